## -*- texinfo -*-
## @deftypefn {} {@var{r} =} tune_lambda (@var{mm}, @var{opt})
## Lambda PI tuning.  Self-regulating: Kc = tau/(K (lambda + theta)),
## Ti = tau, lambda (the closed-loop time constant) defaulting to 3 tau, a
## cautious choice (common practice).  Integrating, lambda being the arrest
## time and required: Ti = 2 lambda + theta, Kc = Ti/(k' (lambda + theta)^2).
## @end deftypefn

function r = tune_lambda (mm, opt)

  if (! isempty (opt.type) && ! strcmp (opt.type, "pi"))
    error ("Octave:invalid-input-arg",
           "vn_tune: lambda tuning gives \"pi\" settings, not \"%s\"\n", opt.type);
  endif
  lambda = opt.lambda;
  r.notes = "";
  if (mm.integrating)
    if (isempty (lambda))
      error ("Octave:invalid-input-arg",
             "vn_tune: lambda tuning of an integrating model needs option \"lambda\", the arrest time (time, > 0), chosen from the level swing the vessel allows\n");
    endif
    r.Ti = 2 * lambda + mm.theta;
    r.Kc = r.Ti / (mm.K * (lambda + mm.theta)^2);
    r.notes = sprintf ("lambda tuning, integrating process, arrest time %g.", lambda);
  else
    [tau, theta, r.notes] = tune_halfrule (mm);
    if (isempty (lambda))
      lambda = 3 * tau;
    endif
    r.Kc = tau / (mm.K * (lambda + theta));
    r.Ti = tau;
    r.notes = [r.notes, sprintf("lambda tuning, closed-loop time constant %g.", lambda)];
  endif
  r.Td = 0;
  r.form = "ideal";
  r.type = "pi";
  r.lambda = lambda;

endfunction

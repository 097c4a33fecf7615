## -*- texinfo -*-
## @deftypefn {} {@var{r} =} tune_imc (@var{mm}, @var{opt})
## IMC-based PID for a first-order-plus-dead-time model with a first-order
## Pade dead time (Rivera, Morari and Skogestad, Ind. Eng. Chem. Process Des.
## Dev. 25, 1986): Kc = (2 tau + theta)/(K (2 lambda + theta)),
## Ti = tau + theta/2, Td = tau theta/(2 tau + theta), ideal form.  lambda
## defaults to max(0.25 tau, 0.8 theta): Rivera et al. advise lambda above
## 0.8 theta for this PID (memory), and a closed loop much faster than a
## quarter of the open-loop lag asks for large moves (common practice).
## @end deftypefn

function r = tune_imc (mm, opt)

  if (mm.integrating)
    error ("Octave:invalid-input-arg",
           "vn_tune: the IMC rule here covers self-regulating models only; for an integrating model use \"simc\" or \"lambda\"\n");
  endif
  if (! isempty (opt.type) && ! strcmp (opt.type, "pid"))
    error ("Octave:invalid-input-arg",
           "vn_tune: the IMC rule gives \"pid\" settings, not \"%s\"; for PI use \"simc\" or \"lambda\"\n",
           opt.type);
  endif
  [tau, theta, r.notes] = tune_halfrule (mm);
  lambda = opt.lambda;
  if (isempty (lambda))
    lambda = max (0.25 * tau, 0.8 * theta);
  endif
  r.warn = "";
  if (lambda < 0.8 * theta)
    r.warn = sprintf ("lambda %g is below 0.8 times the dead time (%g): the IMC PID is not robust there (Rivera et al. 1986)",
                      lambda, 0.8 * theta);
  endif
  r.Kc = (2 * tau + theta) / (mm.K * (2 * lambda + theta));
  r.Ti = tau + theta / 2;
  r.Td = tau * theta / (2 * tau + theta);
  r.form = "ideal";
  r.type = "pid";
  r.lambda = lambda;
  r.notes = [r.notes, sprintf("IMC PID with lambda %g (Rivera, Morari and Skogestad 1986).", lambda)];

endfunction

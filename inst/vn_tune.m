## -*- texinfo -*-
## @deftypefn  {} {@var{pid} =} vn_tune (@var{model}, @var{method})
## @deftypefnx {} {@var{pid} =} vn_tune (@var{model}, @qcode{"simc"}, @qcode{"tauc"}, @var{tauc})
## @deftypefnx {} {@var{pid} =} vn_tune (@var{model}, @qcode{"simc"}, @qcode{"pid"})
## @deftypefnx {} {@var{pid} =} vn_tune (@var{model}, @qcode{"imc"}, @qcode{"lambda"}, @var{lambda})
## @deftypefnx {} {@var{pid} =} vn_tune (@var{model}, @qcode{"lambda"}, @qcode{"lambda"}, @var{lambda})
## @deftypefnx {} {@var{pid} =} vn_tune (@var{model}, @qcode{"zn"}, @qcode{"type"}, @var{type})
## Compute PI/PID settings from a process model by a published tuning rule.
##
## @var{model} is a struct as returned by @code{vn_fopdt}: a self-regulating
## model with fields @code{gain} (K), @code{tau} (or @code{tau1}, with an
## optional second lag @code{tau2}) and @code{deadtime} (theta); or a model
## with @code{type} @qcode{"integrating"}, @code{gain} (k', output per unit
## input per unit time) and @code{deadtime}.  Times come out in the unit of
## the model's times.
##
## @var{method}:
## @table @asis
## @item @qcode{"simc"}
## Skogestad's SIMC rules (2003).  PI by default: Kc = tau/(K (tauc +
## theta)), Ti = min(tau, 4 (tauc + theta)); integrating: Kc = 1/(k' (tauc +
## theta)), Ti = 4 (tauc + theta).  Option @qcode{"tauc"} sets the
## closed-loop time constant, default the dead time; a model whose dead
## time is 0 (or below 1e-6 tau, taken as 0) has no default and SIMC asks
## for @qcode{"tauc"}.  A second-order model
## is reduced by the half rule for PI; with option @qcode{"pid"} it gets the
## series SIMC PID with Td = tau2 (@code{pid.form} is @qcode{"series"}).
## @item @qcode{"imc"}
## IMC-based PID of Rivera, Morari and Skogestad (1986): Kc = (2 tau +
## theta)/(K (2 lambda + theta)), Ti = tau + theta/2, Td = tau theta/(2 tau +
## theta).  Option @qcode{"lambda"}, default max(0.25 tau, 0.8 theta).
## Self-regulating models only.
## @item @qcode{"lambda"}
## Lambda PI.  Self-regulating: Kc = tau/(K (lambda + theta)), Ti = tau,
## default lambda 3 tau.  Integrating, lambda the arrest time (required):
## Ti = 2 lambda + theta, Kc = Ti/(k' (lambda + theta)^2).
## @item @qcode{"zn"}
## Ziegler-Nichols reaction curve (1942), option @qcode{"type"}
## @qcode{"p"}, @qcode{"pi"} (default) or @qcode{"pid"}: Kc = 1, 0.9, 1.2
## times tau/(K theta) (1/(k' theta) when integrating), Ti = Inf, 3.3 theta,
## 2 theta, Td = 0.5 theta for PID.  Not defined for zero dead time.
## @end table
## The controller type may also be given as a bare @qcode{"p"},
## @qcode{"pi"} or @qcode{"pid"}.
##
## @var{pid} has fields @code{Kc}, @code{Ti} (Inf for P), @code{Td} (0 for
## PI), @code{form}, @code{type}, @code{method}, @code{action},
## @code{tauc}, @code{lambda} (NaN where unused), @code{ideal} and
## @code{notes}.  Form @qcode{"ideal"} is the parallel (ISA) form
## Kc (1 + 1/(Ti s) + Td s); form @qcode{"series"} is
## Kc (1 + 1/(Ti s)) (1 + Td s), and @code{pid.ideal} always holds the
## equivalent ideal settings: Kc (1 + Td/Ti), Ti + Td, Ti Td/(Ti + Td).
##
## Sign convention: Kc carries the sign of 1/K, with the error taken as
## setpoint minus measurement.  For a negative process gain Kc is negative;
## a controller that takes only a positive gain then needs abs(Kc) with its
## action swapped (@code{pid.action} is @qcode{"direct"} instead of
## @qcode{"reverse"}).  A warning with identifier
## @qcode{"vesselnet:tune-unreliable"} is issued for a negative gain and
## where the rule's source says the rule is outside its range.
##
## Tuning settings are a starting point: review them, and the model they
## come from, before they reach a live loop.
##
## @seealso{vn_fopdt, vn_controller}
## @end deftypefn

function pid = vn_tune (model, method, varargin)

  if (nargin < 2)
    print_usage ();
  endif
  mm = tune_model (model);
  if (! ischar (method))
    error ("Octave:invalid-input-arg",
           "vn_tune: METHOD must be a string: \"simc\", \"imc\", \"lambda\" or \"zn\"\n");
  endif
  opt = parse_options (varargin);

  switch (lower (method))
    case "simc"
      r = tune_simc (mm, opt);
    case "imc"
      r = tune_imc (mm, opt);
    case "lambda"
      r = tune_lambda (mm, opt);
    case "zn"
      r = tune_zn (mm, opt);
    otherwise
      error ("Octave:invalid-input-arg",
             "vn_tune: unknown METHOD \"%s\"; allowed: \"simc\", \"imc\", \"lambda\", \"zn\"\n",
             method);
  endswitch

  ## A rule never hands back settings no loop could run with.
  if (! (isfinite (r.Kc) && r.Kc != 0 && r.Ti > 0 && isfinite (r.Td)
         && r.Td >= 0))
    error ("Octave:invalid-input-arg",
           "vn_tune: method \"%s\" gives no usable settings for this model (Kc %g, Ti %g, Td %g); check the model's gain, tau and deadtime, or give \"tauc\" / \"lambda\"\n",
           lower (method), r.Kc, r.Ti, r.Td);
  endif
  if (isfield (r, "warn") && ! isempty (r.warn))
    warning ("vesselnet:tune-unreliable", "vn_tune: %s\n", r.warn);
  endif
  action = "reverse";
  if (mm.K < 0)
    action = "direct";
    warning ("vesselnet:tune-unreliable",
             "vn_tune: model GAIN is negative (%g), so Kc is negative (Kc carries the sign of 1/K); a controller that takes a positive gain needs abs(Kc) and direct instead of reverse action\n",
             mm.K);
  endif

  pid.Kc = r.Kc;
  pid.Ti = r.Ti;
  pid.Td = r.Td;
  pid.form = r.form;
  pid.type = r.type;
  pid.method = lower (method);
  pid.action = action;
  pid.tauc = NaN;
  if (isfield (r, "tauc"))
    pid.tauc = r.tauc;
  endif
  pid.lambda = NaN;
  if (isfield (r, "lambda"))
    pid.lambda = r.lambda;
  endif
  if (strcmp (r.form, "series"))
    pid.ideal = struct ("Kc", r.Kc * (1 + r.Td / r.Ti), "Ti", r.Ti + r.Td,
                        "Td", r.Ti * r.Td / (r.Ti + r.Td));
  else
    pid.ideal = struct ("Kc", r.Kc, "Ti", r.Ti, "Td", r.Td);
  endif
  pid.notes = [r.notes, " Starting point only: review before use on a live loop."];

endfunction

function opt = parse_options (args)

  opt = struct ("tauc", [], "lambda", [], "type", "");
  i = 1;
  while (i <= numel (args))
    a = args{i};
    if (! ischar (a))
      error ("Octave:invalid-input-arg",
             "vn_tune: option %d must be a string; allowed: \"tauc\", \"lambda\", \"type\", \"p\", \"pi\", \"pid\"\n",
             i);
    endif
    a = lower (a);
    switch (a)
      case {"p", "pi", "pid"}
        opt.type = a;
      case {"tauc", "lambda"}
        if (i == numel (args) || ! isnumeric (args{i+1}) || ! isreal (args{i+1})
            || ! isscalar (args{i+1}) || ! (args{i+1} > 0) || ! isfinite (args{i+1}))
          error ("Octave:invalid-input-arg",
                 "vn_tune: %s must be a positive finite scalar (time, unit of the model)\n",
                 upper (a));
        endif
        opt.(a) = double (args{i+1});
        i += 1;
      case "type"
        if (i == numel (args) || ! ischar (args{i+1})
            || ! any (strcmpi (args{i+1}, {"p", "pi", "pid"})))
          error ("Octave:invalid-input-arg",
                 "vn_tune: TYPE must be \"p\", \"pi\" or \"pid\"\n");
        endif
        opt.type = lower (args{i+1});
        i += 1;
      otherwise
        error ("Octave:invalid-input-arg",
               "vn_tune: unknown option \"%s\"; allowed: \"tauc\", \"lambda\", \"type\", \"p\", \"pi\", \"pid\"\n",
               a);
    endswitch
    i += 1;
  endwhile

endfunction

%!demo
%! ## Invented case: hot-liquor tank temperature at an invented brewery,
%! ## steam valve (%) to temperature (degC), model from a step test.
%! m = struct ("gain", 0.42, "tau", 540, "deadtime", 45);
%! pi_simc = vn_tune (m, "simc")
%! pid_imc = vn_tune (m, "imc")
%! printf ("SIMC PI: Kc %.3g %%/degC, Ti %.0f s\n", pi_simc.Kc, pi_simc.Ti);
%! printf ("IMC PID: Kc %.3g %%/degC, Ti %.0f s, Td %.1f s\n", ...
%!         pid_imc.Kc, pid_imc.Ti, pid_imc.Td);

## Worked model K 2, tau 10 min, theta 1 min (REFERENCES.md).
%!shared m
%! m = struct ("gain", 2, "tau", 10, "deadtime", 1);

%!test
%! ## Skogestad, J. Process Control 13 (2003): SIMC PI, tauc = theta
%! p = vn_tune (m, "simc");
%! assert ([p.Kc, p.Ti, p.Td], [2.5, 8, 0], 1e-12);
%! assert (p.form, "ideal");
%! assert (p.tauc, 1);
%! assert (p.action, "reverse");

%!test
%! ## Rivera, Morari and Skogestad, Ind. Eng. Chem. Process Des. Dev. 25 (1986)
%! p = vn_tune (m, "imc", "lambda", 1);
%! assert ([p.Kc, p.Ti, p.Td], [3.5, 10.5, 0.47619], 1e-5);

%!test
%! ## Ziegler and Nichols, Trans. ASME 64 (1942), reaction curve
%! p = vn_tune (m, "zn");
%! assert ([p.Kc, p.Ti, p.Td], [4.5, 3.3, 0], 1e-12);
%! p = vn_tune (m, "zn", "type", "pid");
%! assert ([p.Kc, p.Ti, p.Td], [6, 2, 0.5], 1e-12);

%!test
%! ## Lambda tuning, integrating process, arrest time (memory)
%! mi = struct ("type", "integrating", "gain", 0.1, "deadtime", 1);
%! p = vn_tune (mi, "lambda", "lambda", 10);
%! assert (p.Ti, 21, 1e-12);
%! assert (p.Kc, 1.7355, 1e-4);

%!test
%! ## Lambda tuning, self-regulating: Kc = tau/(K (lambda + theta)), Ti = tau
%! p = vn_tune (m, "lambda", "lambda", 4);
%! assert ([p.Kc, p.Ti, p.Td], [1, 10, 0], 1e-12);
%! p = vn_tune (m, "lambda");          # default lambda 3 tau = 30
%! assert ([p.lambda, p.Kc], [30, 10 / 62], 1e-12);

%!test
%! ## Skogestad (2003) SIMC integrating: Kc = 1/(k' (tauc + theta)),
%! ## Ti = 4 (tauc + theta) (memory)
%! mi = struct ("type", "integrating", "gain", 0.1, "deadtime", 1);
%! p = vn_tune (mi, "simc");
%! assert ([p.Kc, p.Ti], [5, 8], 1e-12);
%! p = vn_tune (mi, "simc", "tauc", 3);
%! assert ([p.Kc, p.Ti], [2.5, 16], 1e-12);

%!test
%! ## Skogestad, J. Process Control 13 (2003), example E1 (memory): the
%! ## half rule reduces the model to tau1 2.5, theta 1.47, and SIMC PI with
%! ## tauc = theta gives Kc 0.85, Ti 2.5
%! p = vn_tune (struct ("gain", 1, "tau", 2.5, "deadtime", 1.47), "simc");
%! assert ([p.Kc, p.Ti], [0.85, 2.5], 2e-3);
%!test
%! ## a dead time that ran to its bound (1e-12 s next to 60 s) is zero:
%! ## SIMC asks for tauc instead of returning Kc ~ 1e13
%! m0 = struct ("gain", 2, "tau", 60, "deadtime", 1e-12);
%! fail ("vn_tune (m0, \"simc\")", "DEADTIME is 0.*\"tauc\", the closed-loop time constant");
%! fail ("vn_tune (m0, \"zn\")", "not defined for model DEADTIME 0");
%! p = vn_tune (m0, "simc", "tauc", 20);
%! assert ([p.Kc, p.Ti], [60 / (2 * 20), 60], 1e-12);   # Skogestad (2003), theta = 0
%! p = vn_tune (m0, "imc");
%! assert (p.Kc < 10 && p.Ti > 1);
%! fail ("vn_tune (struct (\"type\", \"integrating\", \"gain\", 1e-3, \"deadtime\", 1e-15), \"simc\")", "\"tauc\"");
%!test
%! ## Skogestad (2003) half rule then SIMC PI: tau 10 + 1, theta 1 + 1
%! p = vn_tune (struct ("gain", 2, "tau1", 10, "tau2", 2, "deadtime", 1), "simc");
%! assert ([p.Kc, p.Ti], [11 / 8, 11], 1e-12);

%!test
%! ## Skogestad (2003) series SIMC PID, Td = tau2; ideal form by
%! ## Kc (1 + Td/Ti), Ti + Td, Ti Td/(Ti + Td) (common practice)
%! p = vn_tune (struct ("gain", 2, "tau1", 10, "tau2", 3, "deadtime", 1), "simc", "pid");
%! assert ([p.Kc, p.Ti, p.Td], [2.5, 8, 3], 1e-12);
%! assert (p.form, "series");
%! assert ([p.ideal.Kc, p.ideal.Ti, p.ideal.Td], [3.4375, 11, 24 / 11], 1e-12);

%!test
%! ## IMC default lambda max (0.25 tau, 0.8 theta) = 2.5
%! p = vn_tune (m, "imc");
%! assert ([p.lambda, p.Kc], [2.5, 1.75], 1e-12);

%!test
%! ## Negative gain: Kc takes the sign of 1/K, action direct
%! warning ("off", "vesselnet:tune-unreliable", "local");
%! p = vn_tune (struct ("gain", -2, "tau", 10, "deadtime", 1), "simc");
%! assert (p.Kc, -2.5, 1e-12);
%! assert (p.action, "direct");

%!test
%! ## Ziegler-Nichols P, integrating: Kc = 1/(k' theta)
%! p = vn_tune (struct ("type", "integrating", "gain", 0.1, "deadtime", 2), "zn", "p");
%! assert ([p.Kc, p.Ti, p.Td], [5, Inf, 0]);

%!warning <negative> vn_tune (struct ("gain", -2, "tau", 10, "deadtime", 1), "imc");
%!warning <dead time / time constant is 2> vn_tune (struct ("gain", 2, "tau", 1, "deadtime", 2), "zn");
%!warning <below 0.8> vn_tune (struct ("gain", 2, "tau", 10, "deadtime", 5), "imc", "lambda", 1);
%!error <not defined for model DEADTIME 0> vn_tune (struct ("gain", 2, "tau", 10, "deadtime", 0), "zn")
%!error <give option "tauc"> vn_tune (struct ("gain", 2, "tau", 10, "deadtime", 0), "simc")
%!error <needs option "lambda"> vn_tune (struct ("type", "integrating", "gain", 0.1, "deadtime", 1), "lambda")
%!error <TAU2> vn_tune (struct ("gain", 2, "tau", 10, "deadtime", 1), "simc", "pid")
%!error <unknown METHOD "pidx"> vn_tune (struct ("gain", 2, "tau", 10, "deadtime", 1), "pidx")
%!error <GAIN is 0> vn_tune (struct ("gain", 0, "tau", 10, "deadtime", 1), "simc")
%!error <DEADTIME is -1> vn_tune (struct ("gain", 2, "tau", 10, "deadtime", -1), "simc")
%!error <no field deadtime> vn_tune (struct ("gain", 2, "tau", 10), "simc")
%!error <self-regulating models only> vn_tune (struct ("type", "integrating", "gain", 0.1, "deadtime", 1), "imc")
%!error <TAUC must be a positive> vn_tune (struct ("gain", 2, "tau", 10, "deadtime", 1), "simc", "tauc", -1)
%!error <Invalid call> vn_tune (struct ("gain", 2, "tau", 10, "deadtime", 1))

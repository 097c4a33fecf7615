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
## closed-loop time constant, default the dead time.  A second-order model
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

## -*- texinfo -*-
## @deftypefn {} {@var{net} =} vn_controller (@var{net}, @var{name}, @qcode{"measure"}, @var{q}, @qcode{"manipulate"}, @var{input}, @dots{})
## Add a PI/PID controller to a network.
##
## The controller measures any output quantity @var{q} (@qcode{"T2.level"},
## @qcode{"O1.flow"}, @dots{}) and drives any input (@qcode{"LV1.opening"},
## @qcode{"P1.speed"}, @qcode{"F1.flow"}, another controller's
## @qcode{"setpoint"} for a cascade).  Ideal (ISA) form,
## @code{u = bias + Kc (e + I/Ti + Td de/dt)}, with derivative on the
## measurement (filtered, time constant @code{alpha Td}), output limits and
## anti-windup by back-calculation.
##
## Options:
## @table @asis
## @item @qcode{"setpoint"}
## setpoint in the measured unit (an input: a signal may drive it).
## @item @qcode{"gain"}
## Kc in engineering units: output units per measured unit (for a valve
## opening 0..1 and a level in m, 1/m).  A gain given in percent of span,
## Kc%, converts as @code{Kc = Kc% * (output span) / (measurement span)}.
## @item @qcode{"reset"}
## integral time Ti (s); Inf (default) for P only.
## @item @qcode{"deriv"}
## derivative time Td (s), default 0.
## @item @qcode{"action"}
## @qcode{"reverse"} (default: the output rises when the measurement falls
## below setpoint, e = setpoint - measurement, as for a valve on a feed that
## holds a level) or @qcode{"direct"} (the output rises with the
## measurement, as for a valve on an outlet that holds a level).
## @item @qcode{"limits"}
## [lo hi] output limits (default none; give [0 1] for a valve).  The
## output is also held within the driven input's range (a valve opening
## or pump speed within its travel), so limits [0 1.1] on an opening act
## at 1, anti-windup included, and the output reported is what the
## element receives.  Limits that leave nothing of that range are refused.
## @item @qcode{"bias"}
## output at zero error; default the driven input's declared value.
## @item @qcode{"filter"}
## measurement filter time constant (s); default 0 for tank quantities and
## 1 s (a transmitter lag) for flows and other instantaneous quantities.
## @item @qcode{"antiwindup"}
## true (default) or false.
## @item @qcode{"alpha"}
## derivative filter as a fraction of Td (default 0.1).
## @end table
##
## Cascade: declare the inner (slave) controller first, then the outer
## (master) one with @qcode{"manipulate"} naming the inner one's
## @qcode{"setpoint"}.  Within each evaluation the outer controller acts
## first, so the inner one reads the setpoint it is given at that instant;
## up to seven levels may be chained, and a chain that comes back to its
## own setpoint is refused.  A switch may drive a setpoint in the same way.
##
## At the start of a run a controller's transmitter filter reads the plant
## as declared, with every controller output at its bias (by default the
## driven input's declared value); a network declared at equilibrium
## stays there, and one declared off its setpoint sees the controller act
## on the error from the first instant.
##
## The controller's output is reported as @code{res.NAME.output}, with
## @code{res.NAME.measurement} and @code{res.NAME.error}.  Settings must be
## reviewed before they reach a live loop: a model's tuning is a starting
## point, not a commissioning result.
## @seealso{vn_switch, vn_tune, vn_simulate}
## @end deftypefn

function net = vn_controller (net, name, varargin)
  if (nargin < 2)
    print_usage ();
  endif
  fn = "vn_controller";
  loop_check_net (net, name, fn);
  allowed = {"measure", "manipulate", "setpoint", "gain", "reset", "deriv", ...
             "action", "limits", "bias", "filter", "antiwindup", "alpha"};
  o = loop_options (varargin, allowed, fn, name, "controller",
                    {"measure", "manipulate", "setpoint", "gain"});
  aux = loop_refs (net, name, o, fn);
  o = loop_units (net, name, o, fn, "controller");
  par = struct ();
  par.setpoint = loop_scalar (o.setpoint, "setpoint", name, fn, false);
  par.gain = loop_scalar (o.gain, "gain", name, fn, false);
  if (par.gain == 0)
    error ("Octave:invalid-input-arg",
           "%s: controller \"%s\": GAIN must not be 0 (sign goes in ACTION)",
           fn, name);
  endif
  for f = {"reset", "deriv", "bias", "filter", "alpha"}
    if (isfield (o, f{1}))
      par.(f{1}) = loop_scalar (o.(f{1}), f{1}, name, fn, strcmp (f{1}, "reset"));
    endif
  endfor
  if (isfield (o, "action"))
    a = o.action;
    if (! ischar (a) || ! any (strcmpi (a, {"reverse", "direct"})))
      error ("Octave:invalid-input-arg",
             "%s: controller \"%s\": ACTION must be \"reverse\" or \"direct\", got %s",
             fn, name, build_value_str (a));
    endif
    par.action = double (strcmpi (a, "reverse"));
    aux.action = lower (a);
  endif
  if (isfield (o, "limits"))
    L = o.limits;
    if (! (isnumeric (L) && isreal (L) && numel (L) == 2 && L(1) < L(2)
           && ! any (isnan (L))))
      error ("Octave:invalid-input-arg",
             "%s: controller \"%s\": LIMITS must be [lo hi] with lo < hi, got %s",
             fn, name, build_value_str (L));
    endif
    ## the output also stays within the driven input's own range (a valve
    ## opening within [0, 1]); limits must leave something of it
    [rlo, rhi, ru] = loop_input_range (net, o.manipulate,
                                       sprintf ("%s: controller \"%s\"", fn, name));
    if (! (max (L(1), rlo) < min (L(2), rhi)))
      error ("Octave:invalid-input-arg",
             "%s: controller \"%s\": LIMITS %s leave nothing of the range of %s, [%s %s] (%s)",
             fn, name, mat2str (L(:).', 6), o.manipulate, build_value_str (rlo),
             build_value_str (rhi), ru);
    endif
    par.lo = L(1);
    par.hi = L(2);
  endif
  if (isfield (o, "antiwindup"))
    a = o.antiwindup;
    if (! ((islogical (a) || isnumeric (a)) && isscalar (a) && ! isnan (a)))
      error ("Octave:invalid-input-arg",
             "%s: controller \"%s\": ANTIWINDUP must be true or false, got %s",
             fn, name, build_value_str (a));
    endif
    par.antiwindup = double (logical (a));
  endif
  net = loop_append (net, name, "controller", par, aux);
endfunction

%!shared net
%! net = vn_network ("c");
%! net = vn_tank (net, "T1", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 150, "opening", 0.5, "characteristic", "linear");
%! net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", ...
%!                      "LV1.opening", "setpoint", 1, "gain", 2, ...
%!                      "reset", 300, "action", "direct", "limits", [0 1]);
%!test
%! u = net.units(net.index.LC1);
%! assert (u.kind, "controller");
%! assert (u.aux.measure, "T1.level");
%! assert (u.aux.manipulate, "LV1.opening");
%! assert ([u.par.gain u.par.reset u.par.action u.par.lo u.par.hi], [2 300 0 0 1]);
%!test
%! ## a PI loop removes the offset after a load step (common practice)
%! u = vn_signal ("F1.flow", "step", 600, 0.01, 0.013);
%! res = vn_simulate (net, [0 6000], u, "dt", 10);
%! assert (res.T1.level(end), 1, 2e-3);
%! assert (max (res.T1.level) > 1.01);
%! assert (all (res.LC1.output >= 0 & res.LC1.output <= 1));
%!error <LC1.*MEASURE> vn_controller (vn_network ("c"), "LC1", "manipulate", "X.y", "setpoint", 1, "gain", 1)
%!error <"LC2".*already driven> vn_controller (net, "LC2", "measure", "T1.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 1)
%!error <no unit "T9"> vn_controller (net, "LC2", "measure", "T9.level", "manipulate", "LV1.opening", "setpoint", 1, "gain", 1)
%!error <GAIN must not be 0> vn_controller (net, "LC2", "measure", "T1.level", "manipulate", "F1.flow", "setpoint", 1, "gain", 0)
%!error <ACTION> vn_controller (net, "LC2", "measure", "T1.level", "manipulate", "F1.flow", "setpoint", 1, "gain", 1, "action", "sideways")
%!error <ANTIWINDUP must be true or false> vn_controller (net, "LC2", "measure", "T1.level", "manipulate", "F1.flow", "setpoint", 1, "gain", 1, "antiwindup", "yes")
%!error <LIMITS> vn_controller (net, "LC2", "measure", "T1.level", "manipulate", "F1.flow", "setpoint", 1, "gain", 1, "limits", [1 0])
%!error <vn_controller: controller "events": NAME "events" is reserved> vn_controller (net, "events", "measure", "T1.level", "manipulate", "F1.flow", "setpoint", 1, "gain", 1)

## A cascade: the outer level loop sets the inner flow loop's setpoint.
%!test
%! net = vn_tank (vn_network ("c"), "T1", "area", 2, "level", 1.2);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_pump (net, "P1", "T1", "", "flow", 0.02, "speed", 0.5);
%! net = vn_controller (net, "FC1", "measure", "P1.flow", "manipulate", "P1.speed", ...
%!                      "setpoint", 0.01, "gain", 40, "reset", 5, "limits", [0 1.5]);
%! net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "FC1.setpoint", ...
%!                      "setpoint", 1, "gain", 0.02, "reset", 300, "action", "direct");
%! res = vn_simulate (net, [0 1], "dt", 1);
%! ## outer output at t = 0: bias 0.01 + 0.02 (1.2 - 1) = 0.014 m3/s
%! assert (res.LC1.output(1), 0.014, 1e-12);
%! assert (res.FC1.output(1), 0.5 + 40 * (0.014 - 0.01), 1e-10);

## Limits wider than the driven input's range act at the input's end stop:
## limits [0 1.1] on a valve opening behave exactly as [0 1] (anti-windup
## at the real stop), and the reported output is what the valve receives.
%!test
%! function res = run (limits)
%!   net = vn_tank (vn_network ("w"), "T1", "area", 2, "level", 1);
%!   net = vn_feed (net, "F1", "T1", "flow", 0.05);
%!   net = vn_valve (net, "LV1", "T1", "", "kv", 300, "opening", 0.5);
%!   net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", ...
%!                        "setpoint", 1, "gain", 2, "reset", 100, "action", "direct", "limits", limits);
%!   u = vn_signal ("F1.flow", "table", [0 0.05; 300 0.05; 301 0.3; 600 0.3; 601 0.02]);
%!   res = vn_simulate (net, [0 1500], u, "dt", 10);
%! endfunction
%! wide = run ([0 1.1]);
%! tight = run ([0 1]);
%! assert (max (wide.LC1.output), 1);
%! assert (any (wide.LC1.output == 1));
%! assert (wide.LC1.output, wide.LV1.opening, 0);
%! assert (wide.T1.level, tight.T1.level, 1e-6);
%! assert (wide.LC1.output, tight.LC1.output, 1e-6);
%!error <vn_controller: controller "LC1": LIMITS \[1.2 2\] leave nothing of the range of LV1.opening, \[0 1\] \(1\)> ...
%! net = vn_tank (vn_network ("w"), "T1", "area", 2, "level", 1);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 30);
%! net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", ...
%!                      "setpoint", 1, "gain", 2, "limits", [1.2 2]);
## the core refuses the same of a network edited by hand
%!error <controller "LC1": limits \[1.2 2\] leave nothing of the range of LV1.opening, \[0 1\]> ...
%! net = vn_tank (vn_network ("w"), "T1", "area", 2, "level", 1);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 30);
%! net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", ...
%!                      "setpoint", 1, "gain", 2, "limits", [0 1]);
%! net.units(net.index.LC1).par.lo = 1.2;
%! net.units(net.index.LC1).par.hi = 2;
%! vn_simulate (net, [0 1]);

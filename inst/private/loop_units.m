## -*- texinfo -*-
## @deftypefn {} {@var{o} =} loop_units (@var{net}, @var{name}, @var{o}, @var{fn}, @var{kind})
## Convert the options of a controller, switch or heater given as
## "VALUE UNIT".
##
## Set points ("setpoint", "on", "off") take the unit of the measured
## quantity, "bias" that of the manipulated input, times ("reset",
## "deriv", "filter", "lag") a unit of time, a heater's "duty" and "max"
## a unit of power and its "minlevel" a length.  The measured and
## manipulated quantities must have been checked (loop_refs).  Numbers
## pass unchanged.
## @end deftypefn

function o = loop_units (net, name, o, fn, kind)
  label = sprintf ("%s \"%s\"", kind, name);
  caller = sprintf ("%s: unit \"%s\"", fn, name);
  f = fieldnames (o);
  for i = 1:numel (f)
    v = o.(f{i});
    if (! ischar (v))
      continue;
    endif
    switch (f{i})
      case {"setpoint", "on", "off"}
        o.(f{i}) = units_value (fn, label, f{i}, v,
                                units_of (net, o.measure, "output", caller));
      case "bias"
        o.(f{i}) = units_value (fn, label, f{i}, v,
                                units_of (net, o.manipulate, "input", caller));
      case {"reset", "deriv", "filter", "lag"}
        o.(f{i}) = units_value (fn, label, f{i}, v, "s");
      case {"duty", "max"}
        o.(f{i}) = units_value (fn, label, f{i}, v, "W");
      case "minlevel"
        o.(f{i}) = units_value (fn, label, f{i}, v, "m");
    endswitch
  endfor
endfunction

%!test
%! net = vn_tank (vn_network (), "T1", "area", 2, "level", 1);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 10, "opening", 0.5);
%! o = struct ("measure", "T1.level", "manipulate", "LV1.opening",
%!             "setpoint", "1200 mm", "bias", "50 %", "reset", "5 min", "gain", 2);
%! o = loop_units (net, "LC1", o, "vn_controller", "controller");
%! assert ([o.setpoint, o.bias, o.reset, o.gain], [1.2 0.5 300 2], 1e-12);
%!error <vn_controller: controller "LC1": SETPOINT "1 m3/h": "m3/h" is a unit of flow; SETPOINT allows units of length> loop_units (vn_tank (vn_network (), "T1", "area", 2), "LC1", struct ("measure", "T1.level", "manipulate", "T1.x", "setpoint", "1 m3/h"), "vn_controller", "controller")

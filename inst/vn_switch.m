## -*- texinfo -*-
## @deftypefn {} {@var{net} =} vn_switch (@var{net}, @var{name}, @qcode{"measure"}, @var{q}, @qcode{"manipulate"}, @var{input}, @qcode{"on"}, @var{on}, @qcode{"off"}, @var{off}, @dots{})
## Add an on/off switch with a dead band (a level switch starting and
## stopping a pump).
##
## The switch drives @var{input} to @code{values(2)} when the measurement
## @var{q} crosses @var{on} moving away from @var{off}, and back to
## @code{values(1)} when it crosses @var{off}: on > off empties a tank,
## on < off fills one.  It starts at @code{values(1)} unless the
## measurement starts beyond @var{on}.  Switching instants are found
## exactly by the integrator's root finding and logged in
## @code{res.events} (time, unit, new value); the output is
## @code{res.NAME.output}.
##
## Option @qcode{"values"}: [off-value on-value], default [0 1]; both
## within the range of the driven input (a valve opening or pump speed
## within its travel).
##
## A modelled switch is not a safety device: overfill and dry-run
## protection are designed under local codes and licensed practice.
## @seealso{vn_controller, vn_simulate}
## @end deftypefn

function net = vn_switch (net, name, varargin)
  if (nargin < 2)
    print_usage ();
  endif
  fn = "vn_switch";
  loop_check_net (net, name, fn);
  o = loop_options (varargin, {"measure", "manipulate", "on", "off", "values"},
                    fn, name, "switch", {"measure", "manipulate", "on", "off"});
  if (ischar (o.on) || ischar (o.off))
    loop_refs (net, name, o, fn);
    o = loop_units (net, name, o, fn, "switch");
  endif
  par.on = loop_scalar (o.on, "on", name, fn, false);
  par.off = loop_scalar (o.off, "off", name, fn, false);
  if (par.on == par.off)
    error ("Octave:invalid-input-arg",
           "%s: switch \"%s\": ON and OFF set points are equal (%g); the dead band needs on != off",
           fn, name, par.on);
  endif
  aux = loop_refs (net, name, o, fn);
  if (isfield (o, "values"))
    v = o.values;
    if (! (isnumeric (v) && isreal (v) && numel (v) == 2 && all (isfinite (v))))
      error ("Octave:invalid-input-arg",
             "%s: switch \"%s\": VALUES must be [off-value on-value], two finite numbers, got %s",
             fn, name, build_value_str (v));
    endif
    [lo, hi, ru] = loop_input_range (net, o.manipulate,
                                     sprintf ("%s: switch \"%s\"", fn, name));
    if (any (v < lo | v > hi))
      error ("Octave:invalid-input-arg",
             "%s: switch \"%s\": VALUES must lie in the range of %s, [%s %s] (%s), got %s",
             fn, name, o.manipulate, build_value_str (lo), build_value_str (hi),
             ru, mat2str (v(:).', 6));
    endif
    par.offvalue = v(1);
    par.onvalue = v(2);
  endif
  net = loop_append (net, name, "switch", par, aux);
endfunction

%!test
%! ## a sump emptied by a pump under a level switch (invented data):
%! ## cycle period A dh/F_in + A dh/(F_pump - F_in) (mass balance)
%! net = vn_network ("sump");
%! net = vn_tank (net, "S1", "area", 2, "level", 0.5);
%! net = vn_feed (net, "F1", "S1", "flow", 0.004);
%! net = vn_pump (net, "P1", "S1", "", "flow", 0.01, "speed", 0);
%! net = vn_switch (net, "LS1", "measure", "S1.level", "manipulate", "P1.speed", ...
%!                  "on", 1.5, "off", 0.5, "values", [0 1]);
%! res = vn_simulate (net, [0 4000], "dt", 5);
%! ev = res.events;
%! assert (numel (ev.t) >= 4);
%! ## first switch-on when the level reaches 1.5 m: t = A dh / F_in
%! assert (ev.t(1), 2 * 1.0 / 0.004, 1e-3);
%! assert (ev.value(1:2).', [1 0]);
%! period = ev.t(3) - ev.t(1);
%! assert (period, 2 * 1 / 0.004 + 2 * 1 / (0.01 - 0.004), 1e-2);
%!error <equal> vn_switch (vn_network ("s"), "LS1", "measure", "a.b", "manipulate", "c.d", "on", 1, "off", 1)
%!error <ON is required> vn_switch (vn_network ("s"), "LS1", "measure", "a.b", "manipulate", "c.d", "off", 1)

%!error <vn_switch: switch "LS1": VALUES must lie in the range of LV1.opening, \[0 1\] \(1\), got \[0 1.5\]> ...
%! net = vn_tank (vn_network ("w"), "T1", "area", 2, "level", 1);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 30);
%! vn_switch (net, "LS1", "measure", "T1.level", "manipulate", "LV1.opening", "on", 2, "off", 1, "values", [0 1.5]);

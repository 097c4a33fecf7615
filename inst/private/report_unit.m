## -*- texinfo -*-
## @deftypefn  {} {[@var{si}, @var{like}] =} report_unit (@var{net}, @var{q})
## @deftypefnx {} {[@var{si}, @var{like}] =} report_unit (@var{net}, @var{q}, @var{unit})
## The SI unit of measure (as the schema writes it: "m", "m3/s", "1") of
## quantity or parameter @var{q} ("T1.level", "O1.coeff", "LC1.gain",
## "T2.level:offset", "T2.level:scale") of network @var{net}; "" when
## @var{q} is not known.
##
## A controller's or switch's "measured unit" and "output unit" are
## resolved through the quantities it measures and manipulates; its gain
## is output unit per measured unit ("1/m", "(m3/s)/m").  A species
## concentration is "conc" (the unit the user chose).  @var{unit}, the
## unit struct of @var{q} when the caller has it, saves the lookup.
## @var{like} is the quantity whose display unit @var{q} takes: @var{q}
## itself, or for a controller's set point the quantity it measures, for
## its limits the input it manipulates.
## @end deftypefn

function [si, like] = report_unit (net, q, unit)
  si = "";
  like = q;
  if (! ischar (q) || ! isstruct (net) || ! isfield (net, "units"))
    return;
  endif
  colon = find (q == ":", 1);
  if (! isempty (colon))
    switch (q(colon+1:end))
      case "offset"
        [si, like] = report_unit (net, q(1:colon-1));
      case "scale"
        si = "1";
    endswitch
    return;
  endif
  dot = find (q == ".", 1);
  if (isempty (dot))
    return;
  endif
  if (nargin < 3)
    k = find (strcmp ({net.units.name}, q(1:dot-1)), 1);
    if (isempty (k))
      return;
    endif
    unit = net.units(k);
  endif
  [si, like] = unit_of_var (net, unit, q(dot+1:end), q);
endfunction

function [si, like] = unit_of_var (net, u, var, like)
  si = "";
  sch = vn_schema ();
  if (! isfield (sch, u.kind))
    return;
  endif
  ks = sch.(u.kind);
  if (any (strcmp (var, net.options.species)))
    si = "conc";
    return;
  endif
  i = find (strcmp (ks.outputs, var), 1);
  if (! isempty (i))
    si = ks.ounits{i};
  else
    i = find (strcmp (ks.params, var), 1);
    if (! isempty (i))
      si = ks.units{i};
    endif
  endif
  if (any (strcmp (si, {"measured unit", "output unit", "output per measured unit"})))
    meas = "";
    out = "";
    if (isfield (u.aux, "measure"))
      meas = report_unit (net, u.aux.measure);
    endif
    if (isfield (u.aux, "manipulate"))
      out = report_unit (net, u.aux.manipulate);
    endif
    switch (si)
      case "measured unit"
        si = meas;
        like = u.aux.measure;
      case "output unit"
        si = out;
        like = u.aux.manipulate;
      otherwise
        si = per (out, meas);
    endswitch
  elseif (strcmp (si, "code"))
    si = "";
  endif
endfunction

## Output unit per measured unit; a dimensionless measurement adds nothing.
function s = per (a, b)
  if (strcmp (b, "1"))
    s = a;
  else
    s = report_per (a, b);
  endif
endfunction

%!shared net
%! net = vn_network ("w");
%! net = vn_tank (net, "T1", "area", 4, "level", 2);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 40, "opening", 0.5);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", ...
%!                      "LV1.opening", "setpoint", 1, "gain", 2, "reset", 300, "limits", [0 1]);
%! net = vn_controller (net, "FC1", "measure", "T1.level", "manipulate", ...
%!                      "F1.flow", "setpoint", 1, "gain", 0.01, "reset", 300, "limits", [0 0.1]);
%!assert (report_unit (net, "T1.level"), "m")
%!assert (report_unit (net, "LV1.flow"), "m3/s")
%!assert (report_unit (net, "LV1.kv"), "m3/h")
%!assert (report_unit (net, "LV1.opening"), "1")
%!assert (report_unit (net, "LC1.gain"), "1/m")
%!assert (report_unit (net, "FC1.gain"), "(m3/s)/m")
%!assert (report_unit (net, "LC1.lo"), "1")
%!assert (report_unit (net, "FC1.setpoint"), "m")
%!assert (report_unit (net, "T1.level:offset"), "m")
%!assert (report_unit (net, "T1.level:scale"), "1")
%!test
%! [si, like] = report_unit (net, "LC1.setpoint");
%! assert ({si, like}, {"m", "T1.level"});
%! [si, like] = report_unit (net, "FC1.hi");
%! assert ({si, like}, {"m3/s", "F1.flow"});
%!assert (report_unit (net, "T9.level"), "")
%!assert (report_unit (net, "LC1.action"), "")
%!assert (report_unit (struct (), "T1.level"), "")

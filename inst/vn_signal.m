## -*- texinfo -*-
## @deftypefn  {} {@var{u} =} vn_signal (@var{quantity}, @qcode{"step"}, @var{t0}, @var{before}, @var{after})
## @deftypefnx {} {@var{u} =} vn_signal (@var{quantity}, @qcode{"ramp"}, @var{t0}, @var{t1}, @var{v0}, @var{v1})
## @deftypefnx {} {@var{u} =} vn_signal (@var{quantity}, @qcode{"table"}, @var{tv})
## @deftypefnx {} {@var{u} =} vn_signal (@var{quantity}, @qcode{"table"}, @var{tv}, @qcode{"hold"}, @var{hold})
## @deftypefnx {} {@var{u} =} vn_signal (@var{quantity}, @qcode{"pulse"}, @var{t0}, @var{width}, @var{base}, @var{amplitude})
## Describe how an input of the network varies with time.
##
## @var{quantity} names the input as @qcode{"UNIT.VARIABLE"}, e.g.
## @qcode{"F1.flow"}, @qcode{"LV1.opening"}, @qcode{"P1.speed"} or
## @qcode{"river.head"}; @code{vn_simulate} checks that it exists.
##
## @table @asis
## @item @qcode{"step"}
## @var{before} until time @var{t0}, s, then @var{after}.
## @item @qcode{"ramp"}
## @var{v0} until @var{t0}, linear to @var{v1} at @var{t1} > @var{t0}, then
## @var{v1}.
## @item @qcode{"table"}
## @var{tv} = [t v], K x 2, times non-decreasing; values are joined
## linearly, or held until the next time with @qcode{"hold"}, true.  Two
## rows with equal times make a jump.
## @item @qcode{"pulse"}
## @var{base} + @var{amplitude} during [@var{t0}, @var{t0} + @var{width}),
## @var{base} otherwise.
## @end table
##
## Before its first time a signal keeps its first value, after its last
## time its last value; every time is a breakpoint of the integrator.
##
## The scalar arguments may be texts "VALUE UNIT" (see @code{vn_units}):
## times in a unit of time (@qcode{"10 min"}), values in a unit of the
## input's dimension (@qcode{"36 m3/h"} for a flow, @qcode{"40 %"} for an
## opening); a pulse's @var{amplitude} is a difference (@qcode{"18 degF"}
## is 10 degC).  The table form takes numbers in SI.
## Signals combine into an array: @code{u(2) = vn_signal (@dots{})}.
##
## @seealso{vn_simulate, vn_feed, vn_valve, vn_pump}
## @end deftypefn

function u = vn_signal (quantity, kind, varargin)
  if (nargin < 3)
    print_usage ();
  endif
  fn = "vn_signal";
  if (! (ischar (quantity) && rows (quantity) == 1
         && ! isempty (regexp (quantity, '^[A-Za-z]\w*\.[A-Za-z]\w*$', "once"))))
    build_error (fn, "", ["QUANTITY must be \"UNIT.VARIABLE\" (two ", ...
                          "identifiers joined by a dot), got %s"],
                 build_value_str (quantity));
  endif
  label = sprintf ("signal \"%s\"", quantity);
  kinds = {"step", "ramp", "table", "pulse"};
  if (! (ischar (kind) && rows (kind) == 1 && any (strcmpi (kind, kinds))))
    build_error (fn, label, "KIND must be one of \"%s\", got %s",
                 strjoin (kinds, "\", \""), build_value_str (kind));
  endif
  kind = lower (kind);
  a = varargin;
  hold = false;
  switch (kind)
    case "step"
      names = {"T0", "BEFORE", "AFTER"};
      check_count (fn, label, kind, a, names);
      x = scalars (fn, label, a, names, quantity, [1 0 0]);
      t = [x(1); x(1)];
      v = [x(2); x(3)];
    case "ramp"
      names = {"T0", "T1", "V0", "V1"};
      check_count (fn, label, kind, a, names);
      x = scalars (fn, label, a, names, quantity, [1 1 0 0]);
      if (! (x(2) > x(1)))
        build_error (fn, label, "T1 must be later than T0 (%s s), got %s",
                     build_value_str (x(1)), build_value_str (x(2)));
      endif
      t = x(1:2).';
      v = x(3:4).';
    case "pulse"
      names = {"T0", "WIDTH", "BASE", "AMPLITUDE"};
      check_count (fn, label, kind, a, names);
      x = scalars (fn, label, a, names, quantity, [1 1 0 2]);
      if (! (x(2) > 0))
        build_error (fn, label, "WIDTH must be a positive finite scalar (s), got %s",
                     build_value_str (x(2)));
      endif
      t = [x(1); x(1); x(1) + x(2); x(1) + x(2)];
      v = [x(3); x(3) + x(4); x(3) + x(4); x(3)];
    case "table"
      if (! (numel (a) == 1 || numel (a) == 3))
        build_error (fn, label, ["\"table\" takes TV and optionally ", ...
                                 "\"hold\", true; got %d arguments"], numel (a));
      endif
      [t, v] = table_points (fn, label, a{1});
      if (numel (a) == 3)
        if (! (ischar (a{2}) && strcmpi (a{2}, "hold")))
          build_error (fn, label, "unknown option %s; allowed: hold",
                       build_value_str (a{2}));
        endif
        h = a{3};
        if (! ((islogical (h) || isnumeric (h)) && isscalar (h)
               && (h == 0 || h == 1)))
          build_error (fn, label, "HOLD must be true or false, got %s",
                       build_value_str (h));
        endif
        hold = logical (h);
      endif
  endswitch
  u = struct ("quantity", quantity, "kind", kind, "t", t, "v", v,
              "hold", hold);
endfunction

function check_count (fn, label, kind, a, names)
  if (numel (a) != numel (names))
    build_error (fn, label, "\"%s\" takes %s; got %d arguments", kind,
                 strjoin (names, ", "), numel (a));
  endif
endfunction

## The arguments as a row of finite real scalars.  ROLE per argument: 1 a
## time, 0 a value of the input, 2 a difference of values of the input;
## texts "VALUE UNIT" are converted accordingly.
function x = scalars (fn, label, a, names, quantity, role)
  x = zeros (1, numel (a));
  for i = 1:numel (a)
    v = a{i};
    if (ischar (v))
      if (role(i) == 1)
        si = "s";
      else
        si = units_of ([], quantity(find (quantity == ".", 1) + 1:end));
      endif
      v = units_value (fn, label, names{i}, v, si, role(i) == 2);
    endif
    if (! ((isnumeric (v) || islogical (v)) && isreal (v) && isscalar (v)
           && isfinite (v)))
      build_error (fn, label, "%s must be a finite real scalar, got %s",
                   names{i}, build_value_str (v));
    endif
    x(i) = double (v);
  endfor
endfunction

## Points of a table [t v]: finite, times non-decreasing, at most two
## equal times in a row (one jump).
function [t, v] = table_points (fn, label, tv)
  if (! (isnumeric (tv) && isreal (tv) && ndims (tv) == 2
         && columns (tv) == 2 && rows (tv) >= 1))
    build_error (fn, label, "TV must be a K x 2 matrix [t v], got %s",
                 build_value_str (tv));
  endif
  tv = double (tv);
  if (! all (isfinite (tv(:))))
    [r, c] = find (! isfinite (tv), 1);
    build_error (fn, label, "TV must be finite, got %s in row %d, column %d",
                 build_value_str (tv(r,c)), r, c);
  endif
  t = tv(:,1);
  v = tv(:,2);
  dt = diff (t);
  k = find (dt < 0, 1);
  if (! isempty (k))
    build_error (fn, label, ["TV times must not decrease, got %s s in row ", ...
                             "%d then %s s in row %d"], build_value_str (t(k)),
                 k, build_value_str (t(k+1)), k + 1);
  endif
  k = find (dt(1:end-1) == 0 & dt(2:end) == 0, 1);
  if (! isempty (k))
    build_error (fn, label, ["TV has three equal times (%s s) from row %d; ", ...
                             "a jump takes two rows"], build_value_str (t(k)), k);
  endif
endfunction

%!test
%! u = vn_signal ("F1.flow", "step", 600, 0.020, 0.026);
%! assert (fieldnames (u), {"quantity"; "kind"; "t"; "v"; "hold"});
%! assert (u.quantity, "F1.flow");
%! assert (u.kind, "step");
%! assert (u.t, [600; 600]);
%! assert (u.v, [0.020; 0.026]);
%! assert (u.hold, false);

%!test
%! u = vn_signal ("F1.flow", "step", 600, 0.020, 0.026);
%! u(2) = vn_signal ("LV1.opening", "table", [0 0.5; 900 0.5; 960 0.3]);
%! u(3) = vn_signal ("P1.speed", "ramp", 100, 160, 1, 0.8);
%! u(4) = vn_signal ("river.head", "pulse", 50, 30, 4, 0.5);
%! assert (size (u), [1 4]);
%! assert (u(2).t, [0; 900; 960]);
%! assert (u(2).v, [0.5; 0.5; 0.3]);
%! assert ([u(3).t, u(3).v], [100 1; 160 0.8]);
%! assert ([u(4).t, u(4).v], [50 4; 50 4.5; 80 4.5; 80 4]);
%! assert (u(4).kind, "pulse");

%!test
%! u = vn_signal ("F1.flow", "Table", [0 1; 10 1; 10 2; 20 3], "hold", true);
%! assert (u.kind, "table");
%! assert (u.hold, true);
%! assert (u.t, [0; 10; 10; 20]);

%!test
%! u = vn_signal ("F1.flow", "step", "10 min", "36 m3/h", "72 m3/h");
%! assert (u.t, [600; 600]);
%! assert (u.v, [0.01; 0.02], 1e-15);
%! u = vn_signal ("H1.duty", "ramp", 0, "1 h", "0 kW", "2 kW");
%! assert ([u.t, u.v], [0 0; 3600 2000]);
%! u = vn_signal ("LV1.opening", "pulse", "30 s", "2 min", "40 %", "10 %");
%! assert ([u.t, u.v], [30 0.4; 30 0.5; 150 0.5; 150 0.4], 1e-15);
%!error <vn_signal: signal "F1.flow": AFTER "2 m": "m" is a unit of length; AFTER allows units of flow: m3/s> vn_signal ("F1.flow", "step", 1, 0, "2 m")
%!error <vn_signal: signal "F1.flow": T0 "1 m3/h": "m3/h" is a unit of flow; T0 allows units of time: s, min, h, d> vn_signal ("F1.flow", "step", "1 m3/h", 0, 1)
%!error <vn_signal: signal "T1.chlorine": BEFORE must be a number here> vn_signal ("T1.chlorine", "step", 1, "1 mg/L", 1)
%!error <Invalid call> vn_signal ("F1.flow", "step")
%!error <vn_signal: QUANTITY must be "UNIT.VARIABLE".*got "F1flow"> vn_signal ("F1flow", "step", 1, 2, 3)
%!error <vn_signal: QUANTITY must be "UNIT.VARIABLE".*got "F1.flow.x"> vn_signal ("F1.flow.x", "step", 1, 2, 3)
%!error <vn_signal: signal "F1.flow": KIND must be one of "step", "ramp", "table", "pulse", got "sine"> vn_signal ("F1.flow", "sine", 1, 2, 3)
%!error <vn_signal: signal "F1.flow": "step" takes T0, BEFORE, AFTER; got 2 arguments> vn_signal ("F1.flow", "step", 1, 2)
%!error <vn_signal: signal "F1.flow": AFTER must be a finite real scalar, got NaN> vn_signal ("F1.flow", "step", 1, 2, NaN)
%!error <vn_signal: signal "F1.flow": T1 must be later than T0 \(100 s\), got 50> vn_signal ("F1.flow", "ramp", 100, 50, 1, 2)
%!error <vn_signal: signal "F1.flow": WIDTH must be a positive finite scalar \(s\), got 0> vn_signal ("F1.flow", "pulse", 10, 0, 1, 2)
%!error <vn_signal: signal "F1.flow": TV times must not decrease, got 10 s in row 2 then 5 s in row 3> vn_signal ("F1.flow", "table", [0 1; 10 2; 5 3])
%!error <vn_signal: signal "F1.flow": TV has three equal times \(10 s\) from row 2> vn_signal ("F1.flow", "table", [0 1; 10 2; 10 3; 10 4])
%!error <vn_signal: signal "F1.flow": TV must be a K x 2 matrix \[t v\], got a 2x3 double> vn_signal ("F1.flow", "table", [0 1 2; 3 4 5])
%!error <vn_signal: signal "F1.flow": HOLD must be true or false, got "yes"> vn_signal ("F1.flow", "table", [0 1; 1 2], "hold", "yes")
%!error <vn_signal: signal "F1.flow": unknown option "hod"; allowed: hold> vn_signal ("F1.flow", "table", [0 1; 1 2], "hod", true)

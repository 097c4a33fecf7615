## -*- texinfo -*-
## @deftypefn  {} {@var{x} =} units_value (@var{fn}, @var{label}, @var{field}, @var{v}, @var{si_unit})
## @deftypefnx {} {@var{x} =} units_value (@var{fn}, @var{label}, @var{field}, @var{v}, @var{si_unit}, @var{difference})
## Read an option value that may be given as text "VALUE UNIT".
##
## A value that is not char is returned unchanged.  A text "VALUE UNIT"
## is converted to @var{si_unit}, the SI unit the schema writes for the
## field ("m3/s", "m", "degC", "1" for a fraction, "Kv" or the schema's
## "m3/h" of a valve's kv for a valve coefficient); its unit must be of the
## same dimension.  A unit of measure the table does not know (e.g.
## "m2.5/s") is accepted only as written.  With @var{si_unit} empty, or
## one that depends on another quantity ("measured unit", "output unit",
## "conc", "code"), text is refused: give a number.
## With @var{difference} true the value is a difference (an amplitude),
## converted by the factor alone: 10 K is 10 degC, 18 degF is 10 degC.
##
## Errors name @var{fn}, @var{label} (the unit, may be empty), the field,
## the text given and the units allowed.
## @end deftypefn

function x = units_value (fn, label, field, v, si_unit, difference)
  x = v;
  if (! ischar (v))
    return;
  endif
  if (nargin < 6)
    difference = false;
  endif
  field = upper (field);
  if (isempty (si_unit) || any (strcmp (si_unit, {"measured unit", ...
                                "output unit", "conc", "concentration", "code"})))
    build_error (fn, label, ["%s must be a number here (its unit of measure ", ...
                             "is not known to vesselnet), got %s"], field,
                 build_value_str (v));
  endif
  t = units_table ();
  [allowed, k] = units_allowed (si_unit);
  [val, unit, ok] = units_text (v);
  if (! ok)
    build_error (fn, label, ["%s must be a number or a text \"VALUE UNIT\" ", ...
                             "(%s), got %s"], field, allowed, build_value_str (v));
  endif
  if (isempty (k))
    if (! strcmp (unit, si_unit))
      build_error (fn, label, "%s %s: unit \"%s\" is not allowed; %s allows %s",
                   field, build_value_str (v), unit, field, allowed);
    endif
    x = val;
    return;
  endif
  j = units_find (unit);
  if (j == 0 || t.dim(j) != k)
    if (j == 0)
      what = "an unknown unit";
    else
      what = ["a unit of " t.dims(t.dim(j)).name];
    endif
    build_error (fn, label, "%s %s: \"%s\" is %s; %s allows %s",
                 field, build_value_str (v), unit, what, field, allowed);
  endif
  if (difference)
    x = val * t.factor(j);
  else
    x = val * t.factor(j) + t.offset(j);
  endif
endfunction

%!assert (units_value ("f", "", "flow", "36 m3/h", "m3/s"), 0.01, 1e-17)
%!assert (units_value ("f", "", "flow", 0.01, "m3/s"), 0.01)
%!assert (units_value ("f", "", "opening", "50 %", "1"), 0.5)
%!error <f: u "X": SETPOINT must be a number here \(its unit of measure is not known to vesselnet\), got "1 m"> units_value ("f", "u \"X\"", "setpoint", "1 m", "measured unit")
%!assert (units_value ("f", "", "kv", "1.156 Cv", "Kv"), 1, 2e-4)
%!assert (units_value ("f", "", "t", "68 degF", "degC"), 20, 1e-12)
%!assert (units_value ("f", "", "a", "18 degF", "degC", true), 10, 1e-12)
%!assert (units_value ("f", "", "coeff", "0.01 m2.5/s", "m2.5/s"), 0.01)
%!error <f: tank "T1": LEVEL "1.2 m3/h": "m3/h" is a unit of flow; LEVEL allows units of length: m, mm, cm, km, ft, in> units_value ("f", "tank \"T1\"", "level", "1.2 m3/h", "m")
%!error <f: FLOW "1 furlong/s": "furlong/s" is an unknown unit; FLOW allows units of flow: m3/s> units_value ("f", "", "flow", "1 furlong/s", "m3/s")
%!error <f: COEFF "1 m3/s": unit "m3/s" is not allowed; COEFF allows "VALUE m2.5/s"> units_value ("f", "", "coeff", "1 m3/s", "m2.5/s")
%!error <f: FLOW must be a number or a text "VALUE UNIT" \(units of flow: m3/s.*\), got "fast"> units_value ("f", "", "flow", "fast", "m3/s")


## -*- texinfo -*-
## @deftypefn  {} {@var{v} =} vn_units (@var{x}, @var{unit})
## @deftypefnx {} {@var{v} =} vn_units (@var{x}, @var{from}, @var{to})
## @deftypefnx {} {@var{v} =} vn_units (@var{text})
## @deftypefnx {} {[@var{v}, @var{u}, @var{dim}] =} vn_units (@dots{})
## @deftypefnx {} {} vn_units ()
## @deftypefnx {} {@var{t} =} vn_units ()
## Convert values between engineering units and the SI units used inside.
##
## @code{vn_units (@var{x}, @var{unit})} converts the array @var{x} given
## in @var{unit} to the SI unit of its dimension (temperatures to degC, as
## everywhere in vesselnet): @code{vn_units (36, "m3/h")} is 0.01 (m3/s).
## @code{vn_units (@var{x}, @var{from}, @var{to})} converts between two
## units of one dimension: @code{vn_units (0.01, "m3/s", "m3/h")} is 36.
## @code{vn_units ("36 m3/h")} reads a text "VALUE UNIT", the form every
## builder option with a dimension accepts.  The second output @var{u} is
## the unit of @var{v}, the third the dimension's name.
##
## Without arguments the table is printed (or returned as a struct array,
## one element per dimension, with fields @code{name}, @code{si},
## @code{units}, @code{factor}, @code{offset}, @code{source}).
##
## Units (case-sensitive; the SI unit of each dimension first):
## @table @asis
## @item length
## m, mm, cm, km, ft, in
## @item area
## m2, cm2, mm2, ft2, in2
## @item volume
## m3, L (or l), mL, ft3, gal (US gallon)
## @item flow
## m3/s, m3/min, m3/h, m3/d, L/s, L/min, L/h (or l/...), gpm and gal/min
## (US), ft3/s
## @item pressure
## Pa, kPa, MPa, bar, mbar, psi, atm
## @item temperature
## degC, K, degF (affine: 32 degF is 0 degC)
## @item power
## W, kW, MW
## @item time
## s, min, h, d
## @item fraction
## 1, % (50 % is 0.5 inside: openings, speeds, transmitter spans)
## @item valve coefficient
## Kv, Cv (Cv = 1.156 Kv; 1 Cv = 0.865 Kv)
## @item density, acceleration, rate, heat loss, specific heat
## kg/m3, g/L, kg/L, g/cm3, lb/ft3; m/s2, ft/s2; 1/s, 1/min, 1/h, 1/d;
## W/K, kW/K; J/(kg K), kJ/(kg K)
## @end table
##
## Typographic forms of plant exports are accepted too: "m³/h", "m^3/h",
## "°C", "°F", "deg C", "m3/hr".  Factors are those of NIST Special
## Publication 811, Appendix B; each is listed with its source by
## @code{vn_units ()}.  An unknown unit, or two units of different
## dimensions, is an error that lists the units allowed.
##
## Temperature conversions are for temperatures, not temperature
## differences: a difference of 1 K is a difference of 1 degC, but
## @code{vn_units (1, "K")} is -272.15.
##
## @seealso{vn_readlog, vn_network}
## @end deftypefn

function [v, u, dim] = vn_units (x, from, to)
  fn = "vn_units";
  t = units_table ();
  if (nargin == 0)
    if (nargout > 0)
      v = table_struct (t);
    else
      print_table (t);
    endif
    return;
  elseif (nargin > 3)
    print_usage ();
  endif
  if (nargin == 1)
    if (! ischar (x))
      error ("Octave:invalid-input-arg",
             "%s: with one argument, give a text \"VALUE UNIT\" such as \"36 m3/h\", got %s",
             fn, value_str (x));
    endif
    [val, from, ok] = units_text (x);
    if (! ok)
      error ("Octave:invalid-input-arg",
             "%s: \"%s\" is not \"VALUE UNIT\" (a number with a decimal point, then a unit, e.g. \"36 m3/h\")",
             fn, x);
    endif
    x = val;
  elseif (! ((isnumeric (x) || islogical (x)) && isreal (x)))
    error ("Octave:invalid-input-arg",
           "%s: X must be a real numeric array, got %s", fn, value_str (x));
  endif
  i = known (fn, t, from, "FROM");
  if (nargin < 3)
    k = t.dim(i);
    j = find (strcmp (t.unit, t.dims(k).si), 1);
  else
    j = known (fn, t, to, "TO");
    if (t.dim(i) != t.dim(j))
      error ("Octave:invalid-input-arg",
             "%s: cannot convert %s (a %s) to %s (a %s); %s units: %s",
             fn, quote (from), t.dims(t.dim(i)).name, quote (to),
             t.dims(t.dim(j)).name, t.dims(t.dim(i)).name,
             strjoin (t.dims(t.dim(i)).units, ", "));
    endif
  endif
  v = double (x) * t.factor(i) + t.offset(i);
  if (j != find (strcmp (t.unit, t.dims(t.dim(j)).si), 1))
    v = (v - t.offset(j)) / t.factor(j);
  endif
  u = t.unit{j};
  dim = t.dims(t.dim(j)).name;
endfunction

## The table position of unit U, or an error listing every unit.
function i = known (fn, t, u, what)
  i = units_find (u);
  if (i == 0)
    if (ischar (u) && rows (u) <= 1)
      shown = quote (u);
    else
      shown = value_str (u);
    endif
    lst = arrayfun (@(d) sprintf ("%s: %s", d.name, strjoin (d.units, ", ")),
                    t.dims, "uniformoutput", false);
    error ("Octave:invalid-input-arg",
           "%s: %s: unknown unit %s; known units are %s", fn, what, shown,
           strjoin (lst, "; "));
  endif
endfunction

function s = quote (u)
  s = ["\"" u "\""];
endfunction

function s = value_str (v)
  if (ischar (v))
    s = ["\"" v(:).' "\""];
  elseif (isscalar (v) && isnumeric (v))
    s = sprintf ("%g", v);
  else
    s = sprintf ("a %s %s", strjoin (arrayfun (@num2str, size (v),
                                               "uniformoutput", false), "x"),
                 class (v));
  endif
endfunction

function d = table_struct (t)
  d = t.dims;
  for k = 1:numel (d)
    m = t.dim == k;
    d(k).factor = t.factor(m).';
    d(k).offset = t.offset(m).';
    d(k).source = t.source(m).';
  endfor
endfunction

function print_table (t)
  for k = 1:numel (t.dims)
    printf ("%s (inside: %s)\n", t.dims(k).name, t.dims(k).si);
    for i = find (t.dim == k).'
      if (t.offset(i) == 0)
        printf ("  1 %-9s = %-.10g %s    %s\n", t.unit{i}, t.factor(i),
                t.dims(k).si, t.source{i});
      else
        printf ("  x %-9s = %-.10g x %+.10g %s    %s\n", t.unit{i},
                t.factor(i), t.offset(i), t.dims(k).si, t.source{i});
      endif
    endfor
  endfor
endfunction

%!assert (vn_units (36, "m3/h"), 0.01, 1e-17)
%!assert (vn_units (0.01, "m3/s", "m3/h"), 36, 1e-12)
%!assert (vn_units ("36 m3/h"), 0.01, 1e-17)
%!assert (vn_units ([0 50 100], "%"), [0 0.5 1])
%!assert (vn_units (32, "degF"), 0, 1e-13)
%!assert (vn_units (212, "degF", "K"), 373.15, 1e-12)
%!assert (vn_units (0, "K"), -273.15)
%!assert (vn_units (2400, "mm", "ft"), 2.4 / 0.3048, 1e-12)
%!test
%! [v, u, d] = vn_units (1, "bar");
%! assert ({v, u, d}, {1e5, "Pa", "pressure"});
%! [v, u, d] = vn_units (1, "Kv", "Cv");
%! assert (u, "Cv");
%! assert (d, "valve coefficient");
%! assert (v, 1.156, 1e-3);     # Cv = 1.156 Kv (common practice)
%!test
%! t = vn_units ();
%! assert (numel (t) >= 10);
%! assert (t(1).name, "length");
%! assert (t(1).si, "m");
%! assert (numel (t(1).units), numel (t(1).factor));
%!error <vn_units: cannot convert "m3/h" \(a flow\) to "m" \(a length\); flow units: m3/s, m3/min, m3/h> vn_units (1, "m3/h", "m")
%!error <vn_units: FROM: unknown unit "furlong"; known units are length: m, mm> vn_units (1, "furlong")
%!error <vn_units: TO: unknown unit "Mbar"> vn_units (1, "bar", "Mbar")
%!error <vn_units: "36" is not "VALUE UNIT"> vn_units ("36")
%!error <vn_units: X must be a real numeric array, got "a"> vn_units ("a", "m")
%!error <called with too many inputs> vn_units (1, "m", "m", "m")
%!demo
%! ## a flow transmitter reads 36 m3/h; inside vesselnet that is 0.01 m3/s
%! q = vn_units (36, "m3/h")
%! ## and back, for a report in the plant's units
%! vn_units (q, "m3/s", "m3/h")
%! ## a valve sized as Cv 50 in Kv
%! vn_units (50, "Cv", "Kv")

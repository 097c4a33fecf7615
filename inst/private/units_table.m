## -*- texinfo -*-
## @deftypefn {} {@var{t} =} units_table ()
## The one table of engineering units: every unit vesselnet reads, its
## dimension and its conversion to the SI unit used inside (cached).
##
## A value @var{x} in a unit converts to SI as
## @code{@var{x} * factor + offset}; the offset is non-zero only for the
## affine temperature scales (inside, temperatures are degC, as in
## DESIGN.md section 3).  Returned fields:
##
## @table @code
## @item dims
## struct array, one per dimension: @code{name} (e.g. "flow"), @code{si}
## (the SI unit as the schema writes it, e.g. "m3/s"), @code{units}
## (cellstr of the units of that dimension, table order).
## @item unit, dim, factor, offset, source
## one entry per unit: its spelling, its dimension's position in
## @code{dims}, the factor and offset to SI, and where the factor comes
## from.
## @end table
##
## Sources: NIST Special Publication 811 (2008), Guide for the Use of the
## International System of Units, Appendix B.8 (factors for units listed
## alphabetically) and B.9 (by kind of quantity).  Where a unit is defined
## exactly through others (the international foot and pound of 1959, the
## US gallon of 231 cubic inches, standard gravity), the factor is computed
## from that definition and the rounded NIST figure is quoted beside it; the
## tests check each factor against the quoted NIST figure.  NIST figures
## are quoted from memory and marked "(memory)".
## @end deftypefn

function t = units_table ()
  persistent cache;
  if (! isempty (cache))
    t = cache;
    return;
  endif
  ft = 0.3048;               # international foot, 1959 (exact)
  in = 0.0254;               # international inch, 1959 (exact)
  gal = 231 * in^3;          # US gallon = 231 in3 (exact)
  lbf = 0.45359237 * 9.80665;  # pound-force = lb * standard gravity (exact)
  psi = lbf / in^2;          # pound-force per square inch
  bar = 1e5;
  ## Kv: flow of water in m3/h through the valve at 1 bar drop (IEC
  ## 60534-1); Cv: flow of water in US gal/min at 1 psi drop
  ## (ANSI/ISA-75.01.01).  Flow scales with sqrt (drop), so 1 Cv is
  ## gal/min in m3/h times sqrt (bar / psi), 0.864976 Kv, i.e.
  ## Cv = 1.156 Kv (common practice; IEC 60534-2-1 N1 = 1e-1 for Kv and
  ## 8.65e-2 for Cv, ratio 0.865 (memory)).  The density difference
  ## between the two reference waters (5-40 degC against 60 degF) is
  ## neglected, as in common practice.
  kv_per_cv = gal * 60 * sqrt (bar / psi);

  ## {unit, dimension, factor, offset, source}
  tab = {
    ## length (m)
    "m",      "length", 1,          0, "SI base unit"
    "mm",     "length", 1e-3,       0, "SI prefix milli"
    "cm",     "length", 1e-2,       0, "SI prefix centi"
    "km",     "length", 1e3,        0, "SI prefix kilo"
    "ft",     "length", ft,         0, "NIST SP 811 B.8: foot = 3.048 E-01 m (exact)"
    "in",     "length", in,         0, "NIST SP 811 B.8: inch = 2.54 E-02 m (exact)"
    ## area (m2)
    "m2",     "area",   1,          0, "SI derived unit"
    "cm2",    "area",   1e-4,       0, "SI prefix centi, squared"
    "mm2",    "area",   1e-6,       0, "SI prefix milli, squared"
    "ft2",    "area",   ft^2,       0, "NIST SP 811 B.8: square foot = 9.290 304 E-02 m2 (exact)"
    "in2",    "area",   in^2,       0, "NIST SP 811 B.8: square inch = 6.4516 E-04 m2 (exact)"
    ## volume (m3)
    "m3",     "volume", 1,          0, "SI derived unit"
    "L",      "volume", 1e-3,       0, "NIST SP 811 B.8: liter = 1.0 E-03 m3 (exact)"
    "l",      "volume", 1e-3,       0, "NIST SP 811 B.8: liter = 1.0 E-03 m3 (exact)"
    "mL",     "volume", 1e-6,       0, "SI prefix milli on the liter"
    "ft3",    "volume", ft^3,       0, "NIST SP 811 B.8: cubic foot = 2.831 685 E-02 m3 (memory)"
    "gal",    "volume", gal,        0, "NIST SP 811 B.8: gallon [US] = 3.785 412 E-03 m3 (memory); 231 in3 exact"
    ## volume flow (m3/s)
    "m3/s",   "flow",   1,          0, "SI derived unit"
    "m3/min", "flow",   1/60,       0, "NIST SP 811 B.8: minute = 6.0 E+01 s (exact)"
    "m3/h",   "flow",   1/3600,     0, "NIST SP 811 B.8: hour = 3.6 E+03 s (exact)"
    "m3/d",   "flow",   1/86400,    0, "NIST SP 811 B.8: day = 8.64 E+04 s (exact)"
    "L/s",    "flow",   1e-3,       0, "NIST SP 811 B.8: liter = 1.0 E-03 m3 (exact)"
    "l/s",    "flow",   1e-3,       0, "NIST SP 811 B.8: liter = 1.0 E-03 m3 (exact)"
    "L/min",  "flow",   1e-3/60,    0, "NIST SP 811 B.8: liter, minute (exact)"
    "l/min",  "flow",   1e-3/60,    0, "NIST SP 811 B.8: liter, minute (exact)"
    "L/h",    "flow",   1e-3/3600,  0, "NIST SP 811 B.8: liter, hour (exact)"
    "l/h",    "flow",   1e-3/3600,  0, "NIST SP 811 B.8: liter, hour (exact)"
    "gpm",    "flow",   gal/60,     0, "NIST SP 811 B.8: gallon [US] per minute = 6.309 020 E-05 m3/s (memory)"
    "gal/min","flow",   gal/60,     0, "NIST SP 811 B.8: gallon [US] per minute = 6.309 020 E-05 m3/s (memory)"
    "ft3/s",  "flow",   ft^3,       0, "NIST SP 811 B.8: cubic foot per second = 2.831 685 E-02 m3/s (memory)"
    ## pressure (Pa)
    "Pa",     "pressure", 1,        0, "SI derived unit"
    "kPa",    "pressure", 1e3,      0, "SI prefix kilo"
    "MPa",    "pressure", 1e6,      0, "SI prefix mega"
    "bar",    "pressure", bar,      0, "NIST SP 811 B.8: bar = 1.0 E+05 Pa (exact)"
    "mbar",   "pressure", 1e2,      0, "NIST SP 811 B.8: millibar = 1.0 E+02 Pa (exact)"
    "psi",    "pressure", psi,      0, "NIST SP 811 B.8: pound-force per square inch = 6.894 757 E+03 Pa (memory)"
    "atm",    "pressure", 101325,   0, "NIST SP 811 B.8: atmosphere, standard = 1.013 25 E+05 Pa (exact)"
    ## temperature (degC inside)
    "degC",   "temperature", 1,     0,        "NIST SP 811 B.9: t/degC = T/K - 273.15 (exact)"
    "K",      "temperature", 1,     -273.15,  "NIST SP 811 B.9: t/degC = T/K - 273.15 (exact)"
    "degF",   "temperature", 1/1.8, -32/1.8,  "NIST SP 811 B.9: t/degC = (t/degF - 32)/1.8 (exact)"
    ## power (W)
    "W",      "power",  1,          0, "SI derived unit"
    "kW",     "power",  1e3,        0, "SI prefix kilo"
    "MW",     "power",  1e6,        0, "SI prefix mega"
    ## time (s)
    "s",      "time",   1,          0, "SI base unit"
    "min",    "time",   60,         0, "NIST SP 811 B.8: minute = 6.0 E+01 s (exact)"
    "h",      "time",   3600,       0, "NIST SP 811 B.8: hour = 3.6 E+03 s (exact)"
    "d",      "time",   86400,      0, "NIST SP 811 B.8: day = 8.64 E+04 s (exact)"
    ## dimensionless fractions (openings, speeds, transmitter spans)
    "1",      "fraction", 1,        0, "SI: quantity of dimension one"
    "%",      "fraction", 1e-2,     0, "NIST SP 811 7.10.2: percent = 0.01 (exact)"
    ## valve flow coefficient (Kv inside)
    "Kv",     "valve coefficient", 1,      0, "IEC 60534-1: Kv, m3/h of water at 1 bar (memory)"
    "Cv",     "valve coefficient", kv_per_cv, 0, "ANSI/ISA-75.01.01: Cv, US gal/min at 1 psi; Cv = 1.156 Kv (common practice)"
    ## density (kg/m3)
    "kg/m3",  "density", 1,         0, "SI derived unit"
    "g/L",    "density", 1,         0, "SI prefixes (exact)"
    "kg/L",   "density", 1e3,       0, "NIST SP 811 B.8: liter = 1.0 E-03 m3 (exact)"
    "g/cm3",  "density", 1e3,       0, "NIST SP 811 B.8: gram per cubic centimeter = 1.0 E+03 kg/m3 (exact)"
    "lb/ft3", "density", 0.45359237/ft^3, 0, "NIST SP 811 B.8: pound per cubic foot = 1.601 846 E+01 kg/m3 (memory)"
    ## acceleration (m/s2)
    "m/s2",   "acceleration", 1,    0, "SI derived unit"
    "ft/s2",  "acceleration", ft,   0, "NIST SP 811 B.8: foot per second squared = 3.048 E-01 m/s2 (exact)"
    ## rate (1/s): decay rates
    "1/s",    "rate",   1,          0, "SI derived unit"
    "1/min",  "rate",   1/60,       0, "NIST SP 811 B.8: minute = 6.0 E+01 s (exact)"
    "1/h",    "rate",   1/3600,     0, "NIST SP 811 B.8: hour = 3.6 E+03 s (exact)"
    "1/d",    "rate",   1/86400,    0, "NIST SP 811 B.8: day = 8.64 E+04 s (exact)"
    ## heat loss coefficient (W/K)
    "W/K",    "heat loss", 1,       0, "SI derived unit"
    "kW/K",   "heat loss", 1e3,     0, "SI prefix kilo"
    ## specific heat (J/(kg K))
    "J/(kg K)",  "specific heat", 1,   0, "SI derived unit"
    "kJ/(kg K)", "specific heat", 1e3, 0, "SI prefix kilo"
  };

  ## the SI unit of each dimension, as the schema writes it
  dn = {"length", "m"; "area", "m2"; "volume", "m3"; "flow", "m3/s";
        "pressure", "Pa"; "temperature", "degC"; "power", "W"; "time", "s";
        "fraction", "1"; "valve coefficient", "Kv"; "density", "kg/m3";
        "acceleration", "m/s2"; "rate", "1/s"; "heat loss", "W/K";
        "specific heat", "J/(kg K)"};
  t.dims = struct ("name", dn(:,1).', "si", dn(:,2).', "units", {{}});
  t.unit = tab(:,1);
  t.factor = cell2mat (tab(:,3));
  t.offset = cell2mat (tab(:,4));
  t.source = tab(:,5);
  [~, t.dim] = ismember (tab(:,2), dn(:,1));
  for k = 1:rows (dn)
    t.dims(k).units = tab(t.dim == k, 1).';
  endfor
  cache = t;
endfunction

%!test
%! t = units_table ();
%! assert (all (t.dim > 0));
%! assert (numel (unique (t.unit)), numel (t.unit));   # each spelling once
%! for k = 1:numel (t.dims)
%!   ## the SI unit of each dimension is in the table with factor 1, offset 0
%!   i = find (strcmp (t.unit, t.dims(k).si));
%!   assert (isscalar (i) && t.dim(i) == k && t.factor(i) == 1 && t.offset(i) == 0);
%! endfor
%! assert (all (t.factor > 0));
%! assert (all (! cellfun (@isempty, t.source)));

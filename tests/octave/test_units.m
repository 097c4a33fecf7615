## Engineering units: every conversion factor of vn_units against the
## figure of NIST Special Publication 811 (2008), "Guide for the Use of the
## International System of Units (SI)", Appendix B.8 (factors for units
## listed alphabetically) and B.9 (by kind of quantity), typed here
## independently of inst/private/units_table.m.  NIST figures are quoted
## from memory; the rounded ones (7 significant digits) are checked to
## that rounding, the exact ones ("boldface" in B.8) to rounding error.
## Then round trips, the affine temperature scales, Kv and Cv, and the
## builders' "VALUE UNIT" options.

## ---- factors: one row per unit {unit, SI value of 1 unit, rel. tol., source}
%!test
%! nist = {
%!   "m",       1,              0,    "SI base unit"
%!   "mm",      1e-3,           1e-15, "SI prefix"
%!   "cm",      1e-2,           1e-15, "SI prefix"
%!   "km",      1e3,            0,    "SI prefix"
%!   "ft",      3.048e-1,       1e-15, "NIST SP 811 B.8 foot (exact) (memory)"
%!   "in",      2.54e-2,        1e-15, "NIST SP 811 B.8 inch (exact) (memory)"
%!   "m2",      1,              0,    "SI"
%!   "cm2",     1e-4,           1e-15, "SI prefix"
%!   "mm2",     1e-6,           1e-15, "SI prefix"
%!   "ft2",     9.290304e-2,    1e-15, "NIST SP 811 B.8 square foot (exact) (memory)"
%!   "in2",     6.4516e-4,      1e-15, "NIST SP 811 B.8 square inch (exact) (memory)"
%!   "m3",      1,              0,    "SI"
%!   "L",       1e-3,           1e-15, "NIST SP 811 B.8 liter (exact) (memory)"
%!   "l",       1e-3,           1e-15, "NIST SP 811 B.8 liter (exact) (memory)"
%!   "mL",      1e-6,           1e-15, "SI prefix on the liter"
%!   "ft3",     2.831685e-2,    5e-7, "NIST SP 811 B.8 cubic foot (memory)"
%!   "gal",     3.785412e-3,    5e-7, "NIST SP 811 B.8 gallon [US] (memory)"
%!   "m3/s",    1,              0,    "SI"
%!   "m3/min",  1/6.0e1,        1e-15, "NIST SP 811 B.8 minute = 6.0 E+01 s (memory)"
%!   "m3/h",    1/3.6e3,        1e-15, "NIST SP 811 B.8 hour = 3.6 E+03 s (memory)"
%!   "m3/d",    1/8.64e4,       1e-15, "NIST SP 811 B.8 day = 8.64 E+04 s (memory)"
%!   "L/s",     1e-3,           1e-15, "NIST SP 811 B.8 liter (memory)"
%!   "l/s",     1e-3,           1e-15, "NIST SP 811 B.8 liter (memory)"
%!   "L/min",   1e-3/6.0e1,     1e-15, "NIST SP 811 B.8 liter, minute (memory)"
%!   "l/min",   1e-3/6.0e1,     1e-15, "NIST SP 811 B.8 liter, minute (memory)"
%!   "L/h",     1e-3/3.6e3,     1e-15, "NIST SP 811 B.8 liter, hour (memory)"
%!   "l/h",     1e-3/3.6e3,     1e-15, "NIST SP 811 B.8 liter, hour (memory)"
%!   "gpm",     6.309020e-5,    5e-7, "NIST SP 811 B.8 gallon [US] per minute (memory)"
%!   "gal/min", 6.309020e-5,    5e-7, "NIST SP 811 B.8 gallon [US] per minute (memory)"
%!   "ft3/s",   2.831685e-2,    5e-7, "NIST SP 811 B.8 cubic foot per second (memory)"
%!   "Pa",      1,              0,    "SI"
%!   "kPa",     1e3,            0,    "SI prefix"
%!   "MPa",     1e6,            0,    "SI prefix"
%!   "bar",     1.0e5,          0,    "NIST SP 811 B.8 bar (exact) (memory)"
%!   "mbar",    1.0e2,          0,    "NIST SP 811 B.8 millibar (exact) (memory)"
%!   "psi",     6.894757e3,     5e-7, "NIST SP 811 B.8 pound-force per square inch (memory)"
%!   "atm",     1.01325e5,      0,    "NIST SP 811 B.8 atmosphere, standard (exact) (memory)"
%!   "W",       1,              0,    "SI"
%!   "kW",      1e3,            0,    "SI prefix"
%!   "MW",      1e6,            0,    "SI prefix"
%!   "s",       1,              0,    "SI base unit"
%!   "min",     6.0e1,          0,    "NIST SP 811 B.8 minute (exact) (memory)"
%!   "h",       3.6e3,          0,    "NIST SP 811 B.8 hour (exact) (memory)"
%!   "d",       8.64e4,         0,    "NIST SP 811 B.8 day (exact) (memory)"
%!   "1",       1,              0,    "SI: dimension one"
%!   "%",       1e-2,           0,    "NIST SP 811 7.10.2 percent (memory)"
%!   "kg/m3",   1,              0,    "SI"
%!   "g/L",     1,              1e-15, "SI prefixes"
%!   "kg/L",    1e3,            1e-15, "NIST SP 811 B.8 liter (memory)"
%!   "g/cm3",   1.0e3,          1e-15, "NIST SP 811 B.8 gram per cubic centimeter (exact) (memory)"
%!   "lb/ft3",  1.601846e1,     5e-7, "NIST SP 811 B.8 pound per cubic foot (memory)"
%!   "m/s2",    1,              0,    "SI"
%!   "ft/s2",   3.048e-1,       1e-15, "NIST SP 811 B.8 foot per second squared (exact) (memory)"
%!   "1/s",     1,              0,    "SI"
%!   "1/min",   1/6.0e1,        1e-15, "NIST SP 811 B.8 minute (memory)"
%!   "1/h",     1/3.6e3,        1e-15, "NIST SP 811 B.8 hour (memory)"
%!   "1/d",     1/8.64e4,       1e-15, "NIST SP 811 B.8 day (memory)"
%!   "W/K",     1,              0,    "SI"
%!   "kW/K",    1e3,            0,    "SI prefix"
%!   "J/(kg K)",  1,            0,    "SI"
%!   "kJ/(kg K)", 1e3,          0,    "SI prefix"
%!   "Kv",      1,              0,    "IEC 60534-1 flow coefficient Kv (memory)"
%!   "Cv",      1/1.156,        1e-3, "Cv = 1.156 Kv (common practice)"
%! };
%! t = vn_units ();
%! listed = [t.units];
%! ## every unit of the table is checked here, and nothing else is claimed
%! assert (sort (listed), sort ([nist(:,1).', {"degC", "K", "degF"}]));
%! for i = 1:rows (nist)
%!   if (any (strcmp (nist{i,1}, {"degC", "K", "degF"})))
%!     continue;
%!   endif
%!   v = vn_units (1, nist{i,1});
%!   if (nist{i,3} == 0)
%!     assert (v, nist{i,2}, eps (nist{i,2}));
%!   else
%!     assert (v, nist{i,2}, -nist{i,3});
%!   endif
%! endfor

%!test
%! ## temperatures: t/degC = T/K - 273.15; t/degC = (t/degF - 32)/1.8
%! ## (NIST SP 811 B.9 (memory)); fixed points of water and -40
%! assert (vn_units (273.15, "K"), 0, 1e-12);
%! assert (vn_units (373.15, "K"), 100, 1e-12);
%! assert (vn_units (32, "degF"), 0, 1e-12);
%! assert (vn_units (212, "degF"), 100, 1e-12);
%! assert (vn_units (-40, "degF"), -40, 1e-12);
%! assert (vn_units (-40, "degC", "degF"), -40, 1e-12);
%! assert (vn_units (20, "degC"), 20);
%! assert (vn_units (98.6, "degF", "K"), 310.15, 1e-9);

%!test
%! ## Kv and Cv from their definitions: Cv is US gal/min of water at 1 psi,
%! ## Kv m3/h at 1 bar (IEC 60534-1, ANSI/ISA-75.01.01 (memory)); flow
%! ## scales as sqrt (dp), so 1 Cv = 0.2271247 m3/h * sqrt (1e5 / 6894.757)
%! ## = 0.86497 Kv; IEC 60534-2-1 N1 = 0.0865 (Cv) against 0.1 (Kv) (memory)
%! kv = vn_units (1, "Cv", "Kv");
%! assert (kv, 3.785412e-3 * 60 * sqrt (1e5 / 6.894757e3), -1e-6);
%! assert (kv, 0.0865 / 0.1, -1e-3);
%! assert (vn_units (1, "Kv", "Cv"), 1.156, -1e-3);

## ---- round trips over random values and every pair of one dimension
%!test
%! rand ("seed", 11);
%! t = vn_units ();
%! for k = 1:numel (t)
%!   u = t(k).units;
%!   x = (rand (1, 50) - 0.3) .* 10 .^ (6 * rand (1, 50) - 3);
%!   for i = 1:numel (u)
%!     si = vn_units (x, u{i});
%!     ## relative error, except on the affine temperature scales, where
%!     ## 273.15 or 32 added and taken away again costs digits near zero
%!     tol = 1e-13 * (abs (x) + 500 * strcmp (t(k).name, "temperature"));
%!     assert (abs (vn_units (si, t(k).si, u{i}) - x) <= tol);   # back again
%!     for j = 1:numel (u)
%!       ## i -> j -> i, and i -> j agrees with i -> SI -> j
%!       y = vn_units (x, u{i}, u{j});
%!       assert (abs (vn_units (y, u{j}, u{i}) - x) <= 10 * tol);
%!       assert (y, vn_units (si, t(k).si, u{j}), -1e-12);
%!     endfor
%!   endfor
%! endfor

## ---- builder options as "VALUE UNIT"
%!test
%! net = vn_network ("w", "gravity", "32.17405 ft/s2", "density", "62.4 lb/ft3",
%!                   "ambient", "59 degF", "thermal", true, "decay", "0.36 1/h",
%!                   "species", {"salt"}, "smooth", "1 mm");
%! assert (net.options.gravity, 9.80665, 1e-5);       # 32.17405 ft/s2 (memory)
%! assert (net.options.density, 62.4 * 16.01846, -1e-6);
%! assert (net.options.ambient, 15, 1e-12);
%! assert (net.options.decay, 1e-4, 1e-18);
%! assert (net.options.smooth, 1e-3, 1e-18);
%! net = vn_tank (net, "T1", "diameter", "2400 mm", "level", "1.2 m",
%!                "rim", "10 ft", "base", "-50 cm", "ua", "0.5 kW/K",
%!                "temperature", "293.15 K");
%! p = net.units(1).par;
%! assert ([p.diameter, p.level, p.rim, p.base, p.ua, p.temperature],
%!         [2.4, 1.2, 3.048, -0.5, 500, 20], 1e-12);
%! net = vn_tank (net, "T2", "area", "21.528 ft2", "volume", "2000 L", "rim", "Inf m");
%! p = net.units(2).par;
%! assert ([p.area, p.volume, p.rim], [21.528 * 0.09290304, 2, Inf], 1e-12);
%! net = vn_feed (net, "F1", "T1", "flow", "36 m3/h", "temperature", "50 degF");
%! assert (net.units(3).par.flow, 0.01, 1e-16);
%! assert (net.units(3).par.temperature, 10, 1e-12);
%! net = vn_valve (net, "LV1", "T1", "T2", "kv", "57.8 Cv", "opening", "40 %",
%!                 "lag", "0.5 min", "outlet", "100 mm");
%! p = net.units(4).par;
%! assert (p.kv, 50, 0.01);                           # Cv = 1.156 Kv (common practice)
%! assert ([p.opening, p.lag, p.outlet], [0.4, 30, 0.1], 1e-12);
%! net = vn_pump (net, "P1", "T2", "T1", "flow", "100 gpm", "speed", "80 %");
%! assert (net.units(5).par.flow, 100 * 6.309020e-5, -5e-7);   # NIST SP 811 B.8 (memory)
%! assert (net.units(5).par.speed, 0.8, 1e-15);
%! net = vn_orifice (net, "O1", "T2", "", "diameter", "2 in");
%! assert (net.units(6).par.diameter, 0.0508, 1e-15);
%! net = vn_orifice (net, "O2", "T1", "", "coeff", "0.01 m2.5/s");
%! assert (net.units(7).par.coeff, 0.01);
%! net = vn_boundary (net, "R", "head", "12 ft", "temperature", "10 degC");
%! assert (net.units(8).par.head, 3.6576, 1e-12);
%! net = vn_resistance (net, "R1", "R", "T2", "r", "800 s/m2");
%! assert (net.units(9).par.r, 800);
%! net = vn_heater (net, "H1", "T1", "duty", "20 kW", "max", "0.05 MW",
%!                  "lag", "2 min", "minlevel", "300 mm");
%! p = net.units(10).par;
%! assert ([p.duty, p.max, p.lag, p.minlevel], [2e4, 5e4, 120, 0.3], 1e-12);

%!test
%! ## bulk builders: one text for all, or one per unit
%! net = vn_tank (vn_network (), {"A", "B"}, "area", {"1 m2", "10.7639 ft2"}, "level", "500 mm");
%! assert (net.units(1).par.area, 1);
%! assert (net.units(2).par.area, 10.7639 * 0.09290304, 1e-12);
%! assert ([net.units(1).par.level, net.units(2).par.level], [0.5 0.5]);

%!test
%! ## the same network from numbers in SI and from texts
%! a = vn_valve (vn_feed (vn_tank (vn_network (), "T1", "area", 2, "level", 1.2),
%!                        "F1", "T1", "flow", 0.01), "V1", "T1", "", "kv", 40, "opening", 0.5);
%! b = vn_valve (vn_feed (vn_tank (vn_network (), "T1", "area", "2 m2", "level", "1200 mm"),
%!                        "F1", "T1", "flow", "36 m3/h"), "V1", "T1", "", "kv", "40 Kv", "opening", "50 %");
%! for i = 1:3
%!   assert (b.units(i).par, a.units(i).par, 1e-15);
%! endfor

## ---- wrong units: command, unit, field, value and the units allowed
%!error <vn_feed: feed "F2": FLOW "36 m": "m" is a unit of length; FLOW allows units of flow: m3/s, m3/min, m3/h, m3/d, L/s> vn_feed (vn_tank (vn_network (), "T1", "area", 1), "F2", "T1", "flow", "36 m")
%!error <vn_tank: tank "T1": LEVEL "1.2 m3": "m3" is a unit of volume; LEVEL allows units of length: m, mm, cm, km, ft, in> vn_tank (vn_network (), "T1", "area", 1, "level", "1.2 m3")
%!error <vn_tank: tank "T1": AREA "2 furlong2": "furlong2" is an unknown unit; AREA allows units of area: m2, cm2, mm2, ft2, in2> vn_tank (vn_network (), "T1", "area", "2 furlong2")
%!error <vn_valve: valve "V1": KV "40 m3/h": "m3/h" is a unit of flow; KV allows units of valve coefficient: Kv, Cv> vn_valve (vn_tank (vn_network (), "T1", "area", 1), "V1", "T1", "", "kv", "40 m3/h")
%!error <vn_valve: valve "V1": OPENING "0.5 m": "m" is a unit of length; OPENING allows units of fraction: 1, %> vn_valve (vn_tank (vn_network (), "T1", "area", 1), "V1", "T1", "", "kv", 4, "opening", "0.5 m")
%!error <vn_valve: valve "V1": OPENING must be a scalar in \[0, 1\], got "150 %" \(1.5\)> vn_valve (vn_tank (vn_network (), "T1", "area", 1), "V1", "T1", "", "kv", 4, "opening", "150 %")
%!error <vn_tank: tank "T1": LEVEL must be a non-negative finite scalar \(m\), got "-1 ft" \(-0.3048 m\)> vn_tank (vn_network (), "T1", "area", 1, "level", "-1 ft")
%!error <vn_resistance: resistance "R1": R "800 s/m3": unit "s/m3" is not allowed; R allows "VALUE s/m2"> vn_resistance (vn_tank (vn_tank (vn_network (), "T1", "area", 1), "T2", "area", 1), "R1", "T1", "T2", "r", "800 s/m3")
%!error <vn_network: network "w": AMBIENT "15 K/s": "K/s" is an unknown unit; AMBIENT allows units of temperature: degC, K, degF> vn_network ("w", "ambient", "15 K/s")
%!error <vn_tank: tank "T1": AREA must be a positive finite scalar \(m2\), got "2,5 m2" \(give a number, or a text "VALUE UNIT" in units of area> vn_tank (vn_network (), "T1", "area", "2,5 m2")

## ---- display units
%!test
%! net = vn_network ("w", "display", {"flow", "m3/h"; "level", "mm"; "T2.level", "ft"});
%! assert (net.options.display, {"flow", "m3/h"; "level", "mm"; "T2.level", "ft"});

%!error <vn_network: network "w": DISPLAY unit for "T2.level" \(a length\) must be one of m, mm, cm, km, ft, in, got "%"> vn_network ("w", "display", {"T2.level", "%"})

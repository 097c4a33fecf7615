## Reference tests of vessel geometry through vn_simulate's outputs:
## partly filled horizontal cylinders, spheres and cones, a strapping
## table, and the level-volume inversion while a vessel fills.  Each
## check names its published source.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_ref_geometry.m")'

## Volumes of partly filled vessels (Perry's Chemical Engineers' Handbook,
## vessel volumes; REFERENCES.md), written here independently of the core.
%!function V = vol_horizontal (R, L, h)
%!  V = L * (R^2 * acos ((R - h) / R) - (R - h) .* sqrt (2 * R * h - h.^2));
%!endfunction

%!function V = vol_sphere (R, h)
%!  V = pi * h.^2 .* (3 * R - h) / 3;
%!endfunction

%!function V = vol_cone (R, H, h)
%!  V = (pi / 3) * (R / H)^2 * h.^3;
%!endfunction

## A tank on its own: its initial volume is what the geometry holds at
## the declared level.
%!function res = at_rest (varargin)
%!  net = vn_network ("vessel");
%!  net = vn_tank (net, "T1", varargin{:});
%!  res = vn_simulate (net, [0 10], "dt", 5);
%!endfunction

%!test
%! ## Horizontal cylinder R 1, L 5, h 0.5 m: 3.0709 m3 (Perry's Chemical
%! ## Engineers' Handbook, vessel volumes)
%! res = at_rest ("shape", "horizontal", "diameter", 2, "length", 5, "level", 0.5);
%! assert (res.T1.volume, 3.0709 * ones (3, 1), 5e-5);
%! assert (res.T1.volume(1), vol_horizontal (1, 5, 0.5), 1e-10);
%! assert (res.T1.level, 0.5 * ones (3, 1), 1e-12);

%!test
%! ## h/D 0.4 is 37.35 % full (same source)
%! res = at_rest ("shape", "horizontal", "diameter", 2, "length", 5, "level", 0.8);
%! assert (res.T1.volume(1) / (pi * 5), 0.3735, 5e-5);

%!test
%! ## Sphere R 5, h 2 m: 54.454 m3, V = pi h^2 (3R - h)/3 (same source)
%! res = at_rest ("shape", "sphere", "diameter", 10, "level", 2);
%! assert (res.T1.volume(1), 54.454, 5e-4);
%! assert (res.T1.volume(1), vol_sphere (5, 2), 1e-9);
%! ## full sphere: 4/3 pi R^3
%! res = at_rest ("shape", "sphere", "diameter", 10, "level", 10);
%! assert (res.T1.volume(1), 4 / 3 * pi * 125, 1e-9);

%!test
%! ## Cone apex down R 4, H 12, h 5 m: 14.544 m3,
%! ## V = (pi/3)(R/H)^2 h^3 (same source)
%! res = at_rest ("shape", "cone", "diameter", 8, "height", 12, "level", 5);
%! assert (res.T1.volume(1), 14.544, 5e-4);
%! assert (res.T1.volume(1), vol_cone (4, 12, 5), 1e-10);

%!test
%! ## Strapping table: linear interpolation between rows (common practice)
%! tab = [0 0; 1 2; 2 6; 3 8];
%! res = at_rest ("table", tab, "level", 0.5);
%! assert (res.T1.volume(1), 1, 1e-12);
%! res = at_rest ("table", tab, "level", 2.25);
%! assert (res.T1.volume(1), 6.5, 1e-12);
%! ## filling at 0.01 m3/s from 1 m3: after 300 s 4 m3, level 1.5 m;
%! ## after 550 s 6.5 m3, level 2.25 m
%! net = vn_network ("strapped");
%! net = vn_tank (net, "T1", "table", tab, "level", 0.5);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! res = vn_simulate (net, [0 50 100 300 550], "reltol", 1e-9);
%! assert (res.T1.volume, 1 + 0.01 * res.t, 1e-9);
%! assert (res.T1.level, interp1 (tab(:,2), tab(:,1), res.T1.volume), 1e-9);
%! assert (res.T1.level(end-1:end), [1.5; 2.25], 1e-9);

%!test
%! ## Level from volume while a horizontal cylinder fills at a constant
%! ## feed: the geometry at the reported level holds the reported volume
%! ## (Perry's Chemical Engineers' Handbook, vessel volumes)
%! net = vn_network ("filling");
%! net = vn_tank (net, "T1", "shape", "horizontal", "diameter", 2, ...
%!                "length", 5, "level", 0.05);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! res = vn_simulate (net, (0:60:1500).', "reltol", 1e-9);
%! V0 = vol_horizontal (1, 5, 0.05);
%! assert (res.T1.volume, V0 + 0.01 * res.t, 1e-8);
%! assert (vol_horizontal (1, 5, res.T1.level), res.T1.volume, 1e-8);
%! assert (all (diff (res.T1.level) > 0));
%! assert (res.T1.level(end) < 2);

%!test
%! ## The same for a sphere and a cone (same source)
%! net = vn_network ("filling");
%! net = vn_tank (net, "S1", "shape", "sphere", "diameter", 4, "level", 0.1);
%! net = vn_tank (net, "C1", "shape", "cone", "diameter", 3, "height", 4, ...
%!                "level", 0.2);
%! net = vn_feed (net, "F1", "S1", "flow", 0.01);
%! net = vn_feed (net, "F2", "C1", "flow", 0.003);
%! res = vn_simulate (net, (0:100:2500).', "reltol", 1e-9);
%! assert (res.S1.volume, vol_sphere (2, 0.1) + 0.01 * res.t, 1e-8);
%! assert (vol_sphere (2, res.S1.level), res.S1.volume, 1e-8);
%! assert (res.C1.volume, vol_cone (1.5, 4, 0.2) + 0.003 * res.t, 1e-8);
%! assert (res.C1.level, cbrt (3 * res.C1.volume / (pi * (1.5 / 4)^2)), 1e-9);

%!test
%! ## A horizontal drum draining through an orifice: A(h) dh/dt = -c sqrt(h),
%! ## A(h) = 2 L sqrt(2 R h - h^2), so the time from h0 to h1 is
%! ## int_h1^h0 2 L sqrt(2R - h) / c dh = (4 L / (3 c)) ((2R - h1)^1.5 - (2R - h0)^1.5)
%! ## (Torricelli 1644 with the horizontal-cylinder plan area, Perry's)
%! c = 0.61 * pi / 4 * 0.08^2 * sqrt (2 * 9.80665);
%! R = 1; L = 5; h0 = 1.6; h1 = 0.4;
%! T = (4 * L / (3 * c)) * ((2 * R - h1)^1.5 - (2 * R - h0)^1.5);
%! net = vn_network ("drum");
%! net = vn_tank (net, "T1", "shape", "horizontal", "diameter", 2 * R, ...
%!                "length", L, "level", h0);
%! net = vn_orifice (net, "O1", "T1", "", "diameter", 0.08, "cd", 0.61);
%! res = vn_simulate (net, [0 T/2 T], "reltol", 1e-9, "abstol", 1e-11);
%! assert (res.T1.level(end), h1, 1e-5);

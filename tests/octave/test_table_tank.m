## A strapping-table tank filled past its top: the table's last row is the
## vessel's top and its default rim, so the tank spills there and its level
## stands at the top plus the weir head of the Francis formula
##   Q = 1.84 (L - 0.1 n H) H^1.5   (SI; Francis, Lowell Hydraulic
##   Experiments, 1855; the formula src/core/tank.c cites),
## carried by the plan area of the table's last segment, in vn_steady,
## vn_simulate and vn_linearize alike.  Before, the level ran up the last
## segment without limit.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_table_tank.m")'

%!shared tab, net, Q, L, H, A
%! tab = [0 0; 0.5 1.2; 1.0 2.6; 2.0 5.9];   # invented strapping table
%! Q = 0.02;                                 # m3/s into the tank
%! L = 1;                                    # m, weir crest, no contractions
%! A = (5.9 - 2.6) / (2.0 - 1.0);            # m2, the last segment's area
%! H = (Q / (1.84 * L))^(2/3);               # Francis head at Q (0.0490 m)
%! net = vn_network ("juice");
%! net = vn_tank (net, "TT", "table", tab, "level", 1, "crest", L);
%! net = vn_feed (net, "F1", "TT", "flow", Q);

%!test
%! ## steady: the spill carries the whole inflow, over the top plus H
%! op = vn_steady (net);
%! assert (op.TT.spill, Q, 1e-12);
%! assert (op.TT.level, 2.0 + H, 1e-9);
%! ## the weir head is held over the last row's area
%! assert (op.TT.volume, 5.9 + A * H, 1e-9);
%! assert (op.spilling, {"TT"});

%!test
%! ## simulate: the table is followed up to its top, then the level
%! ## settles at top + H and never runs past it
%! res = vn_simulate (net, [0 900], "dt", 5);
%! ## 100 s of 0.02 m3/s from 2.6 m3: 4.6 m3 lies on the last segment
%! assert (res.TT.level(res.t == 100), 1.0 + 2.0 / A, 1e-6);
%! assert (res.TT.spill(res.t == 100), 0);
%! assert (max (res.TT.level), 2.0 + H, 1e-6);
%! assert (res.TT.level(end), 2.0 + H, 1e-6);
%! assert (res.TT.spill(end), Q, 1e-6);
%! ## what came in either stays or has spilled (volume balance)
%! spilled = trapz (res.t, res.TT.spill);
%! assert (res.TT.volume(end) - 2.6 + spilled, Q * 900, 1e-3 * Q * 900);

%!test
%! ## linearize at the spilling point: the pole is -dQ/dV over the last
%! ## segment's area, the gain of the feed on the level 1 / (dQ/dH), both
%! ## from the Francis formula, and the spill passes the feed on at gain 1
%! op = vn_steady (net);
%! lin = vn_linearize (net, op, {"F1.flow"}, {"TT.level", "TT.spill"});
%! dQdH = 1.5 * 1.84 * L * sqrt (H);
%! assert (lin.A, -dQdH / A, 1e-6 * dQdH / A);
%! assert (lin.gain(1), 1 / dQdH, 1e-6 / dQdH);
%! assert (lin.gain(2), 1, 1e-9);
%! ## and the difference of two operating points agrees
%! op2 = vn_steady (net, "F1.flow", Q * (1 + 1e-4));
%! g = (op2.TT.level - op.TT.level) / (Q * 1e-4);
%! assert (lin.gain(1), g, 1e-3 * abs (g));

%!test
%! ## a rim given below the top: the table holds between rim and top, the
%! ## spill starts at the rim, into a catch tank drained by an orifice
%! n2 = vn_network ("juice");
%! n2 = vn_tank (n2, "C", "area", 3);
%! n2 = vn_tank (n2, "TT", "table", tab, "level", 1, "rim", 1.5, "crest", L,
%!               "spill", "C");
%! n2 = vn_feed (n2, "F1", "TT", "flow", Q);
%! n2 = vn_orifice (n2, "O1", "C", "", "coeff", 0.01);
%! op = vn_steady (n2);
%! assert (op.TT.spill, Q, 1e-12);
%! assert (op.O1.flow, Q, 1e-12);
%! assert (op.TT.level, 1.5 + H, 1e-9);
%! ## the volume comes from the table below the top: 2.6 + 3.3 (0.5 + H)
%! assert (op.TT.volume, 2.6 + A * (0.5 + H), 1e-9);
%! ## the catch tank: Q = coeff sqrt(h)
%! assert (op.C.level, (Q / 0.01)^2, 1e-9);

%!test
%! ## the old failure: a 2 m table fed far more than its orifice passes
%! ## ran up tens of metres; now it spills at the top with the Francis head
%! ## of the default crest (the perimeter of a circle of the last area)
%! n3 = vn_network ("juice");
%! n3 = vn_tank (n3, "TT", "table", tab, "level", 1);
%! n3 = vn_feed (n3, "F1", "TT", "flow", Q);
%! n3 = vn_orifice (n3, "O1", "TT", "", "coeff", 0.005);
%! res = vn_simulate (n3, [0 3600]);
%! Ld = 2 * sqrt (pi * A);
%! qs = res.TT.spill(end);
%! assert (qs + res.O1.flow(end), Q, 1e-6);
%! assert (res.TT.level(end), 2 + (qs / (1.84 * Ld))^(2/3), 1e-6);
%! assert (max (res.TT.level) < 2.05);

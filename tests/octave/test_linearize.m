## Reference tests of vn_linearize and vn_stepresponse on whole networks:
## tank pairs with linear resistances, non-interacting and interacting, a
## long interacting chain (sparse), agreement of the linear and nonlinear
## step responses and, when installed, of octave-control's step response.
## Each check names its source.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_linearize.m")'

## A network struct built directly (the layout of doc/internals.md).
%!function net = blank (name)
%!  net.type = "vesselnet.network";
%!  net.name = name;
%!  net.options = struct ("gravity", 9.80665, "density", 998.2, "cp", 4181.3,
%!                        "ambient", 15, "thermal", false, "species", {{}},
%!                        "decay", [], "smooth", 1e-3);
%!  net.units = struct ("name", {}, "kind", {}, "from", {}, "to", {},
%!                      "par", {}, "table", {}, "aux", {});
%!  net.index = struct ();
%!endfunction

%!function net = add (net, name, kind, from, to, par)
%!  k = numel (net.units) + 1;
%!  net.units(k) = struct ("name", name, "kind", kind, "from", from,
%!                         "to", to, "par", par, "table", [], "aux", struct ());
%!  net.index.(name) = k;
%!endfunction

## Two tanks in series fed by F1 (m3/s), resistances R1 (T1 -> T2) and R2
## (T2 -> free discharge), in s/m2.  Non-interacting: T1 stands 3 m higher
## and R1 enters T2 through an inlet 3 m up, above T2's surface, so T2's
## level does not push back on R1 (free discharge into T2).
%!function net = two_tanks (A1, A2, R1, R2, F, interacting, h1, h2)
%!  net = blank ("two tanks");
%!  lift = 3 * ! interacting;
%!  net = add (net, "T1", "tank", "", "", struct ("area", A1, "level", h1,
%!                                               "base", lift));
%!  net = add (net, "T2", "tank", "", "", struct ("area", A2, "level", h2));
%!  net = add (net, "F1", "feed", "", "T1", struct ("flow", F));
%!  net = add (net, "R1", "resistance", "T1", "T2", struct ("r", R1,
%!                                                          "inlet", lift));
%!  net = add (net, "R2", "resistance", "T2", "", struct ("r", R2));
%!endfunction

## Operating point by simulating long from the declared levels.
%!function op = settle (net, tend)
%!  res = vn_simulate (net, [0 tend], "reltol", 1e-10, "abstol", 1e-12);
%!  op = struct ("x", res.x(end,:).', "net", net, "states", {res.states});
%!endfunction

%!test
%! ## Non-interacting tanks: poles -1/(A1 R1) and -1/(A2 R2), gains R1 and
%! ## R2 (Coughanowr and LeBlanc, tanks in series, memory).  A1 1, A2 0.5 m2,
%! ## R1 0.5 h/m2 = 1800 s/m2, R2 2 h/m2 = 7200 s/m2; F 1e-4 m3/s gives
%! ## h1 = F R1 = 0.18 m and h2 = F R2 = 0.72 m, below the 3 m inlet.
%! net = two_tanks (1, 0.5, 1800, 7200, 1e-4, false, 0.4, 0.3);
%! op = settle (net, 1e5);
%! assert (op.x, [0.18; 0.5 * 0.72], 1e-8);
%! lin = vn_linearize (net, op, "F1.flow", {"T1.level", "T2.level"});
%! assert (lin.poles, [-1/3600; -1/1800], 1e-14);
%! assert (lin.tau, [3600; 1800], 1e-8);
%! assert (lin.gain, [1800; 7200], 1e-6);
%! ## T1 does not feel T2: the T1 column of A has no T2 entry.
%! assert (lin.A(1,2), 0);

%!test
%! ## Interacting tanks, A1 1, A2 0.5 m2, R1 0.5, R2 2 h/m2: poles -6.7016
%! ## and -0.29844 1/h, H2/Q gain 2 h/m2 (Coughanowr and LeBlanc, ch. 7,
%! ## interacting system, memory); h2 = F R2, h1 = F (R1 + R2).
%! net = two_tanks (1, 0.5, 1800, 7200, 1e-4, true, 0.5, 0.5);
%! op = settle (net, 4e5);
%! assert (op.x, [0.9; 0.5 * 0.72], 1e-8);
%! lin = vn_linearize (net, op, {"F1.flow"}, {"T2.level"});
%! assert (lin.poles * 3600, [-0.29844; -6.7016], 5e-5);
%! assert (lin.gain / 3600, 2, 1e-9);
%! ## H2/Q = R2/(tau1 tau2 s^2 + (tau1 + tau2 + A1 R2) s + 1), in hours
%! ## 2/(0.5 s^2 + 3.5 s + 1) (same source).
%! assert (lin.den / lin.den(end), [0.5 * 3600^2, 3.5 * 3600, 1], -1e-9);
%! assert (lin.num / lin.den(end), 7200, -1e-9);
%! assert (isempty (lin.zeros));

%!test
%! ## Small step (1e-4 relative) on the interacting pair: the nonlinear
%! ## response and the exact linear one agree to 1e-3 of the change; the
%! ## model is linear in the levels here, so this checks the Jacobians and
%! ## the integration together.  Default grid: 5 x the slowest tau.
%! net = two_tanks (1, 0.5, 1800, 7200, 1e-4, true, 0.9, 0.72);
%! op = settle (net, 2e5);
%! sr = vn_stepresponse (net, op, "F1.flow", 1e-8, {"T1.level", "T2.level", "R2.flow"});
%! assert (sr.t(end), 5 * 3600 / 0.29844, 1);
%! assert (sr.nonlinear, sr.linear, 1e-3 * abs (sr.linear(end,:)));
%! assert ([sr.metrics_linear.gain], [9000, 7200, 1], -1e-9);
%! ## Second order without zeros starts flat: no dead time of its own, but
%! ## the 1 % threshold is passed later in T2 than in T1.
%! assert (sr.metrics(2).deadtime > sr.metrics(1).deadtime);
%! assert ([sr.metrics.overshoot], [0 0 0]);

%!test
%! ## Square-root tank, A 2 m2, h_s 1.5 m, F_s 0.01 m3/s: tau = 2 A h_s/F_s =
%! ## 600 s, gain 2 h_s/F_s = 300 s/m2 (Seborg et al., memory); a first
%! ## order reaches 63.2 % of its change at tau (analytic).
%! net = blank ("one tank");
%! net = add (net, "T1", "tank", "", "", struct ("area", 2, "level", 1.5));
%! net = add (net, "O1", "orifice", "T1", "", struct ("coeff", 0.01 / sqrt (1.5)));
%! net = add (net, "F1", "feed", "", "T1", struct ("flow", 0.01));
%! op = struct ("x", 3, "net", net);
%! sr = vn_stepresponse (net, op, "F1.flow", 0.01, "T1.level", "percent", true);
%! assert (sr.size, 1e-6, 1e-18);
%! assert (sr.lin.tau, 600, 1e-9);
%! assert (sr.lin.gain, 300, 1e-9);
%! assert (sr.metrics_linear.t63, sr.lin.tau, 0.05);
%! assert (sr.metrics.t63, sr.lin.tau, 0.5);
%! assert (sr.metrics.gain, 300, 0.05);
%! assert (sr.metrics_linear.rise, 600 * log (9), 0.5);

%!test
%! ## 250 interacting tanks of 1 m2 joined by r 100 s/m2, the last draining
%! ## through r: A = tridiag (1, -2, 1)/(A r) with -1 in the first corner;
%! ## eigenvalues -4 sin^2 ((2k - 1) pi/(2 (2N + 1)))/(A r) (analytic,
%! ## tridiagonal Toeplitz with one modified corner, memory).  The level of
%! ## tank i rises by (N - i + 1) r per m3/s (flow through every resistance).
%! N = 250;  r = 100;
%! net = blank ("chain");
%! for i = 1:N
%!   net = add (net, sprintf ("T%d", i), "tank", "", "", struct ("area", 1, "level", (N - i + 1) * r * 1e-3));
%! endfor
%! net = add (net, "F1", "feed", "", "T1", struct ("flow", 1e-3));
%! for i = 1:N
%!   to = "";
%!   if (i < N)
%!     to = sprintf ("T%d", i + 1);
%!   endif
%!   net = add (net, sprintf ("R%d", i), "resistance", sprintf ("T%d", i), to, struct ("r", r));
%! endfor
%! lin = vn_linearize (net, [], "F1.flow", {"T1.level", "T250.level"});
%! assert (issparse (lin.A));
%! assert (nnz (lin.A), 3 * N - 2);
%! k = (1:N)';
%! assert (lin.poles, -4 * sin ((2*k - 1) * pi / (2 * (2*N + 1))) .^ 2 / r, 1e-12);
%! assert (lin.gain, [N * r; r], -1e-9);
%! ld = vn_linearize (net, [], "F1.flow", "T1.level", "dense", true);
%! assert (! issparse (ld.A));
%! assert (ld.A, full (lin.A));
%! ## Poles can be left out.
%! ln = vn_linearize (net, [], "F1.flow", "T1.level", "poles", false);
%! assert (isempty (ln.poles) && isempty (ln.num));

%!test
%! ## Integrating tank: a pump with fixed flow draws T1, so the level's gain
%! ## from the feed is Inf, the pump's flow gain 0 (mass balance, analytic);
%! ## the step response ramps at du/A.
%! net = blank ("integrating");
%! net = add (net, "T1", "tank", "", "", struct ("area", 4, "level", 2));
%! net = add (net, "F1", "feed", "", "T1", struct ("flow", 0.01));
%! net = add (net, "P1", "pump", "T1", "", struct ("flow", 0.01));
%! lin = vn_linearize (net, [], "F1.flow", {"T1.level", "P1.flow"});
%! assert (lin.tau, Inf);
%! assert (lin.gain, [Inf; 0]);
%! sr = vn_stepresponse (net, [], "F1.flow", 0.002, "T1.level", "tend", 600);
%! assert (sr.linear, 0.002 / 4 * sr.t, 1e-12);
%! assert (sr.nonlinear, sr.linear, 1e-6);
%! fail ("vn_stepresponse (net, [], \"F1.flow\", 0.002, \"T1.level\")",
%!       "no finite time constant");

%!test
%! ## octave-control, an independent reference, gives the same step response
%! ## from lin's matrices (interacting pair).
%! if (! isempty (pkg ("list", "control")))
%!   pkg load control;
%!   net = two_tanks (1, 0.5, 1800, 7200, 1e-4, true, 0.9, 0.72);
%!   sr = vn_stepresponse (net, [], "F1.flow", 1e-5, {"T1.level", "T2.level"});
%!   lin = sr.lin;
%!   y = step (ss (lin.A, lin.B * 1e-5, lin.C, lin.D * 1e-5), sr.t);
%!   assert (sr.linear, squeeze (y), 1e-12);
%!   assert (sort (eig (lin.A)), sort (lin.poles), 1e-14);
%! endif

## ---- bad input ----------------------------------------------------------

%!shared net, op
%! net = blank ("one tank");
%! net = add (net, "T1", "tank", "", "", struct ("area", 2, "level", 1.5));
%! net = add (net, "O1", "orifice", "T1", "", struct ("coeff", 0.01 / sqrt (1.5)));
%! net = add (net, "F1", "feed", "", "T1", struct ("flow", 0.01));
%! op = struct ("x", 3, "net", net, "states", {{"T1.volume"}});

%!error <no unit "X1"> vn_linearize (net, op, "X1.flow", "T1.level")
%!error <coeff is not an input of orifice> vn_linearize (net, op, "O1.coeff", "T1.level")
%!error <is a parameter of tank "T1", not an output> vn_linearize (net, op, "F1.flow", "T1.area")
%!error <"UNIT.VARIABLE"> vn_linearize (net, op, "F1.flow", "level")
%!error <another network> vn_linearize (net, struct ("x", [3; 2]), "F1.flow", "T1.level")
%!error <another network> vn_linearize (two_tanks (1, 1, 1, 1, 1, true, 1, 1), op, "F1.flow", "T1.level")
%!error <is zero> vn_stepresponse (net, op, "F1.flow", 0, "T1.level")
%!error <not an output> vn_stepresponse (net, op, "F1.flow", 1e-4, "O1.speed")

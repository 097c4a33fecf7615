## Reference tests of vn_steady: operating points against closed forms of
## the orifice, linear-resistance and weir laws, the inverse problem
## checked by a forward steady state and a long simulation, and the
## diagnoses when no steady state exists.  Each check names its source.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_steady.m")'

%!function net = hand_net (spec)
%!  ## spec rows: {name, kind, from, to, par}; the struct of doc/internals.md
%!  net.type = "vesselnet.network";
%!  net.name = "t";
%!  net.options = struct ("gravity", 9.80665, "density", 998.2, "cp", 4181.3,
%!                        "ambient", 15, "thermal", false, "species", {{}},
%!                        "decay", [], "smooth", 1e-3);
%!  n = rows (spec);
%!  net.units = struct ("name", spec(:,1)', "kind", spec(:,2)',
%!                      "from", spec(:,3)', "to", spec(:,4)',
%!                      "par", spec(:,5)', "table", cell (1, n),
%!                      "aux", repmat ({struct()}, 1, n));
%!  net.index = struct ();
%!  for i = 1:n
%!    net.index.(spec{i,1}) = i;
%!  endfor
%!endfunction

%!function net = chain (n, kind, par, F)
%!  ## n tanks in series, element i from Ti to T(i+1), the last to free discharge
%!  spec = cell (2*n+1, 5);
%!  for i = 1:n
%!    spec(i,:) = {sprintf("T%d", i), "tank", "", "", struct("area", 1, "level", 1)};
%!    to = "";
%!    if (i < n)
%!      to = sprintf ("T%d", i+1);
%!    endif
%!    spec(n+i,:) = {sprintf("E%d", i), kind, sprintf("T%d", i), to, par(i)};
%!  endfor
%!  spec(2*n+1,:) = {"F1", "feed", "", "T1", struct("flow", F)};
%!  net = hand_net (spec);
%!endfunction

%!function h = levels (op, n)
%!  h = zeros (n, 1);
%!  for i = 1:n
%!    h(i) = op.(sprintf ("T%d", i)).level;
%!  endfor
%!endfunction

%!test
%! ## Orifice to free discharge, F = c sqrt(h): h = (F/c)^2 (Torricelli, 1644).
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 0.2);
%!                  "O1", "orifice", "T1", "", struct("coeff", 0.012);
%!                  "F1", "feed", "", "T1", struct("flow", 0.018)});
%! op = vn_steady (net);
%! assert (op.T1.level, (0.018 / 0.012)^2, 1e-9);   # 2.25 m
%! assert (op.T1.volume, 4.5, 1e-8);
%! assert (op.O1.flow, 0.018, 1e-12);
%! assert (op.residual < 1e-12);

%!test
%! ## Two tanks in series joined by orifices, T2 drains freely; the inlet on
%! ## T2's base makes O1 interacting: h2 = (F/c2)^2, h1 = h2 + (F/c1)^2
%! ## (Torricelli's law on each orifice, mass balance at steady state).
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1);
%!                  "T2", "tank", "", "", struct("area", 1, "level", 1);
%!                  "O1", "orifice", "T1", "T2", struct("coeff", 0.01);
%!                  "O2", "orifice", "T2", "", struct("coeff", 0.008);
%!                  "F1", "feed", "", "T1", struct("flow", 0.012)});
%! op = vn_steady (net);
%! assert (op.T2.level, 2.25, 1e-9);
%! assert (op.T1.level, 2.25 + 1.44, 1e-9);
%! assert ([op.O1.flow op.O2.flow], [0.012 0.012], 1e-12);
%! assert (op.states, {"T1.volume"; "T2.volume"});
%! ## other input values: F = 0.008 gives h2 = 1, h1 = 1 + 0.64
%! op = vn_steady (net, "F1.flow", 0.008);
%! assert ([op.T1.level op.T2.level], [1.64 1], 1e-9);
%! assert (op.F1.flow, 0.008);

%!test
%! ## Linear resistances F = dH/r in series: h_i = F sum_{j>=i} r_j
%! ## (mass balance with a linear law; analytic).
%! r = [400 300 200 100 50];
%! net = chain (5, "resistance", struct ("r", num2cell (r)), 0.01);
%! op = vn_steady (net);
%! assert (levels (op, 5), 0.01 * flipud (cumsum (fliplr (r)')), 1e-10);
%! assert (levels (op, 5).', [10.5 6.5 3.5 1.5 0.5], 1e-10);

%!test
%! ## Inverse problem: the feed that holds T2 at 1.5 m is F = c2 sqrt(1.5)
%! ## (Torricelli, 1644); checked by a forward steady state and by a long
%! ## simulation from the declared levels.
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1);
%!                  "T2", "tank", "", "", struct("area", 1, "level", 1);
%!                  "O1", "orifice", "T1", "T2", struct("coeff", 0.01);
%!                  "O2", "orifice", "T2", "", struct("coeff", 0.008);
%!                  "F1", "feed", "", "T1", struct("flow", 0.012)});
%! op = vn_steady (net, "target", {"T2.level", 1.5}, "adjust", {"F1.flow"});
%! F = 0.008 * sqrt (1.5);
%! assert (op.adjusted.F1.flow, F, 1e-10);
%! assert (op.T2.level, 1.5, 1e-9);
%! assert (op.T1.level, 1.5 + (F / 0.01)^2, 1e-9);
%! fw = vn_steady (op.net);
%! assert (fw.T2.level, 1.5, 1e-8);
%! res = vn_simulate (op.net, [0 40000], "dt", 1000);
%! assert (res.T2.level(end), 1.5, 1e-4);
%! ## continuing from the operating point stays there
%! res = vn_simulate (op.net, [0 600], "initial", op);
%! assert (res.T2.level, 1.5 * ones (size (res.t)), 1e-7);

%!test
%! ## A tank whose only outlet is its rim spills exactly the feed; the head
%! ## over the crest follows Francis' weir formula Q = 1.84 L H^1.5
%! ## (Francis, Lowell Hydraulic Experiments, 1855); crest L = perimeter
%! ## of the circle of the tank's area (the core's default).
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1, "rim", 2);
%!                  "F1", "feed", "", "T1", struct("flow", 0.01)});
%! op = vn_steady (net);
%! L = 2 * sqrt (pi * 2);
%! assert (op.T1.spill, 0.01, 1e-12);
%! assert (op.T1.level, 2 + (0.01 / (1.84 * L))^(2/3), 1e-9);   # 2.0106 m
%! assert (op.spilling, {"T1"});
%! assert (op.spill, 0.01, 1e-12);

%!test
%! ## 2000 orifices in series, equal coefficients: each passes F, so each
%! ## head difference is (F/c)^2 and h_i = (n - i + 1) (F/c)^2 (Torricelli).
%! n = 2000;
%! net = chain (n, "orifice", repmat (struct ("coeff", 0.1), 1, n), 0.01);
%! op = vn_steady (net);
%! assert (op.solver, "klu");
%! assert (levels (op, n), (n:-1:1)' * 0.01, 1e-7);

%!error <tank "T1" has no outlet>
%! ## no free discharge, boundary or rim: the feed can only fill T1
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1);
%!                  "F1", "feed", "", "T1", struct("flow", 0.01)});
%! vn_steady (net);
%!test
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1);
%!                  "F1", "feed", "", "T1", struct("flow", 0.01)});
%! try
%!   vn_steady (net);
%!   error ("no error raised");
%! catch e
%!   assert (e.identifier, "vesselnet:no-steady-state");
%! end_try_catch
%!error <pump "P1" cannot deliver.*shutoff head at speed 1 is 25 m>
%! ## lift of about 47 m against a 25 m shutoff head (affinity laws,
%! ## H = s^2 H0 - k Q^2; common practice): no flow, the tank spills
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1, "rim", 3);
%!                  "R", "boundary", "", "", struct("head", 50);
%!                  "P1", "pump", "T1", "R", struct("shutoff", 25, "k", 4e4);
%!                  "F1", "feed", "", "T1", struct("flow", 0.01)});
%! vn_steady (net);
%!error <tank "T1" runs dry: pump "P1">
%! ## a fixed-flow pump drawing 0.02 m3/s from a tank fed 0.01 m3/s
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1);
%!                  "P1", "pump", "T1", "", struct("flow", 0.02);
%!                  "F1", "feed", "", "T1", struct("flow", 0.01)});
%! vn_steady (net);
%!error <tank "T1" keeps filling>
%! ## a fixed-flow pump passing 0.005 m3/s of a 0.01 m3/s feed, no rim
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1);
%!                  "P1", "pump", "T1", "", struct("flow", 0.005);
%!                  "F1", "feed", "", "T1", struct("flow", 0.01)});
%! vn_steady (net);
%!error <1 target\(s\) but 2 adjusted input\(s\)>
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1);
%!                  "O1", "orifice", "T1", "", struct("coeff", 0.01);
%!                  "F1", "feed", "", "T1", struct("flow", 0.01)});
%! vn_steady (net, "target", {"T1.level", 2}, "adjust", {"F1.flow", "T1.area"});
%!error <level is not an input of tank "T1">
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1);
%!                  "O1", "orifice", "T1", "", struct("coeff", 0.01);
%!                  "F1", "feed", "", "T1", struct("flow", 0.01)});
%! vn_steady (net, "T1.level", 2);
%!error <the network has no unit "T7">
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1);
%!                  "O1", "orifice", "T1", "", struct("coeff", 0.01);
%!                  "F1", "feed", "", "T1", struct("flow", 0.01)});
%! vn_steady (net, "target", {"T7.level", 2}, "adjust", {"F1.flow"});
%!error <start state has 2 values; this network has 1 states>
%! ## an operating point of a two-tank network used on a one-tank network
%! net2 = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1);
%!                   "T2", "tank", "", "", struct("area", 1, "level", 1);
%!                   "O1", "orifice", "T1", "T2", struct("coeff", 0.01);
%!                   "O2", "orifice", "T2", "", struct("coeff", 0.008);
%!                   "F1", "feed", "", "T1", struct("flow", 0.012)});
%! op2 = vn_steady (net2);
%! net = hand_net ({"T1", "tank", "", "", struct("area", 2, "level", 1);
%!                  "O1", "orifice", "T1", "", struct("coeff", 0.01);
%!                  "F1", "feed", "", "T1", struct("flow", 0.01)});
%! vn_steady (net, "initial", op2);

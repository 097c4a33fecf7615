## Acceptance checks of the "answers an engineer can trust" behaviours on
## an invented juice line (invented data, no real plant): a lying
## receiving tank RT1, an elevated buffer BT1 that spills into a catch
## tank CT1, a conical hopper HP1, a spherical filler buffer SB1, pumps,
## valves and an orifice, two PI level loops, a sight tube ST1 of 1e-6 m2
## and a flush-water reservoir WR1 of 1e4 m2; time constants from 5 s to
## 7 h.  Every number is checked against a computation outside the
## command under test (two vn_steady points, closed forms, quadrature,
## Octave's ode15s on equations written out here), named beside it.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst build/oct; test ("tests/octave/test_juice_line.m")'

## The line.  Steady flow 0.010 m3/s (36 m3/h) from the truck feed F1
## through P1, FV1, O1 and LV2 to the filler.  RT1 lies on its side
## (D 2.4 m, L 6 m); BT1 stands 8 m up and spills into CT1 above 2.5 m
## (not at the operating point, so CT1 sits empty and idle); O1 drops
## into SB1 above its surface (inlet 1.7 m).  With LOOPS, LC1 holds RT1
## with P1's speed and LC2 holds SB1 with LV2, both direct acting.
%!function net = juice_line (loops, kv, coeff)
%!  if (nargin < 3)
%!    kv = 100;  coeff = 0.008;
%!  endif
%!  net = vn_network ("invented juice line");
%!  net = vn_tank (net, "RT1", "shape", "horizontal", "diameter", 2.4, "length", 6, "level", 1.2);
%!  net = vn_tank (net, "CT1", "area", 1.5, "rim", 2.0, "level", 0);
%!  net = vn_tank (net, "BT1", "area", 3, "base", 8, "rim", 2.5, "spill", "CT1", "level", 1.2);
%!  net = vn_tank (net, "HP1", "shape", "cone", "diameter", 1.6, "height", 2.0, "base", 2, "level", 1.2);
%!  net = vn_tank (net, "SB1", "shape", "sphere", "diameter", 1.8, "level", 0.9);
%!  net = vn_tank (net, "ST1", "area", 1e-6, "rim", 0.5, "level", 0);
%!  net = vn_tank (net, "WR1", "area", 1e4, "base", 20, "level", 0.8);
%!  net = vn_feed (net, "F1", "RT1", "flow", 0.010);
%!  net = vn_pump (net, "P1", "RT1", "BT1", "shutoff", 22, "k", 3e4, "speed", 0.707);
%!  net = vn_valve (net, "FV1", "BT1", "HP1", "kv", kv, "opening", 0.5, "inlet", 1.9);
%!  net = vn_orifice (net, "O1", "HP1", "SB1", "coeff", coeff, "inlet", 1.7);
%!  net = vn_valve (net, "LV2", "SB1", "", "kv", 300, "opening", 0.4);
%!  net = vn_feed (net, "F4", "ST1", "flow", 2e-9);
%!  net = vn_resistance (net, "R4", "ST1", "", "r", 5e6);
%!  net = vn_feed (net, "F3", "WR1", "flow", 0.4);
%!  net = vn_resistance (net, "R3", "WR1", "", "r", 2);
%!  if (loops)
%!    net = vn_controller (net, "LC1", "measure", "RT1.level", "manipulate", "P1.speed", ...
%!                         "setpoint", 1.2, "gain", 0.5, "reset", 1800, "action", "direct", "limits", [0 1.1]);
%!    net = vn_controller (net, "LC2", "measure", "SB1.level", "manipulate", "LV2.opening", ...
%!                         "setpoint", 0.9, "gain", 2, "reset", 300, "action", "direct", "limits", [0 1]);
%!  endif
%!endfunction

## The value of quantity "UNIT.VARIABLE" in an operating point or result.
%!function v = qv (s, q)
%!  d = find (q == ".", 1);
%!  v = s.(q(1:d-1)).(q(d+1:end));
%!endfunction

## Steady gains from vn_steady operating points at u0 + s h, s = -2 -1 1 2,
## h = 1e-3 |u0|: central differences over h and 2 h combined by
## Richardson's extrapolation, (4 D(h) - D(2h)) / 3, error O(h^4), so
## a curved law (a weir just spilling) does not bias them (outputs x
## inputs).
%!function G = steady_diff (net, op, ins, outs, varargin)
%!  G = zeros (numel (outs), numel (ins));
%!  steps = [-2 -1 1 2];
%!  for j = 1:numel (ins)
%!    u0 = op.input_values(strcmp (op.input_names, ins{j}));
%!    h = 1e-3 * abs (u0);
%!    y = zeros (numel (outs), 4);
%!    for k = 1:4
%!      try
%!        o = vn_steady (net, ins{j}, u0 + steps(k) * h, "initial", op, "tol", 1e-14, varargin{:});
%!      catch
%!        ## Newton may stall just short of 1e-14 (rounding)
%!        o = vn_steady (net, ins{j}, u0 + steps(k) * h, "initial", op, "tol", 1e-11, varargin{:});
%!      end_try_catch
%!      y(:,k) = cellfun (@(q) qv (o, q), outs(:));
%!    endfor
%!    G(:,j) = (4 * (y(:,3) - y(:,2)) / (2 * h) - (y(:,4) - y(:,1)) / (4 * h)) / 3;
%!  endfor
%!endfunction

## Finite gains agree to 1e-6 relative.  The differences' own rounding
## noise (some 1e-13 of the output over the step) is not small beside a
## gain far below the largest of its column: between 1e-2 and 1e-5 of it
## the gains agree to 1e-4 relative, and below 1e-5 of it they must be
## within 1e-5 of that largest of both.
%!function check_gains (L, G, rel)
%!  if (nargin < 3)
%!    rel = 1e-6;
%!  endif
%!  assert (all (isfinite (L(:))), sprintf ("gains %s", mat2str (L, 5)));
%!  scale = max (abs (G), [], 1);
%!  for j = 1:columns (G)
%!    for i = 1:rows (G)
%!      if (abs (G(i,j)) > 1e-2 * scale(j))
%!        assert (L(i,j), G(i,j), rel * abs (G(i,j)));
%!      elseif (abs (G(i,j)) > 1e-5 * scale(j))
%!        assert (L(i,j), G(i,j), 1e-4 * abs (G(i,j)));
%!      else
%!        assert (abs (L(i,j) - G(i,j)) <= 1e-5 * scale(j), sprintf ("gain (%d,%d) %g, differences %g", i, j, L(i,j), G(i,j)));
%!      endif
%!    endfor
%!  endfor
%!endfunction

%!shared g
%! g = 9.80665;

## ---------------------------------------------------------------- item 1

%!test
%! ## Open line (no loops): CT1 is idle (no flow in or out), tau from 5 s
%! ## (sight tube) to 7 h (RT1 on its pump curve), plus CT1's free
%! ## integrator.  Every gain equals the difference of two vn_steady
%! ## points; the idle CT1 gets 0, never Inf, and spoils no other gain.
%! net = juice_line (false);
%! op = vn_steady (net);
%! assert (op.CT1.level, 0);
%! assert (op.P1.flow, 0.010, 1e-12);
%! ins = {"F1.flow", "P1.speed", "FV1.opening", "LV2.opening"};
%! outs = {"RT1.level", "BT1.level", "CT1.level", "HP1.level", "SB1.level", "O1.flow", "P1.flow"};
%! lin = vn_linearize (net, op, ins, outs);
%! check_gains (lin.gain, steady_diff (net, op, ins, outs));
%! ## CT1's row is exactly zero (it holds no flow at the operating point)
%! assert (lin.gain(3,:), zeros (1, 4));
%! ## time constants span seconds to hours: sight tube A r = 5 s, reservoir
%! ## A r = 2e4 s (linear resistances, exact)
%! tau = lin.tau(isfinite (lin.tau));
%! assert (min (abs (tau - 5)), 0, 1e-9 * 5);
%! assert (min (abs (tau - 2e4)), 0, 1e-9 * 2e4);
%! assert (max (tau) > 2e4);

%!test
%! ## Closed loops: integral action makes the controlled levels' gains
%! ## exactly 0, the controller outputs move by the difference quotient
%! net = juice_line (true);
%! op = vn_steady (net);
%! assert ([op.RT1.level op.SB1.level], [1.2 0.9], 1e-9);
%! ins = {"F1.flow", "FV1.opening", "LC2.setpoint"};
%! outs = {"RT1.level", "BT1.level", "CT1.level", "SB1.level", "LC1.output", "LC2.output"};
%! lin = vn_linearize (net, op, ins, outs);
%! check_gains (lin.gain, steady_diff (net, op, ins, outs));
%! assert (lin.gain([1 4], 1:2), zeros (2, 2), 1e-9);
%! assert (lin.gain(4, 3), 1, 1e-9);

%!test
%! ## A transfer function is built on the states the input reaches and
%! ## that reach the output only: F1 -> BT1.level has RT1 and BT1 (2
%! ## poles, not 7: the idle CT1, the sight tube and the reservoir add no
%! ## common factor), FV1 -> SB1.level has RT1, BT1, HP1, SB1 (4 poles);
%! ## each equals C (sI - A)^-1 B + D of the full model (complex solve)
%! net = juice_line (false);
%! op = vn_steady (net);
%! for c = {{"F1.flow", "BT1.level", 2}, {"FV1.opening", "SB1.level", 4}}
%!   lin = vn_linearize (net, op, c{1}{1}, c{1}{2});
%!   assert (numel (lin.den) - 1, c{1}{3});
%!   A = full (lin.A);
%!   for s = [1e-5i, 1e-3i, 1e-2, 0.1i, 1 + 1i]
%!     h = lin.C * ((s * eye (rows (A)) - A) \ lin.B) + lin.D;
%!     assert (polyval (lin.num, s) / polyval (lin.den, s), h, 1e-8 * abs (h) + 1e-12);
%!   endfor
%!   ## its poles are eigenvalues of A
%!   ev = eig (A);
%!   for p = roots (lin.den).'
%!     assert (min (abs (ev - p)), 0, 1e-6 * abs (p));
%!   endfor
%! endfor

%!test
%! ## A truly integrating pair reports a signed Inf.  CIP tank KT1 is
%! ## emptied by a fixed-flow pump, so its level ignores its own outflow:
%! ## +Inf for its feed, -Inf for the pump's speed.  KT2 behind the pump
%! ## drains through an orifice: h = (q s / c)^2, dh/ds = 2 q^2 s / c^2
%! ## = 2 m at s = 1 (orifice law, closed form).
%! k = vn_network ("invented CIP set");
%! k = vn_tank (k, "KT1", "area", 2, "level", 1);
%! k = vn_tank (k, "KT2", "area", 1, "level", 1);
%! k = vn_feed (k, "F5", "KT1", "flow", 0.002);
%! k = vn_pump (k, "P5", "KT1", "KT2", "flow", 0.002);
%! k = vn_orifice (k, "O5", "KT2", "", "coeff", 0.002);
%! lin = vn_linearize (k, vn_steady (k), {"F5.flow", "P5.speed"}, {"KT1.level", "KT2.level", "O5.flow"});
%! assert (lin.gain(1,:), [Inf -Inf]);
%! assert (lin.gain(2:3,:), [0 2; 0 0.002], 1e-9);

%!test
%! ## RGA of the 2 x 2 block {RT1, BT1} x {F1, FV1} of the open line:
%! ## vn_rga on the model equals Bristol's G .* inv (G).' on the gains
%! ## from two vn_steady points (Bristol 1966; memory)
%! net = juice_line (false);
%! op = vn_steady (net);
%! ins = {"F1.flow", "FV1.opening"};  outs = {"RT1.level", "BT1.level"};
%! G = steady_diff (net, op, ins, outs);
%! R = vn_rga (vn_linearize (net, op, ins, outs));
%! assert (R, G .* inv (G).', 1e-5 * max (abs (R(:))));

%!test
%! ## Step response: the final change and gain are those of the nonlinear
%! ## plant (vn_steady after and before the step, not the linear gain);
%! ## t63 is where the simulated response crosses 63.2 % of it; the idle
%! ## catch tank reports a zero change, not Inf or NaN
%! net = juice_line (false);
%! op = vn_steady (net);
%! du = 0.0005;                            # 5 % more juice
%! outs = {"RT1.level", "BT1.level", "CT1.level", "HP1.level"};
%! sr = vn_stepresponse (net, op, "F1.flow", du, outs);
%! o2 = vn_steady (net, "F1.flow", 0.010 + du, "initial", op, "tol", 1e-12);
%! fin = cellfun (@(q) qv (o2, q) - qv (op, q), outs);
%! assert (fin(3), 0);
%! assert ([sr.metrics.final], fin, 1e-6 * max (abs (fin)));
%! assert ([sr.metrics.gain], fin / du, 1e-6 * max (abs (fin)) / du);
%! ## the linear gain differs by the curvature (pump curve, Torricelli),
%! ## so the two are told apart here
%! assert (abs (sr.lin.gain(1) * du - fin(1)) > 1e-2 * abs (fin(1)));
%! ## default run: 5 times the slowest finite time constant
%! assert (sr.t(end), 5 * max (sr.lin.tau(isfinite (sr.lin.tau))), 1e-9 * sr.t(end));
%! for j = [1 2 4]
%!   y = sr.nonlinear(:,j);
%!   i = find (y >= 0.632 * fin(j), 1);
%!   t63 = interp1 (y(i-1:i), sr.t(i-1:i), 0.632 * fin(j));
%!   assert (sr.metrics(j).t63, t63, 0.01 * t63);
%! endfor
%! assert (sr.metrics(3).gain, 0);
%! assert (all (sr.nonlinear(:,3) == 0));

%!test
%! ## Seeded variants of the line (feed, buffer area, valve sizes and
%! ## openings, orifice, pump speed, loops on or off): each either has an
%! ## operating point or is refused as having none (never another error);
%! ## where it has one (away from floors and weir onsets), every gain equals the difference of two vn_steady
%! ## points, the operating point is a rest point of the simulation, and
%! ## a small step of the feed gives linear and nonlinear responses that
%! ## agree to 2 % of the change.
%! rand ("state", 8);
%! ncase = 14;  nok = 0;
%! for c = 1:ncase
%!   r = rand (1, 8);
%!   n = vn_network ("invented juice line variant");
%!   n = vn_tank (n, "RT1", "shape", "horizontal", "diameter", 2 + r(1), "length", 6, "level", 1.2);
%!   n = vn_tank (n, "CT1", "area", 1.5, "rim", 2.0, "level", 0);
%!   n = vn_tank (n, "BT1", "area", 1 + 9 * r(2), "base", 8, "rim", 2.5, "spill", "CT1", "level", 1.2);
%!   n = vn_tank (n, "HP1", "shape", "cone", "diameter", 1.6, "height", 2.0, "base", 2, "level", 1.2);
%!   n = vn_tank (n, "SB1", "shape", "sphere", "diameter", 1.8, "level", 0.9);
%!   ## sized about a mid-level buffer (FV1 passes 1.0e-4 Kv m3/s at 1.25 m),
%!   ## a pump that lifts from 0.6..1.8 m in RT1, a filler valve that
%!   ## holds the sphere between 0.2 and 1.3 m
%!   F = 0.006 + 0.003 * r(3);
%!   n = vn_feed (n, "F1", "RT1", "flow", F);
%!   n = vn_pump (n, "P1", "RT1", "BT1", "shutoff", 22, "k", 3e4, ...
%!                "speed", sqrt ((9.25 + 3e4 * F^2 - 0.6 - 1.2 * r(4)) / 22));
%!   n = vn_valve (n, "FV1", "BT1", "HP1", "kv", F / 1.006e-4 * (0.85 + 0.3 * r(5)), "opening", 0.5, "inlet", 1.9);
%!   n = vn_orifice (n, "O1", "HP1", "SB1", "coeff", 0.006 + 0.004 * r(6), "inlet", 1.7);
%!   n = vn_valve (n, "LV2", "SB1", "", "kv", 300, "opening", 0.65 + 0.25 * r(7), "characteristic", "equal");
%!   if (r(8) > 0.5)
%!     n = vn_controller (n, "LC2", "measure", "SB1.level", "manipulate", "LV2.opening", ...
%!                        "setpoint", 0.9, "gain", 2, "reset", 300, "action", "direct", "limits", [0 1]);
%!   endif
%!   try
%!     op = vn_steady (n);
%!   catch err
%!     assert (err.identifier, "vesselnet:no-steady-state", sprintf ("case %d: %s", c, err.message));
%!     continue;
%!   end_try_catch
%!   ## differences are a fair reference only away from the smoothing
%!   ## bands: no tank within 5 cm of its floor, none just at its weir
%!   tanks = {"RT1", "CT1", "BT1", "HP1", "SB1"};
%!   rims = [2 + r(1), 2.0, 2.5, 2.0, 1.8];
%!   lev = cellfun (@(t) op.(t).level, tanks);
%!   spill = cellfun (@(t) op.(t).spill, tanks);
%!   edge = (lev < 0.05 & ! strcmp (tanks, "CT1")) | (abs (lev - rims) < 0.05 & spill < 0.05 * op.F1.flow);
%!   if (any (edge))
%!     continue;
%!   endif
%!   nok += 1;
%!   ins = {"F1.flow", "FV1.opening"};
%!   outs = {"RT1.level", "BT1.level", "CT1.level", "HP1.level", "SB1.level", "LV2.flow"};
%!   lin = vn_linearize (n, op, ins, outs);
%!   ## over many random points the differences themselves are good to
%!   ## about 1e-6 (Newton stops at 1e-14 of the flows), so 3e-6 here
%!   check_gains (lin.gain, steady_diff (n, op, ins, outs), 3e-6);
%!   res = vn_simulate (n, [0 3600], "initial", op);
%!   for q = outs(1:5)
%!     assert (qv (res, q{1}), qv (op, q{1}) * ones (size (res.t)), 1e-7);
%!   endfor
%!   sr = vn_stepresponse (n, op, "F1.flow", 1e-5, {"BT1.level", "SB1.level", "LV2.flow"}, "tend", 4000);
%!   ## per output: 2 % of its change, or the run's own accuracy (1e-8 m
%!   ## of level per the per-state tolerance rule)
%!   for j = 1:3
%!     assert (sr.nonlinear(:,j), sr.linear(:,j), 0.02 * max (abs (sr.linear(:,j))) + 5e-8);
%!   endfor
%! endfor
%! assert (nok >= ncase / 4, sprintf ("only %d of %d variants checked", nok, ncase));

%!test
%! ## A fit from a steady start on the line with its idle catch tank: a
%! ## bump on FV1 recorded on three levels (simulated from the line with
%! ## Kv 100, coefficient 0.008) gives those values back from a start at
%! ## 80 and 0.006, with no "singular" warning on the way
%! truth = juice_line (false);
%! op = vn_steady (truth);
%! t = (0:20:3000)';
%! res = vn_simulate (truth, t, vn_signal ("FV1.opening", "step", 300, 0.5, 0.6), "initial", op);
%! ex = vn_experiment (t, "FV1.opening", res.FV1.opening, "BT1.level", res.BT1.level, ...
%!                     "HP1.level", res.HP1.level, "SB1.level", res.SB1.level);
%! lastwarn ("");
%! est = vn_fit (juice_line (false, 80, 0.006), ex, {"FV1.kv", "O1.coeff"});
%! assert (est.value, [100; 0.008], 1e-5 * [100; 0.008]);
%! [msg, id] = lastwarn ();
%! assert (isempty (strfind (lower ([msg id]), "singular")), msg);

%!test
%! ## A cascade on the filler: LC2 on the sphere's level sets the flow
%! ## setpoint of FC2, which moves LV2 (declared inner first, as the
%! ## builders need).  Integral action in both: the level's gain to the
%! ## feed is 0, the flow setpoint follows the feed one for one, the level
%! ## follows its setpoint one for one; all as two vn_steady points say.
%! net = juice_line (false);
%! net = vn_controller (net, "FC2", "measure", "LV2.flow", "manipulate", "LV2.opening", ...
%!                      "setpoint", 0.010, "gain", 20, "reset", 5, "limits", [0 1]);
%! net = vn_controller (net, "LC2", "measure", "SB1.level", "manipulate", "FC2.setpoint", ...
%!                      "setpoint", 0.9, "gain", 0.01, "reset", 600, "action", "direct", "limits", [0 0.03]);
%! op = vn_steady (net);
%! assert ([op.SB1.level op.LV2.flow op.LC2.output], [0.9 0.010 0.010], 1e-9);
%! ins = {"F1.flow", "LC2.setpoint"};
%! outs = {"SB1.level", "LC2.output", "FC2.output", "RT1.level"};
%! lin = vn_linearize (net, op, ins, outs);
%! check_gains (lin.gain, steady_diff (net, op, ins, outs));
%! assert (lin.gain(1:2,:), [0 1; 1 0], 1e-9);
%! ## a setpoint step is followed in the run: back within 1 mm in 1.5 h
%! res = vn_simulate (net, 0:60:5400, vn_signal ("LC2.setpoint", "step", 60, 0.9, 1.0), "initial", op);
%! assert (res.SB1.level(end), 1.0, 1e-3);
%! assert (res.LV2.flow(end), 0.010, 1e-5);

## ---------------------------------------------------------------- item 2

%!test
%! ## End of a run: feed stopped, FV1 shut.  The hopper (cone) drains
%! ## through O1 into the sphere, which the filler pump P2 (fixed flow
%! ## 0.004 m3/s) empties.  Both run dry; nothing delivers liquid it does
%! ## not hold: the filler gets exactly what the two held, levels never go
%! ## below -1e-6 m, and the dry sphere stays at zero with no flow.
%! n = vn_network ("invented juice line, run-out");
%! n = vn_tank (n, "HP1", "shape", "cone", "diameter", 1.6, "height", 2.0, "base", 2, "level", 1.2);
%! n = vn_tank (n, "SB1", "shape", "sphere", "diameter", 1.8, "level", 0.9);
%! n = vn_tank (n, "FB1", "area", 4, "level", 0.1);        # filler bowl
%! n = vn_orifice (n, "O1", "HP1", "SB1", "coeff", 0.008, "inlet", 1.7);
%! n = vn_pump (n, "P2", "SB1", "FB1", "flow", 0.004);
%! res = vn_simulate (n, [0 1e4], "dt", 20);
%! ## volumes from the geometry (cone pi R^2 h^3 / (3 H^2); sphere
%! ## pi h^2 (R - h/3); memory)
%! V0 = pi * 0.8^2 * 1.2^3 / (3 * 2^2) + pi * 0.9^2 * (0.9 - 0.9 / 3);
%! assert (res.HP1.volume(1) + res.SB1.volume(1), V0, 1e-9 * V0);
%! assert (res.FB1.volume(end) - res.FB1.volume(1), V0, 1e-6 * V0);
%! tot = res.HP1.volume + res.SB1.volume + res.FB1.volume;
%! assert (tot, tot(1) * ones (size (tot)), 1e-9 * tot(1));
%! assert (min ([res.HP1.level; res.SB1.level]) >= -1e-6);
%! late = res.t > 3 * V0 / 0.004;
%! assert (any (late));
%! assert (max (abs (res.SB1.volume(late))) <= 1e-6 * V0);
%! assert (max (abs (res.P2.flow(late))) <= 1e-5 * 0.004);
%! ## before the sphere runs dry its volume falls by P2's fixed flow
%! ## (it receives O1's flow too, so check the sum of both vessels)
%! early = res.t < 0.5 * V0 / 0.004;
%! assert (tot(early) - res.FB1.volume(early), V0 - 0.004 * res.t(early), 1e-6 * V0);

%!test
%! ## The hopper alone drained to the floor drain through a 30 mm
%! ## sharp-edged bore at its apex: h(t) = (h0^2.5 - 5 Cd a sqrt(2 g) H^2
%! ## t / (2 pi R^2))^0.4, empty at T = 2 pi R^2 h0^2.5 / (5 H^2 Cd a
%! ## sqrt(2 g)) (standard fluid-mechanics exercise, cone apex down).
%! ## Its work stays within a small factor of a prism of the rim's area.
%! R = 0.8;  H = 2;  h0 = 1.6;  cd = 0.61;  a = pi / 4 * 0.03^2;
%! c = cd * a * sqrt (2 * g);
%! T = 2 * pi * R^2 * h0^2.5 / (5 * H^2 * c);
%! n = vn_network ("invented hopper drain");
%! n = vn_tank (n, "HP1", "shape", "cone", "diameter", 2 * R, "height", H, "level", h0);
%! n = vn_orifice (n, "D1", "HP1", "", "diameter", 0.03, "cd", cd);
%! res = vn_simulate (n, [0 1.5 * T], "dt", T / 300);
%! ## the time each simulated level is reached, from the closed form
%! ## (the level falls ever faster as the apex nears, so compare times)
%! up = res.HP1.level > 0.1;
%! tc = 2 * pi * R^2 * (h0^2.5 - res.HP1.level(up).^2.5) / (5 * H^2 * c);
%! assert (tc, res.t(up), 3e-5 * T);
%! assert (min (res.HP1.level) >= -1e-6);
%! i = find (res.t >= T, 1);
%! assert (res.HP1.level(i) < 0.1);
%! assert (res.HP1.level(end) < 0.02);
%! ## a prism of the rim's area on the same bore, over its own emptying
%! ## time T = 2 A sqrt(h0) / (Cd a sqrt(2 g)) (Torricelli; memory)
%! Tp = 2 * pi * R^2 * sqrt (h0) / c;
%! p = vn_network ("invented prism drain");
%! p = vn_tank (p, "PR1", "area", pi * R^2, "level", h0);
%! p = vn_orifice (p, "D1", "PR1", "", "diameter", 0.03, "cd", cd);
%! rp = vn_simulate (p, [0 1.5 * Tp], "dt", Tp / 300);
%! assert (rp.PR1.level(rp.t < 0.9 * Tp), (sqrt (h0) - c * rp.t(rp.t < 0.9 * Tp) / (2 * pi * R^2)).^2, 1e-4 * h0);
%! assert (res.stats.steps <= 4 * rp.stats.steps, sprintf ("cone %d steps, prism %d", res.stats.steps, rp.stats.steps));

%!test
%! ## The lying receiving tank emptied through its bottom valve (Kv 40,
%! ## opening 0.6, linear) to the drain.  The valve law is a square root:
%! ## Q = Kv x / 3600 sqrt(rho0 g h / 1e5) with rho0 = 999.1 kg/m3 as
%! ## vesselnet documents (IEC 60534-2-1 liquid sizing), so the time to
%! ## each level is the integral of A(s) / (k sqrt(s)) with the plan area
%! ## A = 2 L sqrt(s (D - s)) (vessel geometry; memory), by quadgk.
%! D = 2.4;  L = 6;  h0 = 2.0;
%! k = 40 * 0.6 / 3600 * sqrt (999.1 * g / 1e5);
%! n = vn_network ("invented receiving tank drain");
%! n = vn_tank (n, "RT1", "shape", "horizontal", "diameter", D, "length", L, "level", h0);
%! n = vn_valve (n, "DV1", "RT1", "", "kv", 40, "opening", 0.6);
%! tq = @(h) quadgk (@(s) 2 * L * sqrt (s .* (D - s)) ./ (k * sqrt (s)), h, h0, "RelTol", 1e-10);
%! T = tq (0);
%! res = vn_simulate (n, [0 1.3 * T], "dt", T / 200);
%! for h = [1.5 1.0 0.5 0.2]
%!   i = find (res.RT1.level <= h, 1);
%!   ts = interp1 (res.RT1.level(i-1:i), res.t(i-1:i), h);
%!   assert (ts, tq (h), 2e-4 * T);
%! endfor
%! assert (min (res.RT1.level) >= -1e-6);
%! assert (res.RT1.level(end) < 0.01);

%!test
%! ## A run that runs out of steps says where and what would help, and
%! ## doing what it says completes the run (the advice helps)
%! net = juice_line (false);
%! try
%!   vn_simulate (net, [0 1e5], "dt", 1e5, "maxsteps", 20);
%!   error ("no failure");
%! catch err
%!   assert (err.identifier, "vesselnet:solver-failure");
%!   assert (regexp (err.message, '^vn_simulate: .*stopped at t = .*tank "\w+".*raise maxsteps', "once"), 1, err.message);
%! end_try_catch
%! res = vn_simulate (net, [0 1e5], "dt", 1e5, "maxsteps", 2000);
%! assert (res.t(end), 1e5);
%! assert (res.stats.steps < 2000);

## ---------------------------------------------------------------- item 3

%!test
%! ## Sight tube (1e-6 m2) and reservoir (1e4 m2) in the same line, both
%! ## started away from their steady levels: each follows its first-order
%! ## closed form h = h_inf + (h0 - h_inf) exp(-t / (A r)) (linear
%! ## resistance, exact), the sight tube rising monotonically to its
%! ## 0.010 m without overshoot (it once peaked at 0.044 m).
%! net = juice_line (false);
%! op = vn_steady (net);
%! x0 = op.x;
%! x0(strcmp (op.states, "ST1.volume")) = 0;
%! x0(strcmp (op.states, "WR1.volume")) = 1e4 * 0.5;
%! res = vn_simulate (net, [0:0.25:40, 60:60:3e4], "initial", x0);
%! ## below 1 mm (the network's "smooth" band) the liquid gate holds back
%! ## the outflow, as documented, so compare once that has died out
%! hst = 2e-9 * 5e6 * (1 - exp (-res.t / 5));
%! late = res.t >= 20;
%! assert (res.ST1.level(late), hst(late), 1e-4 * 0.010);
%! assert (res.ST1.level(end), 0.010, 1e-6 * 0.010);
%! assert (max (res.ST1.level) <= 0.010 * (1 + 1e-4));
%! ## monotone to within the tolerances (1e-6 relative, 1e-8 m of level)
%! assert (all (diff (res.ST1.level) >= -1e-5 * 0.010));
%! hwr = 0.8 + (0.5 - 0.8) * exp (-res.t / 2e4);
%! assert (res.WR1.level, hwr, 1e-5 * 0.8);    # reltol 1e-6, global error
%! ## the rest of the line stays at its operating point
%! assert (res.SB1.level, op.SB1.level * ones (size (res.t)), 1e-6);

%!test
%! ## Temperatures and concentrations get tolerances of their own: a
%! ## 2 L holding cell heated by 2 kW beside a 1e4 m2 juice reservoir in
%! ## one thermal network with a species.  Constant volume, throughflow F:
%! ## T = T_inf + (T0 - T_inf) exp(-t/tau), T_inf = T_in + Q / (rho cp F),
%! ## c = c_in (1 - exp(-t/tau)), tau = V / F (well-mixed tank balances;
%! ## memory).  Density and heat capacity of juice invented.
%! rho = 1045;  cp = 3900;  F = 1e-4;  V = 0.01 * 0.2;
%! n = vn_network ("invented pasteuriser holding cell", "thermal", true, "density", rho, ...
%!                 "cp", cp, "species", {"brix"}, "ambient", 20);
%! n = vn_tank (n, "HC1", "area", 0.01, "level", 0.2, "temperature", 4, "brix", 0);
%! n = vn_tank (n, "JR1", "area", 1e4, "level", 2, "temperature", 20, "brix", 12);
%! n = vn_feed (n, "F1", "HC1", "flow", F, "temperature", 4, "brix", 11.5);
%! n = vn_heater (n, "H1", "HC1", "duty", 2000);
%! n = vn_pump (n, "P1", "HC1", "JR1", "flow", F);
%! n = vn_pump (n, "P2", "JR1", "", "flow", F);
%! res = vn_simulate (n, (0:5:300)');
%! tau = V / F;
%! Tinf = 4 + 2000 / (rho * cp * F);
%! assert (res.HC1.level, 0.2 * ones (size (res.t)), 1e-12);
%! assert (res.HC1.temperature, Tinf + (4 - Tinf) * exp (-res.t / tau), 2e-5 * Tinf);
%! assert (res.HC1.brix, 11.5 * (1 - exp (-res.t / tau)), 2e-5 * 11.5);
%! ## the reservoir moves by 1.7e-5 K in 5 min: it must not be disturbed more
%! assert (res.JR1.temperature, 20 * ones (size (res.t)), 1e-4);

%!test
%! ## The rule is documented where users read it, and "abstol" stays an
%! ## override that changes the run
%! assert (! isempty (strfind (help ("vn_simulate"), "abstol")));
%! assert (! isempty (regexp (help ("vn_simulate"), "per\\s+state")));
%! fid = fopen (fullfile (fileparts (which ("vn_simulate")), "..", "doc", "methods.md"));
%! txt = fread (fid, Inf, "*char").';  fclose (fid);
%! assert (! isempty (regexp (txt, "[Aa]bsolute tolerance")));
%! net = juice_line (false);
%! r1 = vn_simulate (net, [0 600]);
%! r2 = vn_simulate (net, [0 600], "abstol", 1e-3);
%! assert (r1.stats.steps != r2.stats.steps);

%!test
%! ## The filler feed alone, hopper -> orifice -> sphere -> LV2 under LC2,
%! ## against Octave's ode15s on the equations written out here: levels
%! ## as states with A dh/dt = in - out, cone A = pi (R h / H)^2, sphere
%! ## A = pi h (D - h) (vessel geometry; memory), the orifice dropping in
%! ## above the sphere's surface (head to its inlet elevation), the valve
%! ## Q = Kv x / 3600 sqrt(rho0 g h / 1e5) (IEC 60534-2-1, rho0 999.1 as
%! ## documented), ideal PI x = bias + Kc (e + int e / Ti), e = y - sp
%! ## (direct action).  A 20 % feed step from the operating point.
%! n = vn_network ("invented filler feed");
%! n = vn_tank (n, "HP1", "shape", "cone", "diameter", 1.6, "height", 2.0, "base", 2, "level", 1.2);
%! n = vn_tank (n, "SB1", "shape", "sphere", "diameter", 1.8, "level", 0.9);
%! n = vn_feed (n, "F1", "HP1", "flow", 0.010);
%! n = vn_orifice (n, "O1", "HP1", "SB1", "coeff", 0.008, "inlet", 1.7);
%! n = vn_valve (n, "LV2", "SB1", "", "kv", 300, "opening", 0.4);
%! n = vn_controller (n, "LC2", "measure", "SB1.level", "manipulate", "LV2.opening", ...
%!                    "setpoint", 0.9, "gain", 2, "reset", 300, "action", "direct", "limits", [0 1]);
%! op = vn_steady (n);
%! tt = [0 30 60 120 240 480 900 1500];
%! res = vn_simulate (n, tt, vn_signal ("F1.flow", "step", 0, 0.010, 0.012), "initial", op, "reltol", 1e-9);
%! Kc = 2;  Ti = 300;  bias = 0.4;  sp = 0.9;
%! kval = 300 / 3600 * sqrt (999.1 * g / 1e5);
%! x = @(z) bias + Kc * (z(2) - sp) + z(3);
%! f = @(t, z) [(0.012 - 0.008 * sqrt (z(1) + 2 - 1.7)) / (pi * (0.8 * z(1) / 2)^2);
%!              (0.008 * sqrt (z(1) + 2 - 1.7) - kval * x (z) * sqrt (z(2))) / (pi * z(2) * (1.8 - z(2)));
%!              Kc / Ti * (z(2) - sp)];
%! z0 = [op.HP1.level; op.SB1.level; op.LV2.opening - bias];
%! [~, Z] = ode15s (f, tt, z0, odeset ("RelTol", 1e-10, "AbsTol", 1e-12));
%! assert (res.HP1.level, Z(:,1), 1e-6);
%! assert (res.SB1.level, Z(:,2), 1e-6);
%! assert (res.LV2.opening, bias + Kc * (Z(:,2) - sp) + Z(:,3), 1e-6);
%! ## and the operating point itself: HP1 passes the feed through O1
%! assert (op.HP1.level, (0.010 / 0.008)^2 - 0.3, 1e-9);

## ---------------------------------------------------------------- item 4

%!test
%! ## A bump test with no dead time: the pasteuriser balance tank on a
%! ## linear outlet (A 2 m2, r 500 s/m2: K = r = 500 m/(m3/s), tau = A r
%! ## = 1000 s, exact first order).  The fit reports a dead time of exactly
%! ## 0; SIMC then refuses without "tauc" and asks for it; with tauc it
%! ## gives Kc = tau / (K tauc), Ti = min (tau, 4 tauc) (Skogestad 2003).
%! n = vn_network ("invented pasteuriser balance tank");
%! n = vn_tank (n, "PB1", "area", 2, "level", 2.5);
%! n = vn_feed (n, "F1", "PB1", "flow", 0.005);
%! n = vn_resistance (n, "R1", "PB1", "", "r", 500);
%! for tstep = [200 450]
%!   res = vn_simulate (n, 0:10:6000, vn_signal ("F1.flow", "step", tstep, 0.005, 0.006), "reltol", 1e-9);
%!   m = vn_fopdt (res.t, res.F1.flow, res.PB1.level);
%!   assert (m.deadtime, 0);
%!   assert (m.converged);
%!   assert ([m.gain m.tau], [500 1000], 1e-4 * [500 1000]);
%!   assert (all (isfinite ([m.gain m.tau])));
%!   try
%!     vn_tune (m, "simc");
%!     error ("no refusal");
%!   catch err
%!     assert (regexp (err.message, "^vn_tune: .*\"tauc\"", "once"));
%!   end_try_catch
%!   p = vn_tune (m, "simc", "tauc", 250);
%!   assert ([p.Kc p.Ti], [m.tau / (m.gain * 250), min(m.tau, 1000)], 1e-12);
%!   assert (isfinite (p.Kc) && p.Ti > 1);
%! endfor

%!test
%! ## The same for an integrating test: the CIP tank on a fixed-flow pump
%! ## (k' = 1 / A = 0.5 m/s per m3/s, no dead time); SIMC integrating:
%! ## Kc = 1 / (k' tauc), Ti = 4 tauc (Skogestad 2003)
%! k = vn_network ("invented CIP tank");
%! k = vn_tank (k, "KT1", "area", 2, "level", 1);
%! k = vn_feed (k, "F5", "KT1", "flow", 0.002);
%! k = vn_pump (k, "P5", "KT1", "", "flow", 0.002);
%! res = vn_simulate (k, 0:5:1500, vn_signal ("F5.flow", "step", 300, 0.002, 0.0025));
%! lastwarn ("");
%! m = vn_fopdt (res.t, res.F5.flow, res.KT1.level, "integrating");
%! assert (m.deadtime, 0);
%! ## a dead time of none converges (it once ran out of iterations)
%! assert (m.converged);
%! assert (isempty (lastwarn ()));
%! assert (m.gain, 0.5, 1e-4);
%! try
%!   vn_tune (m, "simc");
%!   error ("no refusal");
%! catch err
%!   assert (regexp (err.message, "^vn_tune: .*\"tauc\"", "once"));
%! end_try_catch
%! p = vn_tune (m, "simc", "tauc", 120);
%! assert ([p.Kc p.Ti], [1 / (m.gain * 120), 480], 1e-9);

## ---------------------------------------------------------------- item 5

%!test
%! ## Names that collide with result fields are refused at declaration,
%! ## by every builder, with the reserved names listed
%! net = juice_line (false);
%! calls = {@(nm) vn_tank (net, nm, "area", 1), ...
%!          @(nm) vn_feed (net, nm, "RT1", "flow", 0.001), ...
%!          @(nm) vn_orifice (net, nm, "CT1", "", "coeff", 0.001), ...
%!          @(nm) vn_valve (net, nm, "CT1", "", "kv", 5), ...
%!          @(nm) vn_pump (net, nm, "CT1", "RT1", "flow", 0.001), ...
%!          @(nm) vn_controller (net, nm, "measure", "BT1.level", "manipulate", "FV1.opening", "setpoint", 1, "gain", 1)};
%! for nm = {"t", "x", "y", "stats", "states", "events", "units"}
%!   for c = 1:numel (calls)
%!     try
%!       calls{c} (nm{1});
%!       error ("no refusal for %s", nm{1});
%!     catch err
%!       assert (err.identifier, "Octave:invalid-input-arg");
%!       assert (regexp (err.message, ["^vn_\\w+: \\w+ \"" nm{1} "\".*reserved.*stats"], "once"));
%!     end_try_catch
%!   endfor
%! endfor
%! ## a harmless name still works and its results stay intact
%! n2 = vn_tank (net, "tank9", "area", 1);
%! res = vn_simulate (n2, [0 10]);
%! assert (isnumeric (res.t) && iscolumn (res.t));

## ---------------------------------------------------------------- item 6

%!test
%! ## res.stats totals the whole run: twenty days of a daily feed schedule
%! ## (breakpoints at each midnight) against the same run done as twenty
%! ## one-day runs, each from where the last ended
%! net = juice_line (true);
%! op = vn_steady (net);
%! days = 20;
%! day = (0:days)';
%! feed = 0.010 + 0.001 * mod (day, 2);
%! tab = [day * 86400, feed];
%! u = vn_signal ("F1.flow", "table", tab);
%! r = vn_simulate (net, [0 days * 86400], u, "initial", op, "dt", 3600);
%! steps = 0;  x = op.x;
%! for d = 1:days
%!   rd = vn_simulate (net, [d-1, d] * 86400, u, "initial", x, "dt", 3600);
%!   steps += rd.stats.steps;
%!   x = rd.x(end,:).';
%! endfor
%! assert (r.stats.restarts, days - 1);         # each interior midnight
%! assert (r.stats.t_reached, days * 86400);
%! assert (r.stats.steps >= 0.5 * steps && r.stats.steps <= 2 * steps, ...
%!         sprintf ("one run %d steps, day by day %d", r.stats.steps, steps));
%! r2 = vn_simulate (net, [0 2 * 86400], u, "initial", op, "dt", 3600);
%! assert (r.stats.steps > 4 * r2.stats.steps);
%! assert (r.stats.rhs >= r.stats.steps);

## ---------------------------------------------------------------- item 7

%!test
%! ## The catch tank on a strapping table (invented: 2 m, 3.2 m3) under the
%! ## elevated buffer.  Fed its spill it fills along the table (volumes
%! ## interpolated linearly, as documented), then spills over the table's
%! ## top: the level stays at 2 m plus the weir head (Francis, Q = 1.84 L
%! ## Hw^1.5, crest L = 2 sqrt(pi A_max); Francis 1855), never beyond.
%! tab = [0 0; 0.4 0.5; 1.0 1.4; 1.6 2.4; 2.0 3.2];
%! n = vn_network ("invented buffer and catch tank");
%! n = vn_tank (n, "CT1", "table", tab, "level", 0);
%! n = vn_tank (n, "BT1", "area", 3, "base", 8, "rim", 2.5, "spill", "CT1", "level", 2.5);
%! n = vn_feed (n, "F1", "BT1", "flow", 0.004);
%! res = vn_simulate (n, [0:20:1000, 1100:100:3000]);
%! A = diff (tab(:,2)) ./ diff (tab(:,1));
%! L = 2 * sqrt (pi * max (A));
%! assert (res.CT1.level, interp1 (tab(:,2), tab(:,1), res.CT1.volume, "linear", "extrap"), 1e-9);
%! ## everything fed stays in the two tanks until CT1 spills
%! before = res.CT1.level < 2;
%! V0 = 3 * 2.5;
%! assert (res.BT1.volume(before) + res.CT1.volume(before), V0 + 0.004 * res.t(before), 1e-6 * V0);
%! assert (res.CT1.spill(before), zeros (nnz (before), 1));
%! ## full: the spill passes the feed over a weir head of (Q / 1.84 L)^(2/3)
%! Hw = (0.004 / (1.84 * L))^(2/3);
%! assert (res.CT1.level(end), 2 + Hw, 1e-6);
%! assert (res.CT1.spill(end), 0.004, 1e-8);
%! assert (max (res.CT1.level) <= 2 + Hw + 1e-5);   # reltol 1e-6 of 3.2 m3
%! ## the same at the operating point of the line
%! op = vn_steady (n);
%! assert (op.CT1.level, 2 + Hw, 1e-9);
%! assert (op.BT1.level, 2.5 + (0.004 / (1.84 * 2 * sqrt (3 * pi)))^(2/3), 1e-9);
%! assert (sort (op.spilling(:)), {"BT1"; "CT1"});

%!test
%! ## a table tank is never asked for a level past its table
%! tab = [0 0; 0.4 0.5; 1.0 1.4; 1.6 2.4; 2.0 3.2];
%! n = vn_network ("invented catch tank");
%! bad = {{"level", 2.5}, "LEVEL.*2.5"; {"volume", 3.5}, "VOLUME.*3.5";
%!        {"rim", 2.5}, "RIM.*2.5"; {"rim", Inf}, "RIM.*Inf"};
%! for i = 1:rows (bad)
%!   try
%!     vn_tank (n, "CT1", "table", tab, bad{i,1}{:});
%!     error ("no refusal for row %d", i);
%!   catch err
%!     assert (err.identifier, "Octave:invalid-input-arg");
%!     assert (regexp (err.message, ['^vn_tank: tank "CT1": ' bad{i,2}], "once"), 1, err.message);
%!   end_try_catch
%! endfor
%! ## nor is a round vessel given a rim above its top (Inf included)
%! for geo = {{"shape", "sphere", "diameter", 1.8}, {"shape", "cone", "diameter", 1.6, "height", 2}, ...
%!          {"shape", "horizontal", "diameter", 2.4, "length", 6}}
%!   for rim = [Inf 3]
%!     try
%!       vn_tank (n, "SB1", geo{1}{:}, "rim", rim);
%!       error ("no refusal");
%!     catch err
%!       assert (err.identifier, "Octave:invalid-input-arg");
%!       assert (regexp (err.message, '^vn_tank: tank "SB1": RIM .*top', "once"), 1, err.message);
%!     end_try_catch
%!   endfor
%! endfor

## ---------------------------------------------------------------- item 8

%!test
%! ## A level switch on the catch tank starts the return pump P3 (fixed
%! ## flow, back to RT1).  Frozen (CT1 empty, the pump off) the operating
%! ## point linearises with the switch holding its output, and the gains
%! ## equal the differences of two frozen operating points.
%! net = juice_line (true);
%! net = vn_pump (net, "P3", "CT1", "RT1", "flow", 0.004, "speed", 0);
%! net = vn_switch (net, "LS1", "measure", "CT1.level", "manipulate", "P3.speed", "on", 1.0, "off", 0.2);
%! op = vn_steady (net, "freeze", true);
%! assert (op.frozen, {"LS1"});
%! assert (op.P3.flow, 0);
%! ins = {"F1.flow", "FV1.opening"};
%! outs = {"RT1.level", "BT1.level", "CT1.level", "LC1.output", "LC2.output", "P3.flow"};
%! lin = vn_linearize (net, op, ins, outs);
%! check_gains (lin.gain, steady_diff (net, op, ins, outs, "freeze", true));
%! ## the held switch adds no state and keeps P3 off in the model
%! assert (lin.gain(end,:), [0 0]);
%! assert (! any (strncmp (lin.states, "LS1", 3)));
%! ## and the frozen point is a rest point of the full network
%! res = vn_simulate (net, [0 600], "initial", op);
%! assert (res.BT1.level, op.BT1.level * ones (size (res.t)), 1e-8);
%! assert (isempty (res.events.t));

## ---------------------------------------------------------------- item 9

%!test
%! ## A valve at a bound linearises with the one-sided derivative from
%! ## inside: the juice line's filler valve LV2 is shut (opening 0) and a
%! ## drain orifice takes the flow.  B's column is -Kv f'(0) / 3600
%! ## sqrt(rho0 g h / 1e5) (IEC 60534-2-1; linear f' = 1, equal
%! ## percentage run linearly to 0 below 0.02 as documented, so f' =
%! ## R^-0.98 / 0.02), and the gain is the forward difference of two
%! ## operating points (opening 0 and 1e-7).
%! for ch = {"linear", "equal"}
%!   n = vn_network ("invented filler buffer, valve shut");
%!   n = vn_tank (n, "SB1", "shape", "sphere", "diameter", 1.8, "level", 0.9);
%!   n = vn_feed (n, "F1", "SB1", "flow", 0.004);
%!   n = vn_orifice (n, "O9", "SB1", "", "coeff", 0.004 / sqrt (0.8));
%!   n = vn_valve (n, "LV2", "SB1", "", "kv", 30, "opening", 0, "characteristic", ch{1});
%!   op = vn_steady (n, "tol", 1e-14);
%!   assert (op.SB1.level, 0.8, 1e-9);
%!   lin = vn_linearize (n, op, {"LV2.opening"}, {"SB1.level", "LV2.flow"});
%!   fp = 1;
%!   if (strcmp (ch{1}, "equal"))
%!     fp = 50^-0.98 / 0.02;
%!   endif
%!   dq = 30 * fp / 3600 * sqrt (999.1 * g * 0.8 / 1e5);
%!   assert (lin.B, -dq, 1e-9 * dq);
%!   assert (lin.D(2), dq, 1e-9 * dq);
%!   h = 1e-7;
%!   o1 = vn_steady (n, "LV2.opening", h, "initial", op, "tol", 1e-14);
%!   G = [(o1.SB1.level - op.SB1.level), (o1.LV2.flow - op.LV2.flow)].' / h;
%!   assert (lin.gain, G, 1e-5 * abs (G));
%!   assert (! isempty (strfind (lin.note, "LV2.opening")));
%! endfor

%!test
%! ## A signal that drives the filler valve past its travel (a ramp from
%! ## 0.4 to 1.5 over 600 s) is clipped in the physics and in res, with a
%! ## warning naming the signal and the range.  The clipped run equals a
%! ## run of the signal as the valve follows it: the ramp to 1 where the
%! ## given ramp crosses 1 (t = 600 * 0.6 / 1.1 s), then 1.
%! net = juice_line (false);
%! op = vn_steady (net);
%! tt = (0:30:1800)';
%! u = vn_signal ("LV2.opening", "table", [0 0.4; 600 1.5; 1800 1.5]);
%! lastwarn ("");
%! r1 = vn_simulate (net, tt, u, "initial", op);
%! [msg, id] = lastwarn ();
%! assert (id, "vesselnet:clipped");
%! assert (regexp (msg, '^vn_simulate: .*LV2\.opening.*1\.5.*\[0, 1\]', "once"), 1, msg);
%! tc = 600 * 0.6 / 1.1;
%! assert (r1.LV2.opening, min (0.4 + 1.1 * tt / 600, 1), 1e-12);
%! r2 = vn_simulate (net, tt, vn_signal ("LV2.opening", "table", [0 0.4; tc 1; 1800 1]), "initial", op);
%! assert (r1.SB1.level, r2.SB1.level, 1e-6);      # two runs, reltol 1e-6
%! assert (r1.LV2.flow, r2.LV2.flow, 1e-6 * 0.010);

%!test
%! ## integrator options and signal values out of range are refused by
%! ## the command called, naming the option and its range
%! net = juice_line (false);
%! sim = @(varargin) vn_simulate (net, [0 60], varargin{:});
%! bad = {@() sim ([], "reltol", 0.5), "vn_simulate", "reltol";
%!        @() sim ([], "reltol", 1e-14), "vn_simulate", "reltol";
%!        @() sim ([], "abstol", -1), "vn_simulate", "abstol";
%!        @() sim ([], "maxstep", 1e-9), "vn_simulate", "maxstep";
%!        @() sim (vn_signal ("F1.flow", "step", 10, 0.01, 2e6)), "vn_simulate", "F1.flow";
%!        @() vn_signal ("F1.flow", "step", 10, 0.01, NaN), "vn_signal", "F1.flow"};
%! for i = 1:rows (bad)
%!   try
%!     bad{i,1} ();
%!     error ("no refusal for row %d", i);
%!   catch err
%!     assert (err.identifier, "Octave:invalid-input-arg");
%!     assert (regexp (err.message, ['^' bad{i,2} ': .*' bad{i,3}], "once"), 1, err.message);
%!   end_try_catch
%! endfor

## --------------------------------------------------------------- item 10

%!test
%! ## "has no outlet" names the tank that fills: the line built without
%! ## its filler valve fills the sphere, not the tank the feed enters
%! n = vn_network ("invented juice line, no filler valve");
%! n = vn_tank (n, "BT1", "area", 3, "base", 8, "level", 1.2);
%! n = vn_tank (n, "HP1", "area", 2, "base", 2, "level", 1.2);
%! n = vn_tank (n, "SB1", "area", 2.5, "level", 0.9);
%! n = vn_feed (n, "F1", "BT1", "flow", 0.010);
%! n = vn_valve (n, "FV1", "BT1", "HP1", "kv", 100, "opening", 0.5, "inlet", 1.9);
%! n = vn_orifice (n, "O1", "HP1", "SB1", "coeff", 0.008, "inlet", 1.7);
%! try
%!   vn_steady (n);
%!   error ("no refusal");
%! catch err
%!   assert (err.identifier, "vesselnet:no-steady-state");
%!   assert (regexp (err.message, '^vn_steady: tank "SB1" has no outlet', "once"));
%! end_try_catch

%!test
%! ## "allowed:" lists name real options, no internal placeholders, and
%! ## the species of the network where it has some
%! net = juice_line (false);
%! ns = vn_network ("invented juice line with sugar", "species", {"brix"});
%! ns = vn_tank (ns, "RT1", "area", 2);
%! cases = {@() vn_tank (net, "T9", "colour", 1), "shape, area", "", ...
%!          @() vn_feed (net, "F9", "RT1", "colour", 1), "flow", "", ...
%!          @() vn_tank (ns, "T9", "colour", 1), "shape, area", "brix", ...
%!          @() vn_feed (ns, "F9", "RT1", "colour", 1), "flow", "brix", ...
%!          @() vn_simulate (net, [0 1], [], "colour", 1), "dt", "", ...
%!          @() vn_linearize (net, [], "F1.flow", "RT1.level", "colour", 1), "loop", ""};
%! for c = 1:3:numel (cases)
%!   try
%!     cases{c} ();
%!     error ("no refusal");
%!   catch err
%!     assert (regexp (err.message, '^vn_\w+: .*"colour".*allowed: \w', "once"), 1);
%!     lst = err.message(strfind (err.message, "allowed:"):end);
%!     assert (! isempty (strfind (lst, cases{c+1})));
%!     assert (isempty (regexp (lst, '\<(c[1-8]|species[1-8])\>', "once")), lst);
%!     if (! isempty (cases{c+2}))
%!       assert (! isempty (strfind (lst, cases{c+2})), lst);
%!     endif
%!   end_try_catch
%! endfor

%!test
%! ## a missed target names its quantity; a step that leaves the input's
%! ## range is refused by vn_stepresponse under its own name
%! net = juice_line (false);
%! op = vn_steady (net);
%! try
%!   vn_steady (net, "target", {"HP1.level", 1.99}, "adjust", {"FV1.opening"});
%!   error ("no refusal");
%! catch err
%!   assert (err.identifier, "vesselnet:no-steady-state");
%!   assert (regexp (err.message, '^vn_steady: .*HP1\.level', "once"), 1);
%! end_try_catch
%! for c = {{"FV1.opening", 0.7}, {"P1.speed", -0.8}}
%!   try
%!     vn_stepresponse (net, op, c{1}{:}, {"BT1.level"});
%!     error ("no refusal");
%!   catch err
%!     assert (err.identifier, "Octave:invalid-input-arg");
%!     uv = strsplit (c{1}{1}, ".");
%!     assert (regexp (err.message, ['^vn_stepresponse: \w+ "' uv{1} '": ' uv{2} ' .*outside'], "once"), 1);
%!   end_try_catch
%! endfor

%!test
%! ## ranges refused at declaration, by the command that declares them,
%! ## naming the unit, the field and the value
%! net = juice_line (false);
%! bad = {@() vn_network ("x", "smooth", -1), "vn_network", "SMOOTH", "-1";
%!        @() vn_network ("x", "smooth", 0.5), "vn_network", "SMOOTH", "0.5";
%!        @() vn_tank (net, "T9", "area", -2), "vn_tank", "AREA", "-2";
%!        @() vn_tank (net, "T9", "area", 2, "level", 2e5), "vn_tank", "LEVEL", "200000";
%!        @() vn_resistance (net, "R9", "CT1", "", "r", 0), "vn_resistance", "R", "0";
%!        @() vn_controller (net, "XC1", "measure", "BT1.level", "manipulate", "FV1.opening", "setpoint", 1, "gain", 1, "reset", -5), "vn_controller", "RESET", "-5";
%!        @() vn_switch (net, "LS9", "measure", "CT1.level", "manipulate", "FV1.opening", "on", 1, "off", 1), "vn_switch", "ON", "1";
%!        @() vn_switch (net, "LS9", "measure", "CT1.level", "manipulate", "FV1.opening", "on", 1e13, "off", 1), "vn_switch", "ON", "1e\\+13";
%!        @() vn_controller (net, "XC1", "measure", "F1.flow", "manipulate", "F1.flow", "setpoint", 0.01, "gain", 1), "vn_controller", "MEASURE", "F1.flow"};
%! for i = 1:rows (bad)
%!   try
%!     bad{i,1} ();
%!     error ("no refusal for row %d", i);
%!   catch err
%!     assert (err.identifier, "Octave:invalid-input-arg");
%!     assert (regexp (err.message, ['^' bad{i,2} ': \w+ "\w+": .*' bad{i,3} '.*' bad{i,4}], "once"), 1, err.message);
%!   end_try_catch
%! endfor

## --------------------------------------------------------------- item 11

%!test
%! ## vn_show: each controller's action once, limits as [lo hi], gains with
%! ## their units (output per measured unit: 1/m for an opening on a level)
%! s = evalc ("vn_show (juice_line (true))");
%! lines = strsplit (s, "\n");
%! for name = {"LC1", "LC2"}
%!   l = lines{find (strncmp (strtrim (lines), [name{1} " "], 4), 1)};
%!   assert (numel (strfind (l, "action")), 1, l);
%!   assert (isempty (regexp (l, '\<(lo|hi) ', "once")), l);
%!   assert (! isempty (regexp (l, 'gain [0-9.]+ 1/m', "once")), l);
%! endfor
%! assert (! isempty (regexp (s, 'LC1 .*limits \[0 1\.1\]', "once")));
%! assert (! isempty (regexp (s, 'LC2 .*limits \[0 1\]', "once")));

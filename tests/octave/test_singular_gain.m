## Steady-state gains where A is singular or badly conditioned, frozen
## switches, inputs at a bound of their range, and step metrics from the
## nonlinear response.  The reference for every finite gain is the
## derivative of the steady state itself: a central difference quotient of
## two vn_steady operating points (definition of the steady-state gain,
## e.g. Seborg et al., Process Dynamics and Control, memory).  The
## networks are invented.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_singular_gain.m")'

## Invented juice line: a 5 s receiving tank R1 feeds a buffer B1 whose
## rim (4 m) spills into catch tank C1, idle at the operating point (B1
## stands near 2 m); a curve pump lifts B1 into a store S1 on a 5.4 m
## stand; S1 feeds a pair of day tanks H1, H2 through a resistance; time
## constants 5 s to about 6 h and more.
%!function net = juice_line ()
%!  net = vn_network ("juice line (invented)");
%!  net = vn_tank (net, "R1", "area", 0.05, "level", 0.5);
%!  net = vn_tank (net, "C1", "area", 3, "level", 0);
%!  net = vn_tank (net, "B1", "area", 20, "level", 2, "rim", 4, "spill", "C1");
%!  net = vn_tank (net, "S1", "area", 72, "level", 2, "base", 5.4);
%!  net = vn_tank (net, "H1", "area", 0.5, "level", 1);
%!  net = vn_tank (net, "H2", "area", 8, "level", 1);
%!  net = vn_feed (net, "F1", "R1", "flow", 0.01);
%!  net = vn_orifice (net, "O1", "R1", "B1", "coeff", 0.01 / sqrt (0.5));
%!  net = vn_pump (net, "P1", "B1", "S1", "shutoff", 10, "k", 1e4, "speed", 0.8);
%!  net = vn_orifice (net, "O2", "C1", "", "coeff", 0.004);
%!  net = vn_orifice (net, "O3", "S1", "", "coeff", 0.01 / sqrt (2));
%!  net = vn_resistance (net, "RH", "S1", "H1", "r", 50);
%!  net = vn_orifice (net, "OH1", "H1", "H2", "coeff", 0.004);
%!  net = vn_orifice (net, "OH2", "H2", "", "coeff", 0.002);
%!endfunction

## Central difference quotient of the steady outputs for input IN.
%!function g = quotient (net, op, in, outs, rel)
%!  v0 = op.input_values(strcmp (op.input_names, in));
%!  if (isempty (v0))   # a controller's setpoint
%!    dot = find (in == ".", 1);
%!    v0 = net.units(net.index.(in(1:dot-1))).par.(in(dot+1:end));
%!  endif
%!  h = rel * max (abs (v0), 1e-3);
%!  o2 = vn_steady (net, in, v0 + h, "initial", op, "tol", 1e-14);
%!  o1 = vn_steady (net, in, v0 - h, "initial", op, "tol", 1e-14);
%!  g = zeros (numel (outs), 1);
%!  for i = 1:numel (outs)
%!    dot = find (outs{i} == ".", 1);
%!    u = outs{i}(1:dot-1);  v = outs{i}(dot+1:end);
%!    g(i) = (o2.(u).(v) - o1.(u).(v)) / (2 * h);
%!  endfor
%!endfunction

## Every gain against its quotient, 1e-6 relative; a zero gain within
## 1e-9 of the largest gain of its input (round-off of the quotient).
%!function check_gains (net, op, lin, rel)
%!  for j = 1:numel (lin.inputs)
%!    g = quotient (net, op, lin.inputs{j}, lin.outputs, rel);
%!    G = lin.gain(:,j);
%!    assert (all (isfinite (G)));
%!    scale = max (abs (g));
%!    err = abs (G - g);
%!    ok = err <= 1e-6 * abs (g) | err <= 1e-9 * scale;
%!    assert (ok, true (size (ok)));
%!  endfor
%!endfunction

%!test
%! ## The idle catch tank and the 5 s .. 6 h spread: every gain equals the
%! ## difference quotient of two operating points; the store's and the day
%! ## tanks' levels do not depend on the pump's speed (their outflow must
%! ## pass the feed), the catch tank's on nothing; no warning is raised.
%! net = juice_line ();
%! op = vn_steady (net, "tol", 1e-14);
%! assert (op.spilling, cell (0, 1));
%! outs = {"R1.level", "B1.level", "C1.level", "S1.level", "H1.level", ...
%!         "H2.level", "P1.flow", "O2.flow", "B1.spill"};
%! lastwarn ("");
%! lin = vn_linearize (net, op, {"P1.speed", "F1.flow"}, outs);
%! assert (lastwarn (), "");
%! assert (max (lin.tau(isfinite (lin.tau))) > 6 * 3600);
%! assert (min (lin.tau) < 10);
%! check_gains (net, op, lin, 1e-5);
%! ## structurally zero: the catch tank and the spill
%! assert (lin.gain([3 8 9],:), zeros (3, 2));
%! ## sparse route, same gains
%! ls = vn_linearize (net, op, {"P1.speed", "F1.flow"}, outs, "sparse", true);
%! assert (ls.gain, lin.gain, 1e-9 * max (abs (lin.gain(:))));

%!test
%! ## Closed loops beside the idle catch tank: a level controller on the
%! ## day tank H2 through an outlet valve, proportional and then PI.
%! ## Gains (setpoint too) against operating-point quotients; with
%! ## integral action H2 follows its setpoint exactly (gain 1, and 0 for
%! ## the feed), as integral action requires (Seborg et al., memory).
%! for reset = [0, 600]
%!   net = juice_line ();
%!   net = vn_valve (net, "LV1", "H2", "", "kv", 150, "opening", 0.5, ...
%!                   "characteristic", "linear");
%!   opts = {"measure", "H2.level", "manipulate", "LV1.opening", ...
%!           "setpoint", 1.5, "gain", 2, "action", "direct", "limits", [0 1]};
%!   if (reset > 0)
%!     opts = [opts, {"reset", reset}];
%!   endif
%!   net = vn_controller (net, "LC1", opts{:});
%!   op = vn_steady (net, "tol", 1e-14);
%!   outs = {"B1.level", "S1.level", "H1.level", "H2.level", "LV1.flow", "C1.level"};
%!   lastwarn ("");
%!   lin = vn_linearize (net, op, {"F1.flow", "P1.speed", "LC1.setpoint"}, outs);
%!   assert (lastwarn (), "");
%!   check_gains (net, op, lin, 1e-5);
%!   if (reset > 0)
%!     assert (lin.gain(4,[1 3]), [0, 1], 1e-9);
%!   endif
%! endfor

%!test
%! ## The relative gain array uses the corrected gains: B1 and S1 levels by
%! ## pump speed and feed; S1 does not depend on the speed, so the pairing
%! ## B1-speed, S1-feed has relative gains [1 0; 0 1] (Bristol 1966).
%! net = juice_line ();
%! op = vn_steady (net, "tol", 1e-14);
%! lin = vn_linearize (net, op, {"P1.speed", "F1.flow"}, {"B1.level", "S1.level"});
%! G = [quotient(net, op, "P1.speed", lin.outputs, 1e-5), ...
%!      quotient(net, op, "F1.flow", lin.outputs, 1e-5)];
%! [R, info] = vn_rga (lin);
%! assert (info.gain, G, 1e-6 * max (abs (G(:))));
%! assert (R, [1 0; 0 1], 1e-6);
%! assert (info.pairing, [1 2]);

%!test
%! ## Integrating pairs: T1 drained by a fixed-flow pump (outflow does not
%! ## depend on the level) into T2 with an orifice.  Feed -> T1 is +Inf,
%! ## pump speed -> T1 is -Inf; T2 does not see the feed (0); the speed
%! ## moves T2 by dh/ds = 2 q Q / c^2 with q = Q s (Torricelli h = (q/c)^2).
%! net = vn_network ("integrating (invented)");
%! net = vn_tank (net, "T1", "area", 2, "level", 2);
%! net = vn_tank (net, "T2", "area", 1, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_pump (net, "P1", "T1", "T2", "flow", 0.0125, "speed", 0.8);
%! net = vn_orifice (net, "O2", "T2", "", "coeff", 0.01);
%! x = [4; 1];
%! lastwarn ("");
%! lin = vn_linearize (net, x, {"F1.flow", "P1.speed"}, {"T1.level", "T2.level"});
%! assert (lastwarn (), "");
%! assert (lin.gain(1,:), [Inf, -Inf]);
%! assert (lin.gain(2,1), 0);
%! assert (lin.gain(2,2), 2 * 0.01 * 0.0125 / 0.01^2, 1e-9);
%! ## the ramp the simulation shows has the sign of the Inf
%! sr = vn_stepresponse (net, x, "F1.flow", 1e-4, {"T1.level"}, "tend", 100);
%! assert (sr.nonlinear(end), 1e-4 * 100 / 2, 1e-7);
%! assert (! sr.metrics.settles);
%! assert (! sr.metrics_linear.settles);
%! assert (isnan ([sr.metrics.t63, sr.metrics.rise, sr.metrics.settle, ...
%!                 sr.metrics.overshoot]));

## Random seeded networks: a chain of tanks with areas from sight glasses
## to reservoirs (time constants of seconds to days), each draining
## through an orifice into the next, a rim on some tanks spilling into an
## idle catch tank, a fixed-flow pump or a curve pump somewhere; every
## gain against the difference quotient of two operating points.
%!test
%! rand ("seed", 8);
%! cases = 12;
%! idle = 0;
%! for c = 1:cases
%!   n = 2 + floor (4 * rand ());
%!   net = vn_network (sprintf ("random chain %d (invented)", c));
%!   F = 0.002 + 0.02 * rand ();
%!   area = 10 .^ (-1.5 + 4 * rand (1, n));
%!   hs = 0.5 + 2 * rand (1, n);
%!   net = vn_tank (net, "C1", "area", 1, "level", 0);
%!   for k = 1:n
%!     opts = {"area", area(k), "level", hs(k)};
%!     if (rand () < 0.5)
%!       rim = hs(k) + 1 + rand ();
%!       opts = [opts, {"rim", rim, "spill", "C1"}];
%!     endif
%!     net = vn_tank (net, sprintf ("T%d", k), opts{:});
%!   endfor
%!   net = vn_orifice (net, "OC", "C1", "", "coeff", 0.003);
%!   net = vn_feed (net, "F1", "T1", "flow", F);
%!   pk = 1 + floor ((n - 1) * rand ());   # the pump leaves tank pk
%!   for k = 1:n-1
%!     if (k == pk)
%!       net = vn_pump (net, "P1", sprintf ("T%d", k), sprintf ("T%d", k+1),
%!                      "shutoff", 8, "k", (8 * 0.81 - 0) / F^2, "speed", 0.9);
%!     else
%!       net = vn_orifice (net, sprintf ("O%d", k), sprintf ("T%d", k),
%!                         sprintf ("T%d", k+1), "coeff", F / sqrt (hs(k)));
%!     endif
%!   endfor
%!   net = vn_orifice (net, "ON", sprintf ("T%d", n), "", "coeff", F / sqrt (hs(n)));
%!   if (n == 1 || pk >= n)
%!     ins = {"F1.flow"};
%!   else
%!     ins = {"F1.flow", "P1.speed"};
%!   endif
%!   op = vn_steady (net, "tol", 1e-14);
%!   outs = arrayfun (@(k) sprintf ("T%d.level", k), 1:n, "uniformoutput", false);
%!   outs{end+1} = "C1.level";
%!   lastwarn ("");
%!   lin = vn_linearize (net, op, ins, outs);
%!   assert (lastwarn (), "");
%!   check_gains (net, op, lin, 1e-5);
%!   if (isempty (op.spilling))
%!     idle += 1;
%!     assert (lin.gain(end,:), zeros (1, numel (ins)));
%!   endif
%! endfor
%! ## most cases hold the catch tank idle
%! assert (idle >= cases / 2);

%!test
%! ## Step metrics come from the nonlinear response: a 1 % step on the
%! ## pump speed.  B1's final change is the nonlinear steady state at the
%! ## new speed (not gain x step, which differs at this size); the store
%! ## S1 rises and returns to its level (its outflow must pass the feed),
%! ## so it does not settle away from zero, nor does the idle catch tank.
%! net = juice_line ();
%! op = vn_steady (net, "tol", 1e-14);
%! sr = vn_stepresponse (net, op, "P1.speed", 1, {"B1.level", "S1.level", "C1.level"},
%!                       "percent", true);
%! o2 = vn_steady (net, "P1.speed", 0.808, "initial", op, "tol", 1e-14);
%! yf = o2.B1.level - op.B1.level;
%! assert (sr.metrics(1).final, yf, 1e-6 * abs (yf));
%! assert (sr.metrics(1).gain, yf / 0.008, 1e-6 * abs (yf / 0.008));
%! assert (abs (sr.lin.gain(1) * 0.008 - yf) > 1e-3 * abs (yf));
%! assert (sr.metrics(1).settles);
%! ## the 2 % band around the nonlinear final holds at the settle time on
%! r = sr.nonlinear(:,1) / yf;
%! assert (all (abs (r(sr.t > sr.metrics(1).settle + 1e-6) - 1) <= 0.02));
%! assert (sr.metrics(1).t63 < sr.metrics(1).settle);
%! assert (max (sr.nonlinear(:,2)) > 0.01);
%! assert ([sr.metrics(2:3).settles], [false, false]);
%! assert (isnan ([sr.metrics(2).t63, sr.metrics(2).rise, ...
%!                 sr.metrics(2).settle, sr.metrics(2).overshoot]));
%! assert (sr.metrics(2).final, 0, 1e-9);
%! assert (sr.metrics(3).final, 0);

%!test
%! ## A record that stops before the response settles: settles is false
%! ## and its times are NaN, while the final change is still the
%! ## nonlinear steady state's.
%! net = juice_line ();
%! op = vn_steady (net, "tol", 1e-14);
%! sr = vn_stepresponse (net, op, "F1.flow", 1e-4, "B1.level", "tend", 600);
%! o2 = vn_steady (net, "F1.flow", 0.0101, "initial", op, "tol", 1e-14);
%! assert (sr.metrics.final, o2.B1.level - op.B1.level, 1e-6 * sr.metrics.final);
%! assert (! sr.metrics.settles);
%! assert (isnan ([sr.metrics.t63, sr.metrics.rise, sr.metrics.settle, ...
%!                 sr.metrics.overshoot]));

## A sump under a level switch (invented): the pump is held at the
## output the switch starts with.
%!function net = sump (level)
%!  net = vn_network ("sump (invented)");
%!  net = vn_tank (net, "S1", "area", 2, "level", level);
%!  net = vn_feed (net, "F1", "S1", "flow", 0.004);
%!  net = vn_orifice (net, "O1", "S1", "", "coeff", 0.002);
%!  net = vn_pump (net, "P1", "S1", "", "flow", 0.003, "speed", 0);
%!  net = vn_switch (net, "LS1", "measure", "S1.level", "manipulate", ...
%!                   "P1.speed", "on", 1.5, "off", 0.5);
%!endfunction

%!test
%! ## Frozen switch, pump off: h = (F/c)^2 = 4 m, gain dh/dF = 2 F/c^2 =
%! ## 2000 s/m2, tau = 2 A h/F = 4000 s (Torricelli, linearised; Seborg et
%! ## al., memory); pump on: the orifice passes F - q = 0.001 m3/s, h =
%! ## 0.25 m, gain 500 s/m2, and the speed draws q per unit speed.
%! for lv = [0.3, 2]
%!   net = sump (lv);
%!   op = vn_steady (net, "freeze", true, "tol", 1e-14);
%!   assert (op.frozen, {"LS1"});
%!   lin = vn_linearize (net, op, {"F1.flow", "P1.speed"}, {"S1.level", "O1.flow"});
%!   assert (lin.states, {"S1.volume"});
%!   on = lv > 1.5;
%!   q = 0.004 - 0.003 * on;
%!   assert (op.S1.level, (q / 0.002)^2, 1e-9);
%!   assert (lin.gain(1,1), 2 * q / 0.002^2, 1e-6 * 2 * q / 0.002^2);
%!   assert (lin.tau, 2 * 2 * (q / 0.002)^2 / q, 1e-6 * lin.tau);
%!   assert (lin.B(1,2), -0.003, 1e-12);
%!   g = quotient (op.net, op, "F1.flow", {"S1.level"}, 1e-5);
%!   assert (lin.gain(1,1), g, 1e-6 * g);
%!   sr = vn_stepresponse (net, op, "F1.flow", 1e-6, "S1.level", "tend", 2e4);
%!   assert (sr.nonlinear, sr.linear, 1e-3 * abs (sr.linear(end)));
%!   assert (sr.metrics.gain, 2 * q / 0.002^2, 1e-3 * 2 * q / 0.002^2);
%! endfor
%! fail ('vn_linearize (net, op, "F1.flow", "LS1.output")', "held at its output");

## A tank drained by an orifice and a control valve (invented), the valve
## at a bound of its opening.
%!function [net, op] = valve_tank (ch, opening)
%!  net = vn_network ("valve at a bound (invented)");
%!  net = vn_tank (net, "T1", "area", 2, "level", 1.5);
%!  net = vn_feed (net, "F1", "T1", "flow", 0.01);
%!  net = vn_orifice (net, "O1", "T1", "", "coeff", 0.004);
%!  net = vn_valve (net, "LV1", "T1", "", "kv", 40, "opening", opening, ...
%!                  "characteristic", ch);
%!  op = vn_steady (net);
%!endfunction

## The valve's flow at the operating point's levels, opening v.
%!function q = valve_flow (net, op, v)
%!  net.units(net.index.LV1).par.opening = v;
%!  res = vn_simulate (net, [0 1], "initial", op.x, "record", {"LV1.flow"});
%!  q = res.LV1.flow(1);
%!endfunction

%!test
%! ## Opening 0 (and 1): B and D of the opening are the one-sided
%! ## derivative from inside the range, checked against a one-sided
%! ## difference quotient of the valve's flow (definition of the
%! ## derivative); the tank loses what the valve passes, so B = -D.
%! for ch = {"linear", "equal", "quick"}
%!   for v0 = [0, 1]
%!     [net, op] = valve_tank (ch{1}, v0);
%!     lin = vn_linearize (net, op, {"LV1.opening"}, {"T1.volume", "LV1.flow"});
%!     h = 1e-9 * (1 - 2 * v0);
%!     dq = (valve_flow (net, op, v0 + h) - valve_flow (net, op, v0)) / h;
%!     assert (abs (dq) > 1e-4);
%!     assert (lin.D(2,1), dq, 1e-5 * abs (dq));
%!     assert (lin.B(1,1), -dq, 1e-5 * abs (dq));
%!     assert (lin.note, "B and D of LV1.opening: one-sided, from inside the range");
%!   endfor
%! endfor
%! ## inside the range nothing changes: the plain derivative, no note
%! [net, op] = valve_tank ("linear", 0.5);
%! lin = vn_linearize (net, op, {"LV1.opening"}, {"LV1.flow"});
%! dq = (valve_flow (net, op, 0.5 + 1e-7) - valve_flow (net, op, 0.5 - 1e-7)) / 2e-7;
%! assert (lin.D, dq, 1e-6 * dq);
%! assert (lin.note, "");

%!test
%! ## vn_fit from a steady start with an idle catch tank beside the pair:
%! ## the steady-start sensitivities skip the tank no parameter reaches,
%! ## no singular-matrix warning, and the coefficient is recovered from a
%! ## noise-free test (invented data).
%! mk = @(c2) vn_orifice (vn_orifice (vn_feed (vn_tank (vn_tank (vn_tank ( ...
%!        vn_network ("fit pair"), "C1", "area", 2, "level", 0), ...
%!        "T1", "area", 1.5, "level", 1), "T2", "area", 1, "level", 0.8, ...
%!        "rim", 5, "spill", "C1"), "F1", "T1", "flow", 0.004), ...
%!        "O1", "T1", "T2", "coeff", 0.003), "O2", "T2", "", "coeff", c2);
%! truth = mk (0.0025);
%! t = (0:20:2000).';
%! sg = struct ("quantity", "F1.flow", "t", [0; 200; 200; 2000],
%!              "v", [0.004; 0.004; 0.006; 0.006], "hold", false, "kind", "table");
%! op = vn_steady (truth);
%! res = vn_simulate (truth, t, sg, "initial", op, "reltol", 1e-10, "abstol", 1e-12);
%! u = 0.004 + 0.002 * (t >= 200);
%! ex = vn_experiment (t, "F1.flow", u, "T2.level", res.T2.level, "hold", true);
%! lastwarn ("");
%! est = vn_fit (mk (0.002), ex, {"O2.coeff"});
%! assert (lastwarn (), "");
%! assert (est.value, 0.0025, 1e-4 * 0.0025);

%!test
%! ## One input, one output: the transfer function leaves out the idle
%! ## catch tank, so no common factor of s appears; at s = 0 it gives the
%! ## gain (definition of G(0)).
%! net = juice_line ();
%! op = vn_steady (net, "tol", 1e-14);
%! for pair = {{"P1.speed", "B1.level"}, {"F1.flow", "H2.level"}}
%!   lin = vn_linearize (net, op, pair{1}{:});
%!   assert (numel (lin.states), 6);
%!   assert (numel (lin.den), 6);        # R1, B1, S1, H1, H2: not C1
%!   assert (polyval (lin.num, 0) / polyval (lin.den, 0), lin.gain, 1e-6 * abs (lin.gain));
%! endfor

## Reference tests of whole nonlinear networks against Octave's ode15s on
## hand-written models of the same equations: three tanks joined by an
## orifice, an equal-percentage valve and a curve pump, with a feed step
## and a valve step; and a PI level loop, with its anti-windup judged by
## the recovery after saturation.  ode15s is the reference only here;
## the reference models are written from the physics (Torricelli, IEC
## 60534-2-1, the pump curve, the ISA PI form), not from the core.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_ref_ode15s.m")'

## ---- the three-tank network ---------------------------------------
## T1 (4 m2) fed by F1 drains through orifice O1 into T2 (1.5 m2), both
## on the floor (interacting: Q = c sqrt(h1 - h2), Torricelli).  T2
## empties through LV1 (Kv 300, equal percentage R 50) into T3, which
## stands 4 m lower with the valve entering 4 m up, above its surface, so
## the valve discharges freely at elevation 0 (non-interacting).  Pump
## P1 (shutoff 14 m, k 5000 m/(m3/s)^2) lifts from T3 into a main at
## 10 m: Q = sqrt((s^2 H0 - lift)/k) (common practice).

%!function p = three_par ()
%!  p.g = 9.80665; p.rho = 998.2; p.rho0 = 999.1;   % rho0: IEC, 15 degC (memory)
%!  p.A = [4 1.5 1]; p.c1 = 0.02 / sqrt (0.5);
%!  p.kv = 300; p.R = 50; p.H0 = 14; p.k = 5000; p.main = 10; p.base3 = -4;
%!endfunction

## IEC 60534-2-1: Q [m3/h] = Kv f(x) sqrt(dp [bar] / (rho/rho0)),
## equal percentage f = R^(x-1) (IEC 60534-2-4; memory).
%!function q = iec_valve (p, x, dH)
%!  dp = p.rho * p.g * dH / 1e5;
%!  q = p.kv * p.R^(x - 1) * sqrt (dp / (p.rho / p.rho0)) / 3600;
%!endfunction

%!function q = curve_pump (p, lift)
%!  q = sqrt ((p.H0 - lift) / p.k);
%!endfunction

%!function dh = three_rhs (p, h, F, x)
%!  q1 = p.c1 * sqrt (h(1) - h(2));
%!  qv = iec_valve (p, x, h(2) - 0);
%!  qp = curve_pump (p, p.main - (p.base3 + h(3)));
%!  dh = [(F - q1) / p.A(1); (q1 - qv) / p.A(2); (qv - qp) / p.A(3)];
%!endfunction

## ode15s over the pieces between input steps, restarting at each.
%!function Y = piecewise_ode15s (rhs, t, y0, breaks, inputs)
%!  opt = odeset ("RelTol", 1e-9, "AbsTol", 1e-12);
%!  edges = [t(1), breaks, t(end)];
%!  Y = zeros (numel (t), numel (y0));
%!  Y(1,:) = y0(:).';
%!  y = y0(:);
%!  for j = 1:numel (edges) - 1
%!    in = t > edges(j) & t <= edges(j+1);
%!    ts = unique ([edges(j); t(in); edges(j+1)]);
%!    [tt, yy] = ode15s (@(s, z) rhs (z, inputs(j,:)), ts, y, opt);
%!    [~, k] = ismember (t(in), tt);
%!    Y(in,:) = yy(k,:);
%!    y = yy(end,:).';
%!  endfor
%!endfunction

%!test
%! ## vn_simulate against ode15s: levels and flows to 1e-5 relative
%! p = three_par ();
%! F0 = 0.02; x0 = 0.8;
%! ## the steady state at F0, x0 from the same laws
%! h2 = (F0 * 3600 / (p.kv * p.R^(x0 - 1)))^2 * 1e5 / (p.rho0 * p.g);
%! h1 = h2 + (F0 / p.c1)^2;
%! h3 = p.main - (p.H0 - p.k * F0^2) - p.base3;
%! assert (norm (three_rhs (p, [h1 h2 h3], F0, x0)) < 1e-15);
%! net = vn_network ("three tanks");
%! net = vn_tank (net, "T1", "area", 4, "level", h1);
%! net = vn_tank (net, "T2", "area", 1.5, "level", h2);
%! net = vn_tank (net, "T3", "area", 1, "level", h3, "base", p.base3);
%! net = vn_boundary (net, "main", "head", p.main);
%! net = vn_feed (net, "F1", "T1", "flow", F0);
%! net = vn_orifice (net, "O1", "T1", "T2", "coeff", p.c1);
%! net = vn_valve (net, "LV1", "T2", "T3", "kv", p.kv, "opening", x0, ...
%!                 "characteristic", "equal", "rangeability", p.R, "inlet", 4);
%! net = vn_pump (net, "P1", "T3", "main", "shutoff", p.H0, "k", p.k);
%! u = vn_signal ("F1.flow", "step", 600, F0, 0.026);
%! u(2) = vn_signal ("LV1.opening", "step", 3000, x0, 0.7);
%! t = (0:100:8000).';
%! res = vn_simulate (net, t, u, "reltol", 1e-10, "abstol", 1e-12);
%! rhs = @(h, in) three_rhs (p, h, in(1), in(2));
%! H = piecewise_ode15s (rhs, t, [h1 h2 h3], [600 3000], [F0 x0; 0.026 x0; 0.026 0.7]);
%! L = [res.T1.level res.T2.level res.T3.level];
%! assert (L, H, -1e-5);
%! ## the run moved far from the start and stayed in the regime modelled
%! assert (L(end,:) - L(1,:) > [3 3 0.5]);
%! assert (all (L(:,3) < 4));
%! ## flows from the reference levels by the same laws; inputs are
%! ## right-continuous, so the output at 3000 s sees the new opening
%! qv = arrayfun (@(i) iec_valve (p, 0.8 - 0.1 * (t(i) >= 3000), H(i,2)), (1:numel (t)).');
%! qp = arrayfun (@(i) curve_pump (p, p.main - p.base3 - H(i,3)), (1:numel (t)).');
%! assert (res.O1.flow, p.c1 * sqrt (H(:,1) - H(:,2)), -1e-5);
%! assert (res.LV1.flow, qv, -1e-5);
%! assert (res.P1.flow, qp, -1e-5);
%! assert (res.P1.head, p.main - p.base3 - H(:,3), -1e-5);

## ---- PI level loop ------------------------------------------------
## T1 (2 m2) fed by F1, emptied to the atmosphere by LV1 (Kv 100,
## linear); LC1 holds the level at 1 m, direct acting (the valve opens
## as the level rises), Kc 2 per m, Ti 300 s.  Ideal (ISA) PI:
## u = bias + Kc (e + I/Ti), e = m - sp (direct), dI/dt = e
## (Astrom and Hagglund, Advanced PID Control, ISA 2006, ch. 3; memory).

%!function p = loop_par ()
%!  p.g = 9.80665; p.rho0 = 999.1; p.A = 2; p.kv = 100;
%!  p.sp = 1; p.Kc = 2; p.Ti = 300;
%!  p.x0 = 0.005 * 3600 / (p.kv * sqrt (p.rho0 * p.g * 1 / 1e5));
%!endfunction

%!function net = loop_net (p, antiwindup)
%!  net = vn_network ("level loop");
%!  net = vn_tank (net, "T1", "area", p.A, "level", 1);
%!  net = vn_feed (net, "F1", "T1", "flow", 0.005);
%!  net = vn_valve (net, "LV1", "T1", "", "kv", p.kv, "opening", p.x0, ...
%!                  "characteristic", "linear");
%!  net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", ...
%!                       "LV1.opening", "setpoint", p.sp, "gain", p.Kc, ...
%!                       "reset", p.Ti, "action", "direct", "limits", [0 1], ...
%!                       "antiwindup", antiwindup);
%!endfunction

%!function dz = loop_rhs (p, z, F)
%!  h = z(1); I = z(2);
%!  e = h - p.sp;
%!  x = p.x0 + p.Kc * (e + I / p.Ti);
%!  q = p.kv * x * sqrt (p.rho0 * p.g * h / 1e5) / 3600;
%!  dz = [(F - q) / p.A; e];
%!endfunction

## the last time the level is outside the band, after t0
%!function ts = settle_time (t, y, sp, band, t0)
%!  out = find (abs (y - sp) > band * sp & t >= t0, 1, "last");
%!  ts = t(out) - t0;
%!endfunction

%!test
%! ## a load step inside the valve's range: the PI loop removes the offset
%! ## and follows the ode15s reference of the same equations
%! p = loop_par ();
%! assert (p.x0 > 0.5 && p.x0 < 0.6);
%! u = vn_signal ("F1.flow", "step", 300, 0.005, 0.006);
%! t = (0:30:6000).';
%! res = vn_simulate (loop_net (p, true), t, u, "reltol", 1e-10, "abstol", 1e-12);
%! Z = piecewise_ode15s (@(z, F) loop_rhs (p, z, F), t, [1 0], 300, [0.005; 0.006]);
%! assert (res.T1.level, Z(:,1), -1e-5);
%! xref = p.x0 + p.Kc * (Z(:,1) - 1 + Z(:,2) / p.Ti);
%! assert (res.LC1.output, xref, 1e-5);
%! assert (res.LV1.opening, res.LC1.output, 1e-12);
%! ## no offset left (integral action), after a real disturbance
%! assert (max (res.T1.level) > 1.02);
%! assert (res.T1.level(end), 1, 1e-4);
%! ## the new opening passes the new load at 1 m
%! assert (res.LC1.output(end), p.x0 * 0.006 / 0.005, 1e-4);

%!test
%! ## a load beyond the valve's range saturates it; when the load returns,
%! ## back-calculation anti-windup brings the level back within 2 % of the
%! ## setpoint sooner than the same loop without it (Astrom and Hagglund,
%! ## Advanced PID Control, ISA 2006, ch. 3; memory)
%! p = loop_par ();
%! u = vn_signal ("F1.flow", "table", [0 0.005; 300 0.005; 300 0.012; 1800 0.012; 1800 0.005]);
%! t = (0:10:12000).';
%! ra = vn_simulate (loop_net (p, true), t, u, "reltol", 1e-8);
%! rw = vn_simulate (loop_net (p, false), t, u, "reltol", 1e-8);
%! ## both saturate fully open while the load exceeds the valve
%! assert (max (ra.LC1.output), 1, 1e-12);
%! assert (max (rw.LC1.output), 1, 1e-12);
%! assert (all (ra.LC1.output >= 0 & ra.LC1.output <= 1));
%! ta = settle_time (t, ra.T1.level, 1, 0.02, 1800);
%! tw = settle_time (t, rw.T1.level, 1, 0.02, 1800);
%! assert (ta < 0.7 * tw);
%! ## without anti-windup the valve stays open long after the load fell
%! ## and the level undershoots further
%! assert (min (rw.T1.level(t > 1800)) < min (ra.T1.level(t > 1800)));
%! ## both end at the setpoint
%! assert ([ra.T1.level(end) rw.T1.level(end)], [1 1], 2e-3);

## Reference tests of the hydraulics through vn_simulate: Torricelli
## draining, two tanks on linear resistances (interacting and not), the
## IEC 60534-2-1 valve and its inherent characteristics, the Francis weir
## and a centrifugal pump against a system curve.  Each check names its
## published source; "(memory)" marks values not confirmed against the
## publication itself.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_ref_hydraulics.m")'

## Closed-form level of a prism tank draining through an orifice to the
## atmosphere: h(t) = (sqrt(h0) - (Cd a / A) sqrt(g/2) t)^2 (Torricelli).
%!function h = torricelli_level (A, a, Cd, g, h0, t)
%!  h = (sqrt (h0) - (Cd * a / A) * sqrt (g / 2) * t) .^ 2;
%!endfunction

## Exact response of the linear two-tank system dx/dt = M x + b F to a
## feed step F0 -> F1 at ts, from the steady state at F0 (matrix
## exponential of the linear ODE).  x = [h1; h2], one row per time.
%!function X = linear_step (M, b, F0, F1, ts, t)
%!  x0 = -M \ (b * F0);
%!  x1 = -M \ (b * F1);
%!  X = zeros (numel (t), 2);
%!  for i = 1:numel (t)
%!    if (t(i) <= ts)
%!      X(i,:) = x0.';
%!    else
%!      X(i,:) = (x1 + expm (M * (t(i) - ts)) * (x0 - x1)).';
%!    endif
%!  endfor
%!endfunction

## ---- Torricelli draining --------------------------------------------

%!test
%! ## Tank diameter 1 m, orifice 0.05 m, Cd 0.61, from 2 m: 2 m to 0.5 m
%! ## in 209.40 s, t = (A/(Cd a)) sqrt(2/g) (sqrt(h0) - sqrt(h1))
%! ## (Torricelli 1644; Encyclopaedia Britannica 1911, "Hydraulics")
%! g = 9.80665;
%! A = pi / 4;
%! a = pi / 4 * 0.05^2;
%! t_half = (A / (0.61 * a)) * sqrt (2 / g) * (sqrt (2) - sqrt (0.5));
%! assert (t_half, 209.40, 0.005);
%! ## empty after 418.79 s (same source)
%! assert ((A / (0.61 * a)) * sqrt (2 / g) * sqrt (2), 418.79, 0.005);
%! net = vn_network ("drain");
%! net = vn_tank (net, "T1", "diameter", 1, "level", 2);
%! net = vn_orifice (net, "O1", "T1", "", "diameter", 0.05, "cd", 0.61);
%! t = linspace (0, t_half, 61).';
%! res = vn_simulate (net, t, "reltol", 1e-8, "abstol", 1e-11);
%! assert (res.t, t);
%! assert (res.T1.level(end), 0.5, 1e-5);
%! assert (res.T1.level, torricelli_level (A, a, 0.61, g, 2, t), 1e-5);
%! ## outflow Q = Cd a sqrt(2 g h) along the way
%! assert (res.O1.flow, 0.61 * a * sqrt (2 * g * res.T1.level), 1e-8);
%! assert (res.O1.flow(1), 0.61 * a * sqrt (2 * g * 2), 1e-12);

%!test
%! ## the same tank given as an orifice coefficient c = Cd a sqrt(2 g), on
%! ## a raised base: the free fall is measured from the outlet, so the base
%! ## elevation does not change the draining (Torricelli 1644)
%! g = 9.80665;
%! A = pi / 4;
%! a = pi / 4 * 0.05^2;
%! net = vn_network ("drain");
%! net = vn_tank (net, "T1", "area", A, "level", 2, "base", 7.5);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.61 * a * sqrt (2 * g));
%! t = (0:10:200).';
%! res = vn_simulate (net, t, "reltol", 1e-8, "abstol", 1e-11);
%! assert (res.T1.level, torricelli_level (A, a, 0.61, g, 2, t), 1e-5);
%! assert (res.T1.head, 7.5 + res.T1.level, 1e-12);

## ---- two tanks on linear resistances ------------------------------

%!test
%! ## Interacting: A1 1, A2 0.5 m2, R1 0.5, R2 2 h/m2; T1 -> R1 -> T2 ->
%! ## R2 -> free discharge.  Transfer function
%! ## R2/(tau1 tau2 s^2 + (tau1 + tau2 + A1 R2) s + 1) = 2/(0.5 s^2 + 3.5 s + 1)
%! ## (hours), poles -6.7016 and -0.29844 1/h, gain 2 (Coughanowr and
%! ## LeBlanc, Process Systems Analysis and Control, ch. 7; memory)
%! A1 = 1; A2 = 0.5; R1 = 0.5 * 3600; R2 = 2 * 3600;
%! M = [-1/(A1*R1), 1/(A1*R1); 1/(A2*R1), -(1/R1 + 1/R2)/A2];
%! b = [1/A1; 0];
%! assert (sort (eig (M)) * 3600, [-6.7016; -0.29844], 5e-5);
%! assert (poly (M * 3600), [1 7 2], 1e-12);   % 2 (0.5 s^2 + 3.5 s + 1)
%! F0 = 1e-4; F1 = 1.5e-4; ts = 600;
%! x0 = -M \ (b * F0);
%! assert (x0, [F0 * (R1 + R2); F0 * R2], 1e-12);
%! net = vn_network ("interacting");
%! net = vn_tank (net, "T1", "area", A1, "level", x0(1));
%! net = vn_tank (net, "T2", "area", A2, "level", x0(2));
%! net = vn_feed (net, "F1", "T1", "flow", F0);
%! net = vn_resistance (net, "R1", "T1", "T2", "r", R1);
%! net = vn_resistance (net, "R2", "T2", "", "r", R2);
%! u = vn_signal ("F1.flow", "step", ts, F0, F1);
%! t = (0:600:120000).';
%! res = vn_simulate (net, t, u, "reltol", 1e-9, "abstol", 1e-12);
%! X = linear_step (M, b, F0, F1, ts, t);
%! assert (res.T1.level, X(:,1), 1e-6);
%! assert (res.T2.level, X(:,2), 1e-6);
%! ## steady gain of T2: R2 (2 h/m2), so the level rises by R2 dF
%! assert (res.T2.level(end) - x0(2), R2 * (F1 - F0), 2e-4 * R2 * (F1 - F0));
%! assert (res.R1.flow, (res.T1.level - res.T2.level) / R1, 1e-12);

%!test
%! ## Non-interacting: T1 stands 5 m higher and R1 enters T2 through an
%! ## inlet 5 m up, above T2's surface, so T2 does not push back (DESIGN
%! ## nozzle rule: the reference is the inlet elevation, here level with
%! ## T1's outlet).  Then h2 follows R2/((tau1 s + 1)(tau2 s + 1)),
%! ## tau_i = A_i R_i; step response
%! ## K dF (1 - (tau1 e^(-t/tau1) - tau2 e^(-t/tau2)) / (tau1 - tau2))
%! ## (Coughanowr and LeBlanc, Process Systems Analysis and Control, ch. 7;
%! ## memory)
%! A1 = 1; A2 = 0.5; R1 = 1800; R2 = 7200;
%! tau1 = A1 * R1; tau2 = A2 * R2;
%! F0 = 1e-4; F1 = 1.5e-4; ts = 600;
%! h1 = F0 * R1; h2 = F0 * R2;
%! net = vn_network ("non-interacting");
%! net = vn_tank (net, "T1", "area", A1, "level", h1, "base", 5);
%! net = vn_tank (net, "T2", "area", A2, "level", h2);
%! net = vn_feed (net, "F1", "T1", "flow", F0);
%! net = vn_resistance (net, "R1", "T1", "T2", "r", R1, "inlet", 5);
%! net = vn_resistance (net, "R2", "T2", "", "r", R2);
%! u = vn_signal ("F1.flow", "step", ts, F0, F1);
%! t = (0:300:40000).';
%! res = vn_simulate (net, t, u, "reltol", 1e-9, "abstol", 1e-12);
%! s = max (t - ts, 0);
%! dF = F1 - F0;
%! h1ref = h1 + R1 * dF * (1 - exp (-s / tau1));
%! h2ref = h2 + R2 * dF * (1 - (tau1 * exp (-s / tau1) - tau2 * exp (-s / tau2)) ...
%!                          / (tau1 - tau2));
%! assert (res.T1.level, h1ref, 1e-6);
%! assert (res.T2.level, h2ref, 1e-6);
%! assert (res.R1.flow, res.T1.level / R1, 1e-12);
%! assert (max (res.T2.level) < 5);

## ---- control valve, IEC 60534-2-1 -------------------------------------

## A boundary feeds valves that discharge freely into a tank through an
## inlet above its surface, so each valve sees a constant head difference:
## the boundary head less the inlet elevation.
%!function net = valve_rig (rho, dH, specs)
%!  net = vn_network ("valve rig", "density", rho);
%!  net = vn_boundary (net, "main", "head", 3 + dH);
%!  net = vn_tank (net, "T1", "area", 1e4, "level", 0.5);
%!  for i = 1:rows (specs)
%!    net = vn_valve (net, specs{i,1}, "main", "T1", "inlet", 3, specs{i,2:end});
%!  endfor
%!endfunction

%!test
%! ## Q = N1 Kv sqrt(dp/(rho/rho0)), N1 = 1 for m3/h and bar; Kv 10 across
%! ## 0.5 bar: 7.0711 m3/h at relative density 1, 7.6696 at 0.85
%! ## (IEC 60534-2-1 = ANSI/ISA-75.01.01).  rho0 = 999.1 kg/m3, water at
%! ## 15 degC (memory); dp = rho g dH.
%! g = 9.80665;
%! for rd = [1 0.85]
%!   rho = rd * 999.1;
%!   dH = 0.5e5 / (rho * g);
%!   net = valve_rig (rho, dH, {"LV1", "kv", 10, "opening", 1});
%!   res = vn_simulate (net, [0 60], "dt", 30);
%!   Q = res.LV1.flow * 3600;
%!   if (rd == 1)
%!     assert (Q, 7.0711 * ones (3, 1), 5e-5);
%!   else
%!     assert (Q, 7.6696 * ones (3, 1), 5e-5);
%!   endif
%!   assert (Q, 10 * sqrt (0.5 / rd) * ones (3, 1), 1e-9);
%! endfor

%!test
%! ## Inherent characteristics through the flow ratio Q(x)/Q(1) at a
%! ## constant head: equal percentage f = R^(x-1), R 50: f(0.5) 0.14142,
%! ## f(0.75) 0.37606 (IEC 60534-2-4, ANSI/ISA-75.11.01; memory); linear
%! ## f = x; quick opening f = sqrt(x) (common practice)
%! specs = {"E1", "kv", 40, "opening", 1, "characteristic", "equal", "rangeability", 50;
%!          "E2", "kv", 40, "opening", 0.5, "characteristic", "equal", "rangeability", 50;
%!          "E3", "kv", 40, "opening", 0.75, "characteristic", "equal", "rangeability", 50;
%!          "L1", "kv", 40, "opening", 0.3, "characteristic", "linear", "rangeability", 50;
%!          "Q1", "kv", 40, "opening", 0.25, "characteristic", "quick", "rangeability", 50};
%! net = valve_rig (999.1, 2, specs);
%! res = vn_simulate (net, [0 10], "dt", 10);
%! q1 = res.E1.flow(1);
%! assert (q1, 40 / 3600 * sqrt (999.1 * 9.80665 * 2 / 1e5), 1e-12);
%! assert (res.E2.flow(1) / q1, 0.14142, 5e-6);
%! assert (res.E3.flow(1) / q1, 0.37606, 5e-6);
%! assert (res.L1.flow(1) / q1, 0.3, 1e-12);
%! assert (res.Q1.flow(1) / q1, 0.5, 1e-12);

## ---- Francis weir -------------------------------------------------

%!test
%! ## A tank with a feed and a rim and no other outlet settles where the
%! ## spill equals the feed: Q = 1.84 (L - 0.1 n H) H^1.5; L 1 m, H 0.2 m,
%! ## n 2: 0.15799 m3/s (Francis, Lowell Hydraulic Experiments, 1855)
%! Q = 1.84 * (1 - 0.1 * 2 * 0.2) * 0.2^1.5;
%! assert (Q, 0.15799, 5e-6);
%! net = vn_network ("weir");
%! net = vn_tank (net, "T1", "area", 3, "level", 2.5, "rim", 3, ...
%!                "crest", 1, "contractions", 2);
%! net = vn_feed (net, "F1", "T1", "flow", Q);
%! ## the same weir without end contractions passes 1.84 L H^1.5
%! net = vn_tank (net, "T2", "area", 3, "level", 2.5, "rim", 3, "crest", 1);
%! net = vn_feed (net, "F2", "T2", "flow", 1.84 * 0.2^1.5);
%! res = vn_simulate (net, [0 600], "dt", 10, "reltol", 1e-9);
%! assert (res.T1.level(end), 3.2, 1e-6);
%! assert (res.T1.spill(end), 0.15799, 5e-6);
%! assert (res.T2.level(end), 3.2, 1e-6);
%! ## no spill while the level is below the rim
%! below = res.T1.level < 3;
%! assert (any (below));
%! assert (res.T1.spill(below), zeros (nnz (below), 1));
%! ## the spill follows the weir law on the way up
%! up = ! below;
%! H = res.T1.level(up) - 3;
%! assert (res.T1.spill(up), 1.84 * (1 - 0.2 * H) .* H .^ 1.5, 1e-12);

## ---- centrifugal pump against a system curve --------------------------

## Pump from a sump (boundary, head 0) into a tank, the tank emptying
## through an orifice into a reservoir 10 m up: the orifice's loss
## 0.003 Q^2 (Q in m3/h) on a 10 m lift is the system curve.
%!function net = pump_rig (speed)
%!  kp = 0.001 * 3600^2;                 % m/(m3/h)^2 -> m/(m3/s)^2
%!  ks = 0.003 * 3600^2;
%!  net = vn_network ("pump rig");
%!  net = vn_boundary (net, "sump", "head", 0);
%!  net = vn_boundary (net, "top", "head", 10);
%!  net = vn_tank (net, "T1", "area", 1, "level", 30);
%!  net = vn_pump (net, "P1", "sump", "T1", "shutoff", 50, "k", kp, "speed", speed);
%!  net = vn_orifice (net, "O1", "T1", "top", "coeff", 1 / sqrt (ks));
%!endfunction

%!test
%! ## H = s^2 H0 - k Q^2, H0 50 m, k 0.001 m/(m3/h)^2, against
%! ## 10 + 0.003 Q^2: 100 m3/h at 40 m; at s 0.8: 74.162 m3/h at 26.500 m
%! ## (affinity laws, Spellman, Handbook of Water and Wastewater Treatment
%! ## Plant Operations; pump curve form: common practice)
%! for s = [1 0.8]
%!   res = vn_simulate (pump_rig (s), [0 20000], "dt", 1000, "reltol", 1e-9);
%!   Q = res.P1.flow(end) * 3600;
%!   H = res.P1.head(end);
%!   if (s == 1)
%!     assert ([Q H], [100 40], [1e-4 1e-5]);
%!   else
%!     assert ([Q H], [74.162 26.500], [5e-4 5e-4]);
%!   endif
%!   ## on both curves at once
%!   assert (H, s^2 * 50 - 0.001 * Q^2, 1e-8);
%!   assert (H, 10 + 0.003 * Q^2, 1e-6);
%!   assert (res.T1.level(end), H, 1e-6);
%!   assert (res.O1.flow(end), res.P1.flow(end), 1e-9);
%! endfor

%!test
%! ## Affinity laws through the operating point: 0.8 speed on a pure
%! ## friction system (no lift) scales flow by 0.8 and head by 0.64
%! ## (Spellman, Handbook of Water and Wastewater Treatment Plant
%! ## Operations: 1450 -> 1160 rpm, 100 -> 80 m3/h, 40 -> 25.6 m)
%! kp = 10 / (100 / 3600)^2;            % H0 50 m, 40 m at 100 m3/h
%! kf = 40 / (100 / 3600)^2;            % system 40 m at 100 m3/h, no lift
%! for s = [1 0.8]
%!   net = vn_network ("affinity");
%!   net = vn_boundary (net, "sump", "head", 0);
%!   net = vn_tank (net, "T1", "area", 1, "level", 30);
%!   net = vn_pump (net, "P1", "sump", "T1", "shutoff", 50, "k", kp, "speed", s);
%!   net = vn_orifice (net, "O1", "T1", "sump", "coeff", 1 / sqrt (kf));
%!   res = vn_simulate (net, [0 20000], "dt", 1000, "reltol", 1e-9);
%!   assert (res.P1.flow(end) * 3600, 100 * s, 1e-4);
%!   assert (res.P1.head(end), 40 * s^2, 1e-5);
%! endfor

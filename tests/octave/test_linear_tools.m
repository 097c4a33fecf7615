## Reference tests of the linear-analysis tools: exact step responses, step
## figures, transfer functions, poles, frequency responses, loop margins and
## the relative gain array.  Each check names its source.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; test ("tests/octave/test_linear_tools.m")'

%!shared here
%! ## The helpers under test live in inst/private.
%! here = fileparts (which ("vn_frequency"));
%! addpath (fullfile (here, "private"));

## ---- exact step response ---------------------------------------------

%!test
%! ## First order K/(tau s + 1): y = K du (1 - exp (-t/tau)) (analytic).
%! K = 1.6;  tau = 240;  du = 0.004;
%! t = (0:5:1800)';
%! y = lin_deviation (-1/tau, K/tau, 1, 0, du, t);
%! assert (y, K * du * (1 - exp (-t / tau)), 1e-15);

%!test
%! ## Against lsode at tight tolerance: lag, oscillating pair and a
%! ## feed-through, two inputs, nonuniform times.
%! A = [-0.5 0 0; 0 -0.2 3; 0 -3 -0.2];
%! B = [1 0; 0 1; 0.5 2];
%! C = [1 1 0; 0 1 -1];
%! D = [0 0.1; 0 0];
%! du = [0.7; -0.3];
%! t = [0; 0.05; 0.4; 1.1; 2.5; 4; 7.5; 12];
%! lsode_options ("relative tolerance", 1e-12);
%! lsode_options ("absolute tolerance", 1e-13);
%! x = lsode (@(x, tt) A * x + B * du, zeros (3, 1), t);
%! y = lin_deviation (A, B, C, D, du, t);
%! assert (y, x * C.' + (D * du).', 1e-9);

%!test
%! ## Against ode45, uniform times, a sparse A of 40 tanks in series
%! ## (each dx_i/dt = (x_{i-1} - x_i)/60): the dense exponential is exact.
%! n = 40;
%! A = spdiags ([ones(n,1), -ones(n,1)] / 60, [-1 0], n, n);
%! B = [1/60; zeros(n-1, 1)];
%! C = [zeros(1, n-1), 1];
%! t = (0:50:4000)';
%! opt = odeset ("RelTol", 1e-10, "AbsTol", 1e-12);
%! [~, x] = ode45 (@(tt, x) A * x + B, t, zeros (n, 1), opt);
%! y = lin_deviation (A, B, C, 0, 1, t);
%! assert (y, x(:,n), 1e-8);
%! ## Erlang: 40 equal lags give P(T >= 40 | rate t/60) at the last tank (analytic).
%! k = 0:n-1;
%! tt = 2400;
%! assert (y(t == tt), 1 - sum (exp (-tt/60) * (tt/60) .^ k ./ factorial (k)), 1e-10);

%!test
%! ## Integrating process (A = 0): the step is a ramp of slope B du (analytic).
%! t = (0:10:600)';
%! assert (lin_deviation (0, 1/2.5, 1, 0, 0.01, t), 0.004 * t, 1e-12);

%!test
%! ## Lag into an integrator: x1' = -x1 + u, x2' = x1, y = x2:
%! ## y = t - 1 + exp (-t) (analytic).
%! t = linspace (0, 20, 201)';
%! y = lin_deviation ([-1 0; 1 0], [1; 0], [0 1], 0, 1, t);
%! assert (y, t - 1 + exp (-t), 1e-12);

## ---- step figures ----------------------------------------------------

%!test
%! ## Second order, zeta 0.5, wn 10: overshoot 100 exp (-pi zeta/sqrt (1 - zeta^2))
%! ## = 16.303 %, peak time pi/wd = 0.36276 s, exact 2 % band 0.8076 s
%! ## (closed form of the underdamped second-order step; worked values
%! ## of REFERENCES.md, "Analysis", memory).
%! zeta = 0.5;  wn = 10;
%! A = [0 1; -wn^2, -2*zeta*wn];
%! t = (0:1e-4:3)';
%! y = lin_deviation (A, [0; wn^2], [1 0], 0, 1, t);
%! m = step_metrics (t, y, 1, "final", 1);
%! assert (m.overshoot, 100 * exp (-pi * zeta / sqrt (1 - zeta^2)), 1e-6);
%! assert (m.overshoot, 16.303, 5e-4);
%! assert (m.peak, 0.36276, 5e-6);
%! assert (m.peak, pi / (wn * sqrt (1 - zeta^2)), 1e-7);
%! assert (m.settle, 0.8076, 5e-5);
%! assert (m.gain, 1, 1e-8);
%! assert (m.undershoot, 0);

%!test
%! ## First order: 63.212 % at tau, 95.021 % at 3 tau (analytic, REFERENCES.md).
%! tau = 300;
%! t = (0:1:3000)';
%! y = lin_deviation (-1/tau, 2/tau, 1, 0, 0.5, t);
%! assert (y(t == tau), 0.63212, 5e-6);
%! assert (y(t == 3*tau), 0.95021, 5e-6);
%! m = step_metrics (t, y, 0.5, "final", 1);
%! assert (m.t63, tau, 1e-3);
%! assert (m.rise, tau * log (9), 1e-2);
%! assert (m.gain, 2);

%!test
%! ## Inverse response (1 - 2 s)/(s + 1)^2: dips first (analytic zero at +0.5);
%! ## y = 1 - exp(-t) - 3 t exp(-t), minimum 1 - 3 exp(-2/3) at t = 2/3.
%! A = [-1 1; 0 -1];
%! B = [0; 1];
%! C = [3 -2];
%! t = (0:1e-3:20)';
%! y = lin_deviation (A, B, C, 0, 1, t);
%! assert (y, 1 - exp (-t) - 3 * t .* exp (-t), 1e-12);
%! m = step_metrics (t, y, 1, "final", 1);
%! assert (m.inverse);
%! ymin = 1 - 3 * exp (-2/3);
%! assert (m.undershoot, -100 * ymin, 1e-4);

%!test
%! ## Figures measured from the step time and from a raw record.
%! t = (0:0.1:400)';
%! y = 5 + 2 * (1 - exp (-max (t - 100, 0) / 20));
%! m = step_metrics (t, y, 0.1, "initial", 5, "tstep", 100, "final", 2);
%! assert (m.t63, 20, 1e-2);
%! assert (m.gain, 20);
%! assert (m.deadtime, -20 * log (0.99), 1e-3);

## ---- transfer function and poles --------------------------------------

%!test
%! ## Interacting two tanks (hours): A1 1, A2 0.5 m2, R1 0.5, R2 2 h/m2.
%! ## H2/Q0 = R2/(tau1 tau2 s^2 + (tau1 + tau2 + A1 R2) s + 1)
%! ##       = 2/(0.5 s^2 + 3.5 s + 1), poles -6.7016 and -0.29844 1/h,
%! ## gain 2 (Coughanowr and LeBlanc, ch. 7, memory).
%! A1 = 1;  A2 = 0.5;  R1 = 0.5;  R2 = 2;
%! ## A1 dh1/dt = q0 - (h1 - h2)/R1;  A2 dh2/dt = (h1 - h2)/R1 - h2/R2
%! A = [-1/(A1*R1), 1/(A1*R1); 1/(A2*R1), -(1/R1 + 1/R2)/A2];
%! B = [1/A1; 0];
%! C = [0 1];
%! [num, den, z, g] = lin_polynomials (A, B, C, 0);
%! assert (den / den(end), [0.5 3.5 1], 1e-12);
%! assert (num / den(end), 2, 1e-12);
%! assert (isempty (z));
%! assert (g, 2, 1e-12);
%! [p, tau] = lin_modes (A);
%! assert (p, [-0.29844; -6.7016], 5e-5);
%! assert (tau, -1 ./ [-0.29844; -6.7016], 5e-4);
%! fr = vn_frequency (struct ("A", A, "B", B, "C", C, "D", 0), 1e-6);
%! assert (fr.magnitude, 2, 1e-5);

%!test
%! ## Zeros: (s + 2)/((s + 1)(s + 3)) from a modal model (analytic partial
%! ## fractions 0.5/(s + 1) + 0.5/(s + 3)).
%! [num, den, z, g] = lin_polynomials (diag ([-1 -3]), [1; 1], [0.5 0.5], 0);
%! assert (num, [1 2], 1e-12);
%! assert (den, [1 4 3], 1e-12);
%! assert (z, -2, 1e-12);
%! assert (g, 2/3, 1e-12);

%!test
%! ## Integrator with an unobservable second integrator: finite part cancels,
%! ## 1/s stays (analytic).
%! [num, den, z, g] = lin_polynomials ([0 0; 0 0], [1; 1], [1 0], 0);
%! assert (g, Inf);
%! [~, ~, ~, g2] = lin_polynomials ([0 0; 0 -1], [0; 1], [0 1], 0);
%! assert (g2, 1, 1e-12);

## ---- frequency response and margins -----------------------------------

%!test
%! ## First order K/(tau s + 1) at w = 1/tau: K/sqrt (2), -45 deg (analytic).
%! K = 3;  tau = 50;
%! lin = struct ("A", -1/tau, "B", K/tau, "C", 1, "D", 0,
%!               "inputs", {{"F1.flow"}}, "outputs", {{"T1.level"}});
%! fr = vn_frequency (lin, 1/tau);
%! assert (fr.magnitude, K / sqrt (2), 1e-12);
%! assert (fr.phase, -45, 1e-10);
%! assert (fr.outputs, {"T1.level"});
%! ## Default grid: two decades beyond the pole, 50 points per decade.
%! fr = vn_frequency (lin);
%! ## (pole 0.02 rad/s: decades rounded out, 1e-4 to 10 rad/s).
%! assert (fr.w([1 end]), [1e-4; 10], 1e-15);
%! assert (numel (fr.w), 251);

%!test
%! ## Sparse model solved per frequency agrees with the dense eigen route,
%! ## and the phase of three lags unwraps past -180 deg (analytic -270).
%! A = [-1 1 0; 0 -1 1; 0 0 -1];
%! w = logspace (-2, 3, 60)';
%! f1 = vn_frequency (struct ("A", A, "B", [0;0;1], "C", [1 0 0], "D", 0), w);
%! f2 = vn_frequency (struct ("A", sparse (A), "B", [0;0;1], "C", [1 0 0], "D", 0), w);
%! assert (f2.magnitude, f1.magnitude, 1e-12);
%! assert (f2.phase, f1.phase, 1e-9);
%! assert (f1.phase, -3 * atand (w), 1e-9);
%! assert (f1.magnitude, (1 + w .^ 2) .^ -1.5, 1e-12);

%!test
%! ## First order with P control: gain margin Inf; |L| = 1 at
%! ## w = sqrt ((K Kc)^2 - 1)/tau, pm = 180 - atan (w tau) (analytic).
%! K = 2;  tau = 10;  Kc = 2;
%! lin = struct ("A", -1/tau, "B", K/tau, "C", 1, "D", 0);
%! fr = vn_frequency (lin, "controller", struct ("Kc", Kc, "Ti", Inf));
%! assert (fr.loop.gain_margin, Inf);
%! assert (isnan (fr.loop.phase_crossover));
%! assert (fr.loop.gain_crossover, sqrt (15) / tau, 1e-9);
%! assert (fr.loop.phase_margin, 180 - atand (sqrt (15)), 1e-7);

%!test
%! ## Integrator k/s with ideal PI (k 0.5, Kc 4, Ti 2): phase
%! ## -180 + atan (w Ti), |L| = 1 where (k Kc)^2 (1 + (w Ti)^2) = (Ti w^2)^2
%! ## (analytic); no phase crossover, gain margin Inf.
%! k = 0.5;  Kc = 4;  Ti = 2;
%! lin = struct ("A", 0, "B", k, "C", 1, "D", 0);
%! fr = vn_frequency (lin, "controller", struct ("Kc", Kc, "Ti", Ti));
%! a = (k * Kc / Ti)^2;
%! wc = sqrt ((a * Ti^2 + sqrt (a^2 * Ti^4 + 4 * a)) / 2);
%! assert (fr.loop.gain_crossover, wc, 1e-9);
%! assert (fr.loop.phase_margin, atand (wc * Ti), 1e-7);
%! assert (fr.loop.gain_margin, Inf);

%!test
%! ## Three lags 1/(s + 1)^3, series form Kc 0.5, Ti Inf, Td 0 is P only:
%! ## |G| = 1/8 at the -180 deg frequency sqrt (3), gain margin 16 (analytic).
%! A = [-1 1 0; 0 -1 1; 0 0 -1];
%! lin = struct ("A", A, "B", [0; 0; 1], "C", [1 0 0], "D", 0);
%! pid = struct ("Kc", 0.5, "Ti", Inf, "Td", 0, "form", "series");
%! fr = vn_frequency (lin, "controller", pid);
%! assert (fr.loop.gain_margin, 16, 1e-9);
%! assert (fr.loop.phase_crossover, sqrt (3), 1e-9);
%! assert (fr.loop.phase_margin, Inf);

## ---- relative gain array ----------------------------------------------

%!test
%! ## Wood and Berry, Chem. Eng. Sci. 28 (1973), gains (memory):
%! ## lambda11 = 1/(1 - g12 g21/(g11 g22)) = 2.0094 (Bristol, IEEE Trans.
%! ## Autom. Control 11, 1966).
%! G = [12.8, -18.9; 6.6, -19.4];
%! [R, info] = vn_rga (G);
%! assert (R, [2.0094, -1.0094; -1.0094, 2.0094], 5e-5);
%! assert (R(1,1), 1 / (1 - G(1,2) * G(2,1) / (G(1,1) * G(2,2))), 1e-12);
%! assert (info.pairing, [1 2]);
%! assert (info.niederlinski, det (G) / (G(1,1) * G(2,2)), 1e-12);

%!test
%! ## 3 x 3: rows and columns sum to 1 (Bristol 1966).
%! G = [1.5 0.2 -0.4; 0.3 2.0 0.5; -0.6 0.1 1.2];
%! R = vn_rga (G);
%! assert (sum (R, 1), ones (1, 3), 1e-12);
%! assert (sum (R, 2), ones (3, 1), 1e-12);

%!test
%! ## From a model with integrating output: error names the pair.
%! lin = struct ("A", [0 0; 0 -1], "B", eye (2), "C", eye (2), "D", zeros (2),
%!               "inputs", {{"F1.flow", "F2.flow"}},
%!               "outputs", {{"T1.level", "T2.level"}});
%! fail ("vn_rga (lin)", "from F1.flow to T1.level is Inf");

## ---- agreement with octave-control, when it is installed --------------

%!test
%! if (! isempty (pkg ("list", "control")))
%!   pkg load control;
%!   A = [-0.5 0 0; 0 -0.2 3; 0 -3 -0.2];
%!   B = [1; 0; 0.5];
%!   C = [1 1 0.5];
%!   sys = ss (A, B, C, 0.2);
%!   t = (0:0.1:20)';
%!   y = step (sys, t);
%!   assert (lin_deviation (A, B, C, 0.2, 1, t), y(:), 1e-8);
%!   w = logspace (-2, 2, 40)';
%!   [mag, pha] = bode (sys, w);
%!   fr = vn_frequency (struct ("A", A, "B", B, "C", C, "D", 0.2), w);
%!   assert (fr.magnitude, mag(:), 1e-10);
%!   ## Phases may sit on branches 360 deg apart.
%!   dphase = fr.phase - pha(:);
%!   assert (dphase - 360 * round (dphase / 360), zeros (size (w)), 1e-8);
%! endif

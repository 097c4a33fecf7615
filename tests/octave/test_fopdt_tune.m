## Integration and reference tests of vn_fopdt and vn_tune.
## Run from the checkout: addpath inst; test tests/octave/test_fopdt_tune.m

## Step of 2 at t = 60 s into K 0.5, tau 120 s, theta 30 s, from y0 = 3.
%!function y = first_order (t, tk, du, K, tau, theta, y0)
%!  y = y0 + sum (K * du(:).' .* (1 - exp (-max (t - tk(:).' - theta, 0) / tau)), 2);
%!endfunction

%!test
%! ## Noiseless step: recovery within 1e-4 relative
%! t = (0:2:900)';
%! u = 1 + 2 * (t >= 60);
%! y = first_order (t, 60, 2, 0.5, 120, 30, 3);
%! m = vn_fopdt (t, u, y);
%! assert ([m.gain, m.tau, m.deadtime, m.baseline.y0], [0.5, 120, 30, 3], -1e-4);

%!test
%! ## Seeded noise (sd 0.01 on a response of 1): each estimate within
%! ## 3 standard errors of the truth, and the errors are small but nonzero
%! t = (0:2:900)';
%! u = 1 + 2 * (t >= 60);
%! randn ("state", 1);
%! y = first_order (t, 60, 2, 0.5, 120, 30, 3) + 0.01 * randn (size (t));
%! m = vn_fopdt (t, u, y);
%! se = [m.stderr.gain, m.stderr.tau, m.stderr.deadtime];
%! assert (all (abs ([m.gain, m.tau, m.deadtime] - [0.5, 120, 30]) < 3 * se));
%! assert (all (se > 0) && all (se ./ [0.5, 120, 30] < 0.05));
%! assert (m.rmse, 0.01, 0.002);

%!test
%! ## Smith's two-point method, Digital Computer Process Control (1972):
%! ## exact for a true FOPDT sampled finely and run out to steady state
%! t = (0:0.01:300)';
%! u = 5 * (t >= 5);
%! y = first_order (t, 5, 5, 1.6, 10, 2, -1);
%! m = vn_fopdt (t, u, y, "twopoint");
%! assert (m.method, "smith");
%! assert ([m.gain, m.tau, m.deadtime], [1.6, 10, 2], -1e-4);

%!test
%! ## Integrating model: k' 2e-3 per s, theta 20 s, two steps
%! t = (0:2:900)';
%! u = 0.5 + 0.1 * (t >= 100) - 0.2 * (t >= 500);
%! y = 1.2 + 2e-3 * (0.1 * max (t - 120, 0) - 0.2 * max (t - 520, 0));
%! m = vn_fopdt (t, u, y, "integrating");
%! assert ([m.gain, m.deadtime, m.baseline.y0], [2e-3, 20, 1.2], -1e-4);
%! assert (isfield (m.stderr, "gain") && isfield (m.stderr, "deadtime"));

%!test
%! ## SOPDT: K 1.5, tau1 80 s, tau2 25 s, theta 15 s, step of 2 at 50 s
%! t = (0:1:1200)';
%! u = 2 * (t >= 50);
%! s = max (t - 65, 0);
%! y = 1 + 3 * (1 - (80 * exp (-s / 80) - 25 * exp (-s / 25)) / 55);
%! m = vn_fopdt (t, u, y, "sopdt");
%! assert ([m.gain, m.tau1, m.tau2, m.deadtime], [1.5, 80, 25, 15], -1e-4);
%! assert (m.type, "sopdt");

%!test
%! ## Non-step input: a random binary sequence plus an offset step, with a
%! ## negative gain and a dead time between samples (42.5 s, sampling 5 s)
%! t = (0:5:3000)';
%! rand ("state", 3);
%! u = 10 + 2 * mod (cumsum (rand (size (t)) < 0.08), 2) - (t > 1500);
%! k = find (diff (u) != 0) + 1;
%! y = first_order (t, t(k), diff (u)(k-1), -1.3, 150, 42.5, 20);
%! m = vn_fopdt (t, u, y);
%! assert ([m.gain, m.tau, m.deadtime], [-1.3, 150, 42.5], -1e-4);

%!test
%! ## Two steps of different size, noise: within 3 standard errors
%! t = (0:4:2400)';
%! u = 0.3 * (t >= 200) + 0.5 * (t >= 1200);
%! randn ("state", 2);
%! y = first_order (t, [200 1200], [0.3 0.5], 4, 200, 60, 10) + 0.01 * randn (size (t));
%! m = vn_fopdt (t, u, y);
%! se = [m.stderr.gain, m.stderr.tau, m.stderr.deadtime];
%! assert (all (abs ([m.gain, m.tau, m.deadtime] - [4, 200, 60]) < 3 * se));

%!test
%! ## Uneven sampling with NaN gaps; the step falls on a sample time
%! rand ("state", 5);
%! t = unique ([0; 100; cumsum(0.5 + 3 * rand (400, 1))]);
%! u = 4 + (t >= 100);
%! y = first_order (t, 100, 1, 0.8, 60, 12.3, 7);
%! y(50:80) = NaN;
%! y(200:3:260) = NaN;
%! m = vn_fopdt (t, u, y);
%! assert ([m.gain, m.tau, m.deadtime], [0.8, 60, 12.3], -1e-4);
%! assert (isnan (m.residuals(60)) && ! isnan (m.fitted(60)));

%!test
%! ## Linear input interpolation: a ramp of 1 over 60 s, K 0.7, tau 60 s
%! t = (0:1:1200)';
%! u = interp1 ([0 100 160 2000], [0 0 1 1], t);
%! s = max (t - 115, 0);
%! r = @(s) s - 60 * (1 - exp (-s / 60));
%! y = 0.7 * (r (s) - r (max (s - 60, 0))) / 60;
%! m = vn_fopdt (t, u, y, "linear");
%! assert ([m.gain, m.tau, m.deadtime], [0.7, 60, 15], -1e-4);
%! assert (m.input, "linear");

%!test
%! ## From a fitted model to settings: SIMC PI of the fit matches SIMC PI
%! ## of the true model, Skogestad, J. Process Control 13 (2003)
%! t = (0:2:900)';
%! u = 1 + 2 * (t >= 60);
%! m = vn_fopdt (t, u, first_order (t, 60, 2, 0.5, 120, 30, 3));
%! p = vn_tune (m, "simc");
%! assert ([p.Kc, p.Ti], [120 / (0.5 * 60), 120], -1e-4);

%!test
%! ## Worked model K 2, tau 10 min, theta 1 min
%! m = struct ("gain", 2, "tau", 10, "deadtime", 1);
%! p = vn_tune (m, "simc");                   # Skogestad, J. Process Control 13 (2003)
%! assert ([p.Kc, p.Ti], [2.5, 8], 1e-12);
%! p = vn_tune (m, "imc", "lambda", 1);       # Rivera, Morari and Skogestad, IECPDD 25 (1986)
%! assert ([p.Kc, p.Ti, p.Td], [3.5, 10.5, 0.47619], 1e-5);
%! p = vn_tune (m, "zn", "type", "pi");       # Ziegler and Nichols, Trans. ASME 64 (1942)
%! assert ([p.Kc, p.Ti], [4.5, 3.3], 1e-12);
%! p = vn_tune (m, "zn", "type", "pid");      # Ziegler and Nichols, Trans. ASME 64 (1942)
%! assert ([p.Kc, p.Ti, p.Td], [6, 2, 0.5], 1e-12);

%!test
%! ## Lambda tuning, integrating, arrest time 10 (memory)
%! p = vn_tune (struct ("type", "integrating", "gain", 0.1, "deadtime", 1), "lambda", "lambda", 10);
%! assert ([p.Ti, p.Kc], [21, 1.7355], 1e-4);

%!test
%! ## A fitted integrating model feeds the integrating rules
%! t = (0:2:900)';
%! u = 0.5 + 0.1 * (t >= 100);
%! m = vn_fopdt (t, u, 1.2 + 2e-3 * 0.1 * max (t - 120, 0), "integrating");
%! p = vn_tune (m, "lambda", "lambda", 200);
%! assert ([p.Ti, p.Kc], [420, 420 / (2e-3 * 220^2)], -1e-4);

%!error id=Octave:invalid-input-arg vn_fopdt ((0:9)', [0 ones(1, 9)]', NaN (10, 1))
%!error id=Octave:invalid-input-arg vn_fopdt ((0:9)', zeros (10, 1), (0:9)')
%!error id=Octave:invalid-input-arg vn_fopdt ((0:9)', [0 ones(1, 9)]', (0:8)')
%!error <too few points> vn_fopdt ((0:5)', [0 ones(1, 5)]', (0:5)')
%!error <strictly increasing> vn_fopdt ([0:4, 4:8]', [0 ones(1, 9)]', (0:9)')
%!error <U must be finite> vn_fopdt ((0:9)', [0 NaN ones(1, 8)]', (0:9)')
%!error <no finite sample after the first input change> vn_fopdt ((0:19)', [zeros(1, 10) ones(1, 10)]', [ones(1, 10) NaN(1, 10)]')
%!error id=Octave:invalid-input-arg vn_tune (struct ("gain", 2, "tau", 10, "deadtime", 0), "zn")

## Tests of vn_experiment and vn_fit on a pair of tanks drained by
## orifices.  The "plant data" are test data generated from a known true
## model (O1.coeff 0.003, O2.coeff 0.0025 m2.5/s, T2.area 1.0 m2) by
## vn_simulate, plus seeded Gaussian noise (randn ("state", 42)); no real
## plant is involved.  Checks: recovery of the true values within their
## 95 % intervals and a few percent, rmse near the noise sigma, narrower
## intervals from two tests than one, convergence from starting values
## off by a factor of two, sensitivities against finite differences, and
## the refusals.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_fit.m")'

## T1 (1.5 m2) feeds T2 through O1; O2 drains T2 freely.
%!function net = pair (c1, c2, a2)
%!  net = vn_network ("fit test pair");
%!  net = vn_tank (net, "T1", "area", 1.5, "level", 1.0);
%!  net = vn_tank (net, "T2", "area", a2, "level", 0.8);
%!  net = vn_feed (net, "F1", "T1", "flow", 0.004);
%!  net = vn_orifice (net, "O1", "T1", "T2", "coeff", c1);
%!  net = vn_orifice (net, "O2", "T2", "", "coeff", c2);
%!endfunction

## A step test on F1 from the true model's steady state, noisy levels.
%!function ex = steptest (net, t, f0, f1, tstep, sigma)
%!  u = f0 + (f1 - f0) * (t >= tstep);
%!  sg = struct ("quantity", "F1.flow", "t", [t(1); tstep; tstep; t(end)],
%!               "v", [f0; f0; f1; f1], "hold", false, "kind", "table");
%!  op = vn_steady (net, "F1.flow", f0);
%!  res = vn_simulate (net, t, sg, "initial", op, "reltol", 1e-10,
%!                     "abstol", 1e-12);
%!  y1 = res.T1.level + sigma * randn (numel (t), 1);
%!  y2 = res.T2.level + sigma * randn (numel (t), 1);
%!  ex = vn_experiment (t, "F1.flow", u, "T1.level", y1, "T2.level", y2,
%!                      "hold", true, "sigma", sigma);
%!endfunction

## Levels predicted for a test at parameters p, from its steady start.
%!function y = predict (p, e)
%!  net = pair (p(1), p(2), p(3));
%!  u = e.data(:, 1);
%!  sg = struct ("quantity", "F1.flow", "t", e.t, "v", u, "hold", true,
%!               "kind", "table");
%!  op = vn_steady (net, "F1.flow", u(1));
%!  res = vn_simulate (net, e.t, sg, "initial", op, "reltol", 1e-10,
%!                     "abstol", 1e-12);
%!  y = [res.T1.level, res.T2.level];
%!endfunction

%!shared truth, names, ex1, ex2, start, est1, est2
%! truth = [0.003; 0.0025; 1.0];
%! names = {"O1.coeff", "O2.coeff", "T2.area"};
%! randn ("state", 42);
%! t = (0:10:3000).';
%! ex1 = steptest (pair (truth(1), truth(2), truth(3)), t, 0.004, 0.006, 300, 0.005);
%! ex2 = steptest (pair (truth(1), truth(2), truth(3)), t, 0.006, 0.003, 200, 0.005);
%! ## starting values off by a factor of two, both ways
%! start = pair (2 * truth(1), truth(2) / 2, 2 * truth(3));
%! est1 = vn_fit (start, ex1, names);
%! est2 = vn_fit (start, [ex1, ex2], names);

%!test
%! ## recovery: truth inside the 95 % intervals, estimates within 3 %
%! assert (est1.names, names(:));
%! assert (all (truth > est1.ci(:, 1) & truth < est1.ci(:, 2)));
%! assert (all (truth > est2.ci(:, 1) & truth < est2.ci(:, 2)));
%! assert (est1.value, truth, -0.03);
%! assert (est2.value, truth, -0.03);
%! ## the fitted network carries the values
%! assert (est2.net.units(est2.net.index.O1).par.coeff, est2.value(1));
%! assert (est2.net.units(est2.net.index.T2).par.area, est2.value(3));

%!test
%! ## rmse of the residuals close to the noise sigma 0.005 m (602 and
%! ## 1204 samples: within 10 %)
%! assert (est1.rmse, 0.005, 5e-4);
%! assert (est2.rmse, 0.005, 5e-4);
%! assert (size (est2.residuals), [2 1]);
%! assert (size (est2.residuals{2}), [301 2]);
%! assert (std (est2.residuals{1}(:)), 0.005, 5e-4);

%!test
%! ## two tests narrow every interval
%! w1 = diff (est1.ci, 1, 2);
%! w2 = diff (est2.ci, 1, 2);
%! assert (all (w2 < w1));
%! assert (all (est2.stderr < est1.stderr));
%! assert (est2.dof, 1204 - 3);
%! ## interval half-width = t(0.975, dof) * stderr
%! assert ((est2.ci(:, 2) - est2.value) ./ est2.stderr, ...
%!         repmat (1.96194, 3, 1), 1e-4);

%!test
%! ## correlation matrix: unit diagonal, symmetric, within [-1, 1]
%! assert (diag (est2.corr), ones (3, 1), 1e-12);
%! assert (est2.corr, est2.corr.', 1e-12);
%! assert (all (abs (est2.corr(:)) <= 1 + 1e-12));
%! assert (est2.iterations >= 2 && est2.iterations <= 50);
%! assert (ischar (est2.reason) && ! isempty (est2.reason));

%!test
%! ## the vn_plot contract
%! f = est2.fit(2);
%! assert (f.names, {"T1.level", "T2.level"});
%! assert (f.t, ex2.t);
%! assert (size (f.measured), [301 2]);
%! assert (size (f.predicted), [301 2]);
%! assert (f.measured - f.predicted, est2.residuals{2}, 1e-15);
%! assert (f.units, {"m", "m"});

%!test
%! ## Jacobian of the weighted residuals from the core's sensitivities
%! ## against central differences of predictions by vn_simulate,
%! ## relative 1e-4 (the two tests, stacked as in est.jacobian)
%! p = est2.value;
%! Jfd = zeros (rows (est2.jacobian), 3);
%! for i = 1:3
%!   h = 1e-5 * p(i);
%!   pp = p; pp(i) += h;
%!   pm = p; pm(i) -= h;
%!   yp = [];
%!   ym = [];
%!   for e = [ex1, ex2]
%!     yp = [yp; predict(pp, e)(:)];
%!     ym = [ym; predict(pm, e)(:)];
%!   endfor
%!   Jfd(:, i) = - (yp - ym) / (2 * h) / 0.005;
%! endfor
%! err = max (abs (est2.jacobian - Jfd)) ./ max (abs (Jfd));
%! assert (all (err < 1e-4));
%! assert (max (abs (Jfd(:))) > 1);

%!error <experiment 1 has no measured output> vn_fit (pair (0.003, 0.0025, 1), vn_experiment (0:10, "F1.flow", ones (1, 11)), {"O1.coeff"})
%!error <neither an input nor an output of orifice "O1"> vn_fit (pair (0.003, 0.0025, 1), vn_experiment (0:10, "O1.coef", ones (1, 11)), {"O1.coeff"})
%!error <foo is not a numeric parameter of orifice "O1"; allowed: coeff> vn_fit (pair (0.003, 0.0025, 1), vn_experiment (0:10, "T1.level", ones (1, 11)), {"O1.foo"})
%!error <the network has no unit "O9"> vn_fit (pair (0.003, 0.0025, 1), vn_experiment (0:10, "T1.level", ones (1, 11)), {"O9.coeff"})
%!error <input "F1.flow" has 1 reading\(s\) at or past its "range"> vn_fit (pair (0.003, 0.0025, 1), vn_experiment (0:2, "F1.flow", [1 2 1], "T1.level", [1 1 1], "range", {"F1.flow", [0 2]}), {"O1.coeff"})
%!error <has 2 samples but T has 3> vn_experiment (0:2, "F1.flow", [1 1], "T1.level", [1 1 1])
%!error <holds only NaN> vn_experiment (0:2, "F1.flow", [1 1 1], "T1.level", NaN (1, 3))
%!error <"sigma" has 2 value\(s\) but the test has 1> vn_fit (pair (0.003, 0.0025, 1), vn_experiment (0:2, "T1.level", [1 1 1], "sigma", [1 2]), {"O1.coeff"})
%!error <drives the test, so it cannot also be fitted> vn_fit (pair (0.003, 0.0025, 1), vn_experiment (0:2, "F1.flow", [1 1 1], "T1.level", [1 1 1]), {"F1.flow"})

%!test
%! ## only T2 measured and one test: O1.coeff and T2.area trade off
%! ## against each other; the warning names them
%! e = vn_experiment (ex1.t, "F1.flow", ex1.data(:, 1), "T2.level",
%!                    ex1.data(:, 3), "hold", true);
%! lastwarn ("");
%! est = vn_fit (start, e, names);
%! [msg, id] = lastwarn ();
%! assert (id, "vesselnet:fit-ill-conditioned");
%! assert (! isempty (strfind (msg, "O1.coeff and T2.area")));
%! assert (abs (est.corr(1, 3)) > 0.99);

%!test
%! ## an upper bound holds the estimate at the bound
%! est = vn_fit (start, ex1, names, "upper", [0.0029, 1, 10]);
%! assert (est.value(1), 0.0029, 1e-12);
%! assert (est.value(2:3), truth(2:3), -0.1);

## Benchmark: fitting three parameters (O1.coeff, O2.coeff, T2.area) of two
## tanks drained by orifices to two step tests of 1000 samples each.
##
##   vesselnet: vn_fit (Levenberg-Marquardt, exact Jacobian from CVODES
##              forward sensitivities)
##   baseline:  what one writes today in plain Octave: fminsearch on the
##              log parameters over an ode15s simulation of the same model,
##              written out below
##
## The test data are invented: generated from a known true model plus
## seeded noise (randn ("state", 42)).  Both fits start from values off by
## a factor of two and must reach the same optimum (1e-3 relative).  The
## time ratio is measured in this one process with tic/toc.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath ([pwd "/inst"], [pwd "/build/oct"]); run bench/fit_bench.m'

1;

## The model by hand: T1 (area 1.5 m2) -> O1 -> T2 (area a2) -> O2 -> free.
## q = c sqrt (dH) (Torricelli); levels stay far above the core's 1 mm
## smoothing band, so plain square roots are the same law.
function dv = pair_rhs (t, v, c1, c2, a2, f)
  h1 = v(1) / 1.5;
  h2 = v(2) / a2;
  q1 = c1 * sign (h1 - h2) * sqrt (abs (h1 - h2));
  q2 = c2 * sqrt (max (h2, 0));
  dv = [f - q1; q1 - q2];
endfunction

## Levels at the sample times of a step test from the steady state at the
## first flow; ode15s restarted at the step (a discontinuity).
function y = pair_sim (p, t, f0, f1, tstep)
  c1 = p(1); c2 = p(2); a2 = p(3);
  h2 = (f0 / c2) ^ 2;
  h1 = h2 + (f0 / c1) ^ 2;
  v0 = [1.5 * h1; a2 * h2];
  o = odeset ("RelTol", 1e-8, "AbsTol", 1e-10);
  i1 = t < tstep;
  [~, va] = ode15s (@(tt, v) pair_rhs (tt, v, c1, c2, a2, f0),
                    [t(i1); tstep], v0, o);
  tb = t(! i1);
  lead = tb(1) > tstep;
  if (lead)
    tb = [tstep; tb];
  endif
  [~, vb] = ode15s (@(tt, v) pair_rhs (tt, v, c1, c2, a2, f1),
                    tb, va(end, :).', o);
  v = [va(1:end-1, :); vb(1+lead:end, :)];
  y = [v(:, 1) / 1.5, v(:, 2) / a2];
endfunction

function s = pair_ssr (th, tests)
  s = 0;
  for k = 1:numel (tests)
    e = tests(k);
    y = pair_sim (exp (th), e.t, e.f0, e.f1, e.tstep);
    r = e.y - y;
    s += sum (r(:) .^ 2);
  endfor
endfunction

function net = pair_net (p)
  net = vn_network ("bench pair");
  net = vn_tank (net, "T1", "area", 1.5, "level", 1.0);
  net = vn_tank (net, "T2", "area", p(3), "level", 0.8);
  net = vn_feed (net, "F1", "T1", "flow", 0.004);
  net = vn_orifice (net, "O1", "T1", "T2", "coeff", p(1));
  net = vn_orifice (net, "O2", "T2", "", "coeff", p(2));
endfunction

truth = [0.003; 0.0025; 1.0];
start = [2 * truth(1); truth(2) / 2; 2 * truth(3)];
t = (0:5:4995).';
plan = [0.004 0.006 300; 0.006 0.003 200];
randn ("state", 42);
tests = struct ("t", {}, "f0", {}, "f1", {}, "tstep", {}, "y", {});
ex = [];
for k = 1:2
  y = pair_sim (truth, t, plan(k, 1), plan(k, 2), plan(k, 3));
  y += 0.005 * randn (size (y));
  tests(k) = struct ("t", t, "f0", plan(k, 1), "f1", plan(k, 2),
                     "tstep", plan(k, 3), "y", y);
  u = plan(k, 1) + (plan(k, 2) - plan(k, 1)) * (t >= plan(k, 3));
  ex = [ex, vn_experiment(t, "F1.flow", u, "T1.level", y(:, 1),
                          "T2.level", y(:, 2), "hold", true)];
endfor

tic;
est = vn_fit (pair_net (start), ex, {"O1.coeff", "O2.coeff", "T2.area"});
t_vn = toc;

tic;
fo = optimset ("TolX", 1e-9, "TolFun", 1e-12, "MaxFunEvals", 4000,
               "MaxIter", 4000);
[th, fval, flag, out] = fminsearch (@(th) pair_ssr (th, tests), log (start), fo);
t_base = toc;
p_base = exp (th(:));

rel = abs (est.value - p_base) ./ p_base;
printf ("fit of 3 parameters to 2 tests x 1000 samples (2 levels each)\n");
printf ("  %-10s %12s %12s %12s %10s\n", "parameter", "true", "vn_fit",
        "fminsearch", "rel diff");
for i = 1:3
  printf ("  %-10s %12.6g %12.6g %12.6g %10.2e\n", est.names{i}, truth(i),
          est.value(i), p_base(i), rel(i));
endfor
printf ("  vn_fit:     %7.2f s, %d iterations (%s)\n", t_vn, est.iterations,
        est.reason);
printf ("  fminsearch: %7.2f s, %d function evaluations of 2 ode15s runs each\n",
        t_base, out.funcCount);
printf ("  time ratio fminsearch/vn_fit: %.1f\n", t_base / t_vn);
if (max (rel) > 1e-3)
  printf ("  WARNING: the two optima differ by %.2e relative\n", max (rel));
else
  printf ("  same optimum within %.1e relative\n", max (rel));
endif

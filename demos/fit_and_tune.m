## -*- texinfo -*-
## @deftypefn  {} {} fit_and_tune ()
## @deftypefnx {} {@var{out} =} fit_and_tune (@var{outdir})
## Demo: fit a model to step tests, tune a level loop on it, test the loop.
##
## Invented scenario, invented data, no real plant: in an invented brewery
## a hot-liquor buffer (HLB, 2 m2) feeds the wort-side buffer tank (WB)
## through a fixed orifice (O1); WB drains through a linear control valve
## (LV1).  A "true" network with known coefficients stands in for the
## plant: it records two step tests (a feed step on F1, a valve step on
## LV1) with seeded measurement noise, uneven sampling and a logger gap.
## The engineer's model, with starting values off by a factor of about
## two, is fitted to both tests with @code{vn_fit}; an empirical
## first-order model from @code{vn_fopdt} on the valve test gives lambda
## settings (@code{vn_tune}) for an averaging level loop on WB, which is
## then simulated on the fitted network against a feed upset.  PNG
## pictures go to @var{outdir} (default: see @code{demo_outdir}).
##
## @var{out} holds the estimate @code{est}, the empirical models @code{m} (first
## order) and @code{mi} (integrating),
## the settings @code{pid}, the upset's @code{peak} (m) and @code{recovery}
## (s) and the @code{files} written.
##
## Tuning from a model is a starting point: review it, and validate the
## model, before it reaches a live loop.
## @seealso{vn_experiment, vn_fit, vn_fopdt, vn_tune, vn_controller}
## @end deftypefn

function out = fit_and_tune (outdir)
  here = fileparts (mfilename ("fullpath"));
  if (nargin < 1)
    outdir = fullfile (here, "output");
  endif
  outdir = demo_outdir (outdir);
  printf ("\nFitting and tuning: an invented brewery's buffer tanks (invented data)\n");
  printf ("======================================================================\n");
  truth = [0.0025; 1.2; 40];
  names = {"O1.coeff", "WB.area", "LV1.kv"};
  plant = buffers (truth);

  ## ---- (1) two step tests on the "true" network -----------------------
  randn ("state", 11);
  rand ("state", 11);
  sigma = 0.004;                         # level transmitter noise, m
  t1 = uneven (7200, 600);
  t2 = uneven (7200, 300);
  ex1 = record (plant, t1, "F1.flow", 0.002, 0.0026, 600, sigma, "feed step");
  ex2 = record (plant, t2, "LV1.opening", 0.5, 0.4, 300, sigma, "valve step");
  ## the logger dropped out for five minutes during the feed test
  gap = t1 > 2400 & t1 < 2700;
  ex1.data(gap, 3:4) = NaN;
  printf ("\nTests (invented data): feed F1 2.0 -> 2.6 L/s at 10 min; valve LV1 50 -> 40 %% at 5 min\n");
  printf ("  %d and %d samples, spacing %.0f..%.0f s, %d samples lost in a gap, noise %.0f mm\n",
          numel (t1), numel (t2), min (diff (t1)), max (diff (t1)),
          nnz (gap), 1000 * sigma);

  ## ---- (2) fit the engineer's model --------------------------------------
  start = buffers ([2 * truth(1); truth(2) / 2; 2 * truth(3)]);
  est = vn_fit (start, [ex1, ex2], names);
  printf ("\nvn_fit: %d iterations (%s), rmse %.2f mm\n", est.iterations,
          est.reason, 1000 * est.rmse);
  printf ("  %-9s %10s %10s %22s %10s\n", "parameter", "start", "estimate",
          "95 % interval", "truth");
  p0 = [2 * truth(1); truth(2) / 2; 2 * truth(3)];
  for i = 1:numel (names)
    printf ("  %-9s %10.4g %10.4g   [%8.4g, %8.4g] %10.4g\n", names{i},
            p0(i), est.value(i), est.ci(i, 1), est.ci(i, 2), truth(i));
  endfor
  files = {};
  f = fullfile (outdir, "fit_and_tune_fit.png");
  vn_plot (est, "file", f, "size", [1200 700],
           "title", "Buffer tanks (invented data): fit");
  files{end+1} = f;

  ## ---- (3) empirical model and tuning from the valve test -------------
  j = find (strcmp (ex2.names, "LV1.opening"));
  k = find (strcmp (ex2.names, "WB.level"));
  u2 = ex2.data(:, j);
  y2 = ex2.data(:, k);
  ## no dead time in these tanks: the fit drives it to zero, where its
  ## information matrix is singular; the warning says nothing new here
  ws = warning ();
  warning ("off", "Octave:singular-matrix");
  warning ("off", "Octave:nearly-singular-matrix");
  m = vn_fopdt (ex2.t, u2, y2);
  ## tau far beyond 8 dead times: lag-dominant, so tune it as the
  ## integrating process it is over the loop's horizon (Skogestad,
  ## J. Process Control 13 (2003)); fit that on the first 20 min
  early = ex2.t <= 300 + 1200;
  mi = vn_fopdt (ex2.t(early), u2(early), y2(early), "integrating");
  warning (ws);
  printf ("\nvn_fopdt on the valve test (WB.level against LV1.opening):\n");
  printf ("  first order: gain %.3f m per unit opening (+- %.3f), tau %.1f min, dead time %.1f s\n",
          m.gain, m.stderr.gain, m.tau / 60, m.deadtime);
  printf ("  integrating, first 20 min: k' %.3g m/s per unit opening (+- %.2g; K/tau = %.3g)\n",
          mi.gain, mi.stderr.gain, m.gain / m.tau);
  ## averaging level control: a slow loop that lets the buffer absorb
  ## upsets; an arrest time of 15 min (common practice for surge tanks)
  lambda = 900;
  ## the negative gain is handled below (|Kc| with direct action)
  ws = warning ();
  warning ("off", "vesselnet:tune-unreliable");
  pid = vn_tune (mi, "lambda", "lambda", lambda);
  warning (ws);
  printf ("vn_tune lambda (arrest time %.0f min): Kc %.3f per m, Ti %.1f min, action %s\n",
          lambda / 60, pid.Kc, pid.Ti / 60, pid.action);
  printf ("  the test was recorded in engineering units (opening 0..1, level in m), so Kc\n");
  printf ("  is already in opening per m: vn_controller gets gain |Kc| = %.3f 1/m with\n",
          abs (pid.Kc));
  printf ("  action \"%s\" (the valve is on the outlet); in %% of span with a 0..3 m\n",
          pid.action);
  printf ("  transmitter and a 0..100 %% valve it would be %.2f %%/%%\n",
          abs (pid.Kc) * 3);

  ## ---- (4) the loop on the fitted network against a feed upset --------
  fitted = est.net;
  op0 = vn_steady (fitted);
  sp = op0.WB.level;
  loop = vn_controller (fitted, "LC1", "measure", "WB.level",
                        "manipulate", "LV1.opening", "setpoint", sp,
                        "gain", abs (pid.Kc), "reset", pid.Ti,
                        "action", pid.action, "limits", [0 1]);
  upset = vn_signal ("F1.flow", "step", 600, 0.002, 0.0026);
  [peak, recovery, res] = upset_run (loop, upset, sp);
  printf ("\nFeed upset 2.0 -> 2.6 L/s at 10 min, LC1 on the fitted network (setpoint %.3f m):\n",
          sp);
  printf ("  peak deviation %.2f mm, back within 10 mm of setpoint %.1f min after the upset\n",
          1000 * peak, recovery / 60);
  printf ("  valve opening %.3f -> %.3f\n", res.LV1.opening(1),
          res.LV1.opening(end));
  ## the same settings on the "true" network: what the plant would do
  plantloop = vn_controller (plant, "LC1", "measure", "WB.level",
                             "manipulate", "LV1.opening", "setpoint", sp,
                             "gain", abs (pid.Kc), "reset", pid.Ti,
                             "action", pid.action, "limits", [0 1]);
  [peakp, recp] = upset_run (plantloop, upset, sp);
  printf ("  the same settings on the true network: peak %.2f mm, within 10 mm after %.1f min\n",
          1000 * peakp, recp / 60);
  f = fullfile (outdir, "fit_and_tune_loop.png");
  vn_plot (res, {"WB.level", "LV1.opening"}, "file", f,
           "title", "Buffer tanks (invented): LC1 against a feed upset");
  files{end+1} = f;

  ## ---- (5) caution ------------------------------------------------------
  printf ("\nPictures written:\n");
  printf ("  %s\n", files{:});
  printf ("\nCaution: these settings come from a model fitted to invented data. Tuning\n");
  printf ("from a model must be reviewed, and the model validated on a test it has not\n");
  printf ("seen, before it reaches a live loop.\n");
  if (nargout > 0)
    out = struct ("est", est, "m", m, "mi", mi, "pid", pid, "peak", peak,
                  "recovery", recovery, "files", {files});
  endif
endfunction

## The buffer tanks with coefficients p = [O1.coeff; WB.area; LV1.kv].
function net = buffers (p)
  net = vn_network ("brewery buffers (invented)");
  net = vn_tank (net, "HLB", "area", 2.0, "level", 1.8, "rim", 3.5);
  net = vn_tank (net, "WB", "area", p(2), "level", 1.2, "rim", 3.0);
  net = vn_feed (net, "F1", "HLB", "flow", 0.002);
  net = vn_orifice (net, "O1", "HLB", "WB", "coeff", p(1));
  net = vn_valve (net, "LV1", "WB", "", "kv", p(3), "opening", 0.5,
                  "characteristic", "linear");
endfunction

## Uneven sample times over [0, tend], 20..40 s apart, with the step time
## tstep among them so the recorded stepped input is exact.
function t = uneven (tend, tstep)
  t = cumsum ([0; 20 + 20 * rand(400, 1)]);
  t = unique ([t(t < tend); tstep; tend]);
endfunction

## One step test on the true network from its steady state: the stepped
## input and both noisy levels, as a logger would record them.
function ex = record (net, t, input, before, after, tstep, sigma, name)
  op = vn_steady (net);
  sg = vn_signal (input, "step", tstep, before, after);
  res = vn_simulate (net, t, sg, "initial", op);
  u = before + (after - before) * (t >= tstep);
  other = "F1.flow";
  uo = 0.002 * ones (size (t));
  if (strcmp (input, "F1.flow"))
    other = "LV1.opening";
    uo = 0.5 * ones (size (t));
  endif
  ex = vn_experiment (t, input, u, other, uo,
                      "HLB.level", res.HLB.level + sigma * randn (size (t)),
                      "WB.level", res.WB.level + sigma * randn (size (t)),
                      "hold", true, "sigma", sigma, "name", name);
endfunction

## Peak deviation from setpoint after the upset and the time from the
## upset until the level stays within 10 mm of setpoint.
function [peak, recovery, res] = upset_run (net, upset, sp)
  op = vn_steady (net);
  res = vn_simulate (net, [0 6 * 3600], upset, "dt", 10, "initial", op);
  dev = res.WB.level - sp;
  after = res.t >= 600;
  peak = max (abs (dev(after)));
  out = find (abs (dev) > 0.01, 1, "last");
  if (isempty (out))
    recovery = 0;
  elseif (out == numel (res.t))
    recovery = Inf;
  else
    recovery = res.t(out + 1) - 600;
  endif
endfunction

## Tests of vn_report: the content of each kind's report (names, units,
## intervals, flags), its length, display units and the Markdown file with
## its pictures.  Validation and ensemble results are built by hand with
## the fields DESIGN.md section 6 documents.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst build/oct; test ("tests/octave/test_report.m")'

## Two tanks in series, fed by F1, T1 -> O1 -> T2 -> O2 -> free discharge.
%!function net = two_tanks (disp)
%!  net = vn_network ("report check", "display", disp);
%!  net = vn_tank (net, "T1", "area", 1.5, "level", 1.0);
%!  net = vn_tank (net, "T2", "area", 2.0, "level", 0.8);
%!  net = vn_feed (net, "F1", "T1", "flow", 0.004);
%!  net = vn_orifice (net, "O1", "T1", "T2", "coeff", 0.004);
%!  net = vn_orifice (net, "O2", "T2", "", "coeff", 0.0025);
%!endfunction

%!function c = lines_of (s)
%!  c = strsplit (s, "\n");
%!endfunction

%!shared net, op, netmm
%! ## report_num and report_time (the report's number format) live in inst/private.
%! addpath (fullfile (fileparts (which ("vn_report")), "private"));
%! net = two_tanks (cell (0, 2));
%! op = vn_steady (net);
%! netmm = two_tanks ({"level", "mm"; "flow", "m3/h"});

## ---- operating point -------------------------------------------------

%!test
%! s = vn_report (op);
%! assert (! isempty (strfind (s, "operating point of \"report check\"")));
%! ## steady level of T2: F = c sqrt (h), h = (F/c)^2 = 2.56 m (Torricelli)
%! assert (op.T2.level, (0.004 / 0.0025) ^ 2, 1e-9);
%! assert (! isempty (regexp (s, "T2 +2.56 m +5.12 m3")));
%! assert (! isempty (regexp (s, "O1 +orifice +0.004 m3/s")));
%! assert (! isempty (regexp (s, "F1.flow +0.004 m3/s")));

%!test
%! ## display units: the same operating point in mm and m3/h
%! s = vn_report (vn_steady (netmm));
%! assert (! isempty (regexp (s, "T2 +2560 mm")));
%! assert (! isempty (regexp (s, "O1 +orifice +14.4 m3/h")));

## ---- linear model and step response ----------------------------------

%!test
%! lin = vn_linearize (net, op, {"F1.flow"}, {"T1.level", "T2.level"});
%! s = vn_report (lin, "net", net);
%! assert (! isempty (strfind (s, "2 states, 1 inputs, 2 outputs")));
%! ## gain of T2.level per F1.flow: dh/dF = 2 F / c^2 = 1280 m/(m3/s)
%! assert (! isempty (regexp (s, "T2.level +1280 m/\\(m3/s\\)")));
%! assert (! isempty (strfind (s, "time constants: ")));
%! s = vn_report (lin, "net", netmm);
%! ## 1280 m/(m3/s) = 1.28e6 mm / 3600 (m3/h) = 355.6 mm/(m3/h)
%! assert (! isempty (regexp (s, "T2.level +355.6 mm/\\(m3/h\\)")));

%!test
%! sr = vn_stepresponse (net, op, "F1.flow", 0.0004, {"T2.level"});
%! s = vn_report (sr);
%! assert (! isempty (strfind (s, "step response to a change of 0.0004 m3/s in F1.flow")));
%! assert (! isempty (regexp (s, "T2.level +[0-9.]+ m +[0-9.]+ m/\\(m3/s\\)")));
%! for h = {"final change", "gain", "dead time", "t63", "rise", "settle (2 %)", "overshoot"}
%!   assert (! isempty (strfind (s, h{1})));
%! endfor

%!test
%! ## a response that does not settle away from zero: times left out
%! sr = struct ("t", (0:10:100)', "nonlinear", zeros (11, 1), "linear", [],
%!              "outputs", {{"T1.level"}}, "input", "F1.flow", "size", 1e-3,
%!              "metrics", struct ("gain", 0, "final", 0, "t63", 30, "rise", 40,
%!                                 "settle", 50, "overshoot", 3, "deadtime", 0,
%!                                 "settles", false));
%! s = vn_report (sr, "net", net);
%! assert (! isempty (strfind (s, "does not settle away from zero (times left out): T1.level")));
%! assert (isempty (strfind (s, "30 s")));
%! assert (isempty (strfind (s, "300 %")));

## ---- frequency response with a loop ----------------------------------

%!test
%! ## K/(tau s + 1) under PI: phase margin and gain crossover as in
%! ## test_linear_tools (analytic); the report carries them with units.
%! lin = struct ("A", -0.1, "B", 0.1, "C", 2, "D", 0, "inputs", {{"F1.flow"}},
%!               "outputs", {{"T1.level"}});
%! fr = vn_frequency (lin, "controller", struct ("Kc", 2, "Ti", 10));
%! s = vn_report (fr);
%! assert (! isempty (strfind (s, "loop F1.flow to T1.level")));
%! assert (! isempty (regexp (s, sprintf ("phase margin +%s deg +at the gain crossover %s rad/s", ...
%!                            report_num (fr.loop.phase_margin), report_num (fr.loop.gain_crossover)))));
%! assert (! isempty (regexp (s, "gain margin +Inf \\(Inf dB\\)")));

## ---- fit ---------------------------------------------------------------

%!test
%! ## three parameters fitted to a noiseless feed step (invented data)
%! t = (0:30:3600)';
%! u = 0.004 + 0.001 * (t >= 300);
%! sg = struct ("quantity", "F1.flow", "t", t, "v", u, "hold", true, "kind", "table");
%! res = vn_simulate (net, t, sg, "initial", op);
%! randn ("state", 3);
%! ex = vn_experiment (t, "F1.flow", u, "T1.level", res.T1.level + 1e-3 * randn (size (t)),
%!                     "T2.level", res.T2.level + 1e-3 * randn (size (t)), "hold", true);
%! start = net;
%! start.units(4).par.coeff = 0.005;
%! est = vn_fit (start, ex, {"O1.coeff", "T2.area", "O2.coeff"});
%! s = vn_report (est);
%! c = lines_of (s);
%! ## one screen: at most 20 lines of at most 100 characters
%! assert (numel (c) <= 20);
%! assert (max (cellfun (@numel, c)) <= 100);
%! assert (! isempty (strfind (s, "fit of 3 parameters")));
%! assert (! isempty (regexp (s, "parameter +estimate +unit +std error +95 % interval")));
%! units = {"m2.5/s", "m2", "m2.5/s"};
%! for i = 1:3
%!   pat = sprintf ("%s +(\\S+) +%s +(\\S+) +\\[(\\S+), (\\S+)\\]",
%!                  strrep (est.names{i}, ".", "\\."), strrep (units{i}, ".", "\\."));
%!   tok = regexp (s, pat, "tokens", "once");
%!   assert (numel (tok), 4, pat);
%!   x = str2double (tok)(:).';
%!   ## printed to at least 4 digits, the interval's ends told apart
%!   assert (x(1), est.value(i), 5e-4 * abs (est.value(i)));
%!   assert (x(2), est.stderr(i), 5e-4 * abs (est.stderr(i)));
%!   assert (x(3:4), est.ci(i,:), 0.5 * diff (est.ci(i,:)));
%!   assert (x(3) < x(1) && x(1) < x(4));
%! endfor
%! assert (! isempty (strfind (s, sprintf ("rmse %s m", report_num (est.rmse)))));
%! assert (! isempty (strfind (s, sprintf ("%d iterations, stopped: %s", est.iterations, est.reason))));
%! assert (! isempty (regexp (s, "T1.level +121 +0 +[0-9.]+ m")));

%!test
%! ## flags: strong correlations and poorly determined parameters; censored
%! ## readings counted and left out of the rmse
%! est = struct ("names", {{"O1.coeff"; "T2.area"}}, "value", [0.004; 2],
%!               "stderr", [1e-5; 3], "ci", [0.00398 0.00402; -4 8],
%!               "corr", [1 -0.93; -0.93 1], "rmse", 0.002, "iterations", 9,
%!               "reason", "step below tolerance", "net", net);
%! est.fit = struct ("t", (1:4)', "names", {{"T2.level"}}, "measured", [1; 2; 3; 9],
%!                   "predicted", [1; 2; 3; 4], "censored", logical ([0; 0; 0; 1]));
%! s = vn_report (est);
%! assert (! isempty (strfind (s, "strong correlations (|r| >= 0.8): O1.coeff ~ T2.area -0.93")));
%! assert (! isempty (strfind (s, "poorly determined (std error over half the estimate): T2.area")));
%! assert (! isempty (regexp (s, "experiment 1 +T2.level +3 +1 +0 m")));
%! assert (! isempty (strfind (s, "9 iterations, stopped: step below tolerance")));

## ---- validation, first-order model, tuning, ensemble ------------------

%!test
%! t = (0:10:100)';
%! ym = [1 + t / 100, 2 - t / 200];
%! yp = ym + [0.01 * (-1) .^ (0:10)', 0.2 * ones(11, 1)];
%! r = ym - yp;
%! val = struct ("t", t, "names", {{"T1.level", "T2.level"}}, "measured", ym,
%!               "predicted", yp, "residuals", r,
%!               "rmse", sqrt (mean (r .^ 2)),
%!               "r2", 1 - sum (r .^ 2) ./ sum ((ym - mean (ym)) .^ 2));
%! s = vn_report (val, "net", netmm);
%! assert (! isempty (regexp (s, "test 1 +T1.level +11 +0 +10 mm +0.99[0-9]")));
%! assert (! isempty (regexp (s, "T2.level +11 +0 +200 mm +-0.600")));
%! ## two tests, one reading censored in the second
%! val(2) = val(1);
%! val(2).name = "unseen";
%! val(2).censored = false (11, 2);
%! val(2).censored(end, 1) = true;
%! val(1).censored = false (11, 2);
%! s = vn_report (val, "net", netmm);
%! assert (! isempty (regexp (s, "unseen +T1.level +10 +1 +10 mm")));
%! assert (! isempty (strfind (s, "r2 below 0.5, the model does not describe: T2.level")));
%! assert (! isempty (strfind (s, "Nash-Sutcliffe")));

%!test
%! ## first-order lag: K = 2, tau = 300 s, theta = 60 s recovered from an
%! ## exact step response (analytic)
%! t = (0:5:3000)';
%! u = 0.5 + 0.1 * (t >= 100);
%! y = 1 + 0.2 * (1 - exp (-(t - 160) / 300)) .* (t >= 160);
%! m = vn_fopdt (t, u, y);
%! s = vn_report (m);
%! assert (! isempty (regexp (s, "gain +2 +output per input")));
%! assert (! isempty (regexp (s, "time constant +5 min")));
%! assert (! isempty (regexp (s, "dead time +60 s")));
%! pid = vn_tune (m, "simc");
%! s = vn_report (pid);
%! assert (! isempty (regexp (s, sprintf ("Kc +%s", report_num (pid.Kc)))));
%! assert (! isempty (regexp (s, sprintf ("Ti +%s", strrep (report_time ([], pid.Ti), ".", "\\.")))));
%! assert (! isempty (strfind (s, "simc")));

%!test
%! t = (0:60:600)';
%! runs = 20;
%! a = linspace (1.8, 2.2, runs);
%! y = zeros (numel (t), 1, runs);
%! for k = 1:runs
%!   y(:,1,k) = 1 + t / (600 * a(k));
%! endfor
%! q = prctile (y, [5 50 95], 3);
%! ens = struct ("t", t, "names", {{"T2.level"}}, "units", {{"m"}}, "y", y,
%!               "params", a(:), "pnames", {{"T2.area"}},
%!               "failed", struct ("run", {}, "message", {}),
%!               "mean", mean (y, 3), "p05", q(:,:,1), "p50", q(:,:,2), "p95", q(:,:,3));
%! s = vn_report (ens, "net", netmm);
%! assert (! isempty (strfind (s, "20 runs, 0 failed, 10 min simulated")));
%! assert (! isempty (regexp (s, "T2.area +1.8 m2 +2 m2 +2.2 m2")));
%! assert (! isempty (regexp (s, sprintf ("T2.level +%s mm", report_num (1000 * mean (y(end,1,:)))))));
%! ens.failed = struct ("run", 7, "message", "vn_simulate: too much work");
%! s = vn_report (ens);
%! assert (! isempty (strfind (s, "first failure: run 7: vn_simulate: too much work")));

## ---- Markdown with pictures -------------------------------------------

%!test
%! sr = vn_stepresponse (net, op, "F1.flow", 0.0004, {"T1.level", "T2.level"});
%! d = tempname ();
%! mkdir (d);
%! f = fullfile (d, "step.md");
%! vn_report (sr, "file", f);
%! txt = fileread (f);
%! assert (! isempty (strfind (txt, "## step response")));
%! assert (! isempty (strfind (txt, "| output ")));
%! assert (! isempty (strfind (txt, "![")));
%! assert (! isempty (strfind (txt, "(step_1.png)")));
%! assert (exist (fullfile (d, "step_1.png"), "file") == 2);
%! confirm_recursive_rmdir (false, "local");
%! rmdir (d, "s");

## ---- errors ------------------------------------------------------------

%!error <Invalid call> vn_report ()
%!error <cannot tell what result a struct with fields a, b is> vn_report (struct ("a", 1, "b", 2))
%!error <X must be a result struct> vn_report (3)
%!error <unknown option "fiel"> vn_report (struct ("Kc", 1, "Ti", 2), "fiel", "x.md")
%!error <folder ".*no_such_dir_vn" does not exist> vn_report (struct ("Kc", 1, "Ti", 2), "file", "/no_such_dir_vn/r.md")
%!error <option "net" must be a network> vn_report (struct ("Kc", 1, "Ti", 2), "net", 3)

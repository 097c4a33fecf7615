## -*- texinfo -*-
## @deftypefn  {} {} plant_record ()
## @deftypefnx {} {@var{out} =} plant_record (@var{outdir})
## Demo: from historian exports to a validated model and a tuned loop.
##
## INVENTED scenario and data, no real plant (see @file{brewery_logs.m},
## which wrote the two CSV files beside this one): an invented brewery's
## hot liquor tank HLT overflows into a drain above 1.9 m and feeds the
## mash water tank MWT through the orifice O1; MWT drains through the
## valve LV1.  A step test on the feed set point FIC101 is read with
## @code{vn_readlog} (";" with decimal commas, day-first time stamps,
## across midnight, flows in m3/h, levels in % of span, "Bad" readings),
## turned into an experiment with the transmitters' spans and ranges (the
## MWT transmitter sticks at 100 %), and fitted with @code{vn_fit}: the
## orifice, the valve, the MWT area, the zero error of the HLT
## transmitter and the unknown levels the test started from.  The model
## is validated with @code{vn_validate} on a second export (",", ISO time
## stamps) and a level loop on MWT is tuned from a step of the fitted
## model (@code{vn_fopdt}, @code{vn_tune}).  Pictures go to @var{outdir}.
##
## Tuning from a model is a starting point: review it, and validate the
## model on tests it has not seen, before it reaches a live loop; local
## codes govern safety systems.
## @seealso{vn_readlog, vn_experiment, vn_fit, vn_validate, vn_tune}
## @end deftypefn

function out = plant_record (outdir)
  here = fileparts (mfilename ("fullpath"));
  if (nargin < 1)
    outdir = fullfile (here, "output");
  endif
  outdir = demo_outdir (outdir);
  printf ("\nFrom a plant record to a tuned loop: an invented brewery (invented data)\n");
  printf ("========================================================================\n");

  ## ---- (1) the records --------------------------------------------------
  log1 = vn_readlog (fullfile (here, "brewery_step.csv"));
  log2 = vn_readlog (fullfile (here, "brewery_check.csv"));
  printf ("\nbrewery_step.csv: %d rows from %s, tags %s (%s)\n", numel (log1.t),
          log1.start, strjoin (log1.names, ", "), strjoin (log1.units, ", "));
  printf ("  unreadable entries per tag: %s\n", mat2str (log1.bad));
  printf ("brewery_check.csv: %d rows from %s\n", numel (log2.t), log2.start);

  ## ---- (2) experiments: spans, ranges, unknown starting levels ----------
  ## LT101: 0..2.5 m; LT102: 0..0.9 m, readings at 100 % censored
  sensors = {"span", {"HLT.level", [0 2.5], "MWT.level", [0 0.9]}, ...
             "range", {"MWT.level", [0 0.9]}};
  ex1 = vn_experiment (log1.t, "FIC101.flow", log1.FIC101_SP,
                       "HLT.level", log1.LT101, "MWT.level", log1.LT102,
                       sensors{:}, "start", "declared", "name", "step test");
  ex2 = vn_experiment (log2.t, "FIC101.flow", log2.FIC101_SP,
                       "HLT.level", log2.LT101, "MWT.level", log2.LT102,
                       sensors{:}, "name", "check test");

  ## ---- (3) the fit ------------------------------------------------------
  ## the engineer's model: areas and the weir from the drawings, the rest
  ## guessed; the levels at the start of the test were not written down
  net = vn_network ("invented brewery, model");
  net = vn_tank (net, "HLT", "area", "0.8 m2", "rim", "1900 mm", "level", 1.0);
  net = vn_tank (net, "MWT", "area", 0.4, "level", 0.5);
  net = vn_feed (net, "FIC101", "HLT", "flow", "2.4 m3/h");
  net = vn_orifice (net, "O1", "HLT", "MWT", "coeff", 2e-3);
  net = vn_valve (net, "LV1", "MWT", "", "kv", 12, "opening", 0.6);
  names = {"O1.coeff", "LV1.kv", "MWT.area", "HLT.level:offset", ...
           "HLT.level", "MWT.level"};
  est = vn_fit (net, ex1, names, "starts", 4);
  printf ("\nvn_fit: %s\n", est.reason);
  printf ("  %d iterations, rmse %.1f mm; inputs: %s: %s\n", est.iterations,
          1000 * est.rmse, est.inputs.quantity, est.inputs.how);
  for r = est.readings
    printf ("  %s: %d readings used, %d censored, %d missing\n", r.quantity,
            r.used, r.censored, r.missing);
  endfor
  truth = [1.1e-3; 20; 0.5; 0.04; 0.95; 0.55];   # of the invented plant
  printf ("  %-17s %10s %22s %10s\n", "parameter", "estimate", "95 % interval",
          "invented");
  for i = 1:numel (names)
    printf ("  %-17s %10.4g   [%8.4g, %8.4g] %10.4g\n", names{i},
            est.value(i), est.ci(i, 1), est.ci(i, 2), truth(i));
  endfor
  files = {};
  f = fullfile (outdir, "plant_record_fit.png");
  vn_plot (est, "file", f, "size", [1000 700],
           "title", "Invented brewery: fit to the step test");
  files{end+1} = f;

  ## ---- (4) validation on the check test -----------------------------------
  val = vn_validate (est, ex2);
  printf ("\nvn_validate on the check test (not used in the fit):\n");
  for j = 1:numel (val.names)
    printf ("  %-10s rmse %5.1f mm   r2 %.4f   (%d censored)\n", val.names{j},
            1000 * val.rmse(j), val.r2(j), nnz (val.censored(:, j)));
  endfor
  f = fullfile (outdir, "plant_record_validate.png");
  vn_plot (val, "file", f, "size", [1000 700]);
  files{end+1} = f;

  ## ---- (5) a level loop on MWT tuned from the fitted model ----------------
  op = vn_steady (est.net, "FIC101.flow", 3 / 3600);
  sr = vn_stepresponse (est.net, op, "LV1.opening", -0.05, {"MWT.level"});
  u = -0.05 * (sr.t > 0);
  ## no dead time in a model of two tanks: the first-order fit says its
  ## dead time is poorly determined, which is no news here
  ws = warning ();
  warning ("off", "vesselnet:fit-ill-conditioned");
  warning ("off", "Octave:singular-matrix");
  warning ("off", "Octave:nearly-singular-matrix");
  m = vn_fopdt (sr.t, u, sr.nonlinear(:, 1));
  warning (ws);
  ## lambda tuning with a closed-loop time constant of a quarter of the
  ## open-loop one (common practice for a level that must hold, not
  ## average)
  lambda = m.tau / 4;
  ws = warning ();
  warning ("off", "vesselnet:tune-unreliable");
  pid = vn_tune (m, "lambda", "lambda", lambda);
  warning (ws);
  printf ("\nMWT level from LV1 (fitted model at 3 m3/h): gain %.3f m per unit opening, tau %.1f min\n",
          m.gain, m.tau / 60);
  printf ("vn_tune lambda (%.1f min): Kc %.3f per m, Ti %.1f min, action %s\n",
          lambda / 60, pid.Kc, pid.Ti / 60, pid.action);
  printf ("  vn_controller on LV1.opening: gain %.3f 1/m, reset %.0f s, action \"%s\"\n",
          abs (pid.Kc), pid.Ti, pid.action);
  printf ("\nPictures written:\n");
  printf ("  %s\n", files{:});
  printf ("\nCaution: a model fitted to invented data. Validate a real model on tests it\n");
  printf ("has not seen and review any tuning before it reaches a live loop.\n");
  if (nargout > 0)
    out = struct ("est", est, "val", val, "m", m, "pid", pid,
                  "files", {files});
  endif
endfunction

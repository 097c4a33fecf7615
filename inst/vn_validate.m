## -*- texinfo -*-
## @deftypefn  {} {@var{val} =} vn_validate (@var{est}, @var{ex})
## @deftypefnx {} {@var{val} =} vn_validate (@var{est}, @var{ex}, @var{option}, @var{value}, @dots{})
## Run a fitted model, its sensors included, on a plant test it was not
## fitted to, and say how well it predicts.
##
## @var{est} comes from @code{vn_fit}; @var{ex} from @code{vn_experiment}
## (several tests @code{[ex1, ex2]} give one result each).  The test is
## simulated on @code{est.net} from its own start, its inputs held or
## interpolated by its @qcode{"hold"} rule as in @code{vn_fit}, and each
## output passed through its fitted sensor (measured = scale * model +
## offset, from @code{est.sensors}).  With @qcode{"start", "measured"} a
## tank whose level sensor was fitted starts from the reading taken back
## through that sensor.  Parameters fitted for one test alone
## (@qcode{"UNIT.PARAM@@K"}) belong to that test and are not used.
##
## The result @var{val} holds @code{t} (s, column), @code{names} (the
## measured outputs), @code{measured} (times x outputs, as read),
## @code{predicted} (what the sensor would read), @code{residuals}
## (measured - predicted; NaN where a reading is missing or censored),
## @code{censored} (logical), @code{units}, @code{name}, and one value
## per output of @code{rmse} (root mean square of the residuals) and
## @code{r2}, the Nash-Sutcliffe efficiency 1 - SSE / SS, SSE the sum of
## squared residuals and SS the sum of squares of the readings about
## their mean (1 is a perfect prediction, 0 no better than the mean, below
## 0 worse; Nash and Sutcliffe, J. Hydrology 10 (1970) 282-290).  Readings
## that are missing or censored take no part.  @code{vn_plot (val)} draws
## measured against predicted with the residuals below, censored readings
## marked.
##
## Options: @qcode{"reltol"}, @qcode{"abstol"} (integrator, as in
## @code{vn_fit}).
##
## A model that predicts one test well may still miss conditions it has
## not seen: validate over the range the model will be used in, and have
## any tuning based on it reviewed before it reaches a live loop.  Local
## codes govern safety systems.
## @seealso{vn_fit, vn_experiment, vn_plot}
## @end deftypefn

function val = vn_validate (est, ex, varargin)
  if (nargin < 2)
    print_usage ();
  endif
  if (! (isstruct (est) && isscalar (est)
         && all (isfield (est, {"net", "names", "value"}))))
    error ("Octave:invalid-input-arg",
           "vn_validate: EST must be a fit made by vn_fit");
  endif
  if (! (isstruct (ex) && ! isempty (ex)
         && all (isfield (ex, {"t", "names", "data"}))))
    error ("Octave:invalid-input-arg",
           "vn_validate: EX must be one or more tests made by vn_experiment");
  endif
  so = struct ("reltol", 1e-8, "abstol", 1e-10, "solver", 0,
               "maxsteps", 100000, "maxstep", 0);
  [names, vals] = vn_option_pairs (varargin, "vn_validate");
  for i = 1:numel (names)
    v = vals{i};
    if (! any (strcmpi (names{i}, {"reltol", "abstol"})))
      error ("Octave:invalid-input-arg",
             "vn_validate: unknown option \"%s\"; allowed: reltol, abstol",
             names{i});
    endif
    if (! (isscalar (v) && isreal (v) && v > 0 && v < 1))
      error ("Octave:invalid-input-arg",
             "vn_validate: option \"%s\" must lie in (0, 1)", lower (names{i}));
    endif
    so.(lower (names{i})) = v;
  endfor
  net = est.net;
  sens = struct ("quantity", {}, "offset", {}, "scale", {});
  if (isfield (est, "sensors"))
    sens = est.sensors;
  endif
  E = fit_classify (net, ex, {}, "vn_validate");
  for k = 1:numel (E)
    signal_clip_warn ("vn_validate", E(k).clips, E(k).t(1), E(k).t(end),
                      sprintf ("in the model's prediction of test %d", k));
  endfor
  val = struct ("t", {}, "names", {}, "measured", {}, "predicted", {},
                "residuals", {}, "censored", {}, "units", {}, "name", {},
                "rmse", {}, "r2", {});
  for k = 1:numel (E)
    e = E(k);
    ny = numel (e.yname);
    sc = ones (1, ny);
    off = zeros (1, ny);
    for j = 1:ny
      i = find (strcmp ({sens.quantity}, e.yname{j}), 1);
      if (! isempty (i))
        sc(j) = sens(i).scale;
        off(j) = sens(i).offset;
      endif
    endfor
    ## a measured start through the fitted sensor
    for m = 1:rows (e.levels)
      un = net.units(e.levels(m, 1)).name;
      j = find (strcmp (e.yname, [un ".level"]), 1);
      e.levels(m, 2) = (e.levels(m, 2) - off(j)) / sc(j);
    endfor
    try
      Y = fit_model (net, e, {}, [], so);
    catch err
      error ("vesselnet:solver-failure",
             "vn_validate: the fitted model cannot be run on test %d: %s",
             k, err.message);
    end_try_catch
    pred = Y .* sc + off;
    res = e.y - pred;
    used = ! isnan (res);
    rmse = zeros (1, ny);
    r2 = zeros (1, ny);
    for j = 1:ny
      rj = res(used(:, j), j);
      yj = e.y(used(:, j), j);
      rmse(j) = sqrt (mean (rj .^ 2));
      r2(j) = 1 - sum (rj .^ 2) / sum ((yj - mean (yj)) .^ 2);
    endfor
    un = cellfun (@(n) vn_quantity (net, n, "output", "vn_validate").unitofmeasure,
                  e.yname, "uniformoutput", false);
    name = e.name;
    if (isempty (name))
      name = sprintf ("test %d", k);
    endif
    val(k) = struct ("t", e.t, "names", {e.yname}, "measured", e.ymeas,
                     "predicted", pred, "residuals", res, "censored", e.cens,
                     "units", {un}, "name", name, "rmse", rmse, "r2", r2);
  endfor
endfunction

%!demo
%! ## Invented: a tank drained by an orifice, fitted to one feed step and
%! ## validated on a second step it has not seen
%! net = vn_network ("demo");
%! net = vn_tank (net, "T1", "area", 1.5, "level", 1.0);
%! net = vn_feed (net, "F1", "T1", "flow", 0.004);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.003);
%! t = (0:20:3000).';
%! randn ("state", 1);
%! test = @(f0, f1) vn_experiment (t, "F1.flow", f0 + (f1 - f0) * (t >= 300),
%!   "T1.level", vn_simulate (net, t, vn_signal ("F1.flow", "step", 300, f0, f1),
%!   "initial", vn_steady (net, "F1.flow", f0)).T1.level + 0.003 * randn (size (t)));
%! start = net;
%! start.units(start.index.O1).par.coeff = 0.005;
%! est = vn_fit (start, test (0.004, 0.006), {"O1.coeff"});
%! val = vn_validate (est, test (0.005, 0.0035));
%! printf ("unseen test: rmse %.4f m, r2 %.4f\n", val.rmse, val.r2);
%! vn_plot (val);

## Invented test data: a pair of tanks (O1 0.003, O2 0.0025 m2.5/s,
## T2 1.0 m2) simulated by vn_simulate, seeded noise.
%!function net = pair (c1, a2)
%!  net = vn_network ("validate check");
%!  net = vn_tank (net, "T1", "area", 1.5, "level", 1.0);
%!  net = vn_tank (net, "T2", "area", a2, "level", 0.8);
%!  net = vn_feed (net, "F1", "T1", "flow", 0.004);
%!  net = vn_orifice (net, "O1", "T1", "T2", "coeff", c1);
%!  net = vn_orifice (net, "O2", "T2", "", "coeff", 0.0025);
%!endfunction

%!function [ex, y2] = steptest (f0, f1, sigma, scale, offset)
%!  net = pair (0.003, 1.0);
%!  t = (0:10:2400).';
%!  u = f0 + (f1 - f0) * (t >= 200);
%!  res = vn_simulate (net, t, vn_signal ("F1.flow", "step", 200, f0, f1),
%!                     "initial", vn_steady (net, "F1.flow", f0),
%!                     "reltol", 1e-10, "abstol", 1e-12);
%!  y2 = res.T2.level;
%!  ex = vn_experiment (t, "F1.flow", u, "T1.level",
%!                      res.T1.level + sigma * randn (size (t)), "T2.level",
%!                      scale * y2 + offset + sigma * randn (size (t)));
%!endfunction

%!test
%! ## a fit with a transmitter zero error (0.05 m) and gain (1.04) on
%! ## T2.level, validated on an unseen test: the prediction carries the
%! ## sensor, rmse near the noise sigma (3 mm), r2 near 1; the same model
%! ## without its sensor misses by the zero error
%! randn ("state", 11);
%! fitted = vn_fit (pair (0.004, 0.8), steptest (0.004, 0.006, 0.003, 1.04, 0.05),
%!                  {"O1.coeff", "T2.area", "T2.level:offset", "T2.level:scale"});
%! [ex2, y2] = steptest (0.0055, 0.0042, 0.003, 1.04, 0.05);
%! val = vn_validate (fitted, ex2);
%! assert (val.names, {"T1.level", "T2.level"});
%! assert (size (val.predicted), [241 2]);
%! assert (val.rmse, [0.003 0.003], 8e-4);
%! assert (all (val.r2 > 0.99));
%! assert (val.predicted(:, 2), 1.04 * y2 + 0.05, 4e-3);
%! ## r2 from its definition: 1 - SSE / SS about the mean
%! r = val.measured(:, 1) - val.predicted(:, 1);
%! y = val.measured(:, 1);
%! assert (val.r2(1), 1 - sum (r .^ 2) / sum ((y - mean (y)) .^ 2), 1e-12);
%! nosensor = fitted;
%! nosensor.sensors = struct ("quantity", {}, "offset", {}, "scale", {});
%! bad = vn_validate (nosensor, ex2);
%! assert (bad.rmse(2) > 10 * val.rmse(2));

%!test
%! ## censored and missing readings take no part; two tests, two results
%! randn ("state", 12);
%! est = vn_fit (pair (0.004, 0.8), steptest (0.004, 0.006, 0.003, 1, 0),
%!               {"O1.coeff", "T2.area"});
%! e = steptest (0.006, 0.0035, 0.003, 1, 0);
%! e.data(5, 2) = NaN;
%! e.censored = false (size (e.data));
%! e.censored(10:20, 3) = true;
%! e.data(10:20, 3) = 99;
%! val = vn_validate (est, [e, e]);
%! assert (numel (val), 2);
%! assert (isnan (val(1).residuals(5, 1)));
%! assert (all (isnan (val(1).residuals(10:20, 2))));
%! assert (val(1).measured(10, 2), 99);
%! assert (val(1).rmse < 0.005);
%! assert (val(1).censored(10:20, 2));

%!error <Invalid call> vn_validate (1)
%!error <EST must be a fit made by vn_fit> vn_validate (struct ("a", 1), vn_experiment (0:2, "T1.level", 1:3))
%!error <EX must be one or more tests> vn_validate (struct ("net", 1, "names", 1, "value", 1), 5)

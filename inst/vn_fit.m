## -*- texinfo -*-
## @deftypefn  {} {@var{est} =} vn_fit (@var{net}, @var{ex}, @var{params})
## @deftypefnx {} {@var{est} =} vn_fit (@dots{}, @var{option}, @var{value}, @dots{})
## Fit unit parameters of a network, and the sensors that measured the
## tests, to plant tests by least squares.
##
## @var{ex} is one test from @code{vn_experiment} or several
## @code{[ex1, ex2]}, fitted together.  @var{params} names what is fitted:
## @table @asis
## @item @qcode{"UNIT.PARAM"}
## any numeric parameter of a unit (orifice @qcode{"coeff"}, tank
## @qcode{"area"}, @qcode{"diameter"} or @qcode{"rim"}, valve @qcode{"kv"},
## resistance @qcode{"r"}, pump @qcode{"shutoff"} and @qcode{"k"}, valve
## @qcode{"lag"}, tank @qcode{"ua"}, ...), shared by all tests.  Its value
## on @var{net} is the start.  A tank's @qcode{"level"} is the level the
## tests start from when they start from declared levels
## (@code{vn_experiment (..., "start", "declared")}): an unknown starting
## level.
## @item @qcode{"UNIT.PARAM@@K"}
## the same for test K alone (K its number in @var{ex} or its name), e.g.
## @qcode{"T1.level@@1"}, @qcode{"T1.level@@2"}: each test its own
## unknown starting level.
## @item @qcode{"QUANTITY:offset"}, @qcode{"QUANTITY:scale"}
## the transmitter measuring QUANTITY, shared by every test that measures
## it: measured = scale * model + offset (a zero error and a span error).
## They start at 0 and 1.
## @end table
##
## Each test is simulated from its start (see @code{vn_experiment}) with
## its inputs as signals, each input held between samples or interpolated
## linearly as the test's @qcode{"hold"} says.  The fit minimises the sum
## over all tests and measured outputs of ((measured - predicted) /
## sigma)^2; NaN and censored readings (outside a sensor's
## @qcode{"range"}) are left out.  The method is Levenberg-Marquardt with
## the exact Jacobian from the core's forward sensitivities (CVODES).
## Positive physical parameters and sensor scales are fitted as their
## logarithms, which keeps them positive; starting levels, elevations and
## sensor offsets as they are.
##
## Robustness: every parameter stays inside the range its unit allows
## (the schema) and inside the bounds given.  A step changes no logarithm
## by more than 1 (a factor of e) and no other parameter by more than half
## its start box (below).  A trial step at which the model cannot be run
## (a value the network refuses, a solver failure, a residual that is not
## finite, any error from a command the fit calls) is rejected and the
## damping raised, as for a step that does not lower the sum of squares;
## @code{est.rejected} counts them.  Only a model that cannot be run at
## the start is an error, @qcode{"vn_fit: the model cannot be run at the
## starting values: ..."} (id @qcode{"vesselnet:fit-not-converged"}).
##
## Options:
## @table @asis
## @item @qcode{"bounds"}
## @code{@{NAME, [LOW HIGH], @dots{}@}} or a matrix with a row [LOW HIGH]
## per parameter (NaN for none): the fit stays inside, and
## @qcode{"starts"} are spread there.
## @item @qcode{"lower"}, @qcode{"upper"}
## bounds as a scalar or one per parameter.
## @item @qcode{"starts"}
## N: fit from N starts and keep the best (least sum of squares).  Start 1
## is the network's values; the other N - 1 form a Latin hypercube in the
## fit's coordinates (logarithms for positive parameters) within the
## bounds.  Without @qcode{"bounds"} a parameter's starts lie within a
## factor of 10 either side of its start (a sensor scale: a factor of 2;
## a starting level or other linear parameter: from 0 to twice its start;
## an offset: within 10 % of the largest reading of its quantity either
## side of zero), inside its allowed range.  A start whose model fails is
## recorded and skipped.
## @item @qcode{"maxiter"} (50), @qcode{"tol"} (1e-6, on the change of the
## fit's coordinates), @qcode{"reltol"}, @qcode{"abstol"} (integrator, 1e-8
## and 1e-10), @qcode{"verbose"} (one line per iteration).
## @end table
##
## The result @var{est} holds @code{names}, @code{value} (column),
## @code{stderr}, @code{ci} (one row [low high] per parameter, 95 %, from
## Student's t with as many degrees of freedom as readings less
## parameters), @code{corr} (correlation matrix), @code{cov} (covariance
## in the fit's coordinates: of the logarithm where @code{scale} says
## @qcode{"log"}, of the value where it says @qcode{"linear"}),
## @code{scale} (cellstr, one per parameter), @code{dof}, @code{rmse} (root
## mean square of the unweighted residuals, all outputs), @code{residuals}
## (cell, one times x outputs matrix per test, measured - predicted, NaN
## where no reading was used), @code{net} (the network with the fitted
## shared values), @code{sensors} (quantity, offset, scale of each fitted
## sensor), @code{iterations}, @code{reason} (why the iteration stopped, in
## words, with the parameters at a bound and, with @qcode{"starts"}, how
## many starts reached the best), @code{rejected}, @code{atbound}
## (logical per parameter), @code{starts} (per start: @code{theta0},
## @code{value}, @code{ssr}, @code{reason}, @code{reached}; the
## @code{best}; the @code{spread} [min max] of the optima found),
## @code{inputs} (per test and input: the intersample @code{rule},
## @qcode{"held"} or @qcode{"linear"}, @code{how} it was decided, and the
## gaps @code{filled}), @code{readings} (per test and output: readings
## @code{used}, @code{censored}, @code{missing}), @code{censored} (total
## censored readings) and @code{fit(k)} with @code{t}, @code{names},
## @code{measured}, @code{predicted} (what the sensor would read),
## @code{censored}, @code{units} and @code{name} for @code{vn_plot}.
## Standard errors scale with the residual variance, so sigmas need only be
## right relative to each other.
##
## When the data cannot separate the parameters (near-singular
## information matrix, or a correlation beyond 0.99) a warning
## @qcode{"vesselnet:fit-ill-conditioned"} names them.
##
## A fitted model describes the tests it was fitted to: validate it on a
## test it has not seen (@code{vn_validate}) before using it to judge a
## plant, and have any tuning based on it reviewed before it reaches a live
## loop.  Local codes govern safety systems.
## @seealso{vn_experiment, vn_validate, vn_simulate, vn_plot, vn_fopdt}
## @end deftypefn

function est = vn_fit (net, ex, params, varargin)
  if (nargin < 3)
    print_usage ();
  endif
  if (! (isstruct (net) && isfield (net, "type")
         && strcmp (net.type, "vesselnet.network")))
    error ("Octave:invalid-input-arg",
           "vn_fit: NET must be a network made by vn_network");
  endif
  if (! (isstruct (ex) && ! isempty (ex)
         && all (isfield (ex, {"t", "names", "data"}))))
    error ("Octave:invalid-input-arg",
           "vn_fit: EX must be one or more tests made by vn_experiment");
  endif
  if (ischar (params))
    params = {params};
  endif
  if (! iscellstr (params) || isempty (params))
    error ("Octave:invalid-input-arg",
           "vn_fit: PARAMS must name the parameters to fit, e.g. {\"O1.coeff\", \"T2.area\"}");
  endif
  params = params(:).';
  opt = fit_options (varargin, params);
  P = fit_params (net, params, ex, opt);
  isunit = strcmp ({P.type}, "unit");
  E = fit_classify (net, ex, {P(isunit).q});
  check_starting_levels (P, E);
  ## a recorded position past its travel (an opening logged at 1.02) is
  ## clipped in the model, as in the plant: say so once per test
  for k = 1:numel (E)
    signal_clip_warn ("vn_fit", E(k).clips, E(k).t(1), E(k).t(end),
                      sprintf ("in the model fitted to test %d", k));
  endfor
  so = struct ("reltol", opt.reltol, "abstol", opt.abstol, "solver", 0,
               "maxsteps", 100000, "maxstep", 0);

  fun = @(th) fit_residuals (net, E, P, th, so);
  lo = fit_values (P, [P.lo], "inverse");
  hi = fit_values (P, [P.hi], "inverse");
  opt.maxstep = [P.maxstep].';
  th0 = fit_values (P, [P.value], "inverse");
  [th, r, J, info, starts] = fit_starts (fun, P, th0, lo, hi, opt);
  [p, dp] = fit_values (P, th);
  st = fit_stats (J, r, p, dp, params);
  [~, ~, pred] = fit_residuals (net, E, P, th, so, false);

  est.names = params(:);
  est.value = p;
  est.stderr = st.stderr;
  est.ci = st.ci;
  est.corr = st.corr;
  est.cov = st.cov;
  est.scale = {P.space}.';
  est.dof = st.dof;
  est.jacobian = J ./ dp(:).';
  res = cell (numel (E), 1);
  all_r = [];
  fit = struct ("t", {}, "names", {}, "measured", {}, "predicted", {},
                "units", {}, "name", {}, "censored", {});
  for k = 1:numel (E)
    res{k} = E(k).y - pred{k};
    all_r = [all_r; res{k}(! isnan (res{k}))];
    un = cellfun (@(n) vn_quantity (net, n, "output", "vn_fit").unitofmeasure,
                  E(k).yname, "uniformoutput", false);
    name = E(k).name;
    if (isempty (name))
      name = sprintf ("test %d", k);
    endif
    fit(k) = struct ("t", E(k).t, "names", {E(k).yname}, "measured",
                     E(k).ymeas, "predicted", pred{k}, "units", {un},
                     "name", name, "censored", E(k).cens);
  endfor
  est.rmse = sqrt (mean (all_r .^ 2));
  est.residuals = res;
  shared = isunit & [P.exper] == 0;
  est.net = fit_apply (net, {P(shared).q}, p(shared));
  est.sensors = sensor_table (P, p);
  est.iterations = info.iterations;
  bound = th <= lo(:) | th >= hi(:);
  est.atbound = bound;
  reason = info.reason;
  if (any (bound))
    reason = sprintf ("%s; at a bound: %s", reason,
                      strjoin (params(bound), ", "));
  endif
  if (any (st.unseen))
    reason = sprintf ("%s; not seen by the data (no interval): %s", reason,
                      strjoin (params(st.unseen), ", "));
  endif
  if (any (st.unresolved))
    reason = sprintf ("%s; only a combination of %s is seen by the data (no intervals)",
                      reason, strjoin (params(st.unresolved), ", "));
  endif
  if (opt.starts > 1)
    reason = sprintf ("%s; best of %d starts (%d reached it, %d failed)",
                      reason, opt.starts, nnz (starts.reached),
                      nnz (isnan (starts.ssr)));
  endif
  est.reason = reason;
  est.rejected = info.rejected;
  est.starts = starts;
  est.inputs = [E.inputs];
  est.readings = [E.readings];
  est.censored = sum ([est.readings.censored]);
  est.fit = fit;
endfunction

## The sensor of each quantity with a fitted offset or scale.
function s = sensor_table (P, p)
  s = struct ("quantity", {}, "offset", {}, "scale", {});
  for i = find (! strcmp ({P.type}, "unit"))
    j = find (strcmp ({s.quantity}, P(i).quantity), 1);
    if (isempty (j))
      j = numel (s) + 1;
      s(j) = struct ("quantity", P(i).quantity, "offset", 0, "scale", 1);
    endif
    s(j).(P(i).type) = p(i);
  endfor
endfunction

## A starting level (or volume) is fitted only for tests that start from
## declared or measured levels: at a steady start it has no effect.
function check_starting_levels (P, E)
  for i = find (strcmp ({P.type}, "unit"))
    q = P(i).q;
    if (strcmp (q.kind, "tank") && any (strcmp (q.var, {"level", "volume"})))
      ks = 1:numel (E);
      if (P(i).exper > 0)
        ks = P(i).exper;
      endif
      for k = ks
        if (strcmp (E(k).start, "steady"))
          error ("Octave:invalid-input-arg",
                 "vn_fit: %s is the %s test %d starts from, but that test starts at steady state; give it \"start\", \"declared\" (or \"measured\") in vn_experiment",
                 P(i).name, q.var, k);
        endif
      endfor
    endif
  endfor
endfunction

%!demo
%! ## Invented data: a tank drained by an orifice, a feed step of +50 %
%! ## recorded every 20 s with 3 mm of seeded noise; the model starts with
%! ## the orifice coefficient twice too large.
%! net = vn_network ("demo");
%! net = vn_tank (net, "T1", "area", 1.5, "level", 1.0);
%! net = vn_feed (net, "F1", "T1", "flow", 0.004);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.003);
%! t = (0:20:3000).';
%! op = vn_steady (net);
%! res = vn_simulate (net, t, vn_signal ("F1.flow", "step", 300, 0.004, 0.006),
%!                    "initial", op);
%! randn ("state", 1);
%! ex = vn_experiment (t, "F1.flow", 0.004 + 0.002 * (t >= 300), "T1.level",
%!                     res.T1.level + 0.003 * randn (size (t)), "hold", true);
%! start = vn_orifice (vn_tank (vn_feed (vn_network ("model"), "F1", "T1",
%!                     "flow", 0.004), "T1", "area", 1.5, "level", 1.0),
%!                     "O1", "T1", "", "coeff", 0.006);
%! est = vn_fit (start, ex, {"O1.coeff"});
%! printf ("O1.coeff %.5f, 95 %% interval [%.5f, %.5f] (truth 0.003)\n",
%!         est.value, est.ci);
%! vn_plot (est);

## One tank T1 fed by F1 and drained freely by O1 (Torricelli law, flow
## = coeff sqrt (level)); with T2 behind it through O2 for two levels.
%!function net = one_tank (c, a)
%!  net = vn_network ("fit check");
%!  net = vn_tank (net, "T1", "area", a, "level", 1.0);
%!  net = vn_feed (net, "F1", "T1", "flow", 0.004);
%!  net = vn_orifice (net, "O1", "T1", "", "coeff", c);
%!endfunction

%!function net = two_tanks (c1, a2, l1 = 1.0, l2 = 0.8)
%!  net = vn_network ("fit check");
%!  net = vn_tank (net, "T1", "area", 1.5, "level", l1);
%!  net = vn_tank (net, "T2", "area", a2, "level", l2);
%!  net = vn_feed (net, "F1", "T1", "flow", 0.004);
%!  net = vn_orifice (net, "O1", "T1", "T2", "coeff", c1);
%!  net = vn_orifice (net, "O2", "T2", "", "coeff", 0.0025);
%!endfunction

## Levels of both tanks for a test from the declared levels of NET, the
## feed held between samples.
%!function y = levels_from (net, t, u)
%!  sg = struct ("quantity", "F1.flow", "t", t, "v", u, "hold", true,
%!               "kind", "table");
%!  res = vn_simulate (net, t, sg, "reltol", 1e-10, "abstol", 1e-12);
%!  y = [res.T1.level, res.T2.level];
%!endfunction

## Central differences of the weighted residuals, relative step 1e-5.
%!function J = fd_jacobian (build, p, t, u, sigma)
%!  J = [];
%!  for i = 1:numel (p)
%!    h = 1e-5 * p(i);
%!    pp = p; pp(i) += h;
%!    pm = p; pm(i) -= h;
%!    d = levels_from (build (pp), t, u) - levels_from (build (pm), t, u);
%!    J(:, i) = - d(:) / (2 * h) / sigma;
%!  endfor
%!endfunction

%!shared t, u
%! t = [0 10 25 40 60 90 130 180 240 300 400 550 700 900 1200 1500].';
%! u = 0.004 + 0.002 * (t >= 90);

%!test
%! ## noise-free data: exact recovery (1e-6 relative) of O1.coeff 0.003
%! ## and T1.area 1.5 from starts off by a factor of two both ways
%! truth = one_tank (0.003, 1.5);
%! sg = struct ("quantity", "F1.flow", "t", t, "v", u, "hold", true,
%!              "kind", "table");
%! res = vn_simulate (truth, t, sg, "initial", vn_steady (truth),
%!                    "reltol", 1e-11, "abstol", 1e-13);
%! ex = vn_experiment (t, "F1.flow", u, "T1.level", res.T1.level, "hold", true);
%! est = vn_fit (one_tank (0.006, 0.75), ex, {"O1.coeff", "T1.area"},
%!               "reltol", 1e-11, "abstol", 1e-13, "tol", 1e-10);
%! assert (est.value, [0.003; 1.5], -1e-6);
%! assert (est.rmse < 1e-6);
%! ## steady start: 0.004 m3/s through O1 at 0.003 m2.5/s needs
%! ## (0.004 / 0.003)^2 = 1.7778 m (Torricelli, any fluids text)
%! assert (est.fit.predicted(1), (0.004 / 0.003) ^ 2, 1e-6);

%!test
%! ## "verbose": one line per iteration, each naming the sum of squares
%! truth = one_tank (0.003, 1.5);
%! sg = struct ("quantity", "F1.flow", "t", t, "v", u, "hold", true,
%!              "kind", "table");
%! res = vn_simulate (truth, t, sg, "initial", vn_steady (truth));
%! ex = vn_experiment (t, "F1.flow", u, "T1.level", res.T1.level, "hold", true);
%! out = evalc ("est = vn_fit (one_tank (0.006, 1.5), ex, {\"O1.coeff\"}, \"verbose\", true);");
%! lines = strsplit (strtrim (out), "\n");
%! assert (numel (lines), est.iterations);
%! assert (est.iterations >= 2);
%! assert (all (strncmp (lines, "vn_fit: iteration", 17)));
%! assert (all (! cellfun ("isempty", strfind (lines, "sum of squares"))));
%! ## quiet by default
%! assert (evalc ("vn_fit (one_tank (0.006, 1.5), ex, {\"O1.coeff\"});"), "");

%!test
%! ## "declared" start: the test starts from the levels on the network
%! ## (1.0 and 0.8 m, not a steady state); sensitivities from the core
%! ## against central differences of the residuals, 1e-4 relative
%! sigma = 0.01;
%! y = levels_from (two_tanks (0.003, 1.0), t, u);
%! ex = vn_experiment (t, "F1.flow", u, "T1.level", y(:, 1), "T2.level",
%!                     y(:, 2), "hold", true, "sigma", sigma,
%!                     "start", "declared");
%! est = vn_fit (two_tanks (0.004, 0.8), ex, {"O1.coeff", "T2.area"});
%! assert (est.value, [0.003; 1.0], -1e-4);
%! assert (est.fit.predicted(1, :), [1.0, 0.8], 1e-9);
%! Jfd = fd_jacobian (@(p) two_tanks (p(1), p(2)), est.value, t, u, sigma);
%! err = max (abs (est.jacobian - Jfd)) ./ max (abs (Jfd));
%! assert (all (err < 1e-4));
%! assert (max (abs (Jfd(:))) > 1);

%!test
%! ## "measured" start: levels from the first samples (1.1 and 0.7 m),
%! ## not the 1.0 and 0.8 m declared on the model; sensitivities against
%! ## central differences, 1e-4 relative
%! sigma = 0.01;
%! ref = two_tanks (0.003, 1.0, 1.1, 0.7);
%! y = levels_from (ref, t, u);
%! ex = vn_experiment (t, "F1.flow", u, "T1.level", y(:, 1), "T2.level",
%!                     y(:, 2), "hold", true, "sigma", sigma,
%!                     "start", "measured");
%! est = vn_fit (two_tanks (0.004, 0.8), ex, {"O1.coeff", "T2.area"});
%! assert (est.value, [0.003; 1.0], -1e-4);
%! assert (est.fit.predicted(1, :), [1.1, 0.7], 1e-9);
%! build = @(p) two_tanks (p(1), p(2), 1.1, 0.7);
%! Jfd = fd_jacobian (build, est.value, t, u, sigma);
%! err = max (abs (est.jacobian - Jfd)) ./ max (abs (Jfd));
%! assert (all (err < 1e-4));

%!shared ex
%! ex = vn_experiment (0:10, "F1.flow", 0.004 * ones (1, 11), "T1.level",
%!                     ones (1, 11));
%!error <Invalid call> vn_fit (one_tank (0.003, 1.5), ex)
%!error <NET must be a network made by vn_network> vn_fit (struct ("a", 1), ex, {"O1.coeff"})
%!error <EX must be one or more tests made by vn_experiment> vn_fit (one_tank (0.003, 1.5), struct ("t", 1), {"O1.coeff"})
%!error <PARAMS must name the parameters> vn_fit (one_tank (0.003, 1.5), ex, {})
%!error <PARAMS must name the parameters> vn_fit (one_tank (0.003, 1.5), ex, 3)
%!error <names a parameter twice: O1.coeff, O1.coeff> vn_fit (one_tank (0.003, 1.5), ex, {"O1.coeff", "O1.coeff"})
%!error <unknown option "iterations"> vn_fit (one_tank (0.003, 1.5), ex, "O1.coeff", "iterations", 5)
%!error <options come in name/value pairs> vn_fit (one_tank (0.003, 1.5), ex, "O1.coeff", "verbose")
%!error <"maxiter" must be a positive integer> vn_fit (one_tank (0.003, 1.5), ex, "O1.coeff", "maxiter", 0.5)
%!error <"tol" must lie in \(0, 1\)> vn_fit (one_tank (0.003, 1.5), ex, "O1.coeff", "tol", 2)
%!error <"lower" must be a scalar or 1 bounds> vn_fit (one_tank (0.003, 1.5), ex, "O1.coeff", "lower", [1 2])
%!error <bounds must satisfy lower < upper> vn_fit (one_tank (0.003, 1.5), ex, "O1.coeff", "lower", 1, "upper", 0.5)
%!error <"verbose" must be true or false> vn_fit (one_tank (0.003, 1.5), ex, "O1.coeff", "verbose", "yes")

## A valve opening logged past its travel (1.02) is clipped in the model,
## with a warning naming the signal and the test.
%!warning <vn_fit: signal "LV1.opening" reaches 1.02 at t = 300 s, outside its range \[0, 1\]; it is clipped to \[0, 1\] in the model fitted to test 1> ...
%! net = vn_tank (vn_network ("w"), "T1", "area", 1, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.002);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 20, "opening", 0.5);
%! t = (0:30:600).';
%! op = 0.5 + 0.52 * (t >= 300);
%! ex = vn_experiment (t, "LV1.opening", op, "T1.level", ones (size (t)), "hold", true);
%! vn_fit (net, ex, {"T1.area"}, "maxiter", 2);

## A draining test has no input signal: nothing to pack, nothing clipped.
## Torricelli: a tank of 1 m2 through 0.003 m2.5/s from 1 m (any fluids
## text), sampled and fitted back.
%!test
%! net = vn_tank (vn_network ("w"), "T1", "area", 1, "level", 1);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.003);
%! t = (0:10:300).';
%! h = (1 - 0.003 * t / 2) .^ 2;
%! ex = vn_experiment (t, "T1.level", h, "start", "declared");
%! est = vn_fit (vn_orifice (vn_tank (vn_network ("w"), "T1", "area", 1, "level", 1), ...
%!                           "O1", "T1", "", "coeff", 0.002), ex, {"O1.coeff"});
%! assert (est.value, 0.003, 1e-5);

## -*- texinfo -*-
## @deftypefn  {} {@var{est} =} vn_fit (@var{net}, @var{ex}, @var{params})
## @deftypefnx {} {@var{est} =} vn_fit (@dots{}, @var{option}, @var{value}, @dots{})
## Fit unit parameters of a network to plant tests by least squares.
##
## @var{ex} is one test from @code{vn_experiment} or several
## @code{[ex1, ex2]}, fitted together.  @var{params} names the parameters,
## @qcode{"UNIT.PARAM"}: any numeric parameter of a unit (orifice
## @qcode{"coeff"}, tank @qcode{"area"} or @qcode{"diameter"}, valve
## @qcode{"kv"}, resistance @qcode{"r"}, pump @qcode{"shutoff"} and
## @qcode{"k"}, valve @qcode{"lag"}, tank @qcode{"ua"}, ...).  Their
## values on @var{net} are the starting values; they must be positive.
##
## Each test is simulated from its start (see @code{vn_experiment}) with
## its inputs as signals; the fit minimises the sum over all tests and
## measured outputs of ((measured - predicted) / sigma)^2, NaN samples
## left out.  The method is Levenberg-Marquardt on the logarithms of the
## parameters (which keeps them positive) with the exact Jacobian from the
## core's forward sensitivities (CVODES).
##
## Options: @qcode{"lower"}, @qcode{"upper"} (bounds, a scalar or one per
## parameter; default 0 and Inf), @qcode{"maxiter"} (50), @qcode{"tol"}
## (1e-6, on the relative change of the parameters), @qcode{"reltol"},
## @qcode{"abstol"} (integrator, 1e-8 and 1e-10), @qcode{"verbose"} (one
## line per iteration).
##
## The result @var{est} holds @code{names}, @code{value} (column),
## @code{stderr}, @code{ci} (one row [low high] per parameter, 95 %, from
## Student's t with as many degrees of freedom as samples less
## parameters), @code{corr} (correlation matrix), @code{cov},
## @code{rmse} (root mean square of the unweighted residuals, all
## outputs), @code{residuals} (cell, one times x outputs matrix per test,
## measured - predicted, NaN where no sample), @code{net} (the network
## with the fitted values), @code{iterations}, @code{reason} (why the
## iteration stopped) and @code{fit(k)} with @code{t}, @code{names},
## @code{measured}, @code{predicted}, @code{units} and @code{name} for
## @code{vn_plot}.  Standard errors scale with the residual variance, so
## sigmas need only be right relative to each other.
##
## When the data cannot separate the parameters (near-singular
## information matrix, or a correlation beyond 0.99) a warning
## @qcode{"vesselnet:fit-ill-conditioned"} names them.
##
## A fitted model describes the tests it was fitted to: validate it on a
## test it has not seen before using it to judge a plant, and have any
## tuning based on it reviewed before it reaches a live loop.
## @seealso{vn_experiment, vn_simulate, vn_plot, vn_fopdt}
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
  np = numel (params);
  if (numel (unique (params)) < np)
    error ("Octave:invalid-input-arg",
           "vn_fit: PARAMS names a parameter twice: %s", strjoin (params, ", "));
  endif
  opt = fit_options (varargin, np);
  [pq, p0] = resolve (net, params);
  E = fit_classify (net, ex, pq);
  so = struct ("reltol", opt.reltol, "abstol", opt.abstol, "solver", 0,
               "maxsteps", 100000, "maxstep", 0);

  fun = @(th) fit_residuals (net, E, pq, exp (th), so);
  [th, r, J, info] = fit_lm (fun, log (p0), log (opt.lower), log (opt.upper),
                             opt);
  p = exp (th);
  st = fit_stats (J, r, p, params);
  [~, ~, pred] = fit_residuals (net, E, pq, p, so);

  est.names = params(:);
  est.value = p;
  est.stderr = st.stderr;
  est.ci = st.ci;
  est.corr = st.corr;
  est.cov = st.cov;
  est.dof = st.dof;
  est.jacobian = J ./ p(:).';
  res = cell (numel (E), 1);
  all_r = [];
  fit = struct ("t", {}, "names", {}, "measured", {}, "predicted", {},
                "units", {}, "name", {});
  for k = 1:numel (E)
    res{k} = E(k).y - pred{k};
    all_r = [all_r; res{k}(! isnan (res{k}))];
    un = cellfun (@(n) vn_quantity (net, n, "output", "vn_fit").unitofmeasure,
                  E(k).yname, "uniformoutput", false);
    name = E(k).name;
    if (isempty (name))
      name = sprintf ("test %d", k);
    endif
    fit(k) = struct ("t", E(k).t, "names", {E(k).yname}, "measured", E(k).y,
                     "predicted", pred{k}, "units", {un}, "name", name);
  endfor
  est.rmse = sqrt (mean (all_r .^ 2));
  est.residuals = res;
  est.net = fit_apply (net, pq, p);
  est.iterations = info.iterations;
  est.reason = info.reason;
  est.fit = fit;
endfunction

## Fitted parameters and their starting values.
function [pq, p0] = resolve (net, params)
  s = vn_schema ();
  np = numel (params);
  pq = cell (1, np);
  p0 = zeros (np, 1);
  for i = 1:np
    q = vn_quantity (net, params{i}, "param", "vn_fit");
    un = net.units(q.unit);
    if (isfield (un.par, q.var))
      v = un.par.(q.var);
    else
      v = s.(q.kind).defaults(q.slot + 1);
    endif
    if (! (isscalar (v) && isfinite (v)))
      error ("Octave:invalid-input-arg",
             "vn_fit: %s \"%s\" has no value for \"%s\"; give a starting value on the network",
             q.kind, q.uname, q.var);
    endif
    if (! (v > 0))
      error ("Octave:invalid-input-arg",
             "vn_fit: %s: starting value %g is not positive; vn_fit fits positive parameters (as logarithms)",
             params{i}, v);
    endif
    pq{i} = q;
    p0(i) = v;
  endfor
endfunction

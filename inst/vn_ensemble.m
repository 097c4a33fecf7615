## -*- texinfo -*-
## @deftypefn  {} {@var{ens} =} vn_ensemble (@var{net}, @var{tspan}, @var{u}, "vary", @{@var{name}, @var{values}, @dots{}@})
## @deftypefnx {} {@var{ens} =} vn_ensemble (@var{est}, @var{tspan}, @var{u}, "draws", @var{n})
## @deftypefnx {} {@var{ens} =} vn_ensemble (@dots{}, @var{option}, @var{value}, @dots{})
## Many runs of one network in one call: what-if sweeps and Monte Carlo
## studies.
##
## With @qcode{"vary"}, run @var{k} sets each named parameter
## (@qcode{"UNIT.PARAMETER"}, e.g. @qcode{"O1.coeff"}, @qcode{"T2.area"},
## @qcode{"F1.flow"}) to element @var{k} of its @var{values} (one value
## per run; a scalar is used in every run).  With @qcode{"draws"}, the
## parameters of a fit @var{est} made by @code{vn_fit} are drawn
## @var{n} times from the normal distribution its covariance
## @code{est.cov} describes, in the fit's own space: a parameter whose
## @code{est.scale} is @qcode{"log"} is drawn as @code{value * exp (z)},
## one that is @qcode{"linear"} (or every one, when @code{est.scale} is
## absent) as @code{value + z}, @var{z} from @code{est.cov}.  Sensor
## parameters of the fit (@qcode{"T2.level:offset"}) are drawn with the
## others but do not enter the runs.  The runs use @code{est.net}.
##
## @var{tspan} and @var{u} are those of @code{vn_simulate} (@var{u} may
## be omitted or empty).  Every run is what @code{vn_simulate} gives for
## the network with that run's parameters.  The compiled core runs them
## on several threads; a run that fails (a value out of range, an
## integrator failure) is listed in @code{ens.failed} and never stops
## the others.
##
## The result @var{ens} has:
## @table @code
## @item t
## output times (column, s);
## @item names
## the recorded quantities (cell row, e.g. @qcode{"T2.level"}), with
## @code{units} their units of measure;
## @item y
## the records, times x quantities x runs (NaN for a failed run);
## @item params
## runs x parameters, the values each run used, with @code{pnames} their
## names;
## @item failed
## a struct array, one element per failed run: @code{run} (its number)
## and @code{message};
## @item mean, p05, p50, p95
## times x quantities: mean and 5th, 50th and 95th percentiles over the
## runs that succeeded (Octave's @code{quantile}, its default method 5);
## @item stats
## @code{wall} (s), @code{workers}, @code{steps} (per run), @code{runs},
## @code{ok} (runs that succeeded);
## @item net, signals
## the network (at its declared values) and the signals of the runs.
## @end table
##
## Options:
## @table @asis
## @item @qcode{"record"}
## output quantities to keep (cell array), or @qcode{"levels"} for every
## tank level; default every output of every unit.
## @item @qcode{"dt"}
## output interval (s), as for @code{vn_simulate}.
## @item @qcode{"seed"}
## seed of the normal draws (@code{randn ("state", seed)}); the generator's
## state is restored afterwards.  Without it the draws continue the
## generator's current state.
## @item @qcode{"workers"}
## threads (default: every core, @code{nproc}).  Results do not depend on
## the number of workers.
## @item @qcode{"initial"}
## a start for every run (an operating point from @code{vn_steady} or a
## state vector); default: each run from its declared levels.
## @item @qcode{"reltol"}, @qcode{"abstol"}, @qcode{"solver"}, @qcode{"maxsteps"}, @qcode{"maxstep"}
## as for @code{vn_simulate}, with the same allowed ranges.
## @item @qcode{"cluster"}
## a launcher command, e.g. @qcode{"mpirun -np 8 --hostfile hosts"} or a
## scheduler's own: the runs are spread over MPI ranks by the standalone
## program @code{vn_cluster} (built by @code{make} where @command{mpicc}
## exists; or set @env{VN_CLUSTER_BIN}).  The job goes to a file, the
## launcher is started on it and waited for, with progress shown after
## 5 s (every second with @qcode{"verbose"}); the same @var{ens} comes
## back.  Only the launching host must see the job file; ranks get it by
## MPI.  Threads per rank: @env{VN_WORKERS} (default 1).  Ctrl-C stops
## the launcher.
## @item @qcode{"verbose"}
## print the runs, failures and time when done.
## @end table
##
## The bands are those of the model and the parameter spread given: they
## say nothing of model error.  Validate the model against plant data,
## and have any tuning judged on them reviewed, before it reaches a live
## loop; local codes govern safety systems.
## @seealso{vn_simulate, vn_fit, vn_signal}
## @end deftypefn

function ens = vn_ensemble (net, tspan, varargin)
  if (nargin < 2)
    print_usage ();
  endif
  u = [];
  args = varargin;
  if (! isempty (args) && ! ischar (args{1}))
    u = args{1};
    args(1) = [];
  endif
  opt = parse_options (args);
  est = [];
  if (isstruct (net) && isfield (net, "net") && isfield (net, "cov"))
    est = net;
    net = est.net;
    if (isempty (opt.draws))
      error ("Octave:invalid-input-arg",
             "vn_ensemble: from a fit, give the number of runs: \"draws\", N");
    endif
    if (! isempty (opt.vary))
      error ("Octave:invalid-input-arg",
             "vn_ensemble: \"vary\" applies to a network; from a fit use \"draws\"");
    endif
  elseif (! isempty (opt.draws))
    error ("Octave:invalid-input-arg",
           "vn_ensemble: \"draws\" needs a fit from vn_fit, not a network");
  elseif (isempty (opt.vary))
    error ("Octave:invalid-input-arg",
           "vn_ensemble: give the parameters to vary: \"vary\", {\"UNIT.PARAMETER\", values, ...}");
  endif
  cn = vn_compile (net, "results");
  tout = sim_times (tspan, opt.dt, "vn_ensemble");
  if (isempty (est))
    [pnames, P] = vary_table (opt.vary);
  else
    [pnames, P] = draw_table (est, opt.draws, opt.seed);
  endif
  model = ! cellfun (@(n) any (n == ":"), pnames);
  pidx = zeros (1, 0, "int32");
  for j = find (model)
    q = vn_quantity (net, pnames{j}, "param", "vn_ensemble", cn.layout);
    pidx(end+1) = q.index;
  endfor
  if (numel (unique (pidx)) < numel (pidx))
    error ("Octave:invalid-input-arg",
           "vn_ensemble: a parameter is named twice in \"vary\"");
  endif
  [names, rec, units] = record_list (net, cn, opt.record);
  sig = vn_pack_signals (net, u, "vn_ensemble", cn);
  if (! isempty (sig))
    signal_clip_warn ("vn_ensemble", sig.clips, tout(1), tout(end));
  endif
  x0 = [];
  if (! isempty (opt.initial))
    if (isstruct (opt.initial) && isfield (opt.initial, "x"))
      x0 = opt.initial.x(:);
    elseif (isnumeric (opt.initial) && isreal (opt.initial))
      x0 = opt.initial(:);
    else
      error ("Octave:invalid-input-arg",
             "vn_ensemble: option \"initial\" must be an operating point from vn_steady or a state vector");
    endif
  endif
  so = struct ("reltol", opt.reltol, "abstol", opt.abstol,
               "solver", opt.solver, "maxsteps", opt.maxsteps,
               "maxstep", opt.maxstep, "record", rec, "workers", opt.workers);
  if (isempty (opt.cluster))
    [Y, status, msgs, steps, wall] = __vn_ensemble__ (cn.pk, sig, tout, x0, so,
                                                      pidx, P(:, model));
  else
    [Y, status, msgs, steps, wall] = run_cluster (opt, cn.pk, sig, tout, x0,
                                                  so, pidx, P(:, model));
  endif
  ens = summarise (tout, names, units, Y, P, pnames, status, msgs);
  ens.stats = struct ("wall", wall, "workers", min (opt.workers, rows (P)),
                      "steps", steps, "runs", rows (P),
                      "ok", sum (status == 0));
  ens.net = net;
  ens.signals = u;
  if (opt.verbose)
    printf ("vn_ensemble: %d runs, %d failed, %d workers, %.3g s\n",
            rows (P), numel (ens.failed), ens.stats.workers, wall);
  endif
endfunction

function opt = parse_options (args)
  opt = struct ("vary", [], "draws", [], "record", [], "dt", [], "seed", [],
                "workers", nproc (), "initial", [], "reltol", 1e-6,
                "abstol", 0, "solver", 0, "maxsteps", 100000,
                "maxstep", 0, "verbose", false, "cluster", "");
  [names, vals] = vn_option_pairs (args, "vn_ensemble");
  for i = 1:numel (names)
    name = lower (names{i});
    val = vals{i};
    [opt, taken] = integrator_option (opt, "vn_ensemble", lower (name), val);
    if (taken)
      continue;
    endif
    switch (name)
      case "vary"
        if (! (iscell (val) && mod (numel (val), 2) == 0 && ! isempty (val)
               && iscellstr (val(1:2:end))))
          error ("Octave:invalid-input-arg",
                 "vn_ensemble: option \"vary\" must be a cell array {\"UNIT.PARAMETER\", values, ...}");
        endif
        opt.vary = val;
      case "draws"
        if (! (isscalar (val) && isreal (val) && val >= 1 && val == fix (val)))
          error ("Octave:invalid-input-arg",
                 "vn_ensemble: option \"draws\" must be a positive integer, got %s",
                 disp_value (val));
        endif
        opt.draws = val;
      case "record"
        if (! (iscellstr (val) || (ischar (val) && strcmp (val, "levels"))))
          error ("Octave:invalid-input-arg",
                 "vn_ensemble: option \"record\" must be a cell array of output quantities or \"levels\"");
        endif
        opt.record = val;
      case "dt"
        opt.dt = val;
      case "seed"
        if (! (isscalar (val) && isreal (val) && isfinite (val)))
          error ("Octave:invalid-input-arg",
                 "vn_ensemble: option \"seed\" must be a finite number");
        endif
        opt.seed = val;
      case "workers"
        if (! (isscalar (val) && isreal (val) && val >= 1 && val == fix (val)
               && val <= 1024))
          error ("Octave:invalid-input-arg",
                 "vn_ensemble: option \"workers\" must be an integer in [1, 1024], got %s",
                 disp_value (val));
        endif
        opt.workers = val;
      case "initial"
        opt.initial = val;
      case "verbose"
        opt.verbose = logical (val);
      case "cluster"
        if (! (ischar (val) && rows (val) == 1 && ! isempty (strtrim (val))))
          error ("Octave:invalid-input-arg",
                 "vn_ensemble: option \"cluster\" must be the launcher command, e.g. \"mpirun -np 8 --hostfile hosts\"");
        endif
        opt.cluster = val;
      otherwise
        error ("Octave:invalid-input-arg",
               "vn_ensemble: unknown option \"%s\"; allowed: vary, draws, record, dt, seed, workers, initial, reltol, abstol, solver, maxsteps, maxstep, cluster, verbose",
               names{i});
    endswitch
  endfor
endfunction

## The runs on MPI ranks: the job goes to a file, the launcher starts the
## standalone program on it (in the background, its own process group),
## and the results file comes back; progress is shown while it runs.
function [Y, status, msgs, steps, wall] = run_cluster (opt, pk, sig, tout, x0,
                                                       so, pidx, P)
  bin = getenv ("VN_CLUSTER_BIN");
  if (isempty (bin))
    bin = fullfile (fileparts (which ("__vn_ensemble__")), "..", "bin",
                    "vn_cluster");
  endif
  if (! exist (bin, "file"))
    error ("vesselnet:cluster-failure",
           "vn_ensemble: the MPI program vn_cluster was not found at %s; build it with \"make\" where mpicc exists (Debian: openmpi-bin, libopenmpi-dev) or set VN_CLUSTER_BIN",
           bin);
  endif
  wd = tempname ();
  mkdir (wd);
  pid = 0;
  finished = false;
  unwind_protect
    job = fullfile (wd, "job.vnj");
    res = fullfile (wd, "results.vnr");
    prog = fullfile (wd, "progress");
    logf = fullfile (wd, "log");
    rcf = fullfile (wd, "status");
    so.jobfile = job;
    __vn_ensemble__ (pk, sig, tout, x0, so, pidx, P);
    cmd = sprintf ("%s %s %s %s %s > %s 2>&1; echo $? > %s.tmp && mv %s.tmp %s",
                   opt.cluster, quote (bin), quote (job), quote (res),
                   quote (prog), quote (logf), quote (rcf), quote (rcf),
                   quote (rcf));
    [st, out] = system (sprintf ("setsid sh -c %s < /dev/null > /dev/null 2>&1 & echo $!",
                                 quote (cmd)));
    pid = str2double (out);
    if (st != 0 || isnan (pid))
      error ("vesselnet:cluster-failure",
             "vn_ensemble: cannot start the launcher \"%s\"", opt.cluster);
    endif
    t0 = tic ();
    shown = 0;
    while (! exist (rcf, "file"))
      pause (0.1);
      el = toc (t0);
      if ((opt.verbose && el - shown >= 1) || (el >= 5 && el - shown >= 5))
        printf ("vn_ensemble: %d of %d runs done on the cluster (%.0f s)\n",
                runs_done (wd), rows (P), el);
        fflush (stdout);
        shown = el;
      endif
    endwhile
    finished = true;
    code = str2double (fileread (rcf));
    if (code != 0)
      txt = strtrim (fileread (logf));
      error ("vesselnet:cluster-failure",
             "vn_ensemble: the cluster job \"%s\" ended with status %d: %s",
             opt.cluster, code, txt(1:min (end, 2000)));
    endif
    [Y, status, msgs, steps, wall] = __vn_ensemble__ ("read", res);
  unwind_protect_cleanup
    if (pid > 0 && ! finished)
      system (sprintf ("kill -TERM -- -%d 2>/dev/null", pid));
    endif
    confirm_recursive_rmdir (false, "local");
    rmdir (wd, "s");
  end_unwind_protect
endfunction

## Runs finished so far: the sum over the ranks' progress files.
function n = runs_done (wd)
  n = 0;
  f = dir (fullfile (wd, "progress.*"));
  for k = 1:numel (f)
    if (! isempty (regexp (f(k).name, '^progress\.\d+$', "once")))
      v = str2double (fileread (fullfile (wd, f(k).name)));
      if (isfinite (v))
        n += v;
      endif
    endif
  endfor
endfunction

## A string quoted for the shell.
function q = quote (s)
  q = ["'" strrep(s, "'", "'\\''") "'"];
endfunction

## Names and the runs x parameters table of "vary".
function [pnames, P] = vary_table (vary)
  pnames = vary(1:2:end);
  vals = vary(2:2:end);
  n = cellfun ("numel", vals);
  nrun = max (n);
  for j = 1:numel (vals)
    v = vals{j};
    if (! (isnumeric (v) && isreal (v) && ! isempty (v) && all (isfinite (v(:)))))
      error ("Octave:invalid-input-arg",
             "vn_ensemble: values of \"%s\" must be finite real numbers",
             pnames{j});
    endif
    if (n(j) != 1 && n(j) != nrun)
      error ("Octave:invalid-input-arg",
             "vn_ensemble: \"%s\" has %d values but another parameter has %d; give one value per run (or one for all)",
             pnames{j}, n(j), nrun);
    endif
  endfor
  P = zeros (nrun, numel (vals));
  for j = 1:numel (vals)
    P(:,j) = vals{j}(:);
  endfor
endfunction

## N draws of a fit's parameters from its covariance, in its own space.
function [pnames, P] = draw_table (est, n, seed)
  pnames = est.names(:).';
  v = est.value(:).';
  np = numel (v);
  C = est.cov;
  if (! (isnumeric (C) && isequal (size (C), [np np]) && all (isfinite (C(:)))))
    error ("Octave:invalid-input-arg",
           "vn_ensemble: the fit's covariance est.cov must be a finite %dx%d matrix",
           np, np);
  endif
  C = (C + C.') / 2;
  scale = repmat ({"linear"}, 1, np);
  if (isfield (est, "scale"))
    scale = cellstr (est.scale);
    if (numel (scale) != np || ! all (ismember (scale, {"log", "linear"})))
      error ("Octave:invalid-input-arg",
             "vn_ensemble: est.scale must give \"log\" or \"linear\" for each of the %d parameters",
             np);
    endif
  endif
  ## a square root of C that tolerates a semidefinite C
  [V, D] = eig (C);
  d = diag (D);
  if (any (d < -1e-10 * max (abs (d))))
    error ("Octave:invalid-input-arg",
           "vn_ensemble: the fit's covariance est.cov is not positive semidefinite");
  endif
  R = (V * diag (sqrt (max (d, 0)))).';
  if (! isempty (seed))
    old = randn ("state");
    randn ("state", seed);
  endif
  Z = randn (np, n).' * R;      # one draw per row: N draws start alike
  if (! isempty (seed))
    randn ("state", old);
  endif
  lg = strcmp (scale, "log");
  P = v + Z;
  if (any (lg))
    P(:,lg) = v(lg) .* exp (Z(:,lg));
  endif
endfunction

## Recorded quantities: names, 0-based output indices, units of measure.
function [names, rec, units] = record_list (net, cn, record)
  tm = cn.tmpl;
  if (isempty (record))
    nf = cellfun ("numel", tm.fields)(tm.group + 1);
    owner = repelem (1:numel (tm.names), nf);
    fld = vertcat (tm.fields{tm.group + 1}).';
    uom = cell (1, numel (tm.fields));
    for g = 1:numel (tm.fields)
      first = tm.names{find (tm.group == g - 1, 1)};
      uom{g} = cellfun (@(f) tm.units.(first).(f), tm.fields{g},
                        "uniformoutput", false);
    endfor
    uom = vertcat (uom{tm.group + 1}).';
    out = tm.src(:).' > 0;
    names = strcat (tm.names(owner(out)), ".", fld(out));
    rec = int32 (tm.src(out).' - 1);
    units = uom(out);
    return;
  endif
  if (ischar (record))
    tanks = find (strcmp ({net.units.kind}, "tank"));
    record = strcat ({net.units(tanks).name}, ".level");
  endif
  [~, first] = unique (record, "first");
  names = record(sort (first))(:).';
  rec = zeros (1, numel (names), "int32");
  units = cell (1, numel (names));
  for j = 1:numel (names)
    q = vn_quantity (net, names{j}, "output", "vn_ensemble", cn.layout);
    rec(j) = q.index;
    units{j} = q.unitofmeasure;
  endfor
endfunction

## The ens struct: records, the failed runs, mean and percentiles.
function ens = summarise (t, names, units, Y, P, pnames, status, msgs)
  nrun = rows (P);
  Y = reshape (Y, numel (t), numel (names), nrun);
  ok = status(:).' == 0;
  bad = find (! ok);
  ens.t = t;
  ens.names = names;
  ens.units = units;
  ens.y = Y;
  ens.params = P;
  ens.pnames = pnames;
  ens.failed = struct ("run", num2cell (bad(:)), "message", msgs(bad));
  if (any (ok))
    Yok = Y(:,:,ok);
    ens.mean = mean (Yok, 3);
    q = quantile (Yok, [0.05 0.5 0.95], 3);
    ens.p05 = q(:,:,1);
    ens.p50 = q(:,:,2);
    ens.p95 = q(:,:,3);
  else
    ens.mean = ens.p05 = ens.p50 = ens.p95 = NaN (numel (t), numel (names));
  endif
endfunction

function t = disp_value (v)
  if (ischar (v))
    t = ["\"" v "\""];
  elseif (isnumeric (v) && isscalar (v))
    t = sprintf ("%g", v);
  else
    t = sprintf ("a %s", class (v));
  endif
endfunction

%!demo
%! ## An invented brewery buffer tank: how far does its level spread when
%! ## the outlet orifice coefficient is only known to +-15 %?
%! net = vn_network ("buffer");
%! net = vn_tank (net, "T1", "area", 3, "level", 1.2);
%! net = vn_feed (net, "F1", "T1", "flow", 0.012);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.011);
%! u = vn_signal ("F1.flow", "step", 600, 0.012, 0.016);
%! c = 0.011 * (1 + 0.15 * (2 * rand (200, 1) - 1));
%! ens = vn_ensemble (net, [0 3600], u, "vary", {"O1.coeff", c}, "dt", 30,
%!                    "record", {"T1.level"});
%! plot (ens.t, ens.p05, "--", ens.t, ens.p50, "-", ens.t, ens.p95, "--");
%! xlabel ("time (s)"); ylabel ("T1 level (m)");
%! legend ("5 %", "median", "95 %");

%!shared net, u
%! net = vn_network ("e");
%! net = vn_tank (net, "T1", "area", 2, "level", 1.5);
%! net = vn_tank (net, "T2", "area", 1.5, "level", 1.0);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01);
%! net = vn_orifice (net, "O2", "T2", "", "coeff", 0.008);
%! u = vn_signal ("F1.flow", "step", 300, 0.01, 0.012);

%!test
%! ## every run equals a single vn_simulate run with its parameters
%! c = [0.006 0.01 0.014 0.02];
%! a = [1.0 1.5 2.5 3.0];
%! ens = vn_ensemble (net, [0 600], u, "vary", {"O1.coeff", c, "T2.area", a},
%!                    "dt", 10, "workers", 2);
%! assert (size (ens.y), [61, numel(ens.names), 4]);
%! assert (ens.params, [c(:) a(:)]);
%! assert (isempty (ens.failed));
%! for k = 1:4
%!   n1 = net;
%!   n1.units(4).par.coeff = c(k);
%!   n1.units(2).par.area = a(k);
%!   r = vn_simulate (n1, [0 600], u, "dt", 10);
%!   for j = 1:numel (ens.names)
%!     dot = find (ens.names{j} == ".", 1);
%!     v = r.(ens.names{j}(1:dot-1)).(ens.names{j}(dot+1:end));
%!     assert (ens.y(:,j,k), v, 1e-12 * max (abs (v)));
%!   endfor
%! endfor

%!test
%! ## 1 and 2 workers give identical results; percentiles bracket the median
%! c = linspace (0.005, 0.02, 9);
%! e1 = vn_ensemble (net, [0 600], u, "vary", {"O1.coeff", c}, "workers", 1,
%!                   "record", "levels", "dt", 20);
%! e2 = vn_ensemble (net, [0 600], u, "vary", {"O1.coeff", c}, "workers", 2,
%!                   "record", "levels", "dt", 20);
%! assert (e1.y, e2.y, 0);
%! assert (e1.names, {"T1.level", "T2.level"});
%! assert (e1.units, {"m", "m"});
%! assert (all (e1.p05(:) <= e1.p50(:)) && all (e1.p50(:) <= e1.p95(:)));
%! assert (e1.mean, mean (e1.y, 3), 1e-14);
%! assert (e1.p50, median (e1.y, 3), 1e-14);

%!test
%! ## a failed run is reported and the others go on
%! c = [0.01 -0.5 0.012];
%! ens = vn_ensemble (net, [0 100], "vary", {"O1.coeff", c}, "dt", 10,
%!                    "record", {"T2.level"});
%! assert (numel (ens.failed), 1);
%! assert (ens.failed(1).run, 2);
%! assert (! isempty (strfind (ens.failed(1).message, "coeff")));
%! assert (all (isnan (ens.y(:,1,2))));
%! assert (all (isfinite (ens.y(:,1,[1 3]))(:)));
%! assert (ens.stats.ok, 2);
%! assert (ens.mean, mean (ens.y(:,:,[1 3]), 3), 1e-14);

%!test
%! ## draws from a fit reproduce its covariance in its log space: sample
%! ## covariance of 2000 draws within 10 % (the standard error of a sample
%! ## variance is sqrt (2/n) = 3.2 % of it, common practice)
%! est.names = {"O1.coeff"; "T2.area"; "T2.level:offset"};
%! est.value = [0.01; 1.5; 0.02];
%! est.cov = [0.04 0.012 0; 0.012 0.01 0; 0 0 1e-6];
%! est.scale = {"log", "log", "linear"};
%! est.net = net;
%! ens = vn_ensemble (est, [0 10], "draws", 2000, "seed", 7, "dt", 10,
%!                    "record", {"T2.level"});
%! assert (size (ens.params), [2000 3]);
%! assert (ens.pnames, est.names.');
%! Z = [log(ens.params(:,1:2) ./ est.value(1:2).'), ens.params(:,3) - 0.02];
%! S = cov (Z);
%! sd = sqrt (diag (est.cov));
%! assert (abs (S - est.cov) ./ (sd * sd.') < 0.1);
%! assert (mean (Z), [0 0 0], 3 * sd.' / sqrt (2000));
%! ## the seed makes the draws repeatable and leaves the generator alone
%! s0 = randn ("state");
%! e2 = vn_ensemble (est, [0 10], "draws", 5, "seed", 7, "dt", 10,
%!                   "record", {"T2.level"});
%! assert (randn ("state"), s0);
%! assert (e2.params, ens.params(1:5,:));
%! ## each run is the network with that run's drawn parameters
%! n1 = net;
%! n1.units(4).par.coeff = e2.params(3,1);
%! n1.units(2).par.area = e2.params(3,2);
%! r = vn_simulate (n1, [0 10], "dt", 10, "record", {"T2.level"});
%! assert (e2.y(:,1,3), r.T2.level, 1e-12);

%!test
%! ## a fit without est.scale (covariance of the values themselves)
%! est = struct ("names", {{"O1.coeff"}}, "value", 0.01, "cov", 1e-6,
%!               "net", net);
%! ens = vn_ensemble (est, [0 10], "draws", 2000, "seed", 3, "dt", 10,
%!                    "record", {"T2.level"});
%! assert (std (ens.params), 1e-3, 1e-4);
%! assert (mean (ens.params), 0.01, 1e-4);

%!error <give the parameters to vary> vn_ensemble (net, [0 10])
%!error <"O1.coeff" has 2 values but another parameter has 3> vn_ensemble (net, [0 10], "vary", {"T2.area", [1 2 3], "O1.coeff", [1 2]})
%!error <"draws" needs a fit> vn_ensemble (net, [0 10], "draws", 10)
%!error <no unit "Q1"> vn_ensemble (net, [0 10], "vary", {"Q1.coeff", 1})
%!test
%! ## a pump speed signal below 0 is clipped to 0 in every run, with one
%! ## warning, and the runs match vn_simulate's (invented data)
%! n = vn_tank (vn_network ("p"), "T1", "area", 2, "level", 1);
%! n = vn_pump (n, "P1", "T1", "", "flow", 0.001);
%! n = vn_orifice (n, "O1", "T1", "", "coeff", 0.001);
%! us = vn_signal ("P1.speed", "step", 50, 1, -1);
%! warning ("off", "vesselnet:clipped", "local");
%! ens = vn_ensemble (n, [0 100], us, "vary", {"O1.coeff", [0.001; 0.002]},
%!                    "dt", 10, "record", {"T1.level"}, "workers", 1);
%! n.units(3).par.coeff = 0.002;
%! r = vn_simulate (n, [0 100], us, "dt", 10);
%! assert (ens.y(:, 1, 2), r.T1.level, 1e-6);
%! ## after 50 s only the orifice drains: the pump stopped, not reversed
%! assert (all (diff (ens.y(6:end, 1, 2)) < 0));
%!warning <vn_ensemble: signal "P1.speed" falls to -1 at t = 50 s, outside its range \[0, 10\]>
%! n = vn_pump (vn_tank (vn_network ("p"), "T1", "area", 2, "level", 1), "P1", "T1", "", "flow", 0.001);
%! vn_ensemble (n, [0 100], vn_signal ("P1.speed", "step", 50, 1, -1), "vary", {"T1.area", [2; 3]}, "workers", 1);
%!error <vn_ensemble: signal "F1.flow": values must lie in \[-1e\+06, 1e\+06\] \(m3/s\), got 2e\+06 at t = 5 s> vn_ensemble (net, [0 10], vn_signal ("F1.flow", "step", 5, 0, 2e6), "vary", {"O1.coeff", [1 2]})
%!error <vn_ensemble: option "abstol" must lie in \[1e-18, 1000\]> vn_ensemble (net, [0 10], u, "vary", {"O1.coeff", [1 2]}, "abstol", 1e9)
%!error <option "workers"> vn_ensemble (net, [0 10], "vary", {"O1.coeff", 1}, "workers", 0)
%!error <unknown option "runs"> vn_ensemble (net, [0 10], "runs", 3)

## Speed from Octave: the whole call against the core, ensembles against
## what one writes without vesselnet, large chains against the floor,
## builders against N, and a fit with and without the compiled-network
## cache.  Every ratio is measured in this one process; goals are printed
## beside the figures.  Run by bench/run_bench.m ("make bench") or alone
## from the top of the checkout:
##   octave-cli --eval 'addpath ([pwd "/inst"], [pwd "/build/oct"], [pwd "/bench"]); run bench/speed_bench.m'
## Environment: VN_BENCH_BIG (largest chain against the floor, default
## 100000; 0 leaves that table out), VN_BENCH_REPEAT (runs per timing,
## median, default 3).  The scenarios are invented.  Nothing here asserts.

1;

function net = sb_chain (N)
  tanks = arrayfun (@(i) sprintf ("T%d", i), 1:N, "UniformOutput", false);
  orifices = arrayfun (@(i) sprintf ("O%d", i), 1:N, "UniformOutput", false);
  net = vn_network ("chain");
  net = vn_tank (net, tanks, "area", 1.0, "level", 1.0);
  net = vn_feed (net, "F", "T1", "flow", 0.01);
  net = vn_orifice (net, orifices, tanks, [tanks(2:end), {""}], "coeff", 0.01);
endfunction

## Median over nrep of [whole call, core integration] of FN ().
function [call, core, res] = sb_time (fn, nrep)
  c = w = zeros (1, nrep);
  for j = 1:nrep
    t0 = tic ();
    res = fn ();
    c(j) = toc (t0);
    w(j) = res.stats.wall;
  endfor
  call = median (c);
  core = median (w);
endfunction

## The two-tank case of the ensembles: T1 -> O1 -> T2 -> O2 -> out, feed
## stepping at 300 s; O1's coefficient varied.
function net = sb_pair ()
  net = vn_network ("pair");
  net = vn_tank (net, "T1", "area", 2, "level", 1.5);
  net = vn_tank (net, "T2", "area", 1.5, "level", 1.0);
  net = vn_feed (net, "F1", "T1", "flow", 0.01);
  net = vn_orifice (net, "O1", "T1", "T2", "coeff", 0.01);
  net = vn_orifice (net, "O2", "T2", "", "coeff", 0.008);
endfunction

## The same model stacked for n runs (volumes of T1, then of T2); plain
## square roots (levels stay far above the 1 mm smoothing band).
function dv = sb_stacked (t, v, c, n)
  q1 = c .* sqrt (max (v(1:n) / 2 - v(n+1:end) / 1.5, 0));
  q2 = 0.008 * sqrt (max (v(n+1:end) / 1.5, 0));
  f = 0.01 + 0.002 * (t >= 300);
  dv = [f - q1; q1 - q2];
endfunction

function y = sb_env (name, def)
  y = str2double (getenv (name));
  if (isnan (y))
    y = def;
  endif
endfunction

root = getenv ("VN_ROOT");
if (isempty (root))
  root = fileparts (fileparts (mfilename ("fullpath")));
endif
nrep = max (1, sb_env ("VN_BENCH_REPEAT", 3));
big = sb_env ("VN_BENCH_BIG", 100000);

printf ("\n5. Whole vn_simulate call against the core's integration (chain, 0..3600 s, dt 5 s)\n\n");
printf ("| N     | record | core (s)  | call (s)  | call/core | goal | uncached call (s) | uncached/core |\n");
printf ("|-------|--------|-----------|-----------|-----------|------|-------------------|---------------|\n");
for N = [2 20 200 2000 20000](1:sb_env ("VN_BENCH_NCALL", 5))
  net = sb_chain (N);
  for rec = {"all", "levels"}
    if (strcmp (rec{1}, "all") && N > 200)
      continue;
    endif
    args = {"dt", 5};
    if (strcmp (rec{1}, "levels"))
      args(end+1:end+2) = {"record", "levels"};
    endif
    f = @() vn_simulate (net, [0 3600], args{:});
    f ();                                   # compiled once, then reused
    n = nrep + 2 * (N <= 200);
    [call, core] = sb_time (f, n);
    setenv ("VN_COMPILE_CACHE", "0");
    [ucall, ucore] = sb_time (f, max (1, nrep - (N >= 20000)));
    setenv ("VN_COMPILE_CACHE", "");
    goal = ifelse (N >= 2000, 1.2, 1.5);
    printf ("| %-5d | %-6s | %-9.4g | %-9.4g | %-9.2f | %-4.1f | %-17.4g | %-13.2f |\n",
            N, rec{1}, core, call, call / core, goal, ucall, ucall / ucore);
  endfor
endfor
printf ("uncached = VN_COMPILE_CACHE=0: the network packed and its result layout made again at every call,\n");
printf ("as before the compiled form; its ratio is to its own runs' core time\n");

printf ("\n6. 1000 runs of a two-tank model, O1.coeff varied (600 s, output every 5 s, levels; RelTol 1e-6, AbsTol 1e-8)\n\n");
net = sb_pair ();
u = vn_signal ("F1.flow", "step", 300, 0.01, 0.012);
randn ("state", 1);
nrun = 1000;
c = 0.01 * (1 + 0.1 * randn (nrun, 1));
tout = (0:5:600).';
rows_ = cell (0, 3);
for w = [1 2]
  t0 = tic ();
  ens = vn_ensemble (net, [0 600], u, "vary", {"O1.coeff", c}, "dt", 5,
                     "record", "levels", "workers", w);
  rows_(end+1,:) = {sprintf("vn_ensemble, %d worker%s", w, ifelse (w > 1, "s", "")), toc(t0), ""};
endfor
bin = fullfile (root, "build", "bin", "vn_cluster");
if (exist (bin, "file") && ! isempty (file_in_path (getenv ("PATH"), "mpirun")))
  [~, who] = system ("id -u");
  l = "mpirun -np 2 --oversubscribe";
  if (str2double (who) == 0)
    l = [l " --allow-run-as-root"];
  endif
  t0 = tic ();
  ecl = vn_ensemble (net, [0 600], u, "vary", {"O1.coeff", c}, "dt", 5,
                     "record", "levels", "cluster", l);
  same = sprintf ("same records as the threads: %d", isequaln (ecl.y, ens.y));
  rows_(end+1,:) = {"vn_ensemble, cluster mpirun -np 2", toc(t0), same};
endif
m = 200;
t0 = tic ();
for k = 1:m
  n1 = net;
  n1.units(4).par.coeff = c(k);
  r = vn_simulate (n1, [0 600], u, "dt", 5, "record", "levels");
endfor
rows_(end+1,:) = {"loop of vn_simulate", toc(t0) * nrun / m, sprintf("%d runs timed, scaled", m)};
v0 = [3 * ones(nrun, 1); 1.5 * ones(nrun, 1)];
for tol = {{"RelTol", 1e-6, "AbsTol", 1e-8}, {}}
  o = odeset (tol{1}{:});
  t0 = tic ();
  [~, a] = ode45 (@(t, v) sb_stacked (t, v, c, nrun), [0 300], v0, o);
  [tt, b] = ode45 (@(t, v) sb_stacked (t, v, c, nrun), 300:5:600, a(end,:).', o);
  ts = toc (t0);
  what = ifelse (isempty (tol{1}), "default tolerances", "same tolerances");
  note = "";
  if (! isempty (tol{1}))
    h2 = b(end, nrun+1:end).' / 1.5;
    note = sprintf ("final T2 levels differ from vn_ensemble by %.1g m at most",
                    max (abs (h2 - squeeze (ens.y(end, 2, :)))));
  endif
  rows_(end+1,:) = {sprintf("stacked ode45, one call, %s", what), ts, note};
endfor
m = 20;
t0 = tic ();
o = odeset ("RelTol", 1e-6, "AbsTol", 1e-8);
for k = 1:m
  [~, a] = ode15s (@(t, v) sb_stacked (t, v, c(k), 1), [0 300], [3; 1.5], o);
  [~, b] = ode15s (@(t, v) sb_stacked (t, v, c(k), 1), 300:5:600, a(end,:).', o);
endfor
rows_(end+1,:) = {"loop of ode15s", toc(t0) * nrun / m, sprintf("%d runs timed, scaled", m)};
stacked = rows_{find (strncmp (rows_(:,1), "stacked ode45, one call, same", 29), 1), 2};
printf ("| method                                      | 1000 runs (s) | / stacked ode45 | note |\n");
printf ("|---------------------------------------------|---------------|-----------------|------|\n");
for k = 1:rows (rows_)
  printf ("| %-43s | %-13.4g | %-15.2f | %s |\n", rows_{k,1}, rows_{k,2},
          rows_{k,2} / stacked, rows_{k,3});
endfor
printf ("goal: vn_ensemble faster than the stacked ode45 call (ratio below 1)\n");

floor_bin = fullfile (root, "build", "bench", "chain_floor");
if (big > 0 && ! exist (floor_bin, "file"))
  printf ("\n7. Large chains against the floor: left out, %s is not built (make bench builds it)\n",
          floor_bin);
elseif (big > 0)
  printf ("\n7. Large chains against the hand-written floor (0..3600 s, 721 outputs, levels recorded, one run each)\n\n");
  printf ("| N      | build (s) | vn core (s) | vn call (s) | floor (s) | core/floor | goal | call/floor | steps vn/floor |\n");
  printf ("|--------|-----------|-------------|-------------|-----------|------------|------|------------|----------------|\n");
  for N = unique ([20000 big])
    t0 = tic ();
    net = sb_chain (N);
    tb = toc (t0);
    vn_simulate (net, [0 5], "record", "levels");   # compiled
    t0 = tic ();
    res = vn_simulate (net, [0 3600], "dt", 5, "record", "levels");
    tc = toc (t0);
    [st, out] = system (sprintf ("'%s' %d", floor_bin, N));
    tok = regexp (out, "wall=(\\S+) steps=(\\d+)", "tokens", "once");
    fw = str2double (tok{1});
    printf ("| %-6d | %-9.4g | %-11.4g | %-11.4g | %-9.4g | %-10.2f | 1.5  | %-10.2f | %d/%s |\n",
            N, tb, res.stats.wall, tc, fw, res.stats.wall / fw, tc / fw,
            res.stats.steps, tok{2});
    clear res net;
  endfor
endif

printf ("\n8. Builders against N (bulk form: tanks, feed, orifices of the chain; one call per kind)\n\n");
printf ("| N      | build (s) | us per unit | single calls, loop (s) |\n");
printf ("|--------|-----------|-------------|------------------------|\n");
for N = [1000 10000 100000]
  t0 = tic ();
  net = sb_chain (N);
  tb = toc (t0);
  loop = "-";
  if (N == 1000)
    t0 = tic ();
    l = vn_network ("chain");
    for i = 1:N
      l = vn_tank (l, sprintf ("T%d", i), "area", 1, "level", 1);
    endfor
    loop = sprintf ("%.3g (tanks only)", toc (t0));
  endif
  printf ("| %-6d | %-9.4g | %-11.3g | %-22s |\n", N, tb, 1e6 * tb / (2 * N + 1), loop);
endfor
printf ("goal: linear in N; 1e5 tanks in under 10 s\n");

printf ("\n9. A fit with the compiled-network cache against the same fit packing at every simulation\n\n");
net = sb_pair ();
t = (0:10:3000).';
u = vn_signal ("F1.flow", "step", 600, 0.01, 0.013);
r = vn_simulate (net, t, u);
randn ("state", 42);
ex = vn_experiment (t, "F1.flow", r.F1.flow, "T1.level",
                    r.T1.level + 1e-3 * randn (size (t)), "T2.level",
                    r.T2.level + 1e-3 * randn (size (t)));
start = sb_pair ();
start.units(4).par.coeff = 0.015;
start.units(5).par.coeff = 0.006;
fits = {};
for mode = {"", "0"}
  setenv ("VN_COMPILE_CACHE", mode{1});
  w = zeros (1, nrep);
  for j = 1:nrep
    t0 = tic ();
    est = vn_fit (start, ex, {"O1.coeff", "O2.coeff"});
    w(j) = toc (t0);
  endfor
  fits(end+1,:) = {median(w), est.value(:).', est.iterations};
endfor
setenv ("VN_COMPILE_CACHE", "");
printf ("cached:   %.3g s (%d iterations), O1.coeff %.6g, O2.coeff %.6g\n",
        fits{1,1}, fits{1,3}, fits{1,2});
printf ("uncached: %.3g s (%d iterations), O1.coeff %.6g, O2.coeff %.6g\n",
        fits{2,1}, fits{2,3}, fits{2,2});
printf ("uncached/cached: %.2f (same estimates: %d)\n", fits{2,1} / fits{1,1},
        isequal (fits{1,2}, fits{2,2}));

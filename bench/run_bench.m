## Speed benchmark of vesselnet on the N-tank chain of bench/README.md,
## against the hand-written CVODES floor (bench/chain_floor.c) and Octave's
## ode15s (bench/chain_ode15s.m), all measured in this one process.
## Run by "make bench".  Environment: VN_BENCH_NMAX (largest N simulated
## by vesselnet, default 2000: the builders grow quadratically in N),
## VN_BENCH_REPEAT (runs per timing, median taken, default 3).
## Benchmarks are not tests: nothing here asserts.

1;  # a script with local functions

## Compile the floor into build/bench when missing or older than its source.
function bin = bench_floor_build (root)
  src = fullfile (root, "bench", "chain_floor.c");
  bin = fullfile (root, "build", "bench", "chain_floor");
  s = dir (src);
  b = dir (bin);
  if (isempty (b) || b.datenum < s.datenum)
    mkdir (fileparts (bin));
    ## The gcc line of bench/README.md.
    cmd = sprintf (["gcc -Wall -Wextra -Werror -std=c99 -O2 ", ...
                    "-I/usr/include/suitesparse -o '%s' '%s' ", ...
                    "-lsundials_cvodes -lsundials_nvecserial ", ...
                    "-lsundials_sunmatrixdense -lsundials_sunlinsoldense ", ...
                    "-lsundials_sunmatrixsparse -lsundials_sunlinsolklu ", ...
                    "-lklu -lm"], bin, src);
    [st, out] = system (cmd);
    if (st != 0)
      error ("run_bench: compiling bench/chain_floor.c failed:\n%s", out);
    endif
  endif
endfunction

## One run of the floor; its single output line parsed into a struct.
function r = bench_floor_run (bin, N, file)
  cmd = sprintf ("'%s' %d", bin, N);
  if (! isempty (file))
    cmd = sprintf ("%s %s '%s'", cmd, ifelse (N <= 100, "dense", "klu"), file);
  endif
  [st, out] = system (cmd);
  if (st != 0)
    error ("run_bench: chain_floor %d failed (status %d): %s", N, st, out);
  endif
  tok = regexp (out, ["solver=(\\w+) wall=(\\S+) steps=(\\d+) rhs=(\\d+) ", ...
                      "jac=(\\d+) final_h1=(\\S+) final_hN=(\\S+)"],
                "tokens", "once");
  if (isempty (tok))
    error ("run_bench: cannot read the output line of chain_floor %d: %s",
           N, out);
  endif
  v = str2double (tok(2:end));
  r = struct ("solver", tok{1}, "wall", v(1), "steps", v(2), "rhs", v(3),
              "jac", v(4), "h1", v(5), "hN", v(6));
endfunction

## Peak resident set size of this process (kB).
function kb = bench_vmhwm ()
  txt = fileread ("/proc/self/status");
  tok = regexp (txt, "VmHWM:\\s*(\\d+)", "tokens", "once");
  kb = str2double (tok{1});
endfunction

root = getenv ("VN_ROOT");
if (isempty (root))
  root = fileparts (fileparts (mfilename ("fullpath")));
endif
addpath (fullfile (root, "bench"));
nmax = str2double (getenv ("VN_BENCH_NMAX"));
if (isnan (nmax))
  nmax = 2000;
endif
nrep = str2double (getenv ("VN_BENCH_REPEAT"));
if (isnan (nrep) || nrep < 1)
  nrep = 3;
endif

floor_bin = bench_floor_build (root);

Ns = [20 200 2000 20000];
ode_nmax = 2000;         # ode15s at 20000 takes ~10 s a run; left out
[~, host] = system ("uname -srm");
[~, cpu] = system ("grep -m1 'model name' /proc/cpuinfo | cut -d: -f2");
printf ("vesselnet benchmark, %s, %d cores, %s, %s, Octave %s\n",
        datestr (now (), "yyyy-mm-dd HH:MM"), nproc (), strtrim (cpu),
        strtrim (host), OCTAVE_VERSION);
printf ("N-tank chain, 0..3600 s, 721 outputs, RelTol 1e-6, AbsTol 1e-8 m3;");
printf (" median of %d runs\n", nrep);

sim = struct ([]);
nets = {};
for k = 1:numel (Ns)
  N = Ns(k);
  r = struct ("N", N, "vn", [], "allwall", NaN, "call", NaN, "build", NaN, "bytes", NaN,
              "hwm", NaN, "fl", [], "ode", NaN, "odes", [], "net", [], "h", []);
  ## Floor: median wall over nrep runs.
  fw = zeros (1, nrep);
  for j = 1:nrep
    r.fl = bench_floor_run (floor_bin, N, "");
    fw(j) = r.fl.wall;
  endfor
  r.fl.wall = median (fw);
  if (N <= nmax)
    hwm0 = bench_vmhwm ();
    [~, ~, sall, net] = chain_vesselnet (N);
    r.allwall = sall.wall;
    [~, h, s] = chain_vesselnet (net, "levels");
    s.build = sall.build;
    s.bytes = sall.bytes;
    r.build = s.build;
    r.bytes = s.bytes;
    w = zeros (1, nrep);
    c = zeros (1, nrep);
    w(1) = s.wall;
    c(1) = s.call;
    for j = 2:nrep
      [~, h, s] = chain_vesselnet (net, "levels");
      w(j) = s.wall;
      c(j) = s.call;
    endfor
    r.hwm = bench_vmhwm () - hwm0;
    r.vn = s;
    r.vn.wall = median (w);
    r.call = median (c);
    r.net = net;
    r.h = h;
  endif
  if (N <= ode_nmax)
    ow = zeros (1, nrep);
    for j = 1:nrep
      [~, ~, ow(j), r.odes] = chain_ode15s (N);
    endfor
    r.ode = median (ow);
  endif
  sim = [sim, r];
endfor

printf ("\n1. Simulation (wall s; vesselnet core = res.stats.wall recording the levels, as the floor does;\n   all = the same run recording every output; call = whole vn_simulate)\n\n");
printf ("| N     | vn core  | vn all   | vn call  | floor    | ode15s   | vn/floor | ode15s/vn | vn steps/rhs/jac | floor steps/rhs/jac | ode15s steps/rhs |\n");
printf ("|-------|----------|----------|----------|----------|----------|----------|-----------|------------------|---------------------|------------------|\n");
for r = sim
  if (isempty (r.vn))
    vn = "not run";
    vc = vn;
    ratio = "-";
    oratio = "-";
    vcount = "-";
  else
    vn = sprintf ("%.4g", r.vn.wall);
    vc = sprintf ("%.4g", r.call);
    ratio = sprintf ("%.2f", r.vn.wall / r.fl.wall);
    oratio = ifelse (isnan (r.ode), "-", sprintf ("%.1f", r.ode / r.vn.wall));
    vcount = sprintf ("%d/%d/%d", r.vn.steps, r.vn.rhs, r.vn.jac);
  endif
  if (isnan (r.ode))
    ode = "not run";
    ocount = "-";
  else
    ode = sprintf ("%.4g", r.ode);
    ocount = sprintf ("%d/%d", r.odes.steps, r.odes.rhs);
  endif
  printf ("| %-5d | %-8s | %-8.4g | %-8s | %-8.4g | %-8s | %-8s | %-9s | %-16s | %-19s | %-16s |\n",
          r.N, vn, r.allwall, vc, r.fl.wall, ode, ratio, oratio, vcount,
          sprintf ("%d/%d/%d", r.fl.steps, r.fl.rhs, r.fl.jac), ocount);
endfor
printf ("\nfloor solver: %s\n",
        strjoin (arrayfun (@(r) sprintf ("N=%d %s", r.N, r.fl.solver), sim,
                           "UniformOutput", false), ", "));

printf ("\nAgreement of vesselnet with the floor (all 721 x N levels)\n\n");
for r = sim(1:2)
  if (isempty (r.vn))
    continue;
  endif
  file = [tempname() ".txt"];
  fl = bench_floor_run (floor_bin, r.N, file);
  ref = load (file);
  delete (file);
  d = abs (r.h - ref(:,2:end));
  printf ("N=%-4d final h1 %.10g vs %.10g (rel %.2g), final hN %.10g vs %.10g (rel %.2g), max |dh| %.2g m (%.2g of max level)\n",
          r.N, r.h(end,1), fl.h1, abs (r.h(end,1) / fl.h1 - 1),
          r.h(end,end), fl.hN, abs (r.h(end,end) / fl.hN - 1),
          max (d(:)), max (d(:)) / max (abs (ref(:,2:end))(:)));
endfor

printf ("\nNetwork building (one bulk builder call per kind) and memory\n\n");
printf ("| N     | build (s) | result bytes | bytes/(N x 721) | peak RSS growth (MB) |\n");
printf ("|-------|-----------|--------------|-----------------|----------------------|\n");
for r = sim
  if (isempty (r.vn))
    continue;
  endif
  printf ("| %-5d | %-9.4g | %-12d | %-15.1f | %-20.1f |\n", r.N, r.build,
          r.bytes, r.bytes / (r.N * 721), r.hwm / 1024);
endfor
ran = sim(! arrayfun (@(r) isempty (r.vn), sim));
if (numel (ran) < numel (sim) && numel (ran) >= 2)
  ## Fit build time ~ a N^p over the two largest sizes run.
  p = log (ran(end).build / ran(end-1).build) / log (ran(end).N / ran(end-1).N);
  for r = sim(numel (ran)+1:end)
    printf ("N=%d not built: VN_BENCH_NMAX=%d; build time grows as N^%.2f, projected %.0f s for the builders alone\n",
            r.N, nmax, p, ran(end).build * (r.N / ran(end).N) ^ p);
  endfor
endif
printf ("(peak RSS growth is VmHWM after minus before the N runs; 0 when an earlier N already reached that peak)\n");

steady_bench (ran);

## 3. Fitting three coefficients to two step tests (bench/fit_bench.m)
printf ("\n3. Fit: vn_fit against fminsearch over ode15s (same model, same data)\n\n");
run (fullfile (fileparts (mfilename ("fullpath")), "fit_bench.m"));

## 4. The cost of sensor parameters in a fit (bench/fit_sensor_bench.m)
printf ("\n4. Fit with a transmitter's offset and scale, as a ratio to the same fit without\n\n");
run (fullfile (fileparts (mfilename ("fullpath")), "fit_sensor_bench.m"));

## 5-9. Speed from Octave: call against core, ensembles, large chains,
## builders, fit with and without the compiled-network cache
run (fullfile (fileparts (mfilename ("fullpath")), "speed_bench.m"));

## 10. Reading plant records (bench/readlog_bench.m)
run (fullfile (fileparts (mfilename ("fullpath")), "readlog_bench.m"));

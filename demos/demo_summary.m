## -*- texinfo -*-
## @deftypefn {} {} demo_summary (@var{res}, @var{tanks}, @var{flows})
## Print a readable summary of a simulation run of the demo.
##
## For each tank in @var{tanks}: level at the start and the end, the peak
## and the lowest level, and the volume spilled over its rim; for each
## flow quantity in @var{flows} (@qcode{"P201.flow"}, ...) the flow at the
## start and the end and its peak, in m3/h; then the integrator's counts.
## @end deftypefn

function demo_summary (res, tanks, flows)
  t = res.t;
  printf ("\nRun of %.1f h, %d outputs\n", (t(end) - t(1)) / 3600, numel (t));
  printf ("  %-8s %9s %9s %9s %9s %12s\n", "tank", "start m", "end m",
          "peak m", "lowest m", "spilled m3");
  for i = 1:numel (tanks)
    r = res.(tanks{i});
    spilled = trapz (t, r.spill);
    printf ("  %-8s %9.3f %9.3f %9.3f %9.3f %12.1f\n", tanks{i}, r.level(1),
            r.level(end), max (r.level), min (r.level), spilled);
  endfor
  printf ("  %-14s %11s %11s %11s\n", "flow", "start m3/h", "end m3/h",
          "peak m3/h");
  for i = 1:numel (flows)
    [unit, var] = strtok (flows{i}, ".");
    q = res.(unit).(var(2:end)) * 3600;
    printf ("  %-14s %11.1f %11.1f %11.1f\n", flows{i}, q(1), q(end), max (q));
  endfor
  s = res.stats;
  printf ("  integrator: %d steps, %d right-hand sides, %d Jacobians, %d restarts at breakpoints, %s solver, %.3f s\n",
          s.steps, s.rhs, s.jac, s.restarts, s.solver, s.wall);
endfunction

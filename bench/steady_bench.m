## -*- texinfo -*-
## @deftypefn {} {@var{tab} =} steady_bench (@var{sims})
## Time vn_steady and vn_linearize on benchmark chains already simulated.
##
## @var{sims} is a struct array with fields @code{N}, @code{net} (the chain
## built by @code{chain_vesselnet}), @code{vn} (its simulation statistics:
## @code{wall}, @code{rhs}) and @code{call} (seconds of the whole
## @code{vn_simulate} call).  For each chain it prints and returns the time
## of @code{vn_steady}, of @code{vn_linearize} (input @code{F.flow},
## output the last tank's level; with and without the poles), these as
## ratios to one simulation, and the linearisation against an estimate of
## a finite-difference Jacobian: N+1 right-hand-side evaluations, each
## costing @code{wall / rhs} of the simulation.  When either command is
## absent the table is skipped with a note.
##
## This is a benchmark, not a user command.
## @seealso{chain_vesselnet, vn_steady, vn_linearize}
## @end deftypefn

function tab = steady_bench (sims)

  if (nargin != 1)
    print_usage ();
  endif
  tab = struct ("N", {}, "steady", {}, "lin", {}, "lin_nopoles", {},
                "fd", {}, "h1", {});
  printf ("\n2. Steady state and linearisation\n\n");
  if (! (exist ("vn_steady") && exist ("vn_linearize")))
    printf ("skipped: vn_steady or vn_linearize is not on the path\n");
    return;
  endif
  printf ("| N     | steady (s) | iters | steady/sim | lin (s)  | lin/sim | lin no poles (s) | FD estimate (s) | lin no poles / FD |\n");
  printf ("|-------|------------|-------|------------|----------|---------|------------------|-----------------|-------------------|\n");
  for r = sims(:).'
    N = r.N;
    t0 = tic ();
    op = vn_steady (r.net);
    ts = toc (t0);
    out = {sprintf("T%d.level", N)};
    t0 = tic ();
    vn_linearize (r.net, op, {"F.flow"}, out);
    tl = toc (t0);
    t0 = tic ();
    vn_linearize (r.net, op, {"F.flow"}, out, "poles", false);
    tn = toc (t0);
    ## No right-hand-side gateway exists: estimate one evaluation from the
    ## simulation's own counts.
    fd = (N + 1) * r.vn.wall / r.vn.rhs;
    printf ("| %-5d | %-10.4g | %-5d | %-10.2f | %-8.4g | %-7.2f | %-16.4g | %-15.4g | %-17.2f |\n",
            N, ts, op.iterations, ts / r.call, tl, tl / r.call, tn, fd,
            tn / fd);
    tab(end+1) = struct ("N", N, "steady", ts, "lin", tl, "lin_nopoles", tn,
                         "fd", fd, "h1", op.(sprintf ("T%d", 1)).level);
  endfor
  printf ("sim = one whole vn_simulate call of the same network (median); ");
  printf ("FD estimate = (N+1) x res.stats.wall / res.stats.rhs, an estimate, ");
  printf ("not a measured finite-difference Jacobian.\n");

endfunction

%!error steady_bench ()

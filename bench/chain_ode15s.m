## -*- texinfo -*-
## @deftypefn {} {[@var{t}, @var{h}, @var{wall}, @var{stats}] =} chain_ode15s (@var{N})
## Integrate the N-tank benchmark chain with Octave's ode15s.
##
## This is the interpreted baseline of the vesselnet speed benchmark.  The
## model is bench/chain_rhs.m (the same equations as bench/chain_floor.c),
## vectorised over the tanks.  To give ode15s a fair chance it receives the
## analytic sparse Jacobian through odeset @qcode{"Jacobian"}, so it never
## differences the right-hand side.  All tanks start at 1 m; the run covers
## 0 to 3600 s with output every 5 s, @qcode{"RelTol"} 1e-6 and
## @qcode{"AbsTol"} 1e-8 m3 on the volumes.
##
## @var{t} is the 721x1 column of output times in s, @var{h} the 721xN
## levels in m, @var{wall} the seconds spent inside ode15s (tic/toc).
## @var{stats} has fields @code{steps}, @code{failed}, @code{rhs} (right-hand
## side calls counted by ode15s), @code{rhs_calls} and @code{jac_calls}
## (calls counted here).
##
## This is a benchmark baseline, not a user command.
## @seealso{chain_rhs}
## @end deftypefn

function [t, h, wall, stats] = chain_ode15s (N)

  if (nargin != 1)
    print_usage ();
  endif
  if (! (isreal (N) && isscalar (N) && N == fix (N) && N >= 1))
    error ("Octave:invalid-input-arg",
           "chain_ode15s: N (number of tanks) must be an integer >= 1, got %s",
           mat2str (N));
  endif

  area = 1.0;                 # m2, as in chain_rhs
  tout = (0:5:3600)';         # s
  V0 = area * ones (N, 1);    # m3, all levels 1 m

  count ("reset");
  opts = odeset ("RelTol", 1e-6, "AbsTol", 1e-8,
                 "Jacobian", @(tt, V) jac (tt, V), "Stats", "on");
  ## Stats are printed by ode15s; capture them instead of showing them.
  tic ();
  txt = evalc ("[t, V] = ode15s (@(tt, V) rhs (tt, V), tout, V0, opts);");
  wall = toc ();

  h = V / area;
  [nrhs, njac] = count ("get");
  stats = struct ("steps", stat_value (txt, "successful steps"),
                  "failed", stat_value (txt, "failed attempts"),
                  "rhs", stat_value (txt, "function evaluations"),
                  "rhs_calls", nrhs, "jac_calls", njac);

endfunction

function f = rhs (t, V)
  count ("rhs");
  f = chain_rhs (t, V);
endfunction

function J = jac (t, V)
  count ("jac");
  [~, J] = chain_rhs (t, V);
endfunction

## Call counters kept across the solver's callbacks.
function [nrhs, njac] = count (what)
  persistent n_rhs n_jac;
  switch (what)
    case "reset"
      n_rhs = 0;
      n_jac = 0;
    case "rhs"
      n_rhs += 1;
    case "jac"
      n_jac += 1;
  endswitch
  nrhs = n_rhs;
  njac = n_jac;
endfunction

function v = stat_value (txt, label)
  tok = regexp (txt, ['(\d+) ' label], "tokens", "once");
  if (isempty (tok))
    v = NaN;
  else
    v = str2double (tok{1});
  endif
endfunction

%!test
%! ## One tank fed at 0.01 m3/s through c = 0.01 at h = 1 m is at rest
%! ## (Torricelli orifice law q = c sqrt (h), common practice).
%! [t, h] = chain_ode15s (1);
%! assert (size (t), [721 1]);
%! assert (t([1 2 end]), [0; 5; 3600]);
%! assert (h, ones (721, 1), 1e-6);

%!test
%! ## Two tanks approach h = [2 1] m, where each orifice carries F0 = c at
%! ## dH = 1 m (orifice law, common practice); after 3600 s chain_floor gives
%! ## h = [1.99933 0.99959], still settling, hence the 2e-3 tolerance.
%! [t, h, ~, stats] = chain_ode15s (2);
%! assert (h(end,:), [2 1], 2e-3);
%! assert (h(1,:), [1 1]);
%! assert (stats.jac_calls > 0);
%! assert (stats.steps > 10);

%!error <N \(number of tanks\)> chain_ode15s (0)
%!error <N \(number of tanks\)> chain_ode15s (2.5)
%!error chain_ode15s ()

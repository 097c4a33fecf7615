## -*- texinfo -*-
## @deftypefn {} {@var{G} =} lin_gain (@var{A}, @var{B}, @var{C}, @var{D})
## Return the steady-state gains of a linear model, outputs x inputs.
##
## For each pair of input j and output i only the states that matter are
## kept: those the input reaches and that reach the output, found by
## graph search on the non-zero pattern of @var{A}, @var{B} and @var{C}
## (@code{lin_reach}).  A state outside that set (an idle catch tank that
## receives only the spill of a tank below its rim, a tank upstream of the
## input) cannot change the gain, so it is removed before any solve.
## With no state left the gain is @code{D(i,j)}.  On the states kept,
## @code{lin_steady_part} gives the part that settles and the part that
## drifts: a drift the output sees makes the gain a signed Inf (an
## integrating pair: the sign is that of the output's ramp for a positive
## step); otherwise the gain is @code{D - C A# B}, which equals
## @code{D - C A^-1 B} whenever the kept states have no integrating mode.
## Pairs that keep the same states share one solve.
## @seealso{lin_reach, lin_steady_part, vn_linearize}
## @end deftypefn

function G = lin_gain (A, B, C, D)

  if (nargin != 4)
    print_usage ();
  endif
  [p, m] = size (D);
  G = full (D);
  n = rows (A);
  if (n == 0 || p == 0 || m == 0)
    return;
  endif
  P = sparse (A != 0);
  from = lin_reach (P, B != 0);        # n x m: reached by input j
  to = lin_reach (P.', C.' != 0);       # n x p: reaching output i
  for j = 1:m
    if (! any (from(:,j)))
      continue;
    endif
    keep = from(:,j) & to;              # n x p
    [sets, ~, which] = unique (keep.', "rows");
    for k = 1:rows (sets)
      s = find (sets(k,:));
      if (isempty (s))
        continue;
      endif
      outs = find (which == k);
      [x, z, t] = lin_steady_part (A(s,s), B(s,j));
      Cs = C(outs,s);
      g = D(outs,j) + Cs * x;
      r = Cs * z;
      ## a drift the output sees, beyond round-off of the projection,
      ## judged in the balanced states (units of the states drop out)
      seen = abs (r) > 1e-9 * norm (z ./ t) * max (abs (Cs * diag (t)), [], 2);
      g(seen) = Inf * sign (r(seen));
      G(outs,j) = full (g);
    endfor
  endfor

endfunction

%!test
%! ## Two lags 2/(10 s + 1) and 3/(5 s + 1) on separate inputs (analytic).
%! G = lin_gain (diag ([-0.1 -0.2]), diag ([0.2 0.6]), eye (2), zeros (2));
%! assert (G, [2 0; 0 3], 1e-12);

%!test
%! ## Integrator (state 1) beside a lag: only the pair that sees it is Inf,
%! ## dense and sparse (analytic).
%! A = [0 0; 0 -0.5];  B = [2 0; 0 1];  C = [1 0; 0 1; 0 -1];  D = zeros (3, 2);
%! assert (lin_gain (A, B, C, D), [Inf 0; 0 2; 0 -2], 1e-12);
%! A = blkdiag (sparse (A), -speye (500));
%! B = [B; zeros(500, 2)];  C = [C, zeros(3, 500)];
%! assert (lin_gain (A, B, C, D), [Inf 0; 0 2; 0 -2], 1e-9);

%!test
%! ## An idle state (zero row and column) and lags 5 s to 6 h in series:
%! ## gains 1, 1 and 0, with no warning (analytic: unit-gain lags).
%! A = [-1/5 0 0; 1/21600 -1/21600 0; 0 0 0];
%! B = [1/5; 0; 0];  C = eye (3);
%! lastwarn ("");
%! G = lin_gain (A, B, C, zeros (3, 1));
%! assert (G, [1; 1; 0], 1e-12);
%! assert (lastwarn (), "");

%!test
%! ## A PI loop on a sight tube (see lin_steady_part): setpoint gain
%! ## exactly 1 and feed gain 0 for the controlled level (integral
%! ## action, analytic); unbalanced they came out 1.04 and 1e7.
%! a = 5e-6;  c = 1e-10;  Kc = 1e-7;  Ti = 1200;
%! A = [-(c + Kc) / a, Kc / Ti; -1 / a, 0];
%! G = lin_gain (A, [Kc 1; 1 0], [1/a 0], zeros (1, 2));
%! assert (G(1), 1, 1e-9);
%! ## 0 to round-off of the open-loop gain 1/c = 1e10 m per m3/s
%! assert (abs (G(2)) < 1e-9 / c);

%!test
%! ## A closed pair of tanks (no outlet): each level integrates upwards
%! ## for a feed into the first, the difference of levels settles
%! ## (analytic, see lin_steady_part); a draw-off gives -Inf.
%! A = [-1/2, 1/6; 1/2, -1/6];
%! G = lin_gain (A, [1 -1; 0 0], [1 0; 0 1/3; 1 -1/3], zeros (3, 2));
%! assert (G, [Inf -Inf; Inf -Inf; 1.5 -1.5], 1e-12);

## -*- texinfo -*-
## @deftypefn {} {[@var{x}, @var{z}, @var{t}] =} lin_steady_part (@var{A}, @var{b})
## Return the steady response of @code{dx/dt = A x + b} for a square
## @var{A} that may be singular.
##
## When @var{A} is nonsingular, @var{x} = @code{-A \ b} and @var{z} is
## zero.  Otherwise the zero eigenvalue of @var{A} is split off with its
## spectral projector @code{P0 = N (M' N)^-1 M'} (N and M the right and
## left null vectors from the singular value decomposition): @var{z} =
## @code{P0 b} is the rate at which the states drift (a ramp, an
## integrating process) and @var{x} = @code{-A# b}, with the group inverse
## @code{A# = (A - P0)^-1 + P0}, the finite part that settles.  A singular
## value below 1e-12 of the largest counts as zero (a mode slower than
## about 1e12 times the fastest integrates).  No solve is attempted on a
## singular matrix, so no singularity warning is raised.
##
## Every decision and solve is made on the balanced matrix
## @code{diag (1./t) * A * diag (t)} (@code{lin_balance}, returned as
## @var{t}), a similarity: the answer does not depend on the units of
## the states.  Unbalanced, a PI loop on a sight tube (entries from 1e-10
## to 2e5) looked singular to the threshold below and its setpoint gain
## came out 1.04 instead of exactly 1.
##
## Singular matrices above 3000 rows are not decomposed: the resolvent at
## three small frequencies s gives z and x to O(s^2) instead.  Callers first
## remove the states the input cannot reach (@code{lin_reach}), which
## keeps most blocks small.
## @seealso{lin_gain, lin_reach}
## @end deftypefn

function [x, z, t] = lin_steady_part (A, b)
  t = lin_balance (A);
  [x, z] = balanced_part (diag (1 ./ t) * A * diag (t), b ./ t);
  x .*= t;
  z .*= t;
endfunction

## The steady part of a balanced system.
function [x, z] = balanced_part (A, b)
  n = rows (A);
  z = zeros (n, columns (b));
  if (n == 0)
    x = z;
    return;
  endif
  if (nonsingular (A))
    x = - (A \ b);
    return;
  endif
  if (n > 3000)
    [x, z] = probes (A, b);
    return;
  endif
  A = full (A);
  b = full (b);
  [U, S, V] = svd (A);
  s = diag (S);
  null = s <= 1e-12 * s(1);
  if (! any (null))
    x = - (A \ b);
    return;
  endif
  N = V(:,null);
  M = U(:,null);
  E = M' * N;
  if (rcond (E) < 1e-10)
    ## a zero eigenvalue of index above 1 (integrators in series): the
    ## drift is read from a resolvent at a small frequency
    h = 1e-9 * s(1);
    w = warning ("off", "all");
    g = (h * eye (n) - A) \ b;
    warning (w);
    z = h * g;
    x = zeros (n, columns (b));
    return;
  endif
  P0 = N * (E \ M');
  z = P0 * b;
  x = - ((A - P0) \ b + z);
endfunction

## Too large for a dense decomposition: the resolvent (sI - A)^-1 b =
## z/s + x + s w + O(s^2) near a simple pole at 0 (Laurent series) at
## three small frequencies gives the drift z and the settled part x,
## the O(s) term eliminated.
function [x, z] = probes (A, b)
  n = rows (A);
  s1 = 1e-6 * max (abs (diag (A)));
  if (! (s1 > 0))
    s1 = 1e-6 * max (abs (A(:)));
  endif
  s = s1 ./ [1; 10; 100];
  Y = zeros (3, n * columns (b));
  w = warning ("off", "all");
  for k = 1:3
    Y(k,:) = reshape ((s(k) * speye (n) - A) \ b, 1, []);
  endfor
  warning (w);
  c = [1 ./ s, ones(3, 1), s] \ Y;
  z = reshape (c(1,:), n, []);
  x = reshape (c(2,:), n, []);
endfunction

## The pivots of a (sparse) LU or the reciprocal condition of a dense one.
function ok = nonsingular (A)
  if (issparse (A) && rows (A) > 400)
    w = warning ("off", "all");
    [~, U] = lu (A);
    warning (w);
    d = abs (diag (U));
    ok = all (isfinite (d)) && min (d) > 1e-12 * max (d);
  else
    ok = rcond (full (A)) > 1e-10;
  endif
endfunction

%!test
%! ## A lag beside an integrator: the lag settles at b/a, the integrator
%! ## drifts at its input rate (analytic).
%! [x, z] = lin_steady_part ([-0.5 0; 0 0], [1; 2]);
%! assert (x, [2; 0], 1e-12);
%! assert (z, [0; 2], 1e-12);

%!test
%! ## Two tanks joined by a linear resistance, no outlet: the total drifts
%! ## at the feed, split by area; the level difference settles (analytic).
%! ## V1' = q - (V1/A1 - V2/A2)/R, V2' = (V1/A1 - V2/A2)/R, A1 1, A2 3, R 2.
%! A = [-1/2, 1/6; 1/2, -1/6];
%! [x, z] = lin_steady_part (A, [1; 0]);
%! assert (z, [0.25; 0.75], 1e-12);
%! ## settled level difference h1 - h2 = R q A2/(A1 + A2) = 1.5
%! assert (x(1) / 1 - x(2) / 3, 1.5, 1e-12);

%!test
%! ## Above 3000 states: a chain of lags ending in an integrator; the drift
%! ## reaches the integrator only, at the rate of the input (analytic).
%! n = 3200;
%! A = spdiags ([ones(n,1), -ones(n,1)], [-1 0], n, n);
%! A(n,n) = 0;
%! b = [1; zeros(n-1, 1)];
%! [x, z] = lin_steady_part (A, b);
%! assert (z(n), 1, 1e-6);
%! assert (norm (z(1:n-1)), 0, 1e-6);
%! assert (x(1:n-1), ones (n-1, 1), 1e-5);

%!test
%! ## A PI loop on a sight tube, states [volume (m3); integral (m s)]:
%! ## area a 5e-6 m2, outflow coefficient c 1e-10 m2/s, gain Kc 1e-7
%! ## m2/s, reset Ti 1200 s; V' = u - c V/a, u = Kc (sp - V/a) + Kc/Ti I,
%! ## I' = sp - V/a.  Integral action holds the level at the setpoint:
%! ## a setpoint step moves the level by exactly as much, a feed step not
%! ## at all (analytic).  Unbalanced, both looked singular.
%! a = 5e-6;  c = 1e-10;  Kc = 1e-7;  Ti = 1200;
%! A = [-(c + Kc) / a, Kc / Ti; -1 / a, 0];
%! [x, z] = lin_steady_part (A, [Kc 1; 1 0]);
%! assert (z, zeros (2));
%! assert (x(1,:) / a, [1 0], 1e-9);

%!test
%! ## Nonsingular: the plain solve.
%! [x, z] = lin_steady_part ([-1 0.5; 0 -2], [1; 4]);
%! assert (x, [2; 2], 1e-12);
%! assert (z, [0; 0]);

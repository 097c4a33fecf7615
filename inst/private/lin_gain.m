## -*- texinfo -*-
## @deftypefn {} {@var{G} =} lin_gain (@var{A}, @var{B}, @var{C}, @var{D})
## Return the steady-state gains of a linear model, outputs x inputs.
##
## For a nonsingular @var{A} the gain is @code{D - C (A \ B)}.  A singular
## @var{A} (a tank whose outflow does not depend on its level, an
## integrating process) has gains that are infinite only where an input
## reaches an integrating mode that an output sees; the other gains stay
## finite.  Up to 400 states each pair is resolved by cancelling common
## factors of s in its transfer function (@code{lin_polynomials}); above,
## the transfer function is evaluated at two small frequencies and a gain
## that grows as 1/s is taken as a signed Inf.
## @seealso{lin_polynomials, lin_modes}
## @end deftypefn

function G = lin_gain (A, B, C, D)

  if (nargin != 4)
    print_usage ();
  endif
  n = rows (A);
  if (n == 0)
    G = full (D);
    return;
  endif
  if (nonsingular (A))
    G = full (D - C * (A \ B));
    return;
  endif
  [p, m] = size (D);
  G = zeros (p, m);
  if (n <= 400)
    Af = full (A);
    for i = 1:p
      for j = 1:m
        [~, ~, ~, G(i,j)] = lin_polynomials (Af, full (B(:,j)),
                                             full (C(i,:)), D(i,j));
      endfor
    endfor
  else
    ## G(s) ~ k/s where an integrator is reached: 100 times larger at a
    ## frequency 100 times smaller.
    s1 = 1e-7 * max (abs (diag (A)));
    g1 = probe (A, B, C, D, s1);
    g2 = probe (A, B, C, D, s1 / 100);
    ## The residue g s must stand out of round-off for the pair.
    scale = max (abs (C), [], 2) * max (abs (B), [], 1);
    grows = abs (g2) > 10 * abs (g1) & abs (g2) * s1 / 100 > 1e-8 * full (scale);
    ## Finite gains: straight line through the two probes, to s = 0.
    G = g2 - (g1 - g2) / 99;
    G(grows) = Inf * sign (g2(grows));
  endif

endfunction

function ok = nonsingular (A)
  if (issparse (A))
    ## the pivots of a sparse LU: far cheaper than condest on large
    ## networks, and enough to tell an integrating (singular) model
    w = warning ("off", "all");
    [~, U] = lu (A);
    warning (w);
    d = abs (diag (U));
    ok = all (isfinite (d)) && min (d) > 1e-12 * max (d);
  else
    ok = rcond (A) > 1e-12;
  endif
endfunction

function g = probe (A, B, C, D, s)
  n = rows (A);
  w = warning ("off", "all");
  g = real (full (D + C * ((s * speye (n) - A) \ B)));
  warning (w);
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

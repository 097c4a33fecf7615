## -*- texinfo -*-
## @deftypefn {} {@var{t} =} lin_balance (@var{A})
## Return a diagonal state scaling @var{t} (powers of 2) that balances the
## square matrix @var{A}: in @code{As = diag (1./t) * A * diag (t)} each
## state's off-diagonal row and column have about the same 1-norm.
##
## A network mixes states of very different size (a sight tube's volume
## of 1e-7 m3 beside a controller's integral, a reservoir's heat content),
## so the entries of A span many decades that only reflect the units.  A
## similarity leaves eigenvalues, steady responses and integrating modes
## as they are, but a rank or condition decision taken on the balanced
## matrix no longer mistakes units for singularity.  The scaling is the
## row and column equilibration of Parlett and Reinsch (Numer. Math. 13,
## 1969, "Balancing a matrix for calculation of eigenvalues and
## eigenvectors"), here in half steps for all states at once (a full step
## for all at once swaps the two entries of a 2 x 2 pair instead of
## balancing them); powers of 2 keep the scaling exact.  Works on full and
## sparse matrices.
## @seealso{lin_steady_part, lin_gain}
## @end deftypefn

function t = lin_balance (A)
  n = rows (A);
  t = ones (n, 1);
  if (n < 2)
    return;
  endif
  [i, j, v] = find (A);
  off = i != j & isfinite (v);
  i = i(off);
  j = j(off);
  v = abs (v(off));
  for it = 1:60
    w = v .* t(j) ./ t(i);                   # |As(i,j)|
    r = accumarray (i, w, [n, 1]);           # off-diagonal row norms
    c = accumarray (j, w, [n, 1]);           # and column norms
    ok = r > 0 & c > 0;
    e = zeros (n, 1);
    ## column i scales with t_i, row i with 1/t_i: t_i sqrt (r / c)
    ## balances them; half that step, to the nearest power of 2
    e(ok) = round (0.25 * log2 (r(ok) ./ c(ok)));
    if (! any (e))
      break;
    endif
    t .*= 2 .^ e;
  endfor
endfunction

%!test
%! ## A PI loop on a sight tube (area 5e-6 m2): entries from 1e-10 to 2e5
%! ## become comparable; the eigenvalues stay (a similarity, analytic).
%! A = [-0.02, 8.3e-11; -2e5, 0];
%! t = lin_balance (A);
%! As = A .* (t.' ./ t);
%! assert (abs (As(1,2)) / abs (As(2,1)) > 0.25 && abs (As(1,2)) / abs (As(2,1)) < 4);
%! assert (sort (eig (As)), sort (eig (A)), 1e-12 * norm (eig (A)));
%! assert (log2 (t), round (log2 (t)));

%!test
%! ## Sparse, with an idle state (zero row and column): it keeps scale 1.
%! A = sparse ([-1 1e8 0; 1e-8 -1 0; 0 0 0]);
%! t = lin_balance (A);
%! assert (t(3), 1);
%! As = A .* (t.' ./ t);
%! assert (full (abs (As(1,2)) / abs (As(2,1))) < 4);

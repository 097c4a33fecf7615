## -*- texinfo -*-
## @deftypefn {} {[@var{num}, @var{den}, @var{zeros}, @var{gain}] =} lin_polynomials (@var{A}, @var{B}, @var{C}, @var{D})
## Return the transfer function of a one-input, one-output linear model.
##
## @var{A} is n x n, @var{B} n x 1, @var{C} 1 x n and @var{D} scalar.  The
## transfer function is @code{G(s) = polyval (@var{num}, s) / polyval
## (@var{den}, s)}, coefficients in descending powers of s.  @var{den} is the
## characteristic polynomial @code{poly (A)}, monic; @var{num} comes from the
## matrix determinant lemma
## @code{det (sI - A + B C) = det (sI - A) (1 + C (sI - A)^-1 B)}, so
## @code{num = poly (A - B C) - poly (A) + D poly (A)}.  Both polynomials
## are built from eigenvalues, which is sound for the tens of states of a
## vessel network but loses accuracy for large or badly scaled models.
## Leading numerator coefficients below the round-off of that difference are
## removed.  @var{zeros} are @code{roots (num)}.
##
## @var{gain} is the steady-state gain G(0) from @code{lin_gain}, not from
## the coefficients: states the input cannot reach or that cannot reach the
## output are removed first, and an integrating pair gives a signed Inf.
## @seealso{lin_gain, lin_modes, vn_frequency}
## @end deftypefn

function [num, den, zeros, gain] = lin_polynomials (A, B, C, D)

  if (nargin != 4)
    print_usage ();
  endif
  n = rows (A);
  if (! isnumeric (A) || columns (A) != n || ! isnumeric (B)
      || ! isequal (size (B), [n 1]) || ! isnumeric (C)
      || ! isequal (size (C), [1 n]) || ! isnumeric (D) || ! isscalar (D))
    error ("Octave:invalid-input-arg",
           ["lin_polynomials: sizes of A %s, B %s, C %s, D %s do not form ", ...
            "a one-input, one-output model (need n x n, n x 1, 1 x n, 1 x 1)"],
           mat2str (size (A)), mat2str (size (B)), mat2str (size (C)),
           mat2str (size (D)));
  endif
  A = full (A);  B = full (B);  C = full (C);  D = full (D);

  den = poly (A);
  pbc = poly (A - B * C);
  num = pbc - den + D * den;
  ## The leading terms of the difference cancel; keep only what stands out
  ## of the round-off of the two characteristic polynomials.
  tol = 1e3 * (n + 1) * eps * max ([1, abs(pbc), abs(den)]);
  if (D == 0)
    num = num(2:end);
  endif
  first = find (abs (num) > tol, 1);
  if (isempty (first))
    num = 0;
  else
    num = num(first:end);
  endif
  zeros = roots (num);

  if (nargout > 3)
    gain = lin_gain (A, B, C, D);
  endif

endfunction

%!test
%! ## First order K/(tau s + 1), K 2, tau 5 (analytic).
%! [num, den, z, g] = lin_polynomials (-1/5, 1, 2/5, 0);
%! assert (num, 0.4, 1e-14);
%! assert (den, [1 0.2], 1e-14);
%! assert (isempty (z));
%! assert (g, 2, 1e-14);

%!test
%! ## Integrator 3/s plus D 1: (s + 3)/s, Inf gain (analytic).
%! [num, den, z, g] = lin_polynomials (0, 1, 3, 1);
%! assert (num, [1 3], 1e-14);
%! assert (den, [1 0]);
%! assert (z, -3, 1e-14);
%! assert (g, Inf);

%!error <one-input> lin_polynomials (eye (2), [1; 1], [1 1 1], 0)

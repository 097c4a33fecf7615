## -*- texinfo -*-
## @deftypefn {} {[@var{poles}, @var{tau}, @var{zeta}, @var{wn}] =} lin_modes (@var{A})
## Return the poles of a linear model with their time constants, damping
## ratios and natural frequencies.
##
## @var{A} is the square state matrix (full or sparse).  All outputs are
## columns with one row per pole, sorted slowest first: by increasing
## @code{abs (real (pole))}, then by increasing @code{abs (imag (pole))}; the
## two poles of a complex pair are adjacent, positive imaginary part first.
##
## @table @var
## @item tau
## time constant @code{-1/real (pole)} in the time unit of @var{A}; Inf for a
## pole at zero (an integrator), negative for an unstable pole.
## @item zeta
## damping ratio @code{-real (pole) / abs (pole)}, for every pole: 1 for a
## stable real pole, -1 for an unstable real pole, NaN for a pole at zero.
## @item wn
## natural frequency @code{abs (pole)} (rad per time unit).
## @end table
##
## Imaginary parts below @code{1e-10 * abs (pole)} are round-off of the
## eigenvalue solver and are set to zero, so such poles count as real.
## @seealso{lin_polynomials, vn_frequency}
## @end deftypefn

function [poles, tau, zeta, wn] = lin_modes (A)

  if (nargin != 1)
    print_usage ();
  endif
  if (! isnumeric (A) || ! ismatrix (A) || rows (A) != columns (A))
    error ("Octave:invalid-input-arg",
           "lin_modes: A must be a square numeric matrix, got %s of size %s",
           class (A), mat2str (size (A)));
  endif
  if (! all (isfinite (A(:))))
    error ("Octave:invalid-input-arg",
           "lin_modes: A must hold finite numbers (found Inf or NaN)");
  endif

  poles = eig (full (A));
  poles = poles(:);
  ## Round-off can leave a tiny imaginary part on a real pole.
  small = abs (imag (poles)) <= 1e-10 * abs (poles);
  poles(small) = real (poles(small));

  [~, order] = sortrows ([abs(real(poles)), abs(imag(poles)), -imag(poles)]);
  poles = poles(order);

  re = real (poles);
  tau = -1 ./ re;
  tau(re == 0) = Inf;
  wn = abs (poles);
  zeta = -re ./ wn;
  zeta(wn == 0) = NaN;

endfunction

%!test
%! ## Real poles -1 and -0.1 and a pair with zeta 0.5, wn 10 (analytic).
%! wd = 10 * sqrt (0.75);
%! A = blkdiag (-1, [-5, wd; -wd, -5], -0.1);
%! [p, tau, zeta, wn] = lin_modes (A);
%! assert (p, [-0.1; -1; -5+1i*wd; -5-1i*wd], 1e-12);
%! assert (tau, [10; 1; 0.2; 0.2], 1e-12);
%! assert (zeta, [1; 1; 0.5; 0.5], 1e-12);
%! assert (wn, [0.1; 1; 10; 10], 1e-12);

%!test
%! ## An integrator first, with Inf time constant and NaN damping.
%! [p, tau, zeta] = lin_modes (sparse ([-2 0; 0 0]));
%! assert (p, [0; -2]);
%! assert (tau, [Inf; 0.5]);
%! assert (isnan (zeta(1)) && zeta(2) == 1);

%!error <square> lin_modes (ones (2, 3))

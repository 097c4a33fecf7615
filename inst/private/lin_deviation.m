## -*- texinfo -*-
## @deftypefn {} {@var{Y} =} lin_deviation (@var{A}, @var{B}, @var{C}, @var{D}, @var{du}, @var{t})
## Return the exact step response of a linear model.
##
## The model @code{dx/dt = A x + B u, y = C x + D u} starts at its steady
## state (x = 0) and the inputs step by @var{du} (one value per input) at
## t = 0.  @var{Y} holds the output deviations, one row per time in @var{t}
## and one column per output; rows for t < 0 are zero and the row for t = 0
## is @code{D du}.
##
## The response is not integrated: with the augmented matrix
## @code{M = [A, B du; 0, 0]} the state is the last column of
## @code{expm (M t)}, which holds for a singular A too (integrating
## processes give ramps).  For equally spaced times one exponential of the
## spacing is applied repeatedly; otherwise one exponential is taken per
## time.  Sparse A is converted to full; models above 3000 states are
## refused (error id @qcode{"vesselnet:too-large"}), as the dense
## exponential would take too long.
## @seealso{step_metrics, lin_modes}
## @end deftypefn

function Y = lin_deviation (A, B, C, D, du, t)

  if (nargin != 6)
    print_usage ();
  endif
  n = rows (A);
  if (! isnumeric (A) || columns (A) != n)
    error ("Octave:invalid-input-arg",
           "lin_deviation: A must be square, got size %s", mat2str (size (A)));
  endif
  m = columns (B);
  if (! isnumeric (B) || rows (B) != n || ! isnumeric (C) || columns (C) != n
      || ! isnumeric (D) || ! isequal (size (D), [rows(C), m]))
    error ("Octave:invalid-input-arg",
           "lin_deviation: sizes of A %s, B %s, C %s, D %s do not agree",
           mat2str (size (A)), mat2str (size (B)), mat2str (size (C)),
           mat2str (size (D)));
  endif
  if (! isnumeric (du) || ! isvector (du) || numel (du) != m
      || ! all (isfinite (du)))
    error ("Octave:invalid-input-arg",
           "lin_deviation: DU must hold %d finite step sizes (one per input), got %d",
           m, numel (du));
  endif
  if (! isnumeric (t) || ! isvector (t) || ! isreal (t) || ! all (isfinite (t)))
    error ("Octave:invalid-input-arg",
           "lin_deviation: T must be a vector of finite real times");
  endif
  if (n > 3000)
    error ("vesselnet:too-large",
           "lin_deviation: %d states exceed the 3000 for which the exact step is computed",
           n);
  endif

  du = du(:);
  t = t(:);
  nt = numel (t);
  p = rows (C);
  Y = zeros (nt, p);
  after = find (t >= 0);
  if (isempty (after))
    return;
  endif
  if (n == 0)
    Y(after,:) = repmat ((D * du).', numel (after), 1);
    return;
  endif

  M = [full(A), full(B) * du; zeros(1, n + 1)];
  z0 = [zeros(n, 1); 1];
  ta = t(after);
  X = zeros (n + 1, numel (ta));
  if (is_uniform (ta))
    h = (ta(end) - ta(1)) / max (numel (ta) - 1, 1);
    E = expm (M * h);
    X(:,1) = expm (M * ta(1)) * z0;
    for k = 2:numel (ta)
      X(:,k) = E * X(:,k-1);
    endfor
  else
    for k = 1:numel (ta)
      X(:,k) = expm (M * ta(k)) * z0;
    endfor
  endif
  Y(after,:) = (full (C) * X(1:n,:)).' + (full (D) * du).';

endfunction

## True when the times are increasing with one spacing (to round-off).
function u = is_uniform (t)
  if (numel (t) < 3)
    u = false;
    return;
  endif
  d = diff (t);
  u = all (d > 0) && (max (d) - min (d)) <= 1e-9 * max (abs (t));
endfunction

%!test
%! ## First order 2/(5 s + 1), step 0.5: y = 1 - exp(-t/5) (analytic).
%! t = (0:0.5:30)';
%! y = lin_deviation (-0.2, 1, 0.4, 0, 0.5, t);
%! assert (y, 1 - exp (-t / 5), 1e-13);

%!test
%! ## Integrator dx/dt = 3 u: a ramp 3 du t (analytic), nonuniform times.
%! t = [-1; 0; 0.3; 2; 7];
%! assert (lin_deviation (0, 3, 1, 0, 2, t), [0; 0; 1.8; 12; 42], 1e-12);

%!error <3 finite step sizes> lin_deviation (-1, [1 1 1], 1, [0 0 0], [1 2], 0:1)

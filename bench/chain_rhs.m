## -*- texinfo -*-
## @deftypefn  {} {@var{dVdt} =} chain_rhs (@var{t}, @var{V})
## @deftypefnx {} {[@var{dVdt}, @var{J}] =} chain_rhs (@var{t}, @var{V})
## Evaluate the benchmark tank chain, vectorised over the tanks.
##
## @var{V} is the column of tank volumes in m3 (N tanks, area 1 m2 each,
## bases and nozzles at 0).  Tank 1 receives 0.01 m3/s; orifice i joins
## tank i to tank i+1 (interacting) and the last orifice discharges tank N
## freely; every coefficient is 0.01 m^2.5/s.  The flow is
## c * ssqrt (dH) * gate (upstream level), with the signed square root and
## the smoothstep gate smoothed over a 1 mm band.  These are the same
## equations as bench/chain_floor.c, so the two baselines are comparable.
##
## @var{dVdt} is in m3/s.  With two outputs, @var{J} is the analytic
## Jacobian d(dVdt)/dV as a sparse tridiagonal matrix in 1/s.
##
## This is a benchmark model, not a user command.
## @seealso{chain_ode15s}
## @end deftypefn

function [dVdt, J] = chain_rhs (t, V)

  if (nargin != 2)
    print_usage ();
  endif
  if (! isreal (V) || ! iscolumn (V) || isempty (V))
    error ("Octave:invalid-input-arg",
           "chain_rhs: V (tank volumes, m3) must be a non-empty real column, got %dx%d",
           rows (V), columns (V));
  endif

  area = 1.0;      # m2
  feed = 0.01;     # m3/s
  coeff = 0.01;    # m^2.5/s
  band = 1e-3;     # m

  n = numel (V);
  h = V / area;
  hd = [h(2:end); 0];          # destination levels; 0 = atmosphere for tank N
  dH = h - hd;
  fwd = dH >= 0;
  fwd(n) = true;               # free discharge gates on tank N itself
  up = hd;
  up(fwd) = h(fwd);

  [sq, dsq] = ssqrt (dH, band);
  [g, dg] = smoothstep (up, band);
  q = coeff * sq .* g;
  dVdt = [feed; q(1:n-1)] - q;

  if (nargout > 1)
    ## a = dq/dh_source, b = dq/dh_destination; b(n) is unused (atmosphere)
    a = coeff * (dsq .* g + sq .* dg .* fwd);
    b = coeff * (-dsq .* g + sq .* dg .* ! fwd);
    diag0 = ([0; b(1:n-1)] - a) / area;
    sub = a(1:n-1) / area;          # row i+1, column i
    sup = -b(1:n-1) / area;         # row i, column i+1
    J = spdiags ([[sub; 0], diag0, [0; sup]], [-1 0 1], n, n);
  endif

endfunction

## Signed square root, cubic inside |x| < d, C1 at |x| = d.
function [y, dy] = ssqrt (x, d)
  y = sign (x) .* sqrt (abs (x));
  dy = 0.5 ./ sqrt (max (abs (x), d));
  in = abs (x) < d;
  u = x(in) / d;
  y(in) = sqrt (d) * (1.25 * u - 0.25 * u.^3);
  dy(in) = sqrt (d) * (1.25 - 0.75 * u.^2) / d;
endfunction

## Smoothstep gate: 0 at s <= 0, 1 at s >= d, 3r^2 - 2r^3 between.
function [g, dg] = smoothstep (s, d)
  r = min (max (s / d, 0), 1);
  g = r.^2 .* (3 - 2 * r);
  dg = (6 * r - 6 * r.^2) / d;
endfunction

%!test
%! ## Steady state of the chain: with F = c sqrt (dH) and F = 0.01 = c, every
%! ## orifice carries 0.01 m3/s at dH = 1 m, so h_i = N - i + 1 is at rest
%! ## (orifice law q = c sqrt (dH), common practice).
%! n = 6;
%! V = (n:-1:1)';
%! assert (chain_rhs (0, V), zeros (n, 1), 1e-15);

%!test
%! ## Mass balance: the changes add up to feed minus free outflow.
%! V = [2.5; 0.3; 1.7; 0.0004; 0.9];
%! f = chain_rhs (0, V);
%! assert (sum (f), 0.01 - 0.01 * sqrt (0.9), 1e-15);

%!test
%! ## Inside the band: ssqrt (d/2) = sqrt (d) (0.625 - 0.03125), gate 1.
%! ## Tank 1 at 1.0005 m over tank 2 at 1.0 m: q1 = 0.01 * 0.59375 * sqrt (1e-3).
%! f = chain_rhs (0, [1.0005; 1.0]);
%! q1 = 0.01 * 0.59375 * sqrt (1e-3);
%! assert (f(1), 0.01 - q1, 1e-15);
%! assert (f(2), q1 - 0.01, 1e-15);

%!test
%! ## Reversed flow gates on the destination: tank 1 at 0, tank 2 at 0.0005 m
%! ## (half the band, gate 0.5); dH = -0.0005 gives q1 = -0.01 * 0.59375 * sqrt (1e-3) * 0.5.
%! f = chain_rhs (0, [0; 0.0005]);
%! assert (f(1), 0.01 + 0.01 * 0.59375 * sqrt (1e-3) * 0.5, 1e-15);

%!test
%! ## Analytic Jacobian against central differences, including both bands
%! ## and reversed flow.
%! i = (0:7)';
%! general = 1 + 0.5 * sin (1.3 * i);
%! low = 4e-4 + 3e-4 * sin (0.7 * i);    # levels inside the gate band
%! near = 1 + 4e-4 * sin (2.1 * i);      # differences inside the ssqrt band
%! rising = 0.2 + 0.05 * i;              # every flow reversed
%! cases = {ones(5, 1), general, low, near, rising};
%! for k = 1:numel (cases)
%!   V = cases{k};
%!   [~, J] = chain_rhs (0, V);
%!   n = numel (V);
%!   Jfd = zeros (n);
%!   e = 1e-8;
%!   for j = 1:n
%!     dv = zeros (n, 1);
%!     dv(j) = e;
%!     Jfd(:,j) = (chain_rhs (0, V + dv) - chain_rhs (0, V - dv)) / (2 * e);
%!   endfor
%!   assert (issparse (J));
%!   assert (full (J), Jfd, 1e-5 * max (abs (Jfd(:))));
%! endfor

%!error <V \(tank volumes, m3\)> chain_rhs (0, [1 2])
%!error chain_rhs (0)

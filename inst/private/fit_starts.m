## -*- texinfo -*-
## @deftypefn {} {[@var{th}, @var{r}, @var{J}, @var{info}, @var{starts}] =} fit_starts (@var{fun}, @var{P}, @var{th0}, @var{lo}, @var{hi}, @var{opt})
## Run fit_lm from @code{opt.starts} starts and keep the best.  Start 1 is
## @var{th0} (the values on the network); the others form a Latin
## hypercube in the fit's coordinates (logarithms for positive
## parameters) over the box @code{[P.slo, P.shi]}: each coordinate's range
## cut into N - 1 equal strata, one point drawn in each, the strata of the
## coordinates paired at random (a fixed seed, so a fit repeats).  A start
## whose model fails is recorded and skipped; when all fail the error
## names the first failure.
##
## @var{starts} reports @code{theta0} and @code{value} (starts x
## parameters, values not logarithms; NaN where a start failed),
## @code{ssr}, @code{reason} (per start), @code{best} (its number),
## @code{reached} (logical: the start ended within 1e-6 relative of the
## best sum of squares) and @code{spread} ([min max] per parameter of the
## optima the starts reached).
## @end deftypefn

function [th, r, J, info, starts] = fit_starts (fun, P, th0, lo, hi, opt)
  n = opt.starts;
  np = numel (th0);
  T = zeros (n, np);
  T(1, :) = th0(:).';
  if (n > 1)
    slo = fit_values (P, [P.slo], "inverse").';
    shi = fit_values (P, [P.shi], "inverse").';
    T(2:end, :) = slo + (shi - slo) .* hypercube (n - 1, np);
  endif
  starts = struct ("theta0", NaN (n, np), "value", NaN (n, np),
                   "ssr", NaN (n, 1), "reason", {cell(n, 1)}, "best", 0,
                   "reached", false (n, 1), "spread", NaN (np, 2));
  best = Inf;
  firstfail = "";
  for k = 1:n
    starts.theta0(k, :) = fit_values (P, T(k, :)).';
    try
      [thk, rk, Jk, ik] = fit_lm (fun, T(k, :).', lo, hi, opt);
    catch err
      if (any (strcmp (err.identifier, {"vesselnet:interrupted", "Octave:interrupt"})))
        rethrow (err);
      endif
      if (n == 1)
        rethrow (err);
      endif
      starts.reason{k} = err.message;
      if (isempty (firstfail))
        firstfail = sprintf ("start %d: %s", k, err.message);
      endif
      continue;
    end_try_catch
    starts.value(k, :) = fit_values (P, thk).';
    starts.ssr(k) = ik.ssr;
    starts.reason{k} = ik.reason;
    if (ik.ssr < best)
      best = ik.ssr;
      th = thk;
      r = rk;
      J = Jk;
      info = ik;
      starts.best = k;
    endif
  endfor
  if (starts.best == 0)
    error ("vesselnet:fit-not-converged",
           "vn_fit: the model cannot be run from any of the %d starts (%s); give starting values nearer the plant's or narrower \"bounds\"",
           n, firstfail);
  endif
  starts.reached = starts.ssr <= best * (1 + 1e-6) + realmin;
  ok = ! isnan (starts.ssr);
  starts.spread = [min(starts.value(ok, :), [], 1).', ...
                   max(starts.value(ok, :), [], 1).'];
endfunction

## N points in [0, 1]^d, one in each of N strata of every coordinate.
function U = hypercube (n, d)
  old = rand ("state");
  rand ("state", 20261203);
  U = zeros (n, d);
  for j = 1:d
    U(:, j) = (randperm (n).' - 1 + rand (n, 1)) / n;
  endfor
  rand ("state", old);
endfunction

## -*- texinfo -*-
## @deftypefn {} {[@var{p}, @var{info}] =} fopdt_lm (@var{fun}, @var{p0}, @var{maxiter})
## @deftypefnx {} {[@var{p}, @var{info}] =} fopdt_lm (@var{fun}, @var{p0}, @var{maxiter}, @var{plo}, @var{rfloor})
## Minimise the sum of squares of the residual vector @code{fun (p)} by
## Levenberg-Marquardt steps with Marquardt's diagonal scaling and a
## central-difference Jacobian.  @var{plo} (default -Inf) are lower
## bounds: a parameter that reaches its bound while the cost still falls
## beyond it stays there and the others go on, so a dead time of none
## (its log falling without end) converges instead of using up the
## iterations.  A root-mean-square residual at or below @var{rfloor}
## (default 0) is an exact fit and ends the search.  @var{info} has fields J (Jacobian of the residuals at
## @var{p}), ssr, iterations and converged.
## @end deftypefn

function [p, info] = fopdt_lm (fun, p0, maxiter, plo, rfloor)

  p = p0(:);
  if (nargin < 4 || isempty (plo))
    plo = -Inf (size (p));
  endif
  if (nargin < 5)
    rfloor = 0;
  endif
  plo = plo(:);
  p = max (p, plo);
  r = fun (p);
  ssr = r' * r;
  mu = 1e-3;
  ## A parameter driven to its bound (a dead time of zero, in log form)
  ## leaves a flat column; the damped step stays defined, so the solver's
  ## singularity warnings say nothing useful here.
  warning ("off", "Octave:singular-matrix", "local");
  warning ("off", "Octave:nearly-singular-matrix", "local");
  converged = false;
  it = 0;
  while (it < maxiter && ! converged)
    it += 1;
    J = jacobian (fun, p);
    A = J' * J;
    g = J' * r;
    ## Floor the scaling so a column that has gone flat stays solvable.
    d = diag (A);
    d = max (d, 1e-12 * max ([d; realmin]));
    ## held: at its bound with the descent pointing below it
    free = ! (p <= plo & g > 0);
    accepted = false;
    while (mu < 1e12)
      dp = zeros (size (p));
      dp(free) = -(A(free,free) + mu * diag (d(free))) \ g(free);
      pn = max (p + dp, plo);
      dp = pn - p;
      rn = fun (pn);
      ssrn = rn' * rn;
      if (isfinite (ssrn) && ssrn < ssr)
        accepted = true;
        mu = max (mu / 3, 1e-12);
        break;
      endif
      mu *= 4;
    endwhile
    if (! accepted)
      ## No step lowers the cost: a (numerical) minimum.
      converged = true;
      break;
    endif
    small_step = norm (dp ./ max (abs (p), 1)) < 1e-10;
    small_gain = (ssr - ssrn) <= 1e-14 * ssr;
    p = pn;
    r = rn;
    ssr = ssrn;
    exact = ssr <= numel (r) * rfloor^2;
    converged = small_step || small_gain || exact;
  endwhile

  info.J = jacobian (fun, p);
  info.ssr = ssr;
  info.iterations = it;
  info.converged = converged;

endfunction

function J = jacobian (fun, p)

  np = numel (p);
  for i = np:-1:1
    h = 1e-5 * max (abs (p(i)), 1);
    e = zeros (np, 1);
    e(i) = h;
    J(:,i) = (fun (p + e) - fun (p - e)) / (2 * h);
  endfor

endfunction

## -*- texinfo -*-
## @deftypefn {} {[@var{theta}, @var{r}, @var{J}, @var{info}] =} fit_lm (@var{fun}, @var{theta}, @var{lo}, @var{hi}, @var{opt})
## Levenberg-Marquardt minimisation of sum (r.^2) over @var{theta} (log
## parameters) within bounds [@var{lo}, @var{hi}].  @code{[r, J] = fun
## (theta)} gives residuals and their Jacobian.  Marquardt's scaling by
## the diagonal of J'J keeps steps fair to parameters of any size.
## @end deftypefn

function [theta, r, J, info] = fit_lm (fun, theta, lo, hi, opt)
  theta = min (max (theta(:), lo(:)), hi(:));
  [r, J] = fun (theta);
  f = r' * r;
  lambda = 1e-3;
  reason = sprintf ("iteration limit (%d) reached", opt.maxiter);
  it = 0;
  for it = 1:opt.maxiter
    g = J' * r;
    H = J' * J;
    d = max (diag (H), eps * max (diag (H)) + realmin);
    if (norm (g ./ sqrt (d), Inf) <= opt.tol * max (sqrt (f), eps))
      reason = "gradient below tolerance";
      it -= 1;
      break;
    endif
    accepted = false;
    tiny = false;
    while (lambda < 1e16)
      step = - (H + lambda * diag (d)) \ g;
      tn = min (max (theta + step, lo(:)), hi(:));
      if (norm (tn - theta, Inf) <= opt.tol)
        tiny = true;                    # nothing left to gain
        break;
      endif
      ## the trial carries its Jacobian: once accepted, no second run
      [rn, Jn] = fun (tn);
      fn = rn' * rn;
      if (isfinite (fn) && fn < f)
        accepted = true;
        break;
      endif
      lambda *= 10;
    endwhile
    if (tiny)
      reason = "relative change of the parameters below tolerance";
      it -= 1;
      break;
    endif
    if (! accepted)
      reason = "no step lowers the sum of squares (at the minimum to working precision)";
      it -= 1;                          # a failed search is no iteration
      break;
    endif
    dtheta = norm (tn - theta, Inf);
    df = (f - fn) / max (f, realmin);
    theta = tn;
    r = rn;
    J = Jn;
    f = fn;
    lambda = max (lambda / 10, 1e-12);
    if (opt.verbose)
      printf ("vn_fit: iteration %3d  sum of squares %.6g  step %.3g (log)  lambda %.2g\n",
              it, f, dtheta, lambda);
    endif
    if (dtheta <= opt.tol)
      reason = "relative change of the parameters below tolerance";
      break;
    endif
    if (df <= opt.tol ^ 2)
      reason = "relative change of the sum of squares below tolerance";
      break;
    endif
  endfor
  info.iterations = it;
  info.reason = reason;
  info.ssr = f;
endfunction

## -*- texinfo -*-
## @deftypefn {} {[@var{theta}, @var{r}, @var{J}, @var{info}] =} fit_lm (@var{fun}, @var{theta}, @var{lo}, @var{hi}, @var{opt})
## Levenberg-Marquardt minimisation of sum (r.^2) over @var{theta} (the
## fit's coordinates: logarithms or values) within bounds [@var{lo},
## @var{hi}].  @code{[r, J] = fun (theta)} gives residuals and their
## Jacobian.  Marquardt's scaling by the diagonal of J'J keeps steps fair
## to parameters of any size.
##
## Robustness: a step longer than @code{opt.maxstep} (per coordinate: 1 in
## log space, a factor of e) is shortened along its direction; a trial
## whose model fails (an error from any command it calls, a value the
## network refuses, a solver failure) or whose residuals are not finite is
## rejected like a step that does not lower the sum of squares, and the
## damping raised.  Only a failure at the start itself is an error, raised
## as "vn_fit: ..." with id vesselnet:fit-not-converged.  Ctrl-C is passed
## on.  @code{info} holds @code{iterations}, @code{reason} (in words),
## @code{ssr}, @code{rejected} (failed trials) and @code{lastfail}.
## @end deftypefn

function [theta, r, J, info] = fit_lm (fun, theta, lo, hi, opt)
  ## a parameter the data do not see makes the damped system near-singular;
  ## the damping still gives a usable step
  warning ("off", "Octave:singular-matrix", "local");
  warning ("off", "Octave:nearly-singular-matrix", "local");
  lo = lo(:);
  hi = hi(:);
  maxstep = opt.maxstep(:);
  theta = min (max (theta(:), lo), hi);
  [r, J, msg] = trial (fun, theta);
  if (! isempty (msg))
    error ("vesselnet:fit-not-converged",
           "vn_fit: the model cannot be run at the starting values: %s", msg);
  endif
  f = r' * r;
  lambda = 1e-3;
  reason = sprintf ("iteration limit (%d) reached", opt.maxiter);
  rejected = 0;
  lastfail = "";
  it = 0;
  for it = 1:opt.maxiter
    g = J' * r;
    H = J' * J;
    d = max (diag (H), eps * max (diag (H)) + realmin);
    ## projected gradient: components pushing against an active bound do
    ## not count
    gp = g;
    gp((theta <= lo & g > 0) | (theta >= hi & g < 0)) = 0;
    if (norm (gp ./ sqrt (d), Inf) <= opt.tol * max (sqrt (f), eps))
      reason = "gradient below tolerance (a minimum)";
      it -= 1;
      break;
    endif
    accepted = false;
    tiny = false;
    while (lambda < 1e16)
      step = - (H + lambda * diag (d)) \ g;
      over = max (abs (step) ./ maxstep);
      if (over > 1)
        step /= over;
      endif
      tn = min (max (theta + step, lo), hi);
      if (norm (tn - theta, Inf) <= opt.tol)
        tiny = true;                    # nothing left to gain
        break;
      endif
      ## the trial carries its Jacobian: once accepted, no second run
      [rn, Jn, msg] = trial (fun, tn);
      if (isempty (msg))
        fn = rn' * rn;
        if (fn < f)
          accepted = true;
          break;
        endif
      else
        rejected += 1;
        lastfail = msg;
      endif
      lambda *= 10;
    endwhile
    if (tiny)
      reason = "relative change of the parameters below tolerance";
      it -= 1;
      break;
    endif
    if (! accepted)
      reason = "no step lowers the sum of squares (a minimum to working precision)";
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
      printf ("vn_fit: iteration %3d  sum of squares %.6g  step %.3g  lambda %.2g\n",
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
  if (rejected > 0)
    reason = sprintf ("%s; %d trial step(s) were rejected because the model failed there",
                      reason, rejected);
  endif
  info.iterations = it;
  info.reason = reason;
  info.ssr = f;
  info.rejected = rejected;
  info.lastfail = lastfail;
endfunction

## Run the model; any failure comes back as a message, not an error.
function [r, J, msg] = trial (fun, theta)
  msg = "";
  r = [];
  J = [];
  try
    [r, J] = fun (theta);
  catch err
    if (any (strcmp (err.identifier, {"vesselnet:interrupted", "Octave:interrupt"})))
      rethrow (err);
    endif
    ## the command that failed inside the fit is not the user's call
    msg = regexprep (err.message, '^_*vn_\w+?_*: ', '');
    return;
  end_try_catch
  if (! all (isfinite (r)))
    msg = sprintf ("%d residual(s) are not finite", nnz (! isfinite (r)));
  elseif (! all (isfinite (J(:))))
    msg = "the sensitivities are not finite";
  endif
endfunction

%!function [r, J] = fails_past (th)
%!  global visited
%!  if (th > 2.5)
%!    error ("vn_linearize: tank \"T1\": area must lie in [1e-09, 1e+09] (m2), got 0");
%!  endif
%!  visited(end+1) = th;
%!  r = th - 3;
%!  J = 1;
%!endfunction

## A quadratic in one coordinate, minimum at 3, whose "model" fails past
## 2.5: the failing trials are rejected, the fit ends at the edge of the
## region that runs with no error, and every step is at most 1.
%!test
%! global visited
%! visited = [];
%! opt = struct ("maxiter", 50, "tol", 1e-8, "verbose", false, "maxstep", 1);
%! [th, r, J, info] = fit_lm (@fails_past, 0, -Inf, Inf, opt);
%! assert (th <= 2.5 && th > 2.4);
%! assert (info.rejected > 0);
%! assert (info.lastfail, "tank \"T1\": area must lie in [1e-09, 1e+09] (m2), got 0");
%! assert (max (abs (diff (visited))) <= 1 + 1e-12);
%! assert (! isempty (strfind (info.reason, "rejected because the model failed")));

## a failure at the start is an error of vn_fit
%!error <vn_fit: the model cannot be run at the starting values: tank "T1"> fit_lm (@fails_past, 3, -Inf, Inf, struct ("maxiter", 5, "tol", 1e-8, "verbose", false, "maxstep", 1))

## bounds hold: the minimum at 3 lies beyond an upper bound of 1
%!test
%! opt = struct ("maxiter", 50, "tol", 1e-10, "verbose", false, "maxstep", 1);
%! [th, ~, ~, info] = fit_lm (@(x) deal (x - 3, 1), 0, -Inf, 1, opt);
%! assert (th, 1);


## -*- texinfo -*-
## @deftypefn {} {@var{st} =} fit_stats (@var{J}, @var{r}, @var{p}, @var{dp}, @var{names})
## Standard errors, 95 % intervals (Student's t) and correlations of a
## least-squares fit from the Jacobian @var{J} of the weighted residuals
## with respect to the fit's coordinates th (log p or p), @var{dp} = d p /
## d th.  The covariance of th is s^2 (J'J)^-1 with s^2 the residual
## variance, so the sigmas given need only be right relative to each
## other; standard errors of p are |dp| times those of th (first order).  Warns "vesselnet:fit-ill-conditioned", naming the
## parameters, when J'J is near-singular or two estimates correlate
## beyond 0.99.  A parameter the residuals do not depend on (unseen),
## or one in a combination they do not depend on (unresolved: an
## eigenvalue of the scaled J'J at roundoff), gets an infinite standard
## error and interval and NaN covariance entries.
## @end deftypefn

function st = fit_stats (J, r, p, dp, names)
  p = p(:);
  dp = dp(:);
  [m, n] = size (J);
  dof = m - n;
  H = J' * J;
  sc = sqrt (diag (H));
  ## a parameter the residuals do not move (a rim above every level the
  ## test reached) has no interval: Inf, not the zero pinv would give
  unseen = sc <= 1e-8 * max (sc);
  sc(sc == 0) = 1;
  Hs = H ./ (sc * sc');
  rc = rcond (Hs);
  if (dof > 0)
    s2 = (r' * r) / dof;
  else
    s2 = NaN;
  endif
  ## the inverse through the eigenvectors: a direction the data do not
  ## see at all (eigenvalue at roundoff) leaves the parameters that share
  ## it with no interval, rather than the zero variance a pseudo-inverse
  ## would give them; a merely weak direction gives wide intervals
  [V, ev] = eig ((Hs + Hs') / 2);
  ev = diag (ev);
  flat = ev <= n * eps * max (ev);
  Cs = V(:, ! flat) * diag (1 ./ ev(! flat)) * V(:, ! flat)';
  unresolved = ! unseen & any (abs (V(:, flat)) > 1e-6, 2);
  C = s2 * Cs ./ (sc * sc');           # covariance of th
  se = abs (dp) .* sqrt (max (diag (C), 0));
  d = sqrt (max (diag (Cs), realmin));
  R = Cs ./ (d * d');
  none = unseen | unresolved;
  se(none) = Inf;
  C(none, :) = NaN;
  C(:, none) = NaN;
  R(none, :) = NaN;
  R(:, none) = NaN;
  if (dof > 0)
    tq = fit_tquantile (0.975, dof);
  else
    tq = NaN;
  endif
  st.stderr = se;
  st.ci = [p - tq * se, p + tq * se];
  st.corr = R;
  st.cov = C;
  st.dof = dof;
  st.tquantile = tq;
  st.rcond = rc;
  st.unseen = unseen;
  st.unresolved = unresolved;
  bad = {};
  if (rc < 1e-12)
    weak = find (unseen);
    bad{end+1} = sprintf ("the information matrix is near-singular (rcond %.2g)%s",
                          rc, listed (names, weak));
  endif
  if (any (unseen) && rc >= 1e-12)
    bad{end+1} = sprintf ("not seen by the data: %s", strjoin (names(unseen), ", "));
  endif
  [i, j] = find (triu (abs (R) > 0.99, 1));
  for k = 1:numel (i)
    bad{end+1} = sprintf ("%s and %s correlate (%.4f)", names{i(k)},
                          names{j(k)}, R(i(k), j(k)));
  endfor
  if (! isempty (bad))
    warning ("vesselnet:fit-ill-conditioned",
             "vn_fit: the data cannot tell the parameters apart: %s; fix one of them or add a test that excites it",
             strjoin (bad, "; "));
  endif
endfunction

function s = listed (names, idx)
  if (isempty (idx))
    s = sprintf (" among %s", strjoin (names, ", "));
  else
    s = sprintf ("; not seen by the data: %s", strjoin (names(idx), ", "));
  endif
endfunction

## -*- texinfo -*-
## @deftypefn {} {[@var{t}, @var{v}] =} fit_breakpoints (@var{t}, @var{v}, @var{hold})
## Keep only the samples of an input where it changes course, so the
## integrator restarts at the steps and ramps of a test and not at every
## sample.  Held inputs keep the samples where the value changes;
## interpolated ones where the slope changes.  The signal is the same.
## @end deftypefn

function [t, v] = fit_breakpoints (t, v, hold)
  t = t(:);
  v = v(:);
  n = numel (t);
  if (n <= 2)
    return;
  endif
  tol = 1e-12 * max (abs (v));
  if (hold)
    keep = [true; abs(diff (v)) > tol];
  else
    slope = diff (v) ./ diff (t);
    ts = max (diff (t));
    keep = [true; abs(diff (slope)) * ts > tol; true];
  endif
  keep(n) = true;
  t = t(keep);
  v = v(keep);
endfunction

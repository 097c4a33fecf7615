## -*- texinfo -*-
## @deftypefn {} {[@var{held}, @var{how}, @var{v}, @var{nfill}] =} fit_hold (@var{t}, @var{v}, @var{hold})
## The intersample rule of one input of a test.  @var{hold} is true, false
## or "auto".  "auto" holds an input whose sample-to-sample changes are
## isolated (no two consecutive changes go the same way: a step, a bump,
## a one-sample pulse) and interpolates any other linearly (a ramp or a
## noisy measured signal moves the same way at consecutive samples).
## Changes below 1e-9 of the largest magnitude do not count.  NaN samples
## are filled by the chosen rule from their neighbours (held: the last
## good value, the first good one before it; linear: interpolation, the
## nearest good value at the ends) and counted in @var{nfill}.  @var{how}
## says in words what was decided and why.
## @end deftypefn

function [held, how, v, nfill] = fit_hold (t, v, hold)
  t = t(:);
  v = v(:);
  good = ! isnan (v);
  nfill = nnz (! good);
  vg = v(good);
  tol = 1e-9 * max ([abs(vg); realmin]);
  d = diff (vg);
  d(abs (d) <= tol) = 0;
  s = sign (d);
  nch = nnz (s);
  if (ischar (hold))
    same = s(1:end-1) .* s(2:end) > 0;
    held = ! any (same);
    if (nch == 0)
      how = "held (auto: constant)";
    elseif (held)
      how = sprintf ("held (auto: %d isolated change(s), a stepped input)", nch);
    else
      how = sprintf ("linear (auto: %d consecutive change(s) the same way, a ramp or measured signal)",
                     nnz (same));
    endif
  elseif (hold)
    held = true;
    how = "held (given)";
  else
    held = false;
    how = "linear (given)";
  endif
  if (nfill > 0)
    tg = t(good);
    if (held)
      ## index of the last good sample at or before each time
      idx = cumsum (good);
      idx(idx == 0) = 1;
      v = vg(idx);
    elseif (numel (tg) == 1)
      v(:) = vg;
    else
      v = interp1 (tg, vg, t, "linear");
      v(t < tg(1)) = vg(1);
      v(t > tg(end)) = vg(end);
    endif
  endif
endfunction

## a step sampled every 10 s: one isolated change, held
%!test
%! [h, how] = fit_hold (0:10:100, [1 1 1 1 2 2 2 2 2 2 2], "auto");
%! assert (h, true);
%! assert (how, "held (auto: 1 isolated change(s), a stepped input)");
## a one-sample pulse (bump test) and a double step: held
%!assert (fit_hold (0:6, [0 0 1 0 0 0 0], "auto"), true)
%!assert (fit_hold (0:6, [0 0 1 1 3 3 0], "auto"), true)
## a ramp, and a noisy measured flow: linear
%!assert (fit_hold (0:6, [0 0 1 2 3 3 3], "auto"), false)
%!test
%! randn ("state", 3);
%! [h, how] = fit_hold (0:99, 0.01 + 1e-4 * randn (1, 100), "auto");
%! assert (h, false);
%! assert (strncmp (how, "linear (auto:", 13));
## constant: held; given rules are kept
%!assert (fit_hold (0:3, [2 2 2 2], "auto"), true)
%!assert (fit_hold (0:3, [0 1 2 3], true), true)
%!assert (fit_hold (0:3, [0 1 0 1], false), false)
## gaps: a held input keeps its last good value (the first good one at the
## start), a linear one is interpolated; NaN does not count as a change
%!test
%! [h, ~, v, n] = fit_hold (0:5, [NaN 1 NaN 2 NaN 2], "auto");
%! assert (h, true);
%! assert (v.', [1 1 1 2 2 2]);
%! assert (n, 3);
%! [h, ~, v, n] = fit_hold (0:4, [NaN 1 NaN 3 NaN], false);
%! assert (v.', [1 1 2 3 3]);
%! assert (n, 3);

## Random cases: 200 stepped inputs (each value kept for 2 to 6 samples,
## any jumps) are held; 200 ramps (3 or more samples rising or falling in
## a row between flat stretches) and 50 noisy measured signals are linear
%!test
%! rand ("state", 4);
%! randn ("state", 4);
%! for k = 1:200
%!   v = repelem (round (100 * rand (1, 8)) / 10, randi ([2 6], 1, 8));
%!   assert (fit_hold (1:numel (v), v, "auto"), true);
%!   n = randi ([3 10]);
%!   ramp = sign (rand () - 0.5) * (1:n) * (0.1 + rand ());
%!   r = [zeros(1, randi (5)), ramp, repmat(ramp(end), 1, randi (5))];
%!   assert (fit_hold (1:numel (r), r, "auto"), false);
%! endfor
%! for k = 1:50
%!   assert (fit_hold (1:200, 1 + 0.01 * randn (1, 200), "auto"), false);
%! endfor

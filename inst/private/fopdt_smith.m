## -*- texinfo -*-
## @deftypefn {} {@var{s} =} fopdt_smith (@var{t}, @var{y}, @var{ev}, @var{y0})
## Smith's two-point estimate of a first-order-plus-dead-time model from the
## response to the first input step in @var{ev} (zero-order-hold events),
## up to the next input change or the end of the record.  The final value is
## the mean of the last tenth of that portion; the crossing times of
## 1 - exp(-1/3) (28.3 %) and 1 - exp(-1) (63.2 %) are found by linear
## interpolation.  @var{s} has fields gain, tau, deadtime and ok.
## @end deftypefn

function s = fopdt_smith (t, y, ev, y0)

  s = struct ("gain", NaN, "tau", NaN, "deadtime", NaN, "ok", false);
  ts = ev.t(1);
  te = Inf;
  if (numel (ev.t) > 1)
    te = ev.t(2);
  endif
  in = t >= ts & t <= te & isfinite (y);
  tt = t(in) - ts;
  yy = y(in);
  if (numel (tt) < 4)
    return;
  endif

  nl = max (3, ceil (0.1 * numel (tt)));
  yinf = mean (yy(end-nl+1:end));
  dy = yinf - y0;
  s.gain = dy / ev.d(1);
  if (dy == 0)
    return;
  endif
  f = (yy - y0) / dy;
  ta = crossing (tt, f, 1 - exp (-1/3));
  tb = crossing (tt, f, 1 - exp (-1));
  if (isnan (ta) || isnan (tb) || tb <= ta)
    return;
  endif
  s.tau = 1.5 * (tb - ta);
  s.deadtime = tb - s.tau;
  s.ok = true;

endfunction

## First time the normalised response f reaches level, interpolated.
function tc = crossing (t, f, level)

  k = find (f >= level, 1);
  if (isempty (k))
    tc = NaN;
  elseif (k == 1)
    tc = t(1);
  else
    tc = t(k-1) + (level - f(k-1)) * (t(k) - t(k-1)) / (f(k) - f(k-1));
  endif

endfunction

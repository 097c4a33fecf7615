## -*- texinfo -*-
## @deftypefn  {} {@var{m} =} step_metrics (@var{t}, @var{y})
## @deftypefnx {} {@var{m} =} step_metrics (@var{t}, @var{y}, @var{du})
## @deftypefnx {} {@var{m} =} step_metrics (@dots{}, @var{name}, @var{value})
## Return the usual figures of one step response.
##
## @var{t} is the time column (increasing), @var{y} one response column as a
## deviation from its value before the step, and @var{du} the step size of
## the input (optional; [] when unknown).  Options:
##
## @table @asis
## @item @qcode{"initial"}
## value of @var{y} before the step, subtracted first (default 0).
## @item @qcode{"final"}
## final change of the output, when known (for example gain times step);
## default the last sample of the deviation.
## @item @qcode{"tstep"}
## time of the step (default @code{t(1)}); samples before it are ignored and
## all times below are measured from it.
## @end table
##
## Fields of @var{m}, times interpolated linearly between samples:
##
## @table @code
## @item gain
## final change / @var{du} (NaN without @var{du}).
## @item final
## the final change used.
## @item t63
## time to 63.212 % (1 - 1/e) of the final change.
## @item rise
## time from 10 % to 90 % of the final change.
## @item settle
## time after which the response stays within 2 % of the final change
## (the last exit from the band); NaN when still outside at the last sample.
## @item overshoot
## peak beyond the final change, percent of the final change (0 if none);
## the peak is refined by a parabola through the largest sample and its
## neighbours.
## @item peak
## time of that peak; NaN without overshoot.
## @item undershoot
## largest move opposite to the final change, percent of the final change.
## @item inverse
## true when the response first leaves a 1 % band moving the wrong way.
## @item deadtime
## apparent dead time: the first time the response passes 1 % of the final
## change in its direction (a threshold, not a tangent construction).
## @item settles
## true when the response settles away from zero within the record: the
## final change is finite, at least 1 % of the largest excursion, and the
## last sample lies within 2 % of it.  False for a response that returns
## to zero (a flow through a train of tanks whose outflow is held), one
## still moving at the end of the record, or an unknown (NaN) or infinite
## final change (an integrating output).
## @end table
##
## When the response does not settle every figure but @code{gain} and
## @code{final} is NaN (@code{inverse} false): a time to a fraction of a
## change that is not reached, or not known, means nothing.
## @seealso{lin_deviation}
## @end deftypefn

function m = step_metrics (t, y, varargin)

  if (nargin < 2)
    print_usage ();
  endif
  du = [];
  if (numel (varargin) > 0 && ! ischar (varargin{1}))
    du = varargin{1};
    varargin(1) = [];
  endif
  if (! (isempty (du) || (isnumeric (du) && isscalar (du) && isreal (du))))
    error ("Octave:invalid-input-arg",
           "step_metrics: DU must be a real scalar step size or []");
  endif
  y0 = 0;
  yf = [];
  ts = [];
  if (mod (numel (varargin), 2) != 0)
    error ("Octave:invalid-input-arg",
           "step_metrics: options must come in name, value pairs");
  endif
  for k = 1:2:numel (varargin)
    name = varargin{k};
    val = varargin{k+1};
    if (! ischar (name))
      error ("Octave:invalid-input-arg",
             "step_metrics: option names must be strings");
    endif
    if (! (isnumeric (val) && isscalar (val) && isreal (val)
           && (isfinite (val) || strcmpi (name, "final"))))
      error ("Octave:invalid-input-arg",
             "step_metrics: option \"%s\" must be a finite real scalar", name);
    endif
    switch (lower (name))
      case "initial"
        y0 = val;
      case "final"
        yf = val;
      case "tstep"
        ts = val;
      otherwise
        error ("Octave:invalid-input-arg",
               "step_metrics: unknown option \"%s\" (allowed: initial, final, tstep)",
               name);
    endswitch
  endfor

  t = t(:);
  y = y(:);
  if (! isnumeric (t) || ! isnumeric (y) || numel (t) != numel (y)
      || numel (t) < 2)
    error ("Octave:invalid-input-arg",
           "step_metrics: T and Y must be vectors of equal length >= 2 (got %d and %d)",
           numel (t), numel (y));
  endif
  if (! all (isfinite (t)) || any (diff (t) <= 0))
    error ("Octave:invalid-input-arg",
           "step_metrics: T must be finite and strictly increasing");
  endif
  if (isempty (ts))
    ts = t(1);
  endif
  keep = t >= ts;
  t = t(keep) - ts;
  d = y(keep) - y0;
  if (numel (t) < 2)
    error ("Octave:invalid-input-arg",
           "step_metrics: fewer than 2 samples at or after TSTEP %g", ts);
  endif
  if (isempty (yf))
    yf = d(end);
  endif

  m.gain = NaN;
  if (! isempty (du) && du != 0)
    m.gain = yf / du;
  endif
  m.final = yf;
  m.t63 = NaN;
  m.rise = NaN;
  m.settle = NaN;
  m.overshoot = NaN;
  m.peak = NaN;
  m.undershoot = NaN;
  m.inverse = false;
  m.deadtime = NaN;
  m.settles = false;
  if (! isfinite (yf) || abs (yf) <= 0.01 * max (abs (d)) || yf == 0)
    return;
  endif
  r = d / yf;
  if (abs (r(end) - 1) > 0.02)
    return;
  endif
  m.settles = true;

  m.t63 = first_crossing (t, r, 1 - exp (-1));
  m.rise = first_crossing (t, r, 0.9) - first_crossing (t, r, 0.1);
  m.settle = settling (t, r, 0.02);
  [rmax, kmax] = max (r);
  m.overshoot = 0;
  if (rmax > 1)
    [m.peak, rmax] = peak_of (t, r, kmax);
    m.overshoot = 100 * (rmax - 1);
  endif
  m.undershoot = 100 * max (0, -min (r));
  kout = find (abs (r) > 0.01, 1);
  m.inverse = ! isempty (kout) && r(kout) < 0;
  m.deadtime = first_crossing (t, r, 0.01);

endfunction

## First time r reaches level from below; NaN if it never does.
function tc = first_crossing (t, r, level)
  k = find (r >= level, 1);
  if (isempty (k))
    tc = NaN;
  elseif (k == 1)
    tc = t(1);
  else
    tc = t(k-1) + (t(k) - t(k-1)) * (level - r(k-1)) / (r(k) - r(k-1));
  endif
endfunction

## Time of the last exit from the band 1 +- tol.
function ts = settling (t, r, tol)
  k = find (abs (r - 1) > tol, 1, "last");
  if (isempty (k))
    ts = t(1);
  elseif (k == numel (r))
    ts = NaN;
  else
    edge = 1 + tol * sign (r(k) - 1);
    ts = t(k) + (t(k+1) - t(k)) * (edge - r(k)) / (r(k+1) - r(k));
  endif
endfunction

## Vertex of the parabola through the largest sample and its neighbours.
function [tp, rp] = peak_of (t, r, k)
  tp = t(k);
  rp = r(k);
  if (k > 1 && k < numel (r))
    ## in units of the sample spacing: spacings of 1e8 s or more made the
    ## Vandermonde matrix singular to machine precision (a warning)
    h = t(k+1) - t(k);
    c = polyfit ((t(k-1:k+1) - t(k)) / h, r(k-1:k+1), 2);
    if (c(1) < 0)
      dt = -c(2) / (2 * c(1));
      tp = t(k) + dt * h;
      rp = max (rp, polyval (c, dt));
    endif
  endif
endfunction

%!test
%! ## An overshoot on a time scale of 1e10 s, y = 1 - exp (-t/T) cos (t/T):
%! ## its peak at t = 3 pi T / 4 is 1 + exp (-3 pi / 4) / sqrt (2), 6.70 %
%! ## overshoot (analytic), found with no singular-matrix warning
%! T = 1e10;
%! t = (0:0.05:10)' * T;
%! lastwarn ("");
%! m = step_metrics (t, 1 - exp (-t / T) .* cos (t / T), 1, "final", 1);
%! assert (lastwarn (), "");
%! assert (m.overshoot, 100 * exp (-3 * pi / 4) / sqrt (2), 1e-3);

%!test
%! ## First order: 63.212 % at tau, 10-90 % rise tau ln 9 (analytic).
%! t = (0:0.01:50)';
%! m = step_metrics (t, 3 * (1 - exp (-t / 5)), 1.5, "final", 3);
%! assert (m.gain, 2);
%! assert (m.t63, 5, 1e-4);
%! assert (m.rise, 5 * log (9), 1e-4);
%! assert (m.settle, -5 * log (0.02), 1e-4);
%! assert (m.overshoot, 0);
%! assert (m.deadtime, -5 * log (0.99), 1e-4);
%! assert (! m.inverse);

%!test
%! ## Zero final change: figures that need it are NaN.
%! m = step_metrics ((0:10)', sin (0:10)' * 0, 1);
%! assert (m.gain, 0);
%! assert (isnan ([m.t63, m.rise, m.settle, m.overshoot, m.deadtime]));

%!test
%! ## settles: a first-order step does; a pulse that returns to zero, a
%! ## record stopped at one time constant, an unknown or infinite final
%! ## change do not, and their times are NaN (analytic responses).
%! t = (0:0.05:40)';
%! m = step_metrics (t, 1 - exp (-t / 5), 1, "final", 1);
%! assert (m.settles);
%! m = step_metrics (t, t / 5 .* exp (-t / 5), 1, "final", 0);
%! assert (! m.settles);
%! assert (isnan ([m.t63, m.rise, m.settle, m.overshoot]));
%! m = step_metrics (t(t <= 5), 1 - exp (-t(t <= 5) / 5), 1, "final", 1);
%! assert (! m.settles);
%! assert (isnan ([m.t63, m.rise, m.settle, m.overshoot]));
%! m = step_metrics (t, t, 1, "final", NaN);
%! assert (! m.settles);
%! assert (isnan (m.gain));
%! m = step_metrics (t, t, 2, "final", Inf);
%! assert ([m.gain, m.settles], [Inf, false]);

%!error <strictly increasing> step_metrics ([0 2 1], [0 1 1])
%!error <unknown option> step_metrics ([0 1 2], [0 1 1], 1, "foo", 2)

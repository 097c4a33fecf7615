## -*- texinfo -*-
## @deftypefn {} {[@var{t}, @var{v}, @var{clip}] =} signal_range (@var{fn}, @var{q}, @var{t}, @var{v}, @var{hold}, @var{what})
## Check a signal's table [@var{t} @var{v}] on the input @var{q} (from
## @code{vn_quantity}) against the input's range in the schema, under the
## command name @var{fn}.
##
## Times and values must be finite.  An input without a unit of measure
## (a valve's opening, a pump's relative speed) is a position whose range
## is its physical travel: a signal past it is clipped to the range, as the
## physics would, and the table returned is the clipped one, exactly (the
## times where a linear segment crosses a bound are added as points, so
## the clipped signal is again piecewise linear).  @var{clip} then holds
## the signal as given (@code{name}, @code{t}, @code{v}, @code{hold}) and
## the range (@code{lo}, @code{hi}) for @code{signal_clip_warn}; it is
## empty when nothing is clipped.  Any other input outside its range is
## an error, as a declared value outside it is at declaration.
## @var{what} (@qcode{"signal"}, default, or @qcode{"input"} for a
## constant value) begins the label of the messages.
## @end deftypefn

function [t, v, clip] = signal_range (fn, q, t, v, hold, what = "signal")
  clip = [];
  label = sprintf ("%s \"%s\"", what, q.name);
  bad = find (! isfinite (t) | ! isfinite (v), 1);
  if (! isempty (bad))
    error ("Octave:invalid-input-arg",
           "%s: %s: point %d must hold a finite time and value, got t = %s s, value %s",
           fn, label, bad, num2str (t(bad)), num2str (v(bad)));
  endif
  s = vn_schema ();
  k = s.(q.kind);
  j = q.slot + 1;
  lo = k.lo(j);
  hi = k.hi(j);
  uom = k.units{j};
  if (all (v >= lo & v <= hi))
    return;
  endif
  if (! strcmp (uom, "1"))
    [~, i] = max (max (v - hi, lo - v));
    at = "";
    if (strcmp (what, "signal"))
      at = sprintf (" at t = %.6g s", t(i));
    endif
    error ("Octave:invalid-input-arg",
           "%s: %s: values must lie in [%.6g, %.6g] (%s), got %.6g%s",
           fn, label, lo, hi, uom, v(i), at);
  endif
  clip = struct ("name", q.name, "t", t, "v", v, "hold", hold, "lo", lo,
                 "hi", hi);
  if (! hold)
    [t, v] = add_crossings (t, v, lo, hi);
  endif
  v = min (max (v, lo), hi);
endfunction

## The points where the linear segments of [t v] cross lo or hi, added in
## time order, so that clipping the values clips the line between them.
function [t, v] = add_crossings (t, v, lo, hi)
  tt = {t(1)};
  vv = {v(1)};
  for i = 1:numel (t) - 1
    tc = [];
    for b = [lo, hi]
      if ((v(i) - b) * (v(i+1) - b) < 0 && t(i+1) > t(i))
        tc(end+1) = t(i) + (b - v(i)) / (v(i+1) - v(i)) * (t(i+1) - t(i));
      endif
    endfor
    tc = sort (tc(tc > t(i) & tc < t(i+1)));
    vc = v(i) + (tc - t(i)) / (t(i+1) - t(i)) * (v(i+1) - v(i));
    tt{end+1} = [tc(:); t(i+1)];
    vv{end+1} = [vc(:); v(i+1)];
  endfor
  t = vertcat (tt{:});
  v = vertcat (vv{:});
endfunction

%!shared q
%! q = struct ("name", "LV1.opening", "kind", "valve", "slot", 0);
%! s = vn_schema ();
%! q.slot = find (strcmp (s.valve.params, "opening")) - 1;

%!test
%! ## a ramp 0.5 -> 1.5 over [0, 100] s crosses 1 at 50 s: that point is
%! ## added and the table clipped there, so it equals min(max(ramp, 0), 1)
%! [t, v, c] = signal_range ("f", q, [0; 100], [0.5; 1.5], false);
%! assert ([t, v], [0 0.5; 50 1; 100 1], 1e-12);
%! assert ([c.lo, c.hi, c.v(end)], [0 1 1.5]);
%! tq = linspace (-10, 120, 261).';
%! want = min (max (interp1 ([0 100], [0.5 1.5], tq, "linear", "extrap"), 0), 1);
%! want(tq < 0) = 0.5;
%! want(tq > 100) = 1;
%! assert (vn_signal_values (t, v, false, tq), want, 1e-12);

%!test
%! ## one segment through both bounds, and a hold table (values only)
%! [t, v] = signal_range ("f", q, [0; 10], [-0.5; 1.5], false);
%! assert ([t, v], [0 0; 2.5 0; 7.5 1; 10 1], 1e-12);
%! [t, v] = signal_range ("f", q, [0; 10], [-0.5; 1.5], true);
%! assert ([t, v], [0 0; 10 1]);
%! ## inside the range nothing changes
%! [t, v, c] = signal_range ("f", q, [0; 5; 5], [0.2; 0.2; 0.9], false);
%! assert ([t, v], [0 0.2; 5 0.2; 5 0.9]);
%! assert (isempty (c));

%!test
%! ## random tables: the clipped table equals the clipped signal everywhere
%! rand ("seed", 7);
%! for k = 1:50
%!   n = randi (6);
%!   t = cumsum (rand (n, 1) * 10);
%!   v = 3 * rand (n, 1) - 1;
%!   [tc, vc] = signal_range ("f", q, t, v, false);
%!   tq = linspace (t(1) - 1, t(end) + 1, 500).';
%!   want = min (max (vn_signal_values (t, v, false, tq), 0), 1);
%!   assert (vn_signal_values (tc, vc, false, tq), want, 1e-12);
%! endfor

%!error <f: signal "F1.flow": values must lie in \[-1e\+06, 1e\+06\] \(m3/s\), got 3e\+06 at t = 50 s> signal_range ("f", struct ("name", "F1.flow", "kind", "feed", "slot", 0), [0; 50], [0; 3e6], false)
%!error <f: signal "LV1.opening": point 2 must hold a finite time and value, got t = 1 s, value NaN> signal_range ("f", q, [0; 1], [0; NaN], false)

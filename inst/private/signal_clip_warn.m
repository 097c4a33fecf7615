## -*- texinfo -*-
## @deftypefn {} {@var{n} =} signal_clip_warn (@var{fn}, @var{clips}, @var{t0}, @var{tf}, @var{where})
## Warn (id @qcode{"vesselnet:clipped"}) once per signal of @var{clips}
## (from @code{signal_range}) that leaves its input's range within the run
## [@var{t0}, @var{tf}]: the signal, the largest (or smallest) value it
## reaches there and when, and the range it is clipped to.  @var{where}
## ends the message: where the clipped signal acts (default: the physics
## and the result of a simulation).  Returns the number of warnings.
## @end deftypefn

function n = signal_clip_warn (fn, clips, t0, tf,
                               where = "in the physics and in the result (res.signals keeps it as given)")
  n = 0;
  for i = 1:numel (clips)
    c = clips(i);
    ## the extremes of a piecewise-linear (or held) signal over [t0, tf]
    ## lie at its points inside the run or at the run's ends
    in = c.t >= t0 & c.t <= tf;
    tq = [t0; c.t(in); tf];
    vq = [vn_signal_values(c.t, c.v, c.hold, t0); c.v(in);
          vn_signal_values(c.t, c.v, c.hold, tf)];
    what = {};
    [vmax, imax] = max (vq);
    if (vmax > c.hi)
      what{end+1} = sprintf ("reaches %.6g at t = %.6g s", vmax, tq(imax));
    endif
    [vmin, imin] = min (vq);
    if (vmin < c.lo)
      what{end+1} = sprintf ("falls to %.6g at t = %.6g s", vmin, tq(imin));
    endif
    if (isempty (what))
      continue;
    endif
    warning ("vesselnet:clipped",
             "%s: signal \"%s\" %s, outside its range [%.6g, %.6g]; it is clipped to [%.6g, %.6g] %s",
             fn, c.name, strjoin (what, " and "), c.lo, c.hi, c.lo, c.hi, where);
    n++;
  endfor
endfunction

%!test
%! c = struct ("name", "LV1.opening", "t", [0; 100], "v", [0.5; 1.5],
%!             "hold", false, "lo", 0, "hi", 1);
%! ## inside [0, 40] s the ramp stays below 1: no warning
%! assert (signal_clip_warn ("f", c, 0, 40), 0);
%! warning ("error", "vesselnet:clipped", "local");
%! try
%!   signal_clip_warn ("f", c, 0, 80);
%!   e = struct ("identifier", "", "message", "none");
%! catch e
%! end_try_catch
%! assert (e.identifier, "vesselnet:clipped");
%! assert (e.message, "f: signal \"LV1.opening\" reaches 1.3 at t = 80 s, outside its range [0, 1]; it is clipped to [0, 1] in the physics and in the result (res.signals keeps it as given)");
%!warning <signal "P1.speed" reaches 12 at t = 5 s and falls to -1 at t = 20 s, outside its range \[0, 10\]> signal_clip_warn ("f", struct ("name", "P1.speed", "t", [0; 5; 5; 20], "v", [1; 12; 1; -1], "hold", true, "lo", 0, "hi", 10), 0, 30);

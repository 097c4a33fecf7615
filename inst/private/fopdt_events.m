## -*- texinfo -*-
## @deftypefn {} {@var{ev} =} fopdt_events (@var{t}, @var{u}, @var{mode})
## Reduce a recorded input to the events that drive a superposition.
##
## @var{mode} @qcode{"hold"}: the input holds each sample until the next one,
## so each change is a step of size @code{u(k) - u(k-1)} at @code{t(k)}.
## @var{mode} @qcode{"linear"}: the input is interpolated linearly, so each
## event is a change of slope at a sample time.  After the last sample the
## input holds.  @var{ev} has fields @code{t}, @code{d} (columns),
## @code{ramp} (true for slope events), @code{u0} (input before the first
## change) and @code{t0} (time the first change begins).
## @end deftypefn

function ev = fopdt_events (t, u, mode)

  du = diff (u);
  kfirst = find (du != 0, 1);
  ev.u0 = u(1);
  if (strcmp (mode, "hold"))
    k = find (du != 0) + 1;
    ev.t = t(k);
    ev.d = du(k-1);
    ev.ramp = false;
    ev.t0 = t(kfirst + 1);
  else
    slope = du ./ diff (t);
    ds = diff ([0; slope; 0]);
    k = find (ds != 0);
    ev.t = t(k);
    ev.d = ds(k);
    ev.ramp = true;
    ev.t0 = t(kfirst);
  endif

endfunction

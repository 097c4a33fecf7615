## -*- texinfo -*-
## @deftypefn {} {@var{g} =} fopdt_unitresp (@var{type}, @var{q}, @var{ev}, @var{t})
## Response at times @var{t} of a unit-gain model to the input events
## @var{ev} (see fopdt_events), by exact superposition of closed-form step or
## ramp responses.  @var{q} holds the time constants and, last, the dead
## time: @qcode{"fopdt"} [tau theta], @qcode{"integrating"} [theta],
## @qcode{"sopdt"} [tau1 tau2 theta].  The dead time shifts each event by a
## continuous amount, never rounded to the sampling.
## @end deftypefn

function g = fopdt_unitresp (type, q, ev, t)

  theta = q(end);
  n = numel (t);
  ne = numel (ev.t);
  g = zeros (n, 1);
  ## Work in blocks so a long record with many events stays in memory.
  blk = max (1, floor (4e5 / max (n, 1)));
  for i0 = 1:blk:ne
    j = i0:min (ne, i0 + blk - 1);
    s = max (t - (ev.t(j).' + theta), 0);
    g += basis (type, q, s, ev.ramp) * ev.d(j);
  endfor

endfunction

## Unit step (or unit ramp) response at elapsed times s >= 0; zero at s = 0.
function r = basis (type, q, s, ramp)

  switch (type)
    case "fopdt"
      tau = q(1);
      e = exp (-s / tau);
      if (ramp)
        r = s - tau * (1 - e);
      else
        r = 1 - e;
      endif
    case "integrating"
      if (ramp)
        r = s.^2 / 2;
      else
        r = s;
      endif
    case "sopdt"
      t1 = q(1);
      t2 = q(2);
      if (abs (t1 - t2) <= 1e-7 * max (t1, t2))
        ## Repeated pole: the limit of the distinct-pole formulas.
        tm = (t1 + t2) / 2;
        e = exp (-s / tm);
        if (ramp)
          r = s - 2 * tm + (2 * tm + s) .* e;
        else
          r = 1 - (1 + s / tm) .* e;
        endif
      else
        e1 = exp (-s / t1);
        e2 = exp (-s / t2);
        if (ramp)
          r = s - (t1 + t2) + (t1^2 * e1 - t2^2 * e2) / (t1 - t2);
        else
          r = 1 - (t1 * e1 - t2 * e2) / (t1 - t2);
        endif
      endif
  endswitch

endfunction

## -*- texinfo -*-
## @deftypefn {} {@var{g} =} fopdt_unitresp (@var{type}, @var{q}, @var{ev}, @var{t})
## Response at times @var{t} of a unit-gain model to the input events
## @var{ev} (see fopdt_events), by exact superposition of closed-form step or
## ramp responses.  @var{q} holds the time constants and, last, the dead
## time: @qcode{"fopdt"} [tau theta], @qcode{"integrating"} [theta],
## @qcode{"sopdt"} [tau1 tau2 theta].  The dead time shifts each event by a
## continuous amount, never rounded to the sampling.
## @end deftypefn

function g = fopdt_unitresp (type, q, ev, t, direct)

  theta = q(end);
  if (nargin < 5 || ! direct)
    g = recursive (type, q, ev, t);
    if (! isempty (g))
      return;
    endif
  endif
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

## Response through running sums over the events already active at each
## t(i): D = sum d, E = sum d T, S(tau) = sum d exp(-(t - T)/tau), T the
## delayed event times.  Returns [] where this form does not apply.
function g = recursive (type, q, ev, t)

  g = [];
  n = numel (t);
  T = ev.t + q(end);
  ## An event at T is felt from the first sample after it (s = 0 adds 0).
  idx = lookup (t, T) + 1;
  in = idx <= n;
  idx = idx(in);
  T = T(in);
  d = ev.d(in);
  D = cumsum (accumarray (idx, d, [n, 1]));
  E = cumsum (accumarray (idx, d .* T, [n, 1]));
  ramp = (t .* D - E);
  switch (type)
    case "integrating"
      if (ev.ramp)
        return;
      endif
      g = ramp;
    case "fopdt"
      S = lagsum (q(1), idx, T, d, t);
      if (ev.ramp)
        g = ramp - q(1) * (D - S);
      else
        g = D - S;
      endif
    case "sopdt"
      t1 = q(1);
      t2 = q(2);
      if (abs (t1 - t2) <= 1e-3 * max (t1, t2))
        return;
      endif
      S1 = lagsum (t1, idx, T, d, t);
      S2 = lagsum (t2, idx, T, d, t);
      if (ev.ramp)
        g = ramp - (t1 + t2) * D + (t1^2 * S1 - t2^2 * S2) / (t1 - t2);
      else
        g = D - (t1 * S1 - t2 * S2) / (t1 - t2);
      endif
  endswitch

endfunction

## S(i) = sum over active events of d exp(-(t(i) - T)/tau), by recursion.
function S = lagsum (tau, idx, T, d, t)

  n = numel (t);
  c = accumarray (idx, d .* exp (-(t(idx) - T) / tau), [n, 1]);
  dt = diff (t);
  if (n > 1 && max (dt) - min (dt) <= 1e-12 * max (dt))
    S = filter (1, [1, -exp(-dt(1) / tau)], c);
  else
    a = exp (-dt / tau);
    S = c;
    for i = 2:n
      S(i) += a(i-1) * S(i-1);
    endfor
  endif

endfunction

%!test
%! ## The recursion matches direct superposition, uniform and uneven times,
%! ## steps and ramps, every model type
%! ## Private: take a handle from its own folder when run via the package.
%! f = @fopdt_unitresp;
%! if (! exist ("fopdt_unitresp", "file"))
%!   p = fullfile (fileparts (which ("vn_fopdt")), "private");
%!   addpath (p);
%!   f = @fopdt_unitresp;
%!   rmpath (p);
%! endif
%! rand ("state", 4);
%! tu = (0:3:600)';
%! tn = unique ([0; cumsum(0.2 + 4 * rand (200, 1))]);
%! for tt = {tu, tn}
%!   t = tt{1};
%!   u = round (3 * rand (size (t))) .* (t > 50);
%!   k = find (diff (u) != 0) + 1;
%!   evh = struct ("t", t(k), "d", diff (u)(k-1), "ramp", false);
%!   ds = diff ([0; diff(u) ./ diff(t); 0]);
%!   k = find (ds != 0);
%!   evl = struct ("t", t(k), "d", ds(k), "ramp", true);
%!   for ev = {evh, evl}
%!     ev = ev{1};
%!     for c = {{"fopdt", [40, 7.3]}, {"sopdt", [40, 9, 7.3]}, {"integrating", 7.3}}
%!       ref = f (c{1}{1}, c{1}{2}, ev, t, true);
%!       assert (f (c{1}{1}, c{1}{2}, ev, t), ref, 1e-9 * max (abs (ref)));
%!     endfor
%!   endfor
%! endfor

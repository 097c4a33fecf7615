## -*- texinfo -*-
## @deftypefn {} {@var{tout} =} sim_times (@var{tspan}, @var{dt}, @var{fn})
## Output times of a run: @var{tspan} @code{[t0 tf]} with step @var{dt}
## (default @code{(tf - t0)/500}; @var{tf} is always included), or a vector
## of three or more increasing times.  Messages begin with @var{fn}.
## A run has at most 1e7 output times (memory), so @var{dt} must lie in
## [(tf - t0)/1e7, Inf).
## @end deftypefn

function tout = sim_times (tspan, dt, fn)
  ## the common case first, in few operations: [t0 tf] and a good dt
  if (numel (tspan) == 2 && isscalar (dt) && isreal (tspan) && isreal (dt)
      && isnumeric (tspan) && tspan(2) > tspan(1)
      && dt >= (tspan(2) - tspan(1)) / 1e7
      && isfinite (tspan(2) - tspan(1) + dt))
    tout = (tspan(1):dt:tspan(2)).';
    if (tspan(2) - tout(end) > 1e-9 * max (1, abs (tspan(2))))
      tout(end+1) = tspan(2);
    endif
    return;
  endif
  if (! isnumeric (tspan) || ! isreal (tspan) || numel (tspan) < 2
      || any (! isfinite (tspan)))
    error ("Octave:invalid-input-arg",
           "%s: TSPAN must be [t0 tf] or a vector of output times (s)", fn);
  endif
  if (numel (tspan) == 2)
    t0 = tspan(1);
    tf = tspan(2);
    if (! (tf > t0))
      error ("Octave:invalid-input-arg",
             "%s: TSPAN [t0 tf] needs tf > t0, got [%g %g]", fn, t0, tf);
    endif
    if (isempty (dt))
      dt = (tf - t0) / 500;
    endif
    lo = (tf - t0) / 1e7;
    if (! (isnumeric (dt) && isscalar (dt) && isreal (dt) && dt > 0
           && dt >= lo && isfinite (dt)))
      error ("Octave:invalid-input-arg",
             "%s: option \"dt\" must be a positive time step in [%.6g, Inf) (s), at most 1e7 output times over TSPAN [%.6g %.6g], got %s",
             fn, lo, t0, tf, build_value_str (dt));
    endif
    tout = (t0:dt:tf).';
    if (tf - tout(end) > 1e-9 * max (1, abs (tf)))
      tout(end+1) = tf;
    endif
  else
    tout = tspan(:);
    if (any (diff (tout) <= 0))
      error ("Octave:invalid-input-arg", "%s: output times must increase", fn);
    endif
  endif
endfunction

%!assert (sim_times ([0 10], 4, "f"), [0; 4; 8; 10])
%!assert (sim_times ([0 10], [], "f")(2), 0.02)
%!assert (sim_times ([1 2 5], [], "f"), [1; 2; 5])
%!error <f: TSPAN \[t0 tf\] needs tf . t0> sim_times ([2 1], 1, "f")
%!error <f: output times must increase> sim_times ([1 3 2], 1, "f")
%!error <f: option "dt" must be a positive time step in \[1e-07, Inf\) \(s\), at most 1e7 output times over TSPAN \[0 1\], got -1> sim_times ([0 1], -1, "f")
%!error <f: option "dt" must be a positive time step in \[0.00036, Inf\) \(s\), at most 1e7 output times over TSPAN \[0 3600\], got 1e-09> sim_times ([0 3600], 1e-9, "f")
%!error <f: option "dt" must be a positive time step .* got "5 s"> sim_times ([0 3600], "5 s", "f")
%!assert (numel (sim_times ([0 1], 1e-6, "f")), 1e6 + 1)

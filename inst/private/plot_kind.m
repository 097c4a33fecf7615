## -*- texinfo -*-
## @deftypefn {} {@var{kind} =} plot_kind (@var{s})
## Tell from its fields what @var{s} is: @qcode{"result"} (vn_simulate),
## @qcode{"step"} (vn_stepresponse), @qcode{"frequency"} (vn_frequency)
## @qcode{"fit"} (a fit against data with field @code{fit}),
## @qcode{"ensemble"} (vn_ensemble) or @qcode{"linear"} (vn_linearize,
## drawn as its frequency response); error otherwise.
## @end deftypefn

function kind = plot_kind (s)
  if (! isstruct (s) || ! isscalar (s))
    error ("Octave:invalid-input-arg",
           "vn_plot: first argument must be a result, step response, frequency response or fit struct, got %s",
           class (s));
  endif
  if (all (isfield (s, {"t", "names", "p05", "p50", "p95"})))
    kind = "ensemble";
  elseif (all (isfield (s, {"t", "nonlinear", "linear", "outputs"})))
    kind = "step";
  elseif (all (isfield (s, {"w", "magnitude", "phase"})))
    kind = "frequency";
  elseif (isfield (s, "fit") && isstruct (s.fit))
    kind = "fit";
  elseif (all (isfield (s, {"t", "units"})) && isstruct (s.units))
    kind = "result";
  elseif (all (isfield (s, {"A", "B", "C", "D"})))
    kind = "linear";
  else
    f = fieldnames (s);
    error ("Octave:invalid-input-arg",
           ["vn_plot: cannot tell what to draw from a struct with fields %s; ", ...
            "expected a simulation result (t, units), a step response ", ...
            "(t, nonlinear, linear, outputs), a frequency response ", ...
            "(w, magnitude, phase), a fit (fit), an ensemble (t, names, ", ...
            "p05, p50, p95) or a linear model (A, B, C, D)"],
           strjoin (f(:).', ", "));
  endif
endfunction

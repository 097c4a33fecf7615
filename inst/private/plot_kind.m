## -*- texinfo -*-
## @deftypefn {} {@var{kind} =} plot_kind (@var{s})
## Tell from its fields what @var{s} is: @qcode{"result"} (vn_simulate),
## @qcode{"step"} (vn_stepresponse), @qcode{"frequency"} (vn_frequency)
## or @qcode{"fit"} (a fit against data with field @code{fit}); error
## otherwise.
## @end deftypefn

function kind = plot_kind (s)
  if (! isstruct (s) || ! isscalar (s))
    error ("Octave:invalid-input-arg",
           "vn_plot: first argument must be a result, step response, frequency response or fit struct, got %s",
           class (s));
  endif
  if (all (isfield (s, {"t", "nonlinear", "linear", "outputs"})))
    kind = "step";
  elseif (all (isfield (s, {"w", "magnitude", "phase"})))
    kind = "frequency";
  elseif (isfield (s, "fit") && isstruct (s.fit))
    kind = "fit";
  elseif (all (isfield (s, {"t", "units"})) && isstruct (s.units))
    kind = "result";
  else
    f = fieldnames (s);
    error ("Octave:invalid-input-arg",
           ["vn_plot: cannot tell what to draw from a struct with fields %s; ", ...
            "expected a simulation result (t, units), a step response ", ...
            "(t, nonlinear, linear, outputs), a frequency response ", ...
            "(w, magnitude, phase) or a fit (fit)"],
           strjoin (f(:).', ", "));
  endif
endfunction

## -*- texinfo -*-
## @deftypefn {} {@var{mm} =} tune_model (@var{model})
## Check a process model for vn_tune and return it in one shape: fields
## integrating (logical), K, tau, tau2 (0 for first order), theta.
## A self-regulating model needs gain, tau (or tau1) and deadtime, with an
## optional tau2; an integrating one has type "integrating", gain (k') and
## deadtime.  A dead time below 1e-6 times the time constant (below
## 1e-6 time units for an integrating model) is taken as exactly 0.
## @end deftypefn

function mm = tune_model (model)

  if (! isstruct (model) || ! isscalar (model))
    error ("Octave:invalid-input-arg",
           "vn_tune: MODEL must be a scalar struct with fields gain, tau and deadtime (or type \"integrating\", gain and deadtime)\n");
  endif
  mm.integrating = isfield (model, "type") && ischar (model.type) ...
                   && strcmpi (model.type, "integrating");
  mm.K = field (model, "gain", true);
  if (mm.K == 0)
    error ("Octave:invalid-input-arg",
           "vn_tune: model GAIN is 0; a process with no gain cannot be tuned\n");
  endif
  mm.theta = field (model, "deadtime", true);
  if (mm.theta < 0)
    error ("Octave:invalid-input-arg",
           "vn_tune: model DEADTIME is %g; it must be >= 0 (time)\n", mm.theta);
  endif
  mm.tau = NaN;
  mm.tau2 = 0;
  if (mm.integrating)
    ## no time constant to compare with: below a microsecond is zero
    if (mm.theta < 1e-6)
      mm.theta = 0;
    endif
    return;
  endif
  if (isfield (model, "tau"))
    mm.tau = field (model, "tau", true);
  elseif (isfield (model, "tau1"))
    mm.tau = field (model, "tau1", true);
  else
    error ("Octave:invalid-input-arg",
           "vn_tune: MODEL needs field tau (or tau1 and tau2), the time constant; or type \"integrating\"\n");
  endif
  if (isfield (model, "tau2"))
    mm.tau2 = field (model, "tau2", true);
  endif
  if (mm.tau <= 0 || mm.tau2 < 0)
    error ("Octave:invalid-input-arg",
           "vn_tune: model time constants must be positive (time); tau is %g, tau2 is %g\n",
           mm.tau, mm.tau2);
  endif
  ## Keep the slower lag first, as the rules assume tau1 >= tau2.
  if (mm.tau2 > mm.tau)
    [mm.tau, mm.tau2] = deal (mm.tau2, mm.tau);
  endif
  ## A dead time a million times shorter than the time constant is a fit
  ## that ran to its bound, not a property of the process: it is zero, and
  ## a rule that needs one then asks for tauc instead of dividing by it.
  if (mm.theta < 1e-6 * mm.tau)
    mm.theta = 0;
  endif

endfunction

function v = field (model, name, required)

  if (! isfield (model, name))
    error ("Octave:invalid-input-arg",
           "vn_tune: MODEL has no field %s\n", name);
  endif
  v = model.(name);
  if (! (isnumeric (v) && isreal (v) && isscalar (v) && isfinite (v)))
    error ("Octave:invalid-input-arg",
           "vn_tune: model %s must be a finite real scalar\n", upper (name));
  endif
  v = double (v);

endfunction

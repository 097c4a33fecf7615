## -*- texinfo -*-
## @deftypefn {} {@var{r} =} tune_zn (@var{mm}, @var{opt})
## Ziegler-Nichols reaction-curve settings (Trans. ASME 64, 1942) from the
## product a = K theta/tau (self-regulating) or a = k' theta (integrating):
## P Kc = 1/a; PI Kc = 0.9/a, Ti = 3.3 theta; PID Kc = 1.2/a, Ti = 2 theta,
## Td = 0.5 theta, ideal form.  Not defined for zero dead time.
## @end deftypefn

function r = tune_zn (mm, opt)

  ctype = opt.type;
  if (isempty (ctype))
    ctype = "pi";
  endif
  [tau, theta, r.notes] = tune_halfrule (mm);
  if (theta == 0)
    error ("Octave:invalid-input-arg",
           "vn_tune: the Ziegler-Nichols rule is not defined for model DEADTIME 0; use \"simc\" with option \"tauc\" or \"lambda\"\n");
  endif
  r.warn = "";
  if (mm.integrating)
    a = mm.K * theta;
  else
    a = mm.K * theta / tau;
    if (theta / tau > 1)
      r.warn = sprintf ("dead time / time constant is %g (> 1): the Ziegler-Nichols reaction-curve rule is meant for lag-dominant processes",
                        theta / tau);
    endif
  endif
  switch (ctype)
    case "p"
      r.Kc = 1 / a;
      r.Ti = Inf;
      r.Td = 0;
    case "pi"
      r.Kc = 0.9 / a;
      r.Ti = 3.3 * theta;
      r.Td = 0;
    case "pid"
      r.Kc = 1.2 / a;
      r.Ti = 2 * theta;
      r.Td = 0.5 * theta;
    otherwise
      error ("Octave:invalid-input-arg",
             "vn_tune: Ziegler-Nichols gives \"p\", \"pi\" or \"pid\" settings, not \"%s\"\n",
             ctype);
  endswitch
  r.form = "ideal";
  r.type = ctype;
  r.notes = [r.notes, "Ziegler-Nichols reaction curve (1942); quarter-decay aim, aggressive."];

endfunction

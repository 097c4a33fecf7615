## -*- texinfo -*-
## @deftypefn {} {@var{r} =} tune_simc (@var{mm}, @var{opt})
## SIMC settings (Skogestad, J. Process Control 13, 2003).  Self-regulating:
## Kc = tau1/(K (tauc + theta)), Ti = min(tau1, 4 (tauc + theta)); PI from
## the half-rule first-order model, or with type "pid" and a second lag the
## series PID with Td = tau2.  Integrating: Kc = 1/(k' (tauc + theta)),
## Ti = 4 (tauc + theta).  tauc defaults to the (effective) dead time.
## @end deftypefn

function r = tune_simc (mm, opt)

  ctype = opt.type;
  if (isempty (ctype))
    ctype = "pi";
  endif
  if (! any (strcmp (ctype, {"pi", "pid"})))
    error ("Octave:invalid-input-arg",
           "vn_tune: SIMC gives \"pi\" or \"pid\" settings, not \"%s\"\n", ctype);
  endif
  r.form = "ideal";
  r.notes = "";
  if (mm.integrating)
    if (strcmp (ctype, "pid"))
      error ("Octave:invalid-input-arg",
             "vn_tune: SIMC PID needs a self-regulating second-order model (field TAU2); an integrating model gets \"pi\"\n");
    endif
    tauc = pick_tauc (opt, mm.theta);
    r.Kc = 1 / (mm.K * (tauc + mm.theta));
    r.Ti = 4 * (tauc + mm.theta);
    r.Td = 0;
  elseif (strcmp (ctype, "pid"))
    if (mm.tau2 <= 0)
      error ("Octave:invalid-input-arg",
             "vn_tune: SIMC PID needs a second-order model with field TAU2 > 0; for a first-order model use \"pi\"\n");
    endif
    tauc = pick_tauc (opt, mm.theta);
    r.Kc = mm.tau / (mm.K * (tauc + mm.theta));
    r.Ti = min (mm.tau, 4 * (tauc + mm.theta));
    r.Td = mm.tau2;
    r.form = "series";
  else
    [tau, theta, r.notes] = tune_halfrule (mm);
    tauc = pick_tauc (opt, theta);
    r.Kc = tau / (mm.K * (tauc + theta));
    r.Ti = min (tau, 4 * (tauc + theta));
    r.Td = 0;
  endif
  r.type = ctype;
  r.tauc = tauc;
  r.notes = [r.notes, sprintf("SIMC with tauc %g (Skogestad 2003).", tauc)];

endfunction

function tauc = pick_tauc (opt, theta)

  tauc = opt.tauc;
  if (isempty (tauc))
    if (theta == 0)
      error ("Octave:invalid-input-arg",
             "vn_tune: SIMC takes tauc = dead time by default, but the model DEADTIME is 0 (or negligible next to tau); give option \"tauc\", the closed-loop time constant (time, > 0), e.g. a fifth to a half of tau\n");
    endif
    tauc = theta;
  endif

endfunction

## -*- texinfo -*-
## @deftypefn {} {@var{kind} =} report_kind (@var{x}, @var{fn})
## Tell from its fields what result @var{x} is: @qcode{"steady"}
## (vn_steady), @qcode{"linear"} (vn_linearize), @qcode{"step"}
## (vn_stepresponse), @qcode{"frequency"} (vn_frequency), @qcode{"fit"}
## (vn_fit), @qcode{"validation"} (vn_validate), @qcode{"fopdt"}
## (vn_fopdt), @qcode{"tuning"} (vn_tune) or @qcode{"ensemble"}
## (vn_ensemble).  Error, with @var{fn} as the command name, otherwise.
## @end deftypefn

function kind = report_kind (x, fn)
  ## several tests give a validation per test
  if (isstruct (x) && numel (x) > 1
      && all (isfield (x, {"t", "names", "measured", "predicted", "rmse", "r2"})))
    kind = "validation";
    return;
  endif
  if (! isstruct (x) || ! isscalar (x))
    error ("Octave:invalid-input-arg",
           "%s: X must be a result struct (operating point, linear model, step or frequency response, fit, validation, first-order model, tuning or ensemble), got a %s of size %s",
           fn, class (x), mat2str (size (x)));
  endif
  has = @(f) all (isfield (x, f));
  if (has ({"t", "names", "y", "p05", "p50", "p95"}))
    kind = "ensemble";
  elseif (has ({"t", "names", "measured", "predicted", "rmse", "r2"}))
    kind = "validation";
  elseif (has ({"t", "nonlinear", "linear", "outputs"}))
    kind = "step";
  elseif (has ({"w", "magnitude", "phase"}))
    kind = "frequency";
  elseif (has ({"A", "B", "C", "D"}))
    kind = "linear";
  elseif (has ({"names", "value", "stderr", "ci"}))
    kind = "fit";
  elseif (has ({"Kc", "Ti"}))
    kind = "tuning";
  elseif (has ({"type", "gain", "tau"}))
    kind = "fopdt";
  elseif (has ({"x", "states", "residual", "iterations"}))
    kind = "steady";
  else
    f = fieldnames (x);
    error ("Octave:invalid-input-arg",
           ["%s: cannot tell what result a struct with fields %s is; expected ", ...
            "an operating point (vn_steady), linear model (vn_linearize), step ", ...
            "response (vn_stepresponse), frequency response (vn_frequency), fit ", ...
            "(vn_fit), validation (vn_validate), first-order model (vn_fopdt), ", ...
            "tuning (vn_tune) or ensemble (vn_ensemble)"],
           fn, strjoin (f(:).', ", "));
  endif
endfunction

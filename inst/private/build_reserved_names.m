## -*- texinfo -*-
## @deftypefn {} {@var{names} =} build_reserved_names ()
## Names a unit may not take: the fields of the result structs.
##
## Units become fields of results (@code{res.T1}, @code{op.T1}), so a unit
## called @code{t} or @code{stats} would overwrite @code{res.t} or
## @code{res.stats}.  The list is the union of the fields of the results
## of vn_simulate, vn_steady, vn_linearize, vn_stepresponse, vn_fit,
## vn_ensemble and vn_validate (tests/octave/test_bad_input_catalog.m
## checks that every field those commands return is on it).  The matrix
## names A, B, C and D of a linear model are left out: a linear model
## carries no unit fields, and single letters are common tank names.
## @end deftypefn

function names = build_reserved_names ()
  persistent list;
  if (isempty (list))
    list = unique ({ ...
      ## vn_simulate
      "t", "x", "states", "units", "events", "stats", "net", "signals", ...
      "warnings", ...
      ## vn_steady
      "spilling", "spill", "saturated", "input_names", "input_values", "inputs", ...
      "adjusted", "residual", "relres", "iterations", "method", "solver", ...
      "frozen", ...
      ## vn_linearize
      "outputs", "note", "poles", "tau", "zeta", "wn", "gain", "num", ...
      "den", "zeros", "op", ...
      ## vn_stepresponse
      "nonlinear", "linear", "input", "size", "before", "lin", "metrics", ...
      "metrics_linear", ...
      ## vn_fit
      "value", "stderr", "ci", "corr", "cov", "scale", "reason", "rmse", ...
      "residuals", "names", "fit", "jacobian", "dof", "sensors", "atbound", ...
      "censored", "readings", "rejected", "starts", ...
      ## vn_ensemble
      "y", "params", "pnames", "failed", "mean", "p05", "p50", "p95", ...
      ## vn_validate
      "measured", "predicted", "r2", "name"});
  endif
  names = list;
endfunction

%!test
%! r = build_reserved_names ();
%! assert (all (ismember ({"t", "x", "y", "stats", "states", "events"}, r)));
%! assert (! any (ismember ({"A", "B", "T1", "LV1"}, r)));

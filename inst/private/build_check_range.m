## -*- texinfo -*-
## @deftypefn {} {} build_check_range (@var{fn}, @var{label}, @var{kind}, @var{par})
## Refuse at declaration a numeric option outside the range the core
## allows (the schema's closed [lo, hi]), so that a bad value is reported
## by the builder that took it, not later by vn_simulate.
##
## Inf passes only where the parameter's default is Inf (a tank's rim).
## @end deftypefn

function build_check_range (fn, label, kind, par)
  s = vn_schema ();
  k = s.(kind);
  f = fieldnames (par);
  for i = 1:numel (f)
    j = find (strcmp (f{i}, k.params), 1);
    v = par.(f{i});
    if (isempty (j) || ! (isnumeric (v) && isscalar (v)) || k.iscode(j))
      continue;
    endif
    if (isinf (v) && isinf (k.defaults(j)) && sign (v) == sign (k.defaults(j)))
      continue;
    endif
    if (! (v >= k.lo(j) && v <= k.hi(j)))
      uom = k.units{j};
      if (any (strcmp (uom, {"1", "code"})))
        uom = "";
      else
        uom = [" (" uom ")"];
      endif
      build_error (fn, label, "%s must lie in [%.6g, %.6g]%s, got %s",
                   upper (f{i}), k.lo(j), k.hi(j), uom, build_value_str (v));
    endif
  endfor
endfunction

%!error <vn_tank: tank "T1": AREA must lie in \[1e-09, 1e\+09\] \(m2\), got 2e\+09> build_check_range ("vn_tank", "tank \"T1\"", "tank", struct ("area", 2e9))
%!error <vn_resistance: resistance "R1": R must lie in \[1e-12, 1e\+15\] \(s/m2\), got 1e\+16> build_check_range ("vn_resistance", "resistance \"R1\"", "resistance", struct ("r", 1e16))
%!test
%! build_check_range ("vn_tank", "tank \"T1\"", "tank", struct ("area", 2, "rim", Inf));

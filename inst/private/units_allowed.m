## -*- texinfo -*-
## @deftypefn {} {[@var{allowed}, @var{k}] =} units_allowed (@var{si})
## What a field whose unit of measure is @var{si} accepts as "VALUE UNIT",
## for messages; @var{k} is the dimension's position in
## @code{units_table} ([] when the table lacks it: only @var{si} itself).
## @end deftypefn

function [allowed, k] = units_allowed (si)
  t = units_table ();
  k = find (strcmp ({t.dims.si}, si), 1);
  if (isempty (k))
    allowed = ["\"VALUE " si "\""];
  else
    allowed = ["units of " t.dims(k).name ": " strjoin(t.dims(k).units, ", ")];
  endif
endfunction

%!assert (units_allowed ("m"), "units of length: m, mm, cm, km, ft, in")
%!assert (units_allowed ("s/m2"), "\"VALUE s/m2\"")
%!test
%! [a, k] = units_allowed ("Kv");
%! assert (a, "units of valve coefficient: Kv, Cv");
%! assert (units_table ().dims(k).name, "valve coefficient");

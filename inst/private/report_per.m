## -*- texinfo -*-
## @deftypefn {} {@var{s} =} report_per (@var{a}, @var{b})
## Unit label of a ratio, @var{a} per @var{b}: "m/fraction",
## "(m3/s)/m"; "" when either is unknown.
## @end deftypefn

function s = report_per (a, b)
  if (isempty (a) || isempty (b))
    s = "";
    return;
  endif
  if (any (a == "/"))
    a = ["(" a ")"];
  endif
  if (any (b == "/"))
    b = ["(" b ")"];
  endif
  s = [a "/" b];
endfunction

%!assert (report_per ("m", "m3/h"), "m/(m3/h)")
%!assert (report_per ("m3/s", "m"), "(m3/s)/m")
%!assert (report_per ("", "m"), "")

## -*- texinfo -*-
## @deftypefn {} {@var{s} =} report_num (@var{v})
## Text of number @var{v} for a report: four significant digits,
## @qcode{"Inf"} or @qcode{"-Inf"}, @qcode{"-"} for NaN or empty.  A
## vector gives a cellstr.
## @end deftypefn

function s = report_num (v)
  if (isempty (v))
    s = "-";
    return;
  endif
  if (numel (v) > 1)
    s = arrayfun (@report_num, v, "uniformoutput", false);
    return;
  endif
  if (isnan (v))
    s = "-";
  elseif (isinf (v))
    s = ifelse_sign (v);
  else
    s = sprintf ("%.4g", v);
  endif
endfunction

function s = ifelse_sign (v)
  if (v > 0)
    s = "Inf";
  else
    s = "-Inf";
  endif
endfunction

%!assert (report_num (1234.567), "1235")
%!assert (report_num (0.0025012), "0.002501")
%!assert (report_num (NaN), "-")
%!assert (report_num (-Inf), "-Inf")
%!assert (report_num ([1 2]), {"1", "2"})

## -*- texinfo -*-
## @deftypefn  {} {@var{s} =} report_time (@var{net}, @var{t})
## @deftypefnx {} {@var{s} =} report_time (@var{net}, @var{t}, @var{tref})
## Text of a duration @var{t} (s) for a report: in the time unit the
## network's "display" option asks for, else in s up to 2 min, min up to
## 2 h, h up to 2 d and d beyond; @qcode{"-"} for NaN.  With @var{tref}
## the unit is chosen for @var{tref} (a standard error in the unit of its
## estimate).
## @end deftypefn

function s = report_time (net, t, tref)
  if (nargin < 3 || ! isscalar (tref) || ! isfinite (tref))
    tref = t;
  endif
  if (! isscalar (t) || isnan (t))
    s = "-";
    return;
  endif
  [v, label] = units_display (net, "s", t);
  if (strcmp (label, "s"))
    a = abs (tref);
    if (a <= 120)
      v = t;
    elseif (a <= 7200)
      v = t / 60;
      label = "min";
    elseif (a <= 172800)
      v = t / 3600;
      label = "h";
    else
      v = t / 86400;
      label = "d";
    endif
  endif
  s = [report_num(v) " " label];
endfunction

%!assert (report_time ([], 90), "90 s")
%!assert (report_time ([], 3709.9), "61.83 min")
%!assert (report_time ([], 1.7678e5), "2.046 d")
%!assert (report_time ([], 7200.5), "2 h")
%!assert (report_time ([], NaN), "-")
%!assert (report_time ([], 95.95, 3709.9), "1.599 min")

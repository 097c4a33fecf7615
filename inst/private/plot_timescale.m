## -*- texinfo -*-
## @deftypefn {} {[@var{factor}, @var{label}] =} plot_timescale (@var{t}, @var{unit})
## Return the factor that turns times in s into the plotting unit, and
## the axis label.  @var{unit} is @qcode{"s"}, @qcode{"min"}, @qcode{"h"}
## or @qcode{"auto"}: seconds for spans up to 20 min, minutes up to 5 h,
## hours beyond, so that tick labels stay short.
## @end deftypefn

function [factor, label] = plot_timescale (t, unit)
  if (strcmp (unit, "auto"))
    span = max (t(:)) - min (t(:));
    if (isempty (span) || ! (span > 1200))
      unit = "s";
    elseif (span <= 5 * 3600)
      unit = "min";
    else
      unit = "h";
    endif
  endif
  switch (unit)
    case "s"
      factor = 1;
    case "min"
      factor = 1 / 60;
    case "h"
      factor = 1 / 3600;
  endswitch
  label = sprintf ("time (%s)", unit);
endfunction

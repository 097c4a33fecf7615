## -*- texinfo -*-
## @deftypefn {} {} plot_legend (@var{ax}, @var{handles}, @var{names})
## Add a legend to @var{ax} in the corner where the fewest data points
## lie (north east when several are equally free).
##
## Octave 7 has no automatic "best" placement, and a legend outside the
## axes would narrow stacked axes by different amounts.
## @end deftypefn

function plot_legend (ax, handles, names)
  xl = get (ax, "xlim");
  yl = get (ax, "ylim");
  logx = strcmp (get (ax, "xscale"), "log");
  logy = strcmp (get (ax, "yscale"), "log");
  if (logx)
    xl = log10 (xl);
  endif
  if (logy)
    yl = log10 (yl);
  endif
  corners = {"northeast", "southeast", "northwest", "southwest"};
  count = zeros (1, 4);
  kids = findobj (ax, "type", "line");
  for i = 1:numel (kids)
    x = get (kids(i), "xdata");
    y = get (kids(i), "ydata");
    if (logx)
      x = log10 (max (x, realmin));
    endif
    if (logy)
      y = log10 (max (y, realmin));
    endif
    ## Position in the axes, 0..1; a corner box is 45 % wide, half high.
    u = (x - xl(1)) / diff (xl);
    v = (y - yl(1)) / diff (yl);
    ok = isfinite (u) & isfinite (v);
    right = u >= 0.55;
    left = u <= 0.45;
    top = v >= 0.5;
    low = v <= 0.5;
    count += [sum(ok & right & top), sum(ok & right & low), ...
              sum(ok & left & top), sum(ok & left & low)];
  endfor
  [~, best] = min (count);
  legend (ax, handles, names, "location", corners{best}, "interpreter", "none",
          "fontsize", 9);
endfunction

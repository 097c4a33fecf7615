## -*- texinfo -*-
## @deftypefn {} {@var{hleg} =} plot_line (@var{ax}, @var{x}, @var{y}, @var{k}, @var{color})
## Draw line @var{k} of axes @var{ax}: the full curve in its line style,
## its marker at about ten points only, and return a hidden handle that
## shows style and marker together, for the legend.
##
## A marker at every sample would blot out dense records; sparse markers
## still tell the lines apart without colour.  Markers of different lines
## are staggered so that they do not sit on top of each other.
## @end deftypefn

function hleg = plot_line (ax, x, y, k, color)
  s = plot_style (k, color);
  x = x(:);
  y = y(:);
  n = numel (x);
  line ("parent", ax, "xdata", x, "ydata", y, "linestyle", s.linestyle,
        "marker", "none", "color", s.color, "linewidth", 1.5);
  nm = 10;
  if (n <= nm)
    idx = 1:n;
  else
    step = (n - 1) / nm;
    pos = 1 + step * ((0:nm-1) + mod (k - 1, 4) / 4 + 0.125);
    idx = unique (round (pos(pos <= n)));
  endif
  line ("parent", ax, "xdata", x(idx), "ydata", y(idx), "linestyle", "none",
        "marker", s.marker, "markersize", 6, "color", s.color,
        "linewidth", 1);
  ## Not drawn (NaN data), only listed by the legend.
  hleg = line ("parent", ax, "xdata", NaN, "ydata", NaN,
               "linestyle", s.linestyle, "marker", s.marker,
               "color", s.color, "linewidth", 1.5);
endfunction

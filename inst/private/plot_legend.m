## -*- texinfo -*-
## @deftypefn  {} {@var{lg} =} plot_legend (@var{ax}, @var{handles}, @var{names})
## @deftypefnx {} {@var{lg} =} plot_legend (@var{ax}, @var{handles}, @var{names}, @var{table})
## Draw the legend of axes @var{ax} outside the data, in the margin to the
## right of the axes: one entry per handle, a short sample of its line
## style and marker and its name.  @var{table}, optional, is a cellstr of
## lines written below the entries in a fixed-width font (a metrics
## table).  Return the legend's axes (tag @qcode{"vn_legend"}, its names in
## @qcode{"userdata"}).
##
## The legend is an invisible axes of its own, so that the data axes keep
## their positions (stacked axes stay aligned) and no curve is covered;
## this also renders the same on every graphics toolkit.
## @end deftypefn

function lg = plot_legend (ax, handles, names, table)
  if (nargin < 4)
    table = {};
  endif
  p = get (ax, "position");
  fig = get (ax, "parent");
  x0 = p(1) + p(3) + 0.015;
  w = max (min (0.99 - x0, 0.24), 0.05);
  lg = axes ("parent", fig, "position", [x0, p(2), w, p(4)], "visible", "off",
             "xlim", [0 1], "ylim", [0 1], "tag", "vn_legend",
             "userdata", names(:).', "nextplot", "add");
  ## entries of about 0.05 of the figure height each, from the top
  step = min (0.05 / p(4), 1 / (numel (names) + numel (table) + 1));
  y = 1 - step / 2;
  for i = 1:numel (handles)
    hh = handles(i);
    ls = get (hh, "linestyle");
    mk = get (hh, "marker");
    c = get (hh, "color");
    line ("parent", lg, "xdata", [0 0.08 0.16], "ydata", [y y y],
          "linestyle", ls, "marker", "none", "color", c, "linewidth", 1.5);
    if (! strcmp (mk, "none"))
      line ("parent", lg, "xdata", 0.08, "ydata", y, "linestyle", "none",
            "marker", mk, "color", c, "markersize", 6,
            "markerfacecolor", get (hh, "markerfacecolor"));
    endif
    text (0.2, y, names{i}, "parent", lg, "interpreter", "none",
          "fontsize", 9, "verticalalignment", "middle");
    y -= step;
  endfor
  if (! isempty (table))
    y -= step / 2;
    for i = 1:numel (table)
      text (0, y, table{i}, "parent", lg, "interpreter", "none",
            "fontsize", 8, "fontname", "Courier", "verticalalignment", "middle",
            "tag", "metrics");
      y -= step;
    endfor
  endif
endfunction

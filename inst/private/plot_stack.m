## -*- texinfo -*-
## @deftypefn {} {@var{ax} =} plot_stack (@var{h}, @var{weights}, @var{column}, @var{ncolumns})
## Create axes stacked top to bottom in figure @var{h}, one per element of
## @var{weights} (relative heights), in column @var{column} of
## @var{ncolumns} equal columns.  Return their handles, top first.
##
## Fixed positions rather than subplot keep the left edges aligned, so
## stacked axes read against one time axis.  Each column leaves room on
## its right for the legends (@code{plot_legend}), outside the data.
## @end deftypefn

function ax = plot_stack (h, weights, column, ncolumns)
  colw = 1 / ncolumns;
  if (ncolumns == 1)
    left = 0.15;
    legroom = 0.24;
  else
    left = 0.1;
    legroom = 0.15;
  endif
  bottom = 0.09;
  top = 0.075;
  n = numel (weights);
  gap = min (0.05, 0.3 / n);
  width = colw - left - legroom;
  x0 = (column - 1) * colw + left;
  room = 1 - bottom - top - (n - 1) * gap;
  heights = room * weights(:).' / sum (weights);
  ax = zeros (1, n);
  y = 1 - top;
  for i = 1:n
    y -= heights(i);
    ax(i) = axes ("parent", h, "position", [x0, y, width, heights(i)],
                  "box", "on", "nextplot", "add", "fontsize", 9 - (ncolumns > 1));
    y -= gap;
  endfor
endfunction

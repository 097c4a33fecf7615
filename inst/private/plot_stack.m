## -*- texinfo -*-
## @deftypefn {} {@var{ax} =} plot_stack (@var{h}, @var{weights}, @var{column}, @var{ncolumns})
## Create axes stacked top to bottom in figure @var{h}, one per element of
## @var{weights} (relative heights), in column @var{column} of
## @var{ncolumns} equal columns.  Return their handles, top first.
##
## Fixed positions rather than subplot keep the left edges aligned, so
## stacked axes read against one time axis.
## @end deftypefn

function ax = plot_stack (h, weights, column, ncolumns)
  left = 0.15;
  right = 0.03;
  bottom = 0.10;
  top = 0.07;
  gap = 0.05;
  colgap = 0.14;
  width = (1 - left - right - (ncolumns - 1) * colgap) / ncolumns;
  x0 = left + (column - 1) * (width + colgap);
  n = numel (weights);
  room = 1 - bottom - top - (n - 1) * gap;
  heights = room * weights(:).' / sum (weights);
  ax = zeros (1, n);
  y = 1 - top;
  for i = 1:n
    y -= heights(i);
    ax(i) = axes ("parent", h, "position", [x0, y, width, heights(i)],
                  "box", "on", "nextplot", "add");
    y -= gap;
  endfor
endfunction

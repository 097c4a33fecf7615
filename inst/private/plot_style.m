## -*- texinfo -*-
## @deftypefn {} {@var{s} =} plot_style (@var{k}, @var{color})
## Return the look of the @var{k}-th line of one axes: @code{s.linestyle},
## @code{s.marker} and @code{s.color}.
##
## Lines are told apart by line style and marker so that a figure printed
## in black and white still reads; with @var{color} true they also get the
## colours of the default colour order.
## @end deftypefn

function s = plot_style (k, color)
  styles = {"-", "--", ":", "-."};
  ## Marker cycle length is coprime to the style cycle: 28 distinct pairs.
  markers = {"o", "s", "^", "d", "v", "x", "+"};
  s.linestyle = styles{mod (k - 1, numel (styles)) + 1};
  s.marker = markers{mod (k - 1, numel (markers)) + 1};
  if (color)
    order = get (0, "defaultaxescolororder");
    s.color = order(mod (k - 1, rows (order)) + 1, :);
  else
    s.color = [0 0 0];
  endif
endfunction

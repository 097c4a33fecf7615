## -*- texinfo -*-
## @deftypefn {} {} plot_pad (@var{ax})
## Widen the y range of linear axes @var{ax} by 5 % of the data span on
## each side, so that a flat line does not hide in the axes frame.
## @end deftypefn

function plot_pad (ax)
  for a = ax(:).'
    if (strcmp (get (a, "yscale"), "log"))
      continue;
    endif
    y = get (findobj (a, "type", "line"), "ydata");
    if (iscell (y))
      y = [y{:}];
    endif
    y = y(isfinite (y));
    if (isempty (y))
      continue;
    endif
    lo = min (y);
    hi = max (y);
    pad = 0.05 * (hi - lo);
    if (pad == 0)
      pad = max (0.05 * abs (lo), 1e-12);
    endif
    set (a, "ylim", [lo - pad, hi + pad]);
  endfor
endfunction

## -*- texinfo -*-
## @deftypefn {} {@var{ax} =} plot_freq (@var{h}, @var{fr}, @var{opt})
## Draw frequency response @var{fr} (from @code{vn_frequency}) in figure
## @var{h}: magnitude on log-log axes over phase on semilog axes, one
## line per input/output pair, against frequency in rad/s.  Return the
## two axes handles.
## @end deftypefn

function ax = plot_freq (h, fr, opt)
  w = fr.w(:);
  nw = numel (w);
  [~, nout, nin] = size (fr.magnitude);
  if (! isnumeric (fr.magnitude) || rows (fr.magnitude) != nw
      || ! isequal (size (fr.phase), size (fr.magnitude)))
    error ("Octave:invalid-input-arg",
           "vn_plot: frequency response magnitude %s and phase %s must both be %d x outputs x inputs",
           mat2str (size (fr.magnitude)), mat2str (size (fr.phase)), nw);
  endif
  outs = names_of (fr, "outputs", "y", nout);
  ins = names_of (fr, "inputs", "u", nin);
  ax = plot_stack (h, [1 1], 1, 1);
  set (ax, "xscale", "log");
  set (ax(1), "yscale", "log");
  hl = [];
  labels = {};
  k = 0;
  for j = 1:nin
    for i = 1:nout
      k += 1;
      mag = fr.magnitude(:,i,j);
      ## log axes cannot show a zero gain
      mag(mag <= 0) = NaN;
      hl(end+1) = plot_line (ax(1), w, mag, k, opt.color);
      plot_line (ax(2), w, fr.phase(:,i,j), k, opt.color);
      labels{end+1} = sprintf ("%s to %s", ins{j}, outs{i});
    endfor
  endfor
  ylabel (ax(1), "magnitude (output/input)");
  ylabel (ax(2), "phase (deg)");
  xlabel (ax(2), "frequency (rad/s)");
  if (nw > 1)
    set (ax, "xlim", [min(w) max(w)]);
  endif
  ## Phase ticks at multiples of 45 or 90 degrees read at a glance.
  p = fr.phase(isfinite (fr.phase));
  if (! isempty (p))
    span = max (p) - min (p);
    step = 45 + 45 * (span > 270);
    lo = step * floor (min (p) / step);
    ## + 0 turns a -0 tick label into 0
    hi = step * ceil (max (p) / step) + 0;
    if (hi == lo)
      hi = lo + step;
    endif
    set (ax(2), "ylim", [lo hi], "ytick", lo:step:hi);
  endif
  set (ax(1), "xticklabel", {});
  plot_legend (ax(1), hl, labels);
endfunction

function c = names_of (fr, field, stem, n)
  if (isfield (fr, field) && iscellstr (fr.(field)) && numel (fr.(field)) == n)
    c = fr.(field)(:).';
  else
    c = arrayfun (@(q) sprintf ("%s%d", stem, q), 1:n, "uniformoutput", false);
  endif
endfunction

## -*- texinfo -*-
## @deftypefn {} {@var{ax} =} plot_freq (@var{h}, @var{fr}, @var{opt})
## Draw frequency response @var{fr} (from @code{vn_frequency}) in figure
## @var{h}, against frequency in rad/s, and return the axes handles, top
## left first.
##
## @itemize
## @item With a loop (@code{fr.loop}): the open loop L = C G, magnitude on
## log-log axes over phase, with |L| = 1 and -180 deg drawn dotted, the
## gain margin marked at the phase crossover and the phase margin at the
## gain crossover, each labelled with its value; the margins are listed
## beside the axes.
## @item One pair: magnitude over phase, legend beside the axes.
## @item Several pairs: a grid of small panels, one column per input and
## one row per output, each a magnitude over a phase axes; every panel has
## the same scales, tick labels only on the outer panels.
## @end itemize
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
  if (isfield (fr, "loop") && isstruct (fr.loop) && isfield (fr.loop, "L"))
    ax = draw_loop (h, w, fr.loop, opt);
  elseif (nout * nin == 1)
    ax = plot_stack (h, [1 1], 1, 1);
    set (ax, "xscale", "log");
    set (ax(1), "yscale", "log");
    mag = fr.magnitude(:,1,1);
    mag(mag <= 0) = NaN;
    hl = plot_line (ax(1), w, mag, 1, opt.color);
    plot_line (ax(2), w, fr.phase(:,1,1), 1, opt.color);
    ylabel (ax(1), "magnitude (output/input)");
    ylabel (ax(2), "phase (deg)");
    xlabel (ax(2), "frequency (rad/s)");
    limits (ax, w, fr.phase);
    set (ax(1), "xticklabel", {});
    plot_legend (ax(1), hl, {sprintf("%s to %s", ins{1}, outs{1})});
  else
    ax = draw_grid (h, w, fr, ins, outs, opt);
  endif
endfunction

## Common x range; phase ticks at multiples of 45 or 90 degrees.
function limits (ax, w, phase, maxticks)
  if (nargin < 4)
    maxticks = 9;
  endif
  if (numel (w) > 1)
    set (ax, "xlim", [min(w) max(w)]);
  endif
  p = phase(isfinite (phase));
  if (! isempty (p))
    span = max (p) - min (p);
    step = 45 * (1 + (span > 270)) * (1 + (span > 720));
    while ((span / step) + 1 > maxticks)
      step *= 2;
    endwhile
    lo = step * floor (min (p) / step);
    ## + 0 turns a -0 tick label into 0
    hi = step * ceil (max (p) / step) + 0;
    if (hi == lo)
      hi = lo + step;
    endif
    pa = ax(strcmp (get (ax, "yscale"), "linear"));
    set (pa, "ylim", [lo hi], "ytick", lo:step:hi);
  endif
endfunction

## Panels in a grid: rows outputs, columns inputs, shared scales.
function ax = draw_grid (h, w, fr, ins, outs, opt)
  [p, m] = deal (numel (outs), numel (ins));
  left = 0.11;
  right = 0.02;
  top = 0.1;
  bottom = 0.09;
  hgap = 0.015;
  vgap = 0.035;
  cw = (1 - left - right - (m - 1) * hgap) / m;
  rh = (1 - top - bottom - (p - 1) * vgap) / p;
  mag = fr.magnitude;
  mag(mag <= 0) = NaN;
  good = mag(isfinite (mag));
  ax = zeros (2 * p, m);
  for i = 1:p
    for j = 1:m
      x0 = left + (j - 1) * (cw + hgap);
      y0 = 1 - top - i * rh - (i - 1) * vgap;
      am = axes ("parent", h, "position", [x0, y0 + 0.4 * rh, cw, 0.6 * rh],
                 "box", "on", "nextplot", "add", "xscale", "log",
                 "yscale", "log", "fontsize", 8);
      ap = axes ("parent", h, "position", [x0, y0, cw, 0.4 * rh],
                 "box", "on", "nextplot", "add", "xscale", "log", "fontsize", 8);
      plot_line (am, w, mag(:,i,j), 1, opt.color);
      plot_line (ap, w, fr.phase(:,i,j), 1, opt.color);
      set (am, "xticklabel", {});
      if (i < p)
        set (ap, "xticklabel", {});
      else
        xlabel (ap, "frequency (rad/s)");
      endif
      if (i == 1)
        title (am, ["from " ins{j}], "interpreter", "none", "fontsize", 9);
      endif
      if (j == 1)
        ylabel (am, outs{i}, "interpreter", "none", "fontsize", 8);
        ylabel (ap, "deg", "fontsize", 8);
      else
        set ([am ap], "yticklabel", {});
      endif
      ax(2*i-1:2*i, j) = [am; ap];
    endfor
  endfor
  limits (ax(:), w, fr.phase, 3);
  if (! isempty (good))
    lo = floor (log10 (min (good)));
    hi = ceil (log10 (max (good)));
    if (hi <= lo)
      hi = lo + 1;
    endif
    ## about three decade ticks
    step = max (1, ceil ((hi - lo) / 3));
    set (ax(1:2:end,:), "ylim", 10 .^ [lo hi], "ytick", 10 .^ (lo:step:hi));
  endif
  ## about four decades on the frequency axis
  wl = floor (log10 (min (w)));
  wh = ceil (log10 (max (w)));
  step = max (1, ceil ((wh - wl) / 4));
  set (ax(:), "xtick", 10 .^ (wl:step:wh));
  annotation_note (h, "magnitude (output unit per input unit) over phase (deg); the same scales in every panel");
endfunction

## One line of text at the foot of the figure.
function annotation_note (h, s)
  a = axes ("parent", h, "position", [0 0.965 1 0.03], "visible", "off",
            "xlim", [0 1], "ylim", [0 1], "tag", "note");
  text (0.5, 0.5, s, "parent", a, "horizontalalignment", "center",
        "fontsize", 8);
endfunction

## The open loop with its margins marked.
function ax = draw_loop (h, w, lp, opt)
  ax = plot_stack (h, [1 1], 1, 1);
  set (ax, "xscale", "log");
  set (ax(1), "yscale", "log");
  mag = lp.magnitude(:);
  mag(mag <= 0) = NaN;
  ph = lp.phase(:);
  hl = plot_line (ax(1), w, mag, 1, opt.color);
  plot_line (ax(2), w, ph, 1, opt.color);
  ## the critical lines: |L| = 1 and -180 deg (the nearest branch)
  line ("parent", ax(1), "xdata", [w(1) w(end)], "ydata", [1 1],
        "linestyle", ":", "color", [0 0 0]);
  c = [0 0 0];
  if (opt.color)
    c = [0.8 0 0];
  endif
  table = {};
  labels = {"L = C G"};
  if (isfinite (lp.gain_crossover))
    wc = lp.gain_crossover;
    pc = interp1 (log (w), ph, log (wc));
    base = -180 + 360 * round ((pc - lp.phase_margin + 180) / 360);
    line ("parent", ax(2), "xdata", [w(1) w(end)], "ydata", [base base],
          "linestyle", ":", "color", [0 0 0]);
    line ("parent", ax(2), "xdata", [wc wc], "ydata", [base pc],
          "linestyle", "-", "color", c, "linewidth", 2, "tag", "phase margin");
    line ("parent", ax(1), "xdata", wc, "ydata", 1, "linestyle", "none",
          "marker", "o", "markersize", 7, "color", c);
    text (wc, (base + pc) / 2, sprintf ("  PM %.1f deg", lp.phase_margin),
          "parent", ax(2), "fontsize", 9, "tag", "phase margin");
    table{end+1} = sprintf ("PM %.1f deg", lp.phase_margin);
    table{end+1} = sprintf ("  at %.3g rad/s", wc);
  else
    table{end+1} = "PM Inf";
  endif
  if (isfinite (lp.phase_crossover))
    wp = lp.phase_crossover;
    mp = 1 / lp.gain_margin;
    line ("parent", ax(1), "xdata", [wp wp], "ydata", [mp 1],
          "linestyle", "-", "color", c, "linewidth", 2, "tag", "gain margin");
    text (wp, sqrt (mp), sprintf ("  GM %.1f dB", lp.gain_margin_db),
          "parent", ax(1), "fontsize", 9, "tag", "gain margin");
    table{end+1} = sprintf ("GM %.3g (%.1f dB)", lp.gain_margin, lp.gain_margin_db);
    table{end+1} = sprintf ("  at %.3g rad/s", wp);
  else
    table{end+1} = "GM Inf";
  endif
  ylabel (ax(1), "|L| (ratio)");
  ylabel (ax(2), "phase of L (deg)");
  xlabel (ax(2), "frequency (rad/s)");
  limits (ax, w, ph);
  set (ax(1), "xticklabel", {});
  title (ax(1), sprintf ("loop %s to %s, %s action", lp.input, lp.output, lp.action),
         "interpreter", "none");
  plot_legend (ax(1), hl, labels, table);
endfunction

function c = names_of (fr, field, stem, n)
  if (isfield (fr, field) && iscellstr (fr.(field)) && numel (fr.(field)) == n)
    c = fr.(field)(:).';
  else
    c = arrayfun (@(q) sprintf ("%s%d", stem, q), 1:n, "uniformoutput", false);
  endif
endfunction

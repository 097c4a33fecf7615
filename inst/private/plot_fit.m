## -*- texinfo -*-
## @deftypefn {} {@var{ax} =} plot_fit (@var{h}, @var{est}, @var{opt})
## Draw a fit against data in figure @var{h}: for each experiment
## @code{est.fit(k)} a column, and in it for each output a panel of the
## measured values (markers) and the model (line), with a small panel of
## the residuals (measured - predicted) as a line against time below it.
## Censored readings (@code{est.fit(k).censored}) are drawn as large open
## rings and have no residual.  Values are in the network's display units
## (@code{est.net} or option @qcode{"net"}); legends sit beside the axes.
## Return the axes handles, (2 x outputs) x experiments: the model panel
## of output j in row 2j-1, its residuals in row 2j.
##
## Field contract, per experiment k:
## @table @code
## @item est.fit(k).t
## times (s), a column of nt.
## @item est.fit(k).names
## cellstr of the ny measured quantities ("T2.level").
## @item est.fit(k).measured, est.fit(k).predicted
## nt x ny matrices; NaN marks a missing sample.
## @item est.fit(k).censored
## optional nt x ny logical: readings at or past a sensor's range.
## @item est.fit(k).units
## optional cellstr of ny units of measure (SI).
## @item est.fit(k).name
## optional experiment label.
## @end table
## @end deftypefn

function ax = plot_fit (h, est, opt)
  fit = est.fit;
  ne = numel (fit);
  if (ne == 0)
    error ("Octave:invalid-input-arg", "vn_plot: EST.fit holds no experiment");
  endif
  net = [];
  if (isfield (opt, "net"))
    net = opt.net;
  endif
  if (isempty (net) && isfield (est, "net") && isstruct (est.net)
      && isfield (est.net, "units"))
    net = est.net;
  endif
  ny = max (arrayfun (@(f) numel (cellstr (f.names)), fit));
  ax = zeros (2 * ny, ne);
  for k = 1:ne
    [t, names, ym, yp, cens] = check_experiment (fit(k), k);
    [factor, tlabel] = plot_timescale (t, opt.time);
    x = t * factor;
    n = numel (names);
    axk = plot_stack (h, repmat ([3 1], 1, n), k, ne);
    ax(1:2*n,k) = axk(:);
    for j = 1:n
      am = axk(2*j-1);
      ar = axk(2*j);
      [a, b, ul] = plot_qty (net, names{j}, unit_of (fit(k), j));
      m = a * ym(:,j) + b;
      p = a * yp(:,j) + b;
      c = cens(:,j);
      s = plot_style (1, opt.color);
      mv = m;
      mv(c) = NaN;
      hl = line ("parent", am, "xdata", x, "ydata", mv, "linestyle", "none",
                 "marker", s.marker, "markersize", 4, "color", s.color);
      hl(2) = line ("parent", am, "xdata", x, "ydata", p, "linestyle", "-",
                    "marker", "none", "color", s.color, "linewidth", 1.5);
      labels = {"measured", "model"};
      if (any (c))
        hl(3) = line ("parent", am, "xdata", x(c), "ydata", m(c),
                      "linestyle", "none", "marker", "o", "markersize", 9,
                      "color", s.color, "tag", "censored");
        labels{3} = "censored";
      endif
      r = m - p;
      r(c) = NaN;
      line ("parent", ar, "xdata", x, "ydata", r, "linestyle", "-",
            "marker", "none", "color", s.color, "linewidth", 1, "tag", "residual");
      line ("parent", ar, "xdata", [x(1) x(end)], "ydata", [0 0],
            "linestyle", ":", "color", [0 0 0]);
      if (x(end) > x(1))
        set ([am ar], "xlim", [x(1) x(end)]);
      endif
      set (am, "xticklabel", {});
      if (j < n)
        set (ar, "xticklabel", {});
      endif
      ylabel (am, label_of (names{j}, ul), "interpreter", "none");
      ylabel (ar, label_of ("residual", ul), "interpreter", "none");
      plot_pad (am);
      ## residuals: symmetric about zero, three ticks
      rm = max (abs (r(isfinite (r))));
      if (! isempty (rm) && rm > 0)
        rm = 1.1 * rm;
        set (ar, "ylim", [-rm rm], "ytick", [-1 0 1] * str2double (sprintf ("%.1g", rm / 1.1)));
      endif
      ## the same entries in every column: the legend beside the last
      if (k == ne || any (c))
        plot_legend (am, hl, labels);
      endif
    endfor
    xlabel (axk(end), tlabel);
    title (axk(1), experiment_name (fit(k), k), "interpreter", "none");
  endfor
endfunction

function [t, names, ym, yp, cens] = check_experiment (f, k)
  need = {"t", "names", "measured", "predicted"};
  if (! all (isfield (f, need)))
    error ("Octave:invalid-input-arg",
           "vn_plot: EST.fit(%d) needs fields t, names, measured, predicted", k);
  endif
  t = f.t(:);
  names = cellstr (f.names);
  sz = [numel(t), numel(names)];
  if (! isequal (size (f.measured), sz) || ! isequal (size (f.predicted), sz))
    error ("Octave:invalid-input-arg",
           "vn_plot: EST.fit(%d) measured %s and predicted %s must be %d x %d (times x names)",
           k, mat2str (size (f.measured)), mat2str (size (f.predicted)),
           sz(1), sz(2));
  endif
  ym = f.measured;
  yp = f.predicted;
  cens = false (sz);
  if (isfield (f, "censored") && isequal (size (f.censored), sz))
    cens = logical (f.censored);
  endif
endfunction

function s = unit_of (f, j)
  s = "";
  if (isfield (f, "units") && iscellstr (f.units) && numel (f.units) >= j)
    s = f.units{j};
  endif
endfunction

function s = label_of (name, u)
  s = name;
  if (! isempty (u))
    s = sprintf ("%s (%s)", name, u);
  endif
endfunction

function s = experiment_name (f, k)
  if (isfield (f, "name") && ischar (f.name) && ! isempty (f.name))
    s = f.name;
  else
    s = sprintf ("experiment %d", k);
  endif
endfunction

## -*- texinfo -*-
## @deftypefn {} {@var{ax} =} plot_fit (@var{h}, @var{est}, @var{opt})
## Draw a fit against data in figure @var{h}: for each experiment
## @code{est.fit(k)} a column with the measured values as markers and the
## model as lines, and below them a small axes of the residuals
## (measured - predicted).  Return the axes handles, 2 x experiments
## (model axes in row 1, residual axes in row 2).
##
## Field contract, per experiment k:
## @table @code
## @item est.fit(k).t
## times (s), a column of nt.
## @item est.fit(k).names
## cellstr of the ny measured quantities ("T2.level").
## @item est.fit(k).measured, est.fit(k).predicted
## nt x ny matrices; NaN marks a missing sample.
## @item est.fit(k).units
## optional cellstr of ny units of measure.
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
  ax = zeros (2, ne);
  for k = 1:ne
    [t, names, ym, yp] = check_experiment (fit(k), k);
    [factor, tlabel] = plot_timescale (t, opt.time);
    x = t * factor;
    ax(:,k) = plot_stack (h, [3 1], k, ne);
    hl = [];
    labels = {};
    set (ax(2,k), "nextplot", "add");
    for j = 1:numel (names)
      s = plot_style (j, opt.color);
      hl(end+1) = line ("parent", ax(1,k), "xdata", x, "ydata", ym(:,j),
                        "linestyle", "none", "marker", s.marker,
                        "markersize", 5, "color", s.color);
      hl(end+1) = line ("parent", ax(1,k), "xdata", x, "ydata", yp(:,j),
                        "linestyle", s.linestyle, "marker", "none",
                        "color", s.color, "linewidth", 1.5);
      labels(end+1:end+2) = {[names{j} " measured"], [names{j} " model"]};
      line ("parent", ax(2,k), "xdata", x, "ydata", ym(:,j) - yp(:,j),
            "linestyle", "none", "marker", s.marker, "markersize", 4,
            "color", s.color);
    endfor
    if (x(end) > x(1))
      set (ax(:,k), "xlim", [x(1) x(end)]);
    endif
    line ("parent", ax(2,k), "xdata", [x(1) x(end)], "ydata", [0 0],
          "linestyle", ":", "color", [0 0 0]);
    set (ax(1,k), "xticklabel", {});
    ylabel (ax(1,k), value_label (fit(k), names), "interpreter", "none");
    ylabel (ax(2,k), "residual");
    xlabel (ax(2,k), tlabel);
    if (ne > 1 || isfield (fit(k), "name"))
      title (ax(1,k), experiment_name (fit(k), k), "interpreter", "none");
    endif
    plot_pad (ax(:,k));
    plot_legend (ax(1,k), hl, labels);
  endfor
endfunction

function [t, names, ym, yp] = check_experiment (f, k)
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
endfunction

function s = value_label (f, names)
  s = strjoin (names, ", ");
  if (isfield (f, "units") && iscellstr (f.units) && ! isempty (f.units))
    u = unique (f.units);
    if (numel (u) == 1 && ! isempty (u{1}))
      s = sprintf ("%s (%s)", s, u{1});
    endif
  endif
endfunction

function s = experiment_name (f, k)
  if (isfield (f, "name") && ischar (f.name) && ! isempty (f.name))
    s = f.name;
  else
    s = sprintf ("experiment %d", k);
  endif
endfunction

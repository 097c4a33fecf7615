## -*- texinfo -*-
## @deftypefn {} {@var{ax} =} plot_step (@var{h}, @var{sr}, @var{opt})
## Draw step response @var{sr} (from @code{vn_stepresponse}) in figure
## @var{h}: one axes per output (changes from the operating point, in
## display units, the axis labelled with the output and its unit), the
## nonlinear response solid, the linear one dashed, the 63.2 % point and
## the settling time marked by small triangles.  Beside each axes, outside
## the data: the legend and a table of the metrics (final change, dead
## time, t63, settling time, overshoot) with times in the axis's time
## unit.  A response that does not settle away from zero
## (@code{metrics.settles} false) says so, without marks or times.
## Return the axes handles, top first.
##
## Times in @code{sr.metrics} are taken from the step at
## @code{sr.tstep} when that field exists, else at @code{sr.t(1)}.  The
## final change is @code{metrics.final} when given, else gain times
## @code{sr.size}, else the last nonlinear sample.
## @end deftypefn

function ax = plot_step (h, sr, opt)
  t = sr.t(:);
  nt = numel (t);
  outs = cellstr (sr.outputs);
  nout = numel (outs);
  check_block (sr.nonlinear, "nonlinear", nt, nout);
  havelin = ! isempty (sr.linear);
  if (havelin)
    check_block (sr.linear, "linear", nt, nout);
  endif
  t0 = t(1);
  if (isfield (sr, "tstep") && isscalar (sr.tstep))
    t0 = sr.tstep;
  endif
  net = opt.net;
  if (isempty (net) && isfield (sr, "lin") && isstruct (sr.lin)
      && isfield (sr.lin, "op") && isfield (sr.lin.op, "net"))
    net = sr.lin.op.net;
  endif
  [factor, tlabel] = plot_timescale (t, opt.time);
  tunit = regexprep (tlabel, '^time \((.*)\)$', "$1");
  x = t * factor;
  ax = plot_stack (h, ones (1, nout), 1, 1);
  for i = 1:nout
    [a, ~, ulabel] = plot_qty (net, outs{i}, unit_of (sr, i));
    yn = a * sr.nonlinear(:,i);
    hl = plot_line (ax(i), x, yn, 1, opt.color);
    labels = {"nonlinear"};
    if (havelin)
      hl(end+1) = plot_line (ax(i), x, a * sr.linear(:,i), 2, opt.color);
      labels{end+1} = "linear";
    endif
    table = {};
    if (isfield (sr, "metrics") && numel (sr.metrics) >= i)
      m = sr.metrics(i);
      final = a * final_change (sr, m, i);
      [hm, lm, table] = mark_points (ax(i), t, yn, t0, m, final, factor,
                                     tunit, ulabel, opt.color);
      hl = [hl, hm];
      labels = [labels, lm];
    endif
    ylab = [outs{i} " change"];
    if (! isempty (ulabel))
      ylab = sprintf ("%s (%s)", ylab, ulabel);
    endif
    ylabel (ax(i), ylab, "interpreter", "none");
    if (x(end) > x(1))
      set (ax(i), "xlim", [x(1) x(end)]);
    endif
    plot_pad (ax(i));
    plot_legend (ax(i), hl, labels, table);
    if (i < nout)
      set (ax(i), "xticklabel", {});
    endif
  endfor
  xlabel (ax(end), tlabel);
endfunction

function check_block (v, field, nt, nout)
  if (! isnumeric (v) || ! isequal (size (v), [nt, nout]))
    error ("Octave:invalid-input-arg",
           "vn_plot: step response field \"%s\" must be %d x %d (times x outputs), got %s",
           field, nt, nout, mat2str (size (v)));
  endif
endfunction

function final = final_change (sr, m, i)
  if (isfield (m, "final") && isscalar (m.final) && isfinite (m.final))
    final = m.final;
  elseif (isfield (m, "gain") && isfield (sr, "size")
          && isscalar (m.gain) && isfinite (m.gain) && isscalar (sr.size))
    final = m.gain * sr.size;
  else
    final = sr.nonlinear(end, i);
  endif
endfunction

## Markers at the 63.2 % point and at the settling time, and the table of
## metrics beside the axes (times in the axis's unit).
function [hm, lm, table] = mark_points (ax, t, y, t0, m, final, factor, tunit, ulabel, color)
  hm = [];
  lm = {};
  tick = @(v) sprintf ("%.4g %s", v * factor, tunit);
  c = [0 0 0];
  if (color)
    c = [0.8 0 0];
  endif
  table = {strtrim(sprintf ("final     %.4g %s", final, ulabel))};
  if (isfield (m, "deadtime") && isscalar (m.deadtime) && isfinite (m.deadtime))
    table{end+1} = ["dead time " tick(m.deadtime)];
  endif
  if (isfield (m, "settles") && ! m.settles)
    table(end+1:end+2) = {"does not settle", "away from zero"};
    return;
  endif
  if (isfield (m, "t63") && isscalar (m.t63) && isfinite (m.t63))
    ## 63.2 % = 1 - 1/e of the final change: one time constant of a lag.
    hm(end+1) = line ("parent", ax, "xdata", (t0 + m.t63) * factor,
                      "ydata", (1 - exp (-1)) * final, "linestyle", "none",
                      "marker", "^", "markersize", 8, "color", c,
                      "markerfacecolor", c);
    lm{end+1} = "63.2 %";
    table{end+1} = ["t63       " tick(m.t63)];
  endif
  if (isfield (m, "settle") && isscalar (m.settle))
    if (isfinite (m.settle))
      ts = t0 + m.settle;
      hm(end+1) = line ("parent", ax, "xdata", ts * factor,
                        "ydata", interp1 (t, y, min (max (ts, t(1)), t(end))),
                        "linestyle", "none", "marker", "v", "markersize", 8,
                        "color", c, "markerfacecolor", c);
      lm{end+1} = "settled (2 %)";
      table{end+1} = ["settled   " tick(m.settle)];
    else
      table{end+1} = "not settled";
    endif
  endif
  if (isfield (m, "overshoot") && isscalar (m.overshoot) && isfinite (m.overshoot))
    table{end+1} = sprintf ("overshoot %.3g %%", 100 * m.overshoot);
  endif
endfunction

function s = unit_of (sr, i)
  s = "";
  if (isfield (sr, "units") && iscellstr (sr.units) && numel (sr.units) >= i
      && ! isempty (sr.units{i}))
    s = sr.units{i};
  endif
endfunction

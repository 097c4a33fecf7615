## -*- texinfo -*-
## @deftypefn {} {@var{ax} =} plot_ensemble (@var{h}, @var{ens}, @var{opt})
## Draw an ensemble (@code{vn_ensemble}) in figure @var{h}: one axes per
## recorded quantity (at most six, the first), stacked over one time axis,
## each with the median (solid), the 5 % and 95 % percentiles (dashed, the
## band of 90 % of the runs) and the mean (dotted), in display units;
## legends beside the axes.  Return the axes handles, top first.
## @end deftypefn

function ax = plot_ensemble (h, ens, opt)
  names = cellstr (ens.names);
  t = ens.t(:);
  nq = min (numel (names), 6);
  for f = {"mean", "p05", "p50", "p95"}
    if (! isnumeric (ens.(f{1})) || rows (ens.(f{1})) != numel (t)
        || columns (ens.(f{1})) < numel (names))
      error ("Octave:invalid-input-arg",
             "vn_plot: ensemble field \"%s\" must be %d x %d (times x quantities), got %s",
             f{1}, numel (t), numel (names), mat2str (size (ens.(f{1}))));
    endif
  endfor
  net = opt.net;
  [factor, tlabel] = plot_timescale (t, opt.time);
  x = t * factor;
  ax = plot_stack (h, ones (1, nq), 1, 1);
  nr = size (ens.y, 3);
  for j = 1:nq
    si = "";
    if (isfield (ens, "units") && iscellstr (ens.units) && numel (ens.units) >= j)
      si = ens.units{j};
    endif
    [a, b, ul] = plot_qty (net, names{j}, si);
    hl = plot_line (ax(j), x, a * ens.p50(:,j) + b, 1, opt.color);
    hl(2) = plot_line (ax(j), x, a * ens.p05(:,j) + b, 2, opt.color);
    plot_line (ax(j), x, a * ens.p95(:,j) + b, 2, opt.color);
    hl(3) = plot_line (ax(j), x, a * ens.mean(:,j) + b, 3, opt.color);
    lab = names{j};
    if (! isempty (ul))
      lab = sprintf ("%s (%s)", lab, ul);
    endif
    ylabel (ax(j), lab, "interpreter", "none");
    if (x(end) > x(1))
      set (ax(j), "xlim", [x(1) x(end)]);
    endif
    plot_pad (ax(j));
    plot_legend (ax(j), hl, {"median", "5 % and 95 %", "mean"});
    if (j < nq)
      set (ax(j), "xticklabel", {});
    endif
  endfor
  xlabel (ax(end), tlabel);
  nf = 0;
  if (isfield (ens, "failed"))
    nf = numel (ens.failed);
  endif
  title (ax(1), sprintf ("ensemble of %d runs (%d failed)", nr, nf));
endfunction

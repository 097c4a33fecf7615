## -*- texinfo -*-
## @deftypefn  {} {} vn_report (@var{x})
## @deftypefnx {} {@var{s} =} vn_report (@var{x})
## @deftypefnx {} {} vn_report (@var{x}, @qcode{"file"}, @var{name})
## @deftypefnx {} {} vn_report (@dots{}, @var{option}, @var{value}, @dots{})
## Print a compact report of a result: the numbers an engineer reads, in
## a few tables, in the network's display units.
##
## @var{x} is any result of vesselnet, told apart by its fields:
## @table @asis
## @item operating point (@code{vn_steady})
## method, iterations, residual; a table of the tanks (level, volume,
## spill), of the flows, of the controllers and of the inputs, adjusted
## inputs marked.
## @item linear model (@code{vn_linearize})
## sizes, the steady-state gains (outputs x inputs, with units;
## integrating pairs as Inf) and the time constants.
## @item step response (@code{vn_stepresponse})
## per output the final change, gain, dead time, t63, rise and settling
## times and overshoot; a response that does not settle away from zero
## (@code{metrics.settles} false) says so and leaves its times out.
## @item frequency response (@code{vn_frequency})
## per pair the gain at the lowest frequency and the bandwidth; with a
## loop, the controller, the gain and phase margins and their crossover
## frequencies.
## @item fit (@code{vn_fit})
## per parameter the estimate, unit, standard error and 95 % interval,
## poorly determined parameters and strong correlations (|r| >= 0.8)
## flagged, the rmse overall and per experiment and output (censored
## readings counted), iterations and why the fit stopped.
## @item validation (@code{vn_validate})
## per output the rmse and the Nash-Sutcliffe efficiency r2.
## @item first-order model (@code{vn_fopdt})
## gain, time constant and dead time with standard errors, rmse.
## @item tuning (@code{vn_tune})
## Kc, Ti, Td, form, action, rule and its notes.
## @item ensemble (@code{vn_ensemble})
## runs and failures, the spread of the varied parameters, and per
## quantity the mean and the 5, 50 and 95 % percentiles at the end of the
## run and the extremes of the band over the run.
## @end table
##
## Without an output the report is printed; @var{s} = vn_report (@dots{})
## returns it as a char row (lines joined by newlines) instead.
##
## Options:
## @table @asis
## @item @qcode{"file"}, @var{name}
## write the report as Markdown to @var{name} (e.g. @qcode{"r.md"}), with
## its pictures (@code{vn_plot}) as PNG files beside it, named
## @var{base}_1.png, @dots{}, and linked from the text; nothing is printed.
## @item @qcode{"net"}, @var{net}
## the network whose display units and unit names to use, for results
## that do not carry it (linear models, responses, ensembles).
## @item @qcode{"title"}, @var{text}
## the report's title.
## @end table
##
## A report shows a model's numbers: validate the model against plant
## data, and have any tuning reviewed, before either informs a live
## plant; local codes govern safety systems.
## @seealso{vn_plot, vn_show, vn_fit, vn_steady}
## @end deftypefn

function s = vn_report (x, varargin)
  if (nargin < 1)
    print_usage ();
  endif
  kind = report_kind (x, "vn_report");
  opt = options (varargin);
  net = opt.net;
  if (isempty (net))
    net = carried_net (x);
  endif
  switch (kind)
    case "steady"
      blocks = rep_steady (x, net);
    case "linear"
      blocks = rep_linear (x, net);
    case "step"
      blocks = rep_step (x, net);
    case "frequency"
      blocks = rep_frequency (x, net);
    case "fit"
      blocks = rep_fit (x, net);
    case "validation"
      blocks = rep_validation (x, net);
    case "fopdt"
      blocks = rep_fopdt (x, net);
    case "tuning"
      blocks = rep_tuning (x);
    case "ensemble"
      blocks = rep_ensemble (x, net);
  endswitch
  if (! isempty (opt.title))
    blocks{1}{2} = opt.title;
  endif
  if (isempty (opt.file))
    txt = report_render (blocks, false);
    if (nargout > 0)
      s = txt;
    else
      printf ("%s\n", txt);
    endif
    return;
  endif
  pics = pictures (x, kind, opt.file, net);
  txt = report_render (blocks, true);
  for i = 1:numel (pics)
    [~, b, e] = fileparts (pics{i});
    txt = sprintf ("%s\n\n![%s](%s)", txt, blocks{1}{2}, [b e]);
  endfor
  txt = sprintf ("%s\n\n_%s_\n", txt, caution (kind));
  fid = fopen (opt.file, "w");
  if (fid < 0)
    error ("Octave:invalid-input-arg",
           "vn_report: cannot write \"%s\"", opt.file);
  endif
  fputs (fid, txt);
  fclose (fid);
  if (nargout > 0)
    s = txt;
  endif
endfunction

function opt = options (args)
  opt = struct ("file", "", "net", [], "title", "");
  [names, vals] = vn_option_pairs (args, "vn_report");
  for i = 1:numel (names)
    v = vals{i};
    switch (lower (names{i}))
      case "file"
        if (! ischar (v) || isempty (v) || rows (v) != 1)
          error ("Octave:invalid-input-arg",
                 "vn_report: option \"file\" must be a file name, e.g. \"report.md\"");
        endif
        d = fileparts (v);
        if (! isempty (d) && ! isfolder (d))
          error ("Octave:invalid-input-arg",
                 "vn_report: cannot write \"%s\": folder \"%s\" does not exist",
                 v, d);
        endif
        opt.file = v;
      case "net"
        if (! (isstruct (v) && isfield (v, "units") && isfield (v, "options")))
          error ("Octave:invalid-input-arg",
                 "vn_report: option \"net\" must be a network made by vn_network");
        endif
        opt.net = v;
      case "title"
        if (! ischar (v) || rows (v) > 1)
          error ("Octave:invalid-input-arg",
                 "vn_report: option \"title\" must be a string");
        endif
        opt.title = v;
      otherwise
        error ("Octave:invalid-input-arg",
               "vn_report: unknown option \"%s\"; allowed: file, net, title",
               names{i});
    endswitch
  endfor
endfunction

## The network a result carries: x.net, or the operating point's.
function net = carried_net (x)
  net = [];
  if (isfield (x, "net") && isstruct (x.net) && isfield (x.net, "units"))
    net = x.net;
  elseif (isfield (x, "op") && isstruct (x.op) && isfield (x.op, "net"))
    net = x.op.net;
  elseif (isfield (x, "lin") && isstruct (x.lin) && isfield (x.lin, "op")
          && isstruct (x.lin.op) && isfield (x.lin.op, "net"))
    net = x.lin.op.net;
  endif
endfunction

function s = caution (kind)
  if (strcmp (kind, "tuning"))
    s = "Tuning from a model is a starting point: review it before it reaches a live loop.";
  else
    s = "Model results: validate the model against plant data before they inform a live plant.";
  endif
endfunction

## "1.2 m" of a value in display units.
function s = qv (net, q, v, change)
  if (nargin < 4)
    change = false;
  endif
  [v, l] = report_qty (net, q, v, change);
  s = strtrim ([report_num(v) " " l]);
endfunction

## Up to 2 k rows: the first and last k, with a line saying how many are left out.
function [idx, note] = head_tail (n, k)
  note = "";
  if (n <= 2 * k)
    idx = 1:n;
  else
    idx = [1:k, n-k+1:n];
    note = sprintf ("%d rows not shown (the first and last %d are)", n - 2 * k, k);
  endif
endfunction

function blocks = add_table (blocks, head, cells, k)
  if (nargin < 4)
    k = 8;
  endif
  [idx, note] = head_tail (rows (cells), k);
  blocks{end+1} = {"t", head, cells(idx,:)};
  if (! isempty (note))
    blocks{end+1} = {"p", ["  ... " note]};
  endif
endfunction

## ---- operating point ---------------------------------------------------

function blocks = rep_steady (op, net)
  name = "";
  if (! isempty (net))
    name = sprintf (" of \"%s\"", net.name);
  endif
  blocks = {{"h", ["operating point" name]}};
  line = sprintf ("%s, %d iterations, residual %s", field_or (op, "method", "?"),
                  op.iterations, report_num (op.residual));
  if (isfield (op, "relres"))
    line = sprintf ("%s (relative %s)", line, report_num (op.relres));
  endif
  blocks{end+1} = {"p", line};
  if (isempty (net))
    blocks{end+1} = {"p", sprintf("%d states", numel(op.x))};
    return;
  endif
  U = net.units;
  tk = {};
  fl = {};
  ct = {};
  for i = 1:numel (U)
    u = U(i);
    if (! isfield (op, u.name))
      continue;
    endif
    r = op.(u.name);
    switch (u.kind)
      case "tank"
        row = {u.name, qv(net, [u.name ".level"], r.level), ...
               qv(net, [u.name ".volume"], r.volume), ...
               qv(net, [u.name ".spill"], get0(r, "spill"))};
        if (net.options.thermal)
          row{end+1} = qv (net, [u.name ".temperature"], get0 (r, "temperature"));
        endif
        tk(end+1,:) = row;
      case {"orifice", "resistance", "valve", "pump"}
        extra = "";
        if (isfield (r, "opening"))
          extra = ["opening " qv(net, [u.name ".opening"], r.opening)];
        elseif (isfield (r, "speed"))
          extra = ["speed " qv(net, [u.name ".speed"], r.speed)];
        endif
        fl(end+1,:) = {u.name, u.kind, qv(net, [u.name ".flow"], r.flow), extra};
      case {"controller", "switch"}
        ct(end+1,:) = {u.name, u.aux.measure, ...
                       qv(net, [u.name ".measurement"], get0(r, "measurement")), ...
                       qv(net, [u.name ".setpoint"], get0(r, "setpoint")), ...
                       u.aux.manipulate, qv(net, [u.name ".output"], get0(r, "output"))};
    endswitch
  endfor
  if (! isempty (tk))
    head = {"tank", "level", "volume", "spill"};
    if (net.options.thermal)
      head{end+1} = "temperature";
    endif
    blocks = add_table (blocks, head, tk);
  endif
  if (! isempty (fl))
    blocks = add_table (blocks, {"element", "kind", "flow", ""}, fl);
  endif
  if (! isempty (ct))
    blocks = add_table (blocks, {"loop", "measures", "value", "setpoint", ...
                                 "manipulates", "output"}, ct);
  endif
  if (isfield (op, "input_names") && ! isempty (op.input_names))
    adj = {};
    if (isfield (op, "adjusted") && iscellstr (op.adjusted))
      adj = op.adjusted;
    endif
    n = numel (op.input_names);
    c = cell (n, 2);
    for i = 1:n
      q = op.input_names{i};
      c(i,:) = {q, qv(net, q, op.input_values(i))};
      if (any (strcmp (q, adj)))
        c{i,2} = [c{i,2} " (adjusted)"];
      endif
    endfor
    blocks = add_table (blocks, {"input", "value"}, c);
  endif
  if (isfield (op, "spilling") && ! isempty (op.spilling))
    blocks{end+1} = {"p", ["spilling: " strjoin(cellstr(op.spilling), ", ")]};
  endif
  if (isfield (op, "saturated") && ! isempty (op.saturated))
    blocks{end+1} = {"p", ["saturated, off setpoint: " strjoin(cellstr(op.saturated), ", ")]};
  endif
endfunction

function v = get0 (r, f)
  v = NaN;
  if (isfield (r, f))
    v = r.(f);
  endif
endfunction

function v = field_or (x, f, d)
  v = d;
  if (isfield (x, f) && ! isempty (x.(f)))
    v = x.(f);
  endif
endfunction

## ---- linear model ------------------------------------------------------

function blocks = rep_linear (lin, net)
  [p, m] = size (lin.D);
  n = rows (lin.A);
  outs = names_or (lin, "outputs", "y", p);
  ins = names_or (lin, "inputs", "u", m);
  blocks = {{"h", "linear model"}};
  blocks{end+1} = {"p", sprintf("%d states, %d inputs, %d outputs", n, m, p)};
  if (isfield (lin, "note") && ischar (lin.note) && ! isempty (lin.note))
    blocks{end+1} = {"p", lin.note};
  endif
  if (isfield (lin, "gain") && isequal (size (lin.gain), [p m]))
    blocks{end+1} = {"p", "steady-state gains (change of output per change of input; Inf: integrating)"};
    c = cell (p, m + 1);
    for i = 1:p
      c{i,1} = outs{i};
      for j = 1:m
        c{i,j+1} = gain_text (net, outs{i}, ins{j}, lin.gain(i,j));
      endfor
    endfor
    blocks = add_table (blocks, [{"output"}, ins], c);
  endif
  tau = [];
  if (isfield (lin, "tau"))
    tau = sort (lin.tau(isfinite (lin.tau) & lin.tau > 0), "descend");
  endif
  if (! isempty (tau))
    k = min (numel (tau), 8);
    t = arrayfun (@(v) report_time (net, v), tau(1:k), "uniformoutput", false);
    line = ["time constants: " strjoin(t(:).', ", ")];
    if (numel (tau) > k)
      line = sprintf ("%s and %d faster", line, numel (tau) - k);
    endif
    blocks{end+1} = {"p", line};
  endif
  if (isfield (lin, "poles"))
    ni = nnz (real (lin.poles) == 0 | abs (lin.poles) < 1e-12 * max ([1; abs(lin.poles(:))]));
    nu = nnz (real (lin.poles) > 0);
    if (ni > 0 || nu > 0)
      blocks{end+1} = {"p", sprintf("%d integrating and %d unstable modes", ni, nu)};
    endif
  endif
endfunction

## A gain in display units of output per input.
function s = gain_text (net, out, in, g)
  [a, la] = report_qty (net, out, 1, true);
  [b, lb] = report_qty (net, in, 1, true);
  s = strtrim ([report_num(g * a / b) " " report_per(la, lb)]);
endfunction

function c = names_or (x, f, stem, k)
  if (isfield (x, f) && iscellstr (x.(f)) && numel (x.(f)) == k)
    c = x.(f)(:).';
  else
    c = arrayfun (@(q) sprintf ("%s%d", stem, q), 1:k, "uniformoutput", false);
  endif
endfunction

## ---- step response -----------------------------------------------------

function blocks = rep_step (sr, net)
  outs = cellstr (sr.outputs);
  inp = field_or (sr, "input", "the input");
  head = "step response";
  if (isfield (sr, "size") && isscalar (sr.size))
    head = sprintf ("step response to a change of %s in %s", qv (net, inp, sr.size, true), inp);
  endif
  blocks = {{"h", head}};
  if (! isfield (sr, "metrics") || numel (sr.metrics) < numel (outs))
    blocks{end+1} = {"p", "no metrics"};
    return;
  endif
  c = cell (numel (outs), 8);
  notes = {};
  for i = 1:numel (outs)
    m = sr.metrics(i);
    settles = ! isfield (m, "settles") || m.settles;
    fin = NaN;
    if (isfield (m, "final"))
      fin = m.final;
    endif
    c(i,1:4) = {outs{i}, qv(net, outs{i}, fin, true), ...
                gain_text(net, outs{i}, inp, get0(m, "gain")), ...
                report_time(net, get0(m, "deadtime"))};
    if (settles)
      c(i,5:8) = {report_time(net, get0(m, "t63")), report_time(net, get0(m, "rise")), ...
                  report_time(net, get0(m, "settle")), ...
                  strtrim([report_num(100 * get0(m, "overshoot")) " %"])};
    else
      c(i,5:8) = {"-", "-", "-", "-"};
      notes{end+1} = outs{i};
    endif
  endfor
  blocks = add_table (blocks, {"output", "final change", "gain", "dead time", ...
                               "t63", "rise", "settle (2 %)", "overshoot"}, c);
  if (! isempty (notes))
    blocks{end+1} = {"p", ["does not settle away from zero (times left out): " ...
                           strjoin(notes, ", ")]};
  endif
endfunction

## ---- frequency response ------------------------------------------------

function blocks = rep_frequency (fr, net)
  [nw, p, m] = size (fr.magnitude);
  outs = names_or (fr, "outputs", "y", p);
  ins = names_or (fr, "inputs", "u", m);
  blocks = {{"h", "frequency response"}};
  blocks{end+1} = {"p", sprintf("%d frequencies from %s to %s rad/s", nw, ...
                                report_num(min(fr.w)), report_num(max(fr.w)))};
  c = cell (0, 4);
  for j = 1:m
    for i = 1:p
      mag = fr.magnitude(:,i,j);
      g0 = mag(1);
      k = find (mag < g0 / sqrt (2), 1);
      bw = NaN;
      if (! isempty (k) && g0 > 0)
        bw = fr.w(k);
      endif
      c(end+1,:) = {ins{j}, outs{i}, gain_text(net, outs{i}, ins{j}, g0), ...
                    report_num(bw)};
    endfor
  endfor
  blocks = add_table (blocks, {"input", "output", sprintf("gain at %s rad/s", report_num(fr.w(1))), ...
                               "bandwidth (rad/s)"}, c);
  if (isfield (fr, "loop") && isstruct (fr.loop))
    lp = fr.loop;
    pid = lp.controller;
    blocks{end+1} = {"h", sprintf("loop %s to %s", lp.input, lp.output)};
    blocks{end+1} = {"p", sprintf("controller Kc %s, Ti %s, Td %s (%s), %s action", ...
                                  report_num(pid.Kc), report_time(net, pid.Ti), ...
                                  report_time(net, pid.Td), pid.form, lp.action)};
    c = {"gain margin", sprintf("%s (%s dB)", report_num(lp.gain_margin), ...
                               report_num(lp.gain_margin_db)), ...
         where("phase", lp.phase_crossover);
         "phase margin", [report_num(lp.phase_margin) " deg"], ...
         where("gain", lp.gain_crossover)};
    blocks{end+1} = {"t", {"margin", "value", "where"}, c};
    if (lp.phase_margin < 30 || lp.gain_margin < 2)
      blocks{end+1} = {"p", "margins below common practice (gain margin 2, phase margin 30 deg)"};
    endif
  endif
endfunction

function s = where (what, w)
  if (isfinite (w))
    s = sprintf ("at the %s crossover, %s rad/s", what, report_num (w));
  else
    s = sprintf ("no %s crossover on the grid", what);
  endif
endfunction

## ---- fit ---------------------------------------------------------------

function blocks = rep_fit (est, net)
  names = cellstr (est.names);
  np = numel (names);
  blocks = {{"h", sprintf("fit of %d parameter%s", np, plural(np))}};
  c = cell (np, 5);
  poor = {};
  for i = 1:np
    [v, l] = report_qty (net, names{i}, est.value(i));
    se = report_qty (net, names{i}, est.stderr(i), true);
    ci = report_qty (net, names{i}, est.ci(i,:));
    ## digits enough to tell the ends of the interval apart
    nd = 4;
    while (nd < 10 && all (isfinite (ci))
           && strcmp (sprintf ("%.*g", nd, ci(1)), sprintf ("%.*g", nd, ci(2))))
      nd += 1;
    endwhile
    g = @(x) sprintf ("%.*g", nd, x);
    c(i,:) = {names{i}, g(v), l, report_num(se), sprintf("[%s, %s]", g(ci(1)), g(ci(2)))};
    if (! (abs (est.stderr(i)) <= 0.5 * abs (est.value(i))))
      poor{end+1} = names{i};
    endif
  endfor
  blocks{end+1} = {"t", {"parameter", "estimate", "unit", "std error", "95 % interval"}, c};
  if (! isempty (poor))
    blocks{end+1} = {"p", ["poorly determined (std error over half the estimate): " ...
                           strjoin(poor, ", ")]};
  endif
  if (isfield (est, "corr") && isequal (size (est.corr), [np np]))
    [i, j] = find (triu (abs (est.corr) >= 0.8, 1));
    if (! isempty (i))
      pairs = arrayfun (@(a, b) sprintf ("%s ~ %s %.2f", names{a}, names{b}, ...
                                         est.corr(a, b)), i, j, "uniformoutput", false);
      blocks{end+1} = {"p", ["strong correlations (|r| >= 0.8): " strjoin(pairs(:).', "; ")]};
    endif
  endif
  ## rmse overall, and per experiment and output
  line = ["rmse " fit_rmse_text(est, net)];
  if (isfield (est, "dof"))
    line = sprintf ("%s, %d degrees of freedom", line, est.dof);
  endif
  blocks{end+1} = {"p", line};
  if (isfield (est, "fit") && isstruct (est.fit))
    c = cell (0, 5);
    for k = 1:numel (est.fit)
      f = est.fit(k);
      en = field_or (f, "name", sprintf ("experiment %d", k));
      fn = cellstr (f.names);
      cens = false (size (f.measured));
      if (isfield (f, "censored") && isequal (size (f.censored), size (f.measured)))
        cens = logical (f.censored);
      endif
      for j = 1:numel (fn)
        r = f.measured(:,j) - f.predicted(:,j);
        ok = isfinite (r) & ! cens(:,j);
        c(end+1,:) = {en, fn{j}, sprintf("%d", nnz(ok)), sprintf("%d", nnz(cens(:,j))), ...
                      qv(net, fn{j}, sqrt(mean(r(ok) .^ 2)), true)};
      endfor
    endfor
    blocks = add_table (blocks, {"experiment", "output", "readings", "censored", "rmse"}, c, 5);
  endif
  line = sprintf ("%d iterations", field_or (est, "iterations", NaN));
  if (isfield (est, "reason") && ischar (est.reason))
    line = [line ", stopped: " est.reason];
  endif
  blocks{end+1} = {"p", line};
endfunction

## The overall rmse with a unit when all fitted outputs share one.
function s = fit_rmse_text (est, net)
  s = report_num (est.rmse);
  if (isfield (est, "fit") && isstruct (est.fit) && ! isempty (est.fit))
    q = unique ([arrayfun(@(f) cellstr(f.names)(:).', est.fit, "uniformoutput", false){:}]);
    si = cellfun (@(x) report_unit (net, x), q, "uniformoutput", false);
    if (! isempty (si) && all (strcmp (si, si{1})) && ! isempty (si{1}))
      s = qv (net, q{1}, est.rmse, true);
    endif
  endif
endfunction

function s = plural (n)
  if (n == 1)
    s = "";
  else
    s = "s";
  endif
endfunction

## ---- validation --------------------------------------------------------

function blocks = rep_validation (val, net)
  blocks = {{"h", "validation on tests the fit has not seen"}};
  c = cell (0, 6);
  bad = {};
  for k = 1:numel (val)
    v = val(k);
    names = cellstr (v.names);
    tn = field_or (v, "name", sprintf ("test %d", k));
    cens = false (size (v.measured));
    if (isfield (v, "censored") && isequal (size (v.censored), size (v.measured)))
      cens = logical (v.censored);
    endif
    for j = 1:numel (names)
      n = nnz (isfinite (v.measured(:,j)) & isfinite (v.predicted(:,j)) & ! cens(:,j));
      c(end+1,:) = {tn, names{j}, sprintf("%d", n), sprintf("%d", nnz (cens(:,j))), ...
                    qv(net, names{j}, v.rmse(j), true), sprintf("%.3f", v.r2(j))};
      if (v.r2(j) < 0.5)
        bad{end+1} = names{j};
      endif
    endfor
  endfor
  blocks = add_table (blocks, {"test", "output", "readings", "censored", "rmse", "r2"}, c);
  blocks{end+1} = {"p", "r2: Nash-Sutcliffe efficiency, 1 - SSE / SS about the mean (1 perfect, 0 no better than the mean)"};
  if (! isempty (bad))
    blocks{end+1} = {"p", ["r2 below 0.5, the model does not describe: " strjoin(unique (bad), ", ")]};
  endif
endfunction

## ---- first-order model -------------------------------------------------

function blocks = rep_fopdt (m, net)
  blocks = {{"h", sprintf("%s model (%s)", m.type, field_or(m, "method", ""))}};
  se = struct ("gain", NaN, "tau", NaN, "deadtime", NaN);
  if (isfield (m, "stderr") && isstruct (m.stderr))
    se = m.stderr;
  endif
  c = {};
  if (strcmp (m.type, "integrating"))
    c(end+1,:) = {"rate gain k'", report_num(m.gain), "output/s per input", report_num(get0(se, "gain"))};
  else
    c(end+1,:) = {"gain", report_num(m.gain), "output per input", report_num(get0(se, "gain"))};
  endif
  if (isfield (m, "tau") && ! isempty (m.tau) && isfinite (m.tau(1)))
    c(end+1,:) = {"time constant", report_time(net, m.tau(1)), "", ...
                  report_time(net, get0(se, "tau"))};
  endif
  c(end+1,:) = {"dead time", report_time(net, field_or(m, "deadtime", NaN)), "", ...
                report_time(net, get0(se, "deadtime"))};
  blocks{end+1} = {"t", {"parameter", "estimate", "unit", "std error"}, c};
  line = sprintf ("rmse %s", report_num (field_or (m, "rmse", NaN)));
  if (isfield (m, "iterations"))
    line = sprintf ("%s, %d iterations", line, m.iterations);
  endif
  if (isfield (m, "converged") && ! m.converged)
    line = [line ", NOT converged"];
  endif
  blocks{end+1} = {"p", line};
  if (isfield (m, "baseline") && isstruct (m.baseline))
    b = m.baseline;
    blocks{end+1} = {"p", sprintf("baseline: input %s, output %s, step at %s", ...
                                  report_num(get0(b, "u0")), report_num(get0(b, "y0")), ...
                                  report_time(net, get0(b, "t0")))};
  endif
endfunction

## ---- tuning ------------------------------------------------------------

function blocks = rep_tuning (pid)
  blocks = {{"h", sprintf("controller settings (%s, %s)", field_or(pid, "method", "?"), ...
                          field_or(pid, "type", "pid"))}};
  c = {"Kc", report_num(pid.Kc), "output per measured unit";
       "Ti", report_time([], pid.Ti), "reset (integral) time";
       "Td", report_time([], field_or(pid, "Td", 0)), "derivative time"};
  blocks{end+1} = {"t", {"setting", "value", ""}, c};
  line = sprintf ("form %s", field_or (pid, "form", "ideal"));
  if (isfield (pid, "action"))
    line = sprintf ("%s, %s action (vn_controller gets gain |Kc| = %s)", line, ...
                    pid.action, report_num (abs (pid.Kc)));
  endif
  blocks{end+1} = {"p", line};
  for f = {"lambda", "tauc"}
    if (isfield (pid, f{1}) && isscalar (pid.(f{1})) && isfinite (pid.(f{1})))
      blocks{end+1} = {"p", sprintf("%s %s", f{1}, report_time([], pid.(f{1})))};
    endif
  endfor
  if (isfield (pid, "notes") && ! isempty (pid.notes))
    blocks{end+1} = {"p", strjoin(cellstr(pid.notes), " ")};
  endif
endfunction

## ---- ensemble ----------------------------------------------------------

function blocks = rep_ensemble (ens, net)
  names = cellstr (ens.names);
  nr = size (ens.y, 3);
  nf = 0;
  if (isfield (ens, "failed"))
    nf = numel (ens.failed);
  endif
  blocks = {{"h", sprintf("ensemble of %d runs", nr)}};
  line = sprintf ("%d runs, %d failed, %s simulated", nr, nf, ...
                  report_time (net, ens.t(end) - ens.t(1)));
  blocks{end+1} = {"p", line};
  if (nf > 0)
    f = ens.failed(1);
    blocks{end+1} = {"p", sprintf("first failure: run %d: %s", f.run, f.message)};
  endif
  if (isfield (ens, "params") && ! isempty (ens.params))
    pn = names_or (ens, "pnames", "p", columns (ens.params));
    c = cell (numel (pn), 4);
    for i = 1:numel (pn)
      v = ens.params(:,i);
      c(i,:) = {pn{i}, qv(net, pn{i}, min(v)), qv(net, pn{i}, median(v)), qv(net, pn{i}, max(v))};
    endfor
    blocks = add_table (blocks, {"parameter", "lowest", "median", "highest"}, c);
  endif
  c = cell (numel (names), 6);
  for j = 1:numel (names)
    q = names{j};
    si = "";
    if (isfield (ens, "units") && iscellstr (ens.units) && numel (ens.units) >= j)
      si = {ens.units{j}, q};
    else
      si = q;
    endif
    c(j,:) = {q, qv(net, si, ens.mean(end,j)), qv(net, si, ens.p05(end,j)), ...
              qv(net, si, ens.p50(end,j)), qv(net, si, ens.p95(end,j)), ...
              sprintf("%s .. %s", qv(net, si, min(ens.p05(:,j))), qv(net, si, max(ens.p95(:,j))))};
  endfor
  blocks{end+1} = {"p", "at the end of the run, and the 5 to 95 % band over the whole run:"};
  blocks = add_table (blocks, {"quantity", "mean", "5 %", "50 %", "95 %", "band over the run"}, c);
endfunction

## ---- pictures ----------------------------------------------------------

function files = pictures (x, kind, file, net)
  files = {};
  [d, b] = fileparts (file);
  what = {};
  switch (kind)
    case {"step", "frequency", "fit", "validation", "ensemble"}
      what = {x};
    case "linear"
      if (rows (x.A) > 0)
        what = {vn_frequency(x)};
      endif
  endswitch
  for i = 1:numel (what)
    f = fullfile (d, sprintf ("%s_%d.png", b, i));
    args = {};
    if (! isempty (net) && ! isfield (what{i}, "net"))
      args = {"net", net};
    endif
    try
      vn_plot (what{i}, "file", f, args{:});
      files{end+1} = f;
    catch err
      warning ("vesselnet:report-picture",
               "vn_report: picture \"%s\" not drawn: %s", f, err.message);
    end_try_catch
  endfor
endfunction

%!demo
%! ## Invented: a holding tank drained by an orifice; its operating point.
%! net = vn_network ("holding tank (invented)", "display", {"flow", "m3/h"});
%! net = vn_tank (net, "T1", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.008);
%! vn_report (vn_steady (net))

## The content of every kind's report is checked in tests/octave/test_report.m.
%!test
%! pid = struct ("Kc", -1.5, "Ti", 600, "Td", 0, "form", "ideal",
%!               "action", "direct", "method", "lambda", "type", "pi");
%! s = vn_report (pid);
%! assert (! isempty (regexp (s, "Kc +-1.5")));
%! assert (! isempty (regexp (s, "Ti +10 min")));
%! assert (! isempty (strfind (s, "direct action (vn_controller gets gain |Kc| = 1.5)")));
%!error <Invalid call> vn_report ()
%!error <cannot tell what result> vn_report (struct ("q", 1))

## A saturated loop is named in the operating point's report.
%!test
%! net = vn_tank (vn_network ("w"), "T1", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.005);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 30, "opening", 0.5);
%! net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", "LV1.opening", ...
%!                      "setpoint", 1, "gain", 2, "reset", 100, "action", "direct");
%! warning ("off", "vesselnet:saturated", "local");
%! s = vn_report (vn_steady (net));
%! assert (! isempty (strfind (s, "saturated, off setpoint: LC1")));

## -*- texinfo -*-
## @deftypefn {} {@var{ax} =} plot_trends (@var{h}, @var{res}, @var{names}, @var{opt})
## Draw quantities @var{names} (cellstr "UNIT.VARIABLE"; empty: every tank
## level) of simulation result @var{res} against time in figure @var{h},
## in the network's display units.  Quantities sharing a unit of measure
## share one axes; the axes are stacked over one time axis, each labelled
## with its variable and unit ("level (m)", "opening (fraction)").  A
## controller's set point is drawn over the quantity it measures (brought
## in when only the set point is named), and named quantities that a
## controller measures bring its set point.  Legends sit beside the axes.
## Return the axes handles, top first.
## @end deftypefn

function ax = plot_trends (h, res, names, opt)
  if (isempty (names))
    names = tank_levels (res);
  endif
  net = opt.net;
  if (isempty (net) && isfield (res, "net") && isstruct (res.net)
      && isfield (res.net, "units"))
    net = res.net;
  endif
  names = with_setpoints (res, net, names);
  t = res.t(:);
  n = numel (names);
  [y, um] = deal (cell (1, n));
  for i = 1:n
    [y{i}, si] = fetch (res, names{i}, numel (t));
    if (any (strcmp (si, {"measured unit", "output unit"})))
      si = "";
    endif
    [a, b, um{i}] = plot_qty (net, names{i}, si);
    y{i} = a * y{i} + b;
  endfor
  ## a set point shares the axes of the quantity its controller measures
  over = zeros (1, n);
  for i = 1:n
    m = measured_by (net, names{i});
    if (! isempty (m))
      k = find (strcmp (names, m), 1);
      if (! isempty (k))
        over(i) = k;
      endif
    endif
  endfor

  ## One axes per unit of measure, in the order first named.
  groups = {};
  which = zeros (1, n);
  for i = find (over == 0)
    g = find (strcmp (groups, um{i}), 1);
    if (isempty (g))
      groups{end+1} = um{i};
      g = numel (groups);
    endif
    which(i) = g;
  endfor
  which(over > 0) = which(over(over > 0));
  ax = plot_stack (h, ones (1, numel (groups)), 1, 1);
  [factor, tlabel] = plot_timescale (t, opt.time);
  x = t * factor;
  for g = 1:numel (groups)
    members = find (which == g);
    hl = [];
    labels = {};
    k = 0;
    for i = members(:).'
      for j = 1:columns (y{i})
        k += 1;
        hl(end+1) = plot_line (ax(g), x, y{i}(:,j), k, opt.color);
        if (columns (y{i}) > 1)
          labels{end+1} = sprintf ("%s(%d)", names{i}, j);
        else
          labels{end+1} = names{i};
        endif
      endfor
    endfor
    ylabel (ax(g), axis_label (names(members(over(members) == 0)), groups{g}),
            "interpreter", "none");
    if (x(end) > x(1))
      set (ax(g), "xlim", [x(1) x(end)]);
    endif
    plot_pad (ax(g));
    plot_legend (ax(g), hl, labels);
    if (g < numel (groups))
      set (ax(g), "xticklabel", {});
    endif
  endfor
  xlabel (ax(end), tlabel);
endfunction

## The quantity the controller of set point NAME measures, or "".
function m = measured_by (net, name)
  m = "";
  if (isempty (net) || isempty (regexp (name, '\.setpoint$', "once")))
    return;
  endif
  k = find (strcmp ({net.units.name}, name(1:end-9)), 1);
  if (! isempty (k) && isfield (net.units(k).aux, "measure"))
    m = net.units(k).aux.measure;
  endif
endfunction

## The set point of every controller that measures a quantity drawn,
## placed after it; a set point drawn without its measurement brings it.
function out = with_setpoints (res, net, names)
  out = names(:).';
  if (isempty (net))
    return;
  endif
  for i = 1:numel (net.units)
    u = net.units(i);
    if (! strcmp (u.kind, "controller") || ! isfield (u.aux, "measure"))
      continue;
    endif
    sp = [u.name ".setpoint"];
    m = u.aux.measure;
    hassp = any (strcmp (out, sp));
    hasm = any (strcmp (out, m));
    if (hassp && ! hasm)
      k = find (strcmp (out, sp), 1);
      out = [out(1:k-1), {m}, out(k:end)];
    elseif (hasm && ! hassp && isfield (res, u.name) && isfield (res.(u.name), "setpoint"))
      k = find (strcmp (out, m), 1);
      out = [out(1:k), {sp}, out(k+1:end)];
    endif
  endfor
endfunction

## Every unit of the network that is a tank, or, without the network, every
## unit that reports a level.
function names = tank_levels (res)
  names = {};
  if (isfield (res, "net") && isstruct (res.net) && isfield (res.net, "units"))
    u = res.net.units;
    for i = 1:numel (u)
      if (strcmp (u(i).kind, "tank"))
        names{end+1} = [u(i).name ".level"];
      endif
    endfor
  else
    f = fieldnames (res.units);
    for i = 1:numel (f)
      if (isfield (res.units.(f{i}), "level"))
        names{end+1} = [f{i} ".level"];
      endif
    endfor
  endif
  if (isempty (names))
    error ("Octave:invalid-input-arg",
           "vn_plot: the result has no tank levels; name the quantities to plot, e.g. vn_plot (res, {\"O1.flow\"})");
  endif
endfunction

## Values and unit of measure of one quantity, or an error listing those
## the result has.
function [v, um] = fetch (res, name, nt)
  dot = find (name == ".", 1);
  ok = ! isempty (dot);
  if (ok)
    unit = name(1:dot-1);
    var = name(dot+1:end);
    ok = (isvarname (unit) && isfield (res, unit) && isstruct (res.(unit))
          && isfield (res.(unit), var));
  endif
  if (! ok)
    error ("Octave:invalid-input-arg",
           "vn_plot: the result has no quantity \"%s\"; it has %s",
           name, strjoin (known (res), ", "));
  endif
  v = res.(unit).(var);
  if (! isnumeric (v) || rows (v) != nt)
    error ("Octave:invalid-input-arg",
           "vn_plot: quantity \"%s\" has %d rows, the time column %d",
           name, rows (v), nt);
  endif
  um = "";
  if (isfield (res.units, unit) && isfield (res.units.(unit), var))
    um = res.units.(unit).(var);
  endif
endfunction

## All "UNIT.VARIABLE" names of a result.
function c = known (res)
  c = {};
  f = fieldnames (res.units);
  for i = 1:numel (f)
    if (isfield (res, f{i}) && isstruct (res.(f{i})))
      v = fieldnames (res.(f{i}));
      q = strcat (f{i}, ".", v(:).');
      c = [c, q];
    endif
  endfor
endfunction

## "level (m)" when the axes shows one kind of variable, else the unit.
function s = axis_label (names, um)
  vars = regexprep (names, '^[^.]*\.', "");
  if (! isempty (vars) && all (strcmp (vars, vars{1})))
    if (isempty (um))
      s = vars{1};
    else
      s = sprintf ("%s (%s)", vars{1}, um);
    endif
  elseif (isempty (um))
    s = "(no unit)";
  else
    s = um;
  endif
endfunction

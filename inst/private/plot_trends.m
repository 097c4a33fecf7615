## -*- texinfo -*-
## @deftypefn {} {@var{ax} =} plot_trends (@var{h}, @var{res}, @var{names}, @var{opt})
## Draw quantities @var{names} (cellstr "UNIT.VARIABLE"; empty: every tank
## level) of simulation result @var{res} against time in figure @var{h}.
## Quantities sharing a unit of measure share one axes; the axes are
## stacked over one time axis.  Return the axes handles, top first.
## @end deftypefn

function ax = plot_trends (h, res, names, opt)
  if (isempty (names))
    names = tank_levels (res);
  endif
  t = res.t(:);
  [y, um] = deal (cell (1, numel (names)));
  for i = 1:numel (names)
    [y{i}, um{i}] = fetch (res, names{i}, numel (t));
  endfor

  ## One axes per unit of measure, in the order first named.
  groups = {};
  which = zeros (1, numel (um));
  for i = 1:numel (um)
    g = find (strcmp (groups, um{i}), 1);
    if (isempty (g))
      groups{end+1} = um{i};
      g = numel (groups);
    endif
    which(i) = g;
  endfor
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
    ylabel (ax(g), axis_label (names(members), groups{g}), "interpreter", "none");
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
  if (all (strcmp (vars, vars{1})))
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

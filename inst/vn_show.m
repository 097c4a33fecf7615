## -*- texinfo -*-
## @deftypefn  {} {} vn_show (@var{net})
## @deftypefnx {} {} vn_show (@var{net}, @qcode{"all"}, true)
## @deftypefnx {} {@var{s} =} vn_show (@dots{})
## Print a readable summary of a network.
##
## Shows the network's name and options, then one row per unit in
## declaration order: name, kind, where it takes from and delivers to, and
## the parameters given, with their units of measure (in the units the
## network's @qcode{"display"} option asks for, see @code{vn_network}).  A
## controller shows its action once, its limits as @code{[lo hi]} and its
## gain in output unit per measured unit.  A last list gives the inputs
## that signals may drive (feed flows, valve openings, pump speeds,
## boundary heads) with their present values.  With an output the summary
## is returned as a char row (lines joined by newlines) instead of
## printed.
##
## A network of more than 40 units is summarised: the counts of units by
## kind, the first and the last units of the table and the first and last
## inputs, and where to look for the rest.  Option @qcode{"all"}, true
## lists every unit and input.
##
## @seealso{vn_network, vn_tank, vn_simulate, vn_report}
## @end deftypefn

function s = vn_show (net, varargin)
  if (nargin < 1)
    print_usage ();
  endif
  build_check_net ("vn_show", net);
  all_units = show_options (varargin);
  o = net.options;
  lines = {sprintf(["network \"%s\": gravity %g m/s2, density %g kg/m3, ", ...
                    "cp %g J/(kg K), ambient %g degC, smooth %g m, thermal %s"],
                   net.name, o.gravity, o.density, o.cp, o.ambient, o.smooth,
                   yesno (o.thermal))};
  if (! isempty (o.species))
    sp = cell (1, numel (o.species));
    for i = 1:numel (o.species)
      sp{i} = sprintf ("%s (decay %g 1/s)", o.species{i}, o.decay(i));
    endfor
    lines{end+1} = ["species: " strjoin(sp, ", ")];
  endif
  U = net.units;
  n = numel (U);
  ## head and tail of a long table; everything when asked
  keep = 5;
  brief = ! all_units && n > 40;
  lines{end+1} = sprintf ("%d unit%s", n, ifelse (n == 1, "", "s"));
  if (brief)
    lines{end} = [lines{end} ": " counts(U)];
    rows_shown = [1:keep, n-keep+1:n];
  else
    rows_shown = 1:n;
  endif
  if (n > 0)
    cols = {"name", "kind", "from -> to", "parameters"};
    m = numel (rows_shown);
    rowsc = cell (m, 4);
    for r = 1:m
      i = rows_shown(r);
      rowsc(r,:) = {U(i).name, U(i).kind, ends(U(i)), params(net, U(i))};
    endfor
    w = max (cellfun (@numel, [cols; rowsc]), [], 1);
    fmt = sprintf ("  %%-%ds  %%-%ds  %%-%ds  %%s", w(1:3));
    lines{end+1} = sprintf (fmt, cols{:});
    for r = 1:m
      if (brief && r == keep + 1)
        lines{end+1} = sprintf ("  ... %d units not shown (units %d to %d)",
                                n - 2 * keep, keep + 1, n - keep);
      endif
      lines{end+1} = sprintf (fmt, rowsc{r,:});
    endfor
    inp = inputs (net);
    if (! isempty (inp))
      ni = rows (inp);
      lines{end+1} = sprintf ("inputs (%d):", ni);
      shown = 1:ni;
      if (brief && ni > 2 * keep)
        shown = [1:keep, ni-keep+1:ni];
      endif
      wq = max (cellfun (@numel, inp(shown,1)));
      for r = 1:numel (shown)
        if (r == keep + 1 && numel (shown) < ni)
          lines{end+1} = sprintf ("  ... %d inputs not shown", ni - 2 * keep);
        endif
        lines{end+1} = sprintf ("  %-*s  %s", wq, inp{shown(r),1}, inp{shown(r),2});
      endfor
    endif
    if (brief)
      lines{end+1} = ["every unit and input: vn_show (net, \"all\", true); ", ...
                      "one unit: net.units(k) (k from the table's order), ", ...
                      "its parameters in net.units(k).par"];
    endif
  endif
  txt = strjoin (lines, "\n");
  if (nargout > 0)
    s = txt;
  else
    printf ("%s\n", txt);
  endif
endfunction

function all_units = show_options (args)
  all_units = false;
  [names, vals] = vn_option_pairs (args, "vn_show");
  for i = 1:numel (names)
    switch (lower (names{i}))
      case "all"
        v = vals{i};
        if (! (isscalar (v) && (islogical (v) || isnumeric (v)) && (v == 0 || v == 1)))
          error ("Octave:invalid-input-arg",
                 "vn_show: option \"all\" must be true or false");
        endif
        all_units = logical (v);
      otherwise
        error ("Octave:invalid-input-arg",
               "vn_show: unknown option \"%s\"; allowed: all", names{i});
    endswitch
  endfor
endfunction

## "1200 tank, 799 orifice, 1 feed": counts by kind, in order of appearance.
function s = counts (U)
  [kinds, first, j] = unique ({U.kind}, "first");
  [~, order] = sort (first);
  n = accumarray (j(:), 1);
  parts = arrayfun (@(k) sprintf ("%d %s", n(k), kinds{k}), order,
                    "uniformoutput", false);
  s = strjoin (parts, ", ");
endfunction

## "from -> to" column; a tank shows where its spill goes.
function s = ends (u)
  to = u.to;
  switch (u.kind)
    case "tank"
      if (isfield (u.par, "rim") && isfinite (u.par.rim))
        s = ["spill -> " ifelse(isempty (to), "waste", to)];
      else
        s = "";
      endif
    case {"orifice", "resistance", "valve", "pump"}
      s = [u.from " -> " ifelse(isempty (to), "(free discharge)", to)];
    otherwise
      if (isempty (to))
        s = u.from;
      elseif (isempty (u.from))
        s = ["-> " to];
      else
        s = [u.from " -> " to];
      endif
  endswitch
endfunction

## Parameters with units of measure (display units); char options by
## name, their codes omitted; a controller's limits as [lo hi].
function s = params (net, u)
  parts = {};
  a = u.aux;
  if (strcmp (u.kind, "controller") && ! isfield (a, "action"))
    a.action = "reverse (default)";
  endif
  f = fieldnames (a);
  for i = 1:numel (f)
    if (ischar (a.(f{i})))
      parts{end+1} = sprintf ("%s %s", f{i}, a.(f{i}));
    endif
  endfor
  ## Codes of char options, shown above by their names.
  codes = {"shape", "shape"; "char", "characteristic"; "action", "action"};
  f = fieldnames (u.par);
  for i = 1:numel (f)
    k = find (strcmp (f{i}, codes(:,1)), 1);
    if (! isempty (k) && isfield (a, codes{k,2}))
      continue;
    endif
    if (any (strcmp (f{i}, {"lo", "hi"})) && all (isfield (u.par, {"lo", "hi"})))
      if (strcmp (f{i}, "lo"))
        [v, uom] = shown (net, u, "lo", [u.par.lo, u.par.hi]);
        parts{end+1} = strtrim (sprintf ("limits [%g %g] %s", v, uom));
      endif
      continue;
    endif
    [v, uom] = shown (net, u, f{i}, u.par.(f{i}));
    parts{end+1} = strtrim (sprintf ("%s %g %s", f{i}, v, uom));
  endfor
  if (! isempty (u.table))
    parts{end+1} = sprintf ("table %d points to %g m, %g m3", rows (u.table),
                            u.table(end,1), u.table(end,2));
  endif
  if (isfield (a, "species") && isstruct (a.species))
    f = fieldnames (a.species);
    for i = 1:numel (f)
      parts{end+1} = sprintf ("%s %g", f{i}, a.species.(f{i}));
    endfor
  endif
  s = strjoin (parts, ", ");
endfunction

## A parameter's value and unit as shown: the display unit the network
## asks for; dimensionless values without a unit.
function [v, uom] = shown (net, u, name, v)
  si = report_unit (net, [u.name "." name], u);
  [v, uom] = units_display (net, si, v, [u.name "." name]);
  if (any (strcmp (uom, {"1", "conc"})))
    uom = "";
  endif
endfunction

## Inputs signals may drive: {quantity, value text}; defaults are marked.
function inp = inputs (net)
  U = net.units;
  table = {"feed", "flow", 0; "valve", "opening", 1; "pump", "speed", 1;
           "boundary", "head", NaN; "heater", "duty", 0;
           "controller", "setpoint", NaN};
  ## inputs a controller or switch sets: say which
  driven = struct ("q", {}, "by", {});
  for i = 1:numel (U)
    if (any (strcmp (U(i).kind, {"controller", "switch"})))
      driven(end+1) = struct ("q", U(i).aux.manipulate, "by", U(i).name);
    endif
  endfor
  inp = cell (0, 2);
  for i = 1:numel (U)
    k = find (strcmp (U(i).kind, table(:,1)), 1);
    if (isempty (k))
      continue;
    endif
    p = table{k,2};
    if (isfield (U(i).par, p))
      [v, uom] = shown (net, U(i), p, U(i).par.(p));
      val = strtrim (sprintf ("%g %s", v, uom));
    elseif (! isnan (table{k,3}))
      [v, uom] = shown (net, U(i), p, table{k,3});
      val = [strtrim(sprintf ("%g %s", v, uom)), " (default)"];
    else
      val = "(not set)";
    endif
    inp(end+1,:) = {[U(i).name "." p], val};
    ## what a feed or boundary carries: temperature, concentrations
    if (any (strcmp (U(i).kind, {"feed", "boundary"})))
      if (net.options.thermal)
        if (isfield (U(i).par, "temperature"))
          tv = sprintf ("%g degC", U(i).par.temperature);
        else
          tv = sprintf ("%g degC (ambient)", net.options.ambient);
        endif
        inp(end+1,:) = {[U(i).name ".temperature"], tv};
      endif
      for k = 1:numel (net.options.species)
        sp = net.options.species{k};
        if (isfield (U(i).aux, "species") && isfield (U(i).aux.species, sp))
          cv = sprintf ("%g", U(i).aux.species.(sp));
        else
          cv = "0 (default)";
        endif
        inp(end+1,:) = {[U(i).name "." sp], cv};
      endfor
    endif
  endfor
  for j = 1:numel (driven)
    r = find (strcmp (inp(:,1), driven(j).q), 1);
    if (! isempty (r))
      inp{r,2} = [inp{r,2} " (set by " driven(j).by ")"];
    endif
  endfor
endfunction

function s = yesno (c)
  s = ifelse (c, "yes", "no");
endfunction

%!demo
%! ## Invented scenario: a raw-water tank feeding a clear well.
%! net = vn_network ("clearwell");
%! net = vn_tank (net, "T2", "area", 1.5, "level", 0.8);
%! net = vn_tank (net, "T1", "area", 2, "rim", 3, "level", 1.2, "spill", "T2");
%! net = vn_feed (net, "F1", "T1", "flow", 0.02);
%! net = vn_orifice (net, "O1", "T1", "T2", "coeff", 0.015);
%! net = vn_valve (net, "LV1", "T2", "", "kv", 40, "opening", 0.5, ...
%!                 "characteristic", "equal");
%! vn_show (net)

%!test
%! net = vn_network ("clearwell");
%! net = vn_tank (net, "T2", "area", 1.5, "level", 0.8);
%! net = vn_tank (net, "T1", "area", 2, "rim", 3, "level", 1.2, "spill", "T2");
%! net = vn_feed (net, "F1", "T1", "flow", 0.02);
%! net = vn_orifice (net, "O1", "T1", "T2", "coeff", 0.015);
%! net = vn_valve (net, "LV1", "T2", "", "kv", 40, "opening", 0.5, ...
%!                 "characteristic", "equal");
%! net = vn_boundary (net, "river", "head", 4);
%! net = vn_pump (net, "P1", "T2", "river", "shutoff", 25, "k", 4e4);
%! s = vn_show (net);
%! assert (ischar (s) && rows (s) == 1);
%! assert (! isempty (strfind (s, "network \"clearwell\": gravity 9.80665 m/s2, density 998.2 kg/m3")));
%! assert (! isempty (strfind (s, "7 units")));
%! assert (! isempty (regexp (s, "T1 +tank +spill -> T2 +shape prism, area 2 m2, rim 3 m, level 1.2 m")));
%! assert (! isempty (regexp (s, "O1 +orifice +T1 -> T2 +coeff 0.015 m2.5/s")));
%! assert (! isempty (regexp (s, "LV1 +valve +T2 -> \\(free discharge\\) +characteristic equal, kv 40 m3/h, opening 0.5")));
%! assert (! isempty (regexp (s, "P1 +pump +T2 -> river +shutoff 25 m, k 40000 m/\\(m3/s\\)2")));
%! assert (! isempty (regexp (s, "F1 +feed +-> T1 +flow 0.02 m3/s")));
%! assert (! isempty (regexp (s, "inputs \\(4\\):\n  F1.flow +0.02 m3/s\n  LV1.opening +0.5\n  river.head +4 m\n  P1.speed +1 \\(default\\)")));

%!test
%! net = vn_network ("w", "thermal", true, "species", {"chlorine"}, "decay", 2e-5);
%! net = vn_tank (net, "T1", "shape", "cone", "diameter", 8, "height", 12, ...
%!                "temperature", 12, "chlorine", 1.2, "ua", 60);
%! s = vn_show (net);
%! assert (! isempty (strfind (s, "thermal yes")));
%! assert (! isempty (strfind (s, "species: chlorine (decay 2e-05 1/s)")));
%! assert (! isempty (strfind (s, "shape cone, diameter 8 m, height 12 m, temperature 12 degC, ua 60 W/K, chlorine 1.2")));
%! assert (isempty (strfind (s, "inputs:")));

%!test
%! s = vn_show (vn_network ());
%! assert (! isempty (strfind (s, "0 units")));

%!test
%! ## carried inputs of feeds, and inputs a controller sets
%! net = vn_network ("w", "thermal", true, "ambient", 15, "species", {"chlorine"});
%! net = vn_tank (net, "T1", "area", 4, "level", 2);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01, "chlorine", 1.8);
%! net = vn_heater (net, "H1", "T1", "duty", 2e4);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.01);
%! net = vn_controller (net, "TC1", "measure", "T1.temperature", "manipulate", ...
%!                      "H1.duty", "setpoint", 40, "gain", 1e4, "limits", [0 5e4]);
%! s = vn_show (net);
%! assert (! isempty (strfind (s, "F1.temperature  15 degC (ambient)")));
%! assert (! isempty (strfind (s, "F1.chlorine     1.8")));
%! assert (! isempty (strfind (s, "(set by TC1)")));
%!test
%! ## a controller: action once, limits as [lo hi], gain in output per
%! ## measured unit, setpoint in the measured unit
%! net = vn_network ("w");
%! net = vn_tank (net, "T1", "area", 4, "level", 2);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 40, "opening", 0.5);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", ...
%!                      "LV1.opening", "setpoint", 1, "gain", 2, "reset", 300, ...
%!                      "action", "direct", "limits", [0 1.1]);
%! net = vn_controller (net, "FC1", "measure", "T1.level", "manipulate", ...
%!                      "F1.flow", "setpoint", 1.5, "gain", 0.01, "reset", 600, ...
%!                      "limits", [0 0.05]);
%! s = vn_show (net);
%! assert (! isempty (strfind (s, "measure T1.level, manipulate LV1.opening, action direct, setpoint 1 m, gain 2 1/m, reset 300 s, limits [0 1.1]")));
%! assert (! isempty (strfind (s, "setpoint 1.5 m, gain 0.01 (m3/s)/m, reset 600 s, limits [0 0.05] m3/s")));
%! assert (numel (strfind (s, "action")), 2);
%! assert (! isempty (strfind (s, "manipulate F1.flow, action reverse (default), setpoint 1.5 m")));
%! assert (isempty (strfind (s, " lo ")) && isempty (strfind (s, " hi ")));

%!test
%! ## display units: a flow in m3/h, a level in mm
%! net = vn_network ("w", "display", {"flow", "m3/h"; "level", "mm"});
%! net = vn_tank (net, "T1", "area", 4, "level", 2);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! s = vn_show (net);
%! assert (! isempty (strfind (s, "level 2000 mm")));
%! assert (! isempty (strfind (s, "F1.flow  36 m3/h")));

%!test
%! ## 2,000 units: a summary of at most 2,500 characters, with the counts
%! ## by kind, the first and the last units and where to look
%! N = 1000;
%! net = vn_network ("big");
%! tn = arrayfun (@(k) sprintf ("T%d", k), 1:N, "uniformoutput", false);
%! on = arrayfun (@(k) sprintf ("O%d", k), 1:N-1, "uniformoutput", false);
%! net = vn_tank (net, tn, "area", ones (1, N), "level", ones (1, N));
%! net = vn_orifice (net, on, tn(1:N-1), tn(2:N), "coeff", 0.01 * ones (1, N-1));
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! s = vn_show (net);
%! assert (numel (s) < 2500);
%! assert (! isempty (strfind (s, "2000 units: 1000 tank, 999 orifice, 1 feed")));
%! assert (! isempty (regexp (s, "\n  T1 +tank")));
%! assert (! isempty (regexp (s, "\n  F1 +feed")));
%! assert (! isempty (strfind (s, "1990 units not shown")));
%! assert (! isempty (strfind (s, "vn_show (net, \"all\", true)")));
%! assert (isempty (regexp (s, "\n  T500 ", "once")));

%!test
%! ## "all": every unit
%! N = 60;
%! net = vn_network ("mid");
%! tn = arrayfun (@(k) sprintf ("T%d", k), 1:N, "uniformoutput", false);
%! net = vn_tank (net, tn, "area", ones (1, N), "level", ones (1, N));
%! s = vn_show (net, "all", true);
%! assert (numel (regexp (s, "\n  T[0-9]+ +tank")), N);
%! assert (isempty (strfind (s, "not shown")));

%!error <option "all" must be true or false> vn_show (vn_network (), "all", "yes")
%!error <unknown option "every"> vn_show (vn_network (), "every", true)
%!error <Invalid call> vn_show ()
%!error <vn_show: NET must be a network made by vn_network, got a 1x1 struct> vn_show (struct ("type", "x"))

## -*- texinfo -*-
## @deftypefn  {} {} vn_show (@var{net})
## @deftypefnx {} {@var{s} =} vn_show (@var{net})
## Print a readable summary of a network.
##
## Shows the network's name and options, then one row per unit in
## declaration order: name, kind, where it takes from and delivers to, and
## the parameters given, with their units of measure.  A last list gives
## the inputs that signals may drive (feed flows, valve openings, pump
## speeds, boundary heads) with their present values.  With an output the
## summary is returned as a char row (lines joined by newlines) instead of
## printed.
##
## @seealso{vn_network, vn_tank, vn_simulate}
## @end deftypefn

function s = vn_show (net)
  if (nargin != 1)
    print_usage ();
  endif
  build_check_net ("vn_show", net);
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
  lines{end+1} = sprintf ("%d unit%s", n, ifelse (n == 1, "", "s"));
  if (n > 0)
    cols = {"name", "kind", "from -> to", "parameters"};
    rowsc = cell (n, 4);
    for i = 1:n
      rowsc(i,:) = {U(i).name, U(i).kind, ends(U(i)), params(U(i))};
    endfor
    w = max (cellfun (@numel, [cols; rowsc]), [], 1);
    fmt = sprintf ("  %%-%ds  %%-%ds  %%-%ds  %%s", w(1:3));
    lines{end+1} = sprintf (fmt, cols{:});
    for i = 1:n
      lines{end+1} = sprintf (fmt, rowsc{i,:});
    endfor
    inp = inputs (net);
    if (! isempty (inp))
      lines{end+1} = "inputs:";
      wq = max (cellfun (@numel, inp(:,1)));
      for i = 1:rows (inp)
        lines{end+1} = sprintf ("  %-*s  %s", wq, inp{i,1}, inp{i,2});
      endfor
    endif
  endif
  txt = strjoin (lines, "\n");
  if (nargout > 0)
    s = txt;
  else
    printf ("%s\n", txt);
  endif
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

## Parameters with units of measure; char options by name, codes omitted.
function s = params (u)
  parts = {};
  a = u.aux;
  f = fieldnames (a);
  for i = 1:numel (f)
    if (ischar (a.(f{i})))
      parts{end+1} = sprintf ("%s %s", f{i}, a.(f{i}));
    endif
  endfor
  ## Codes of char options, shown above by their names.
  codes = {"shape", "shape"; "char", "characteristic"};
  f = fieldnames (u.par);
  for i = 1:numel (f)
    k = find (strcmp (f{i}, codes(:,1)), 1);
    if (! isempty (k) && isfield (a, codes{k,2}))
      continue;
    endif
    uom = unit_of (u.kind, f{i});
    parts{end+1} = strtrim (sprintf ("%s %g %s", f{i}, u.par.(f{i}), uom));
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

## Unit of measure of a parameter, for display.
function uom = unit_of (kind, name)
  switch (name)
    case {"diameter", "length", "height", "base", "rim", "crest", "level", ...
          "outlet", "inlet", "head", "shutoff", "suction"}
      uom = "m";
    case "area"
      uom = "m2";
    case "volume"
      uom = "m3";
    case "flow"
      uom = "m3/s";
    case "coeff"
      uom = "m2.5/s";
    case "r"
      uom = "s/m2";
    case "kv"
      uom = "m3/h";
    case "k"
      uom = "m/(m3/s)^2";
    case {"lag", "reset", "rate"}
      uom = "s";
    case "ua"
      uom = "W/K";
    case "temperature"
      uom = "degC";
    case "duty"
      uom = "W";
    otherwise
      uom = "";
  endswitch
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
      val = strtrim (sprintf ("%g %s", U(i).par.(p), unit_of (U(i).kind, p)));
    elseif (! isnan (table{k,3}))
      val = [strtrim(sprintf ("%g %s", table{k,3}, unit_of (U(i).kind, p))), ...
             " (default)"];
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

function r = ifelse (c, a, b)
  if (c)
    r = a;
  else
    r = b;
  endif
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
%! assert (! isempty (regexp (s, "P1 +pump +T2 -> river +shutoff 25 m, k 40000 m/\\(m3/s\\)\\^2")));
%! assert (! isempty (regexp (s, "F1 +feed +-> T1 +flow 0.02 m3/s")));
%! assert (! isempty (regexp (s, "inputs:\n  F1.flow +0.02 m3/s\n  LV1.opening +0.5\n  river.head +4 m\n  P1.speed +1 \\(default\\)")));

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
%!error <Invalid call> vn_show ()
%!error <vn_show: NET must be a network made by vn_network, got a 1x1 struct> vn_show (struct ("type", "x"))

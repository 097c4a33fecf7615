## -*- texinfo -*-
## @deftypefn  {} {@var{net} =} vn_tank (@var{net}, @var{name}, @var{option}, @var{value}, @dots{})
## @deftypefnx {} {@var{net} =} vn_tank (@var{net}, @{@var{name1}, @var{name2}, @dots{}@}, @var{option}, @var{value}, @dots{})
## Add a well-mixed tank, or many tanks at once, to the network.
##
## The tank's state is its liquid volume; its level follows from the
## geometry and its head is @qcode{"base"} + level.  Options (SI units):
##
## @table @asis
## @item @qcode{"shape"}
## @qcode{"prism"} (vertical, default), @qcode{"horizontal"} (cylinder lying
## on its side), @qcode{"sphere"}, @qcode{"cone"} (apex down) or
## @qcode{"table"} (a strapping table).  Giving @qcode{"table"} alone
## implies shape @qcode{"table"}.
## @item @qcode{"area"}, @qcode{"diameter"}
## Prism: cross-section, m2, or diameter, m (one of the two).  Horizontal
## cylinder and sphere: diameter.  Cone: diameter of the top rim.
## @item @qcode{"length"}
## Length of a horizontal cylinder, m.
## @item @qcode{"height"}
## Cone: height from the apex to the top rim, m.  Other shapes: nominal
## height (optional).
## @item @qcode{"table"}
## K x 2 matrix [level (m), volume (m3)], both columns strictly increasing.
## The last row is the top of the vessel: the level is never extrapolated
## past the table.  The rim defaults to that top, so a table tank that
## fills up spills over it (to @qcode{"spill"} or to waste, reported as
## @code{T.spill}); a level above the rim is only the weir head, over the
## plan area of the table's last segment.  A @qcode{"rim"} above the top,
## a @qcode{"rim"} of Inf, and an initial level or volume above the top
## are refused.
## @item @qcode{"base"}
## Elevation of the tank bottom, m (default 0).
## @item @qcode{"rim"}
## Level of the spill weir above the base, m.  Default: the top of a
## horizontal cylinder, sphere, cone or strapping table, or the
## @qcode{"height"} of a prism that has one; otherwise (an open prism) Inf,
## no spill.  It may not lie above the top of a closed vessel.
## @item @qcode{"crest"}, @qcode{"contractions"}
## Weir crest length, m (default the perimeter) and its end contractions
## (0, 1 or 2) in the Francis formula Q = 1.84 (L - 0.1 n H) H^1.5.
## @item @qcode{"spill"}
## Name of a declared tank that receives the spill; @qcode{""} (default)
## sends it to waste.  Allowed whenever the rim is finite, given or by
## default.
## @item @qcode{"level"}, @qcode{"volume"}
## Initial level, m, or initial volume, m3 (one of the two; default level 0).
## @item @qcode{"temperature"}, @qcode{"ua"}
## Initial temperature, degC, and heat-loss coefficient, W/K (thermal
## networks only).
## @item species names
## Initial concentration of each species declared on the network.
## @end table
##
## Bulk form: given a cell array of names, one tank is added per name in
## one call, with the same checks and messages as one call per tank.  A
## numeric option is then a scalar (for all tanks) or a vector of one value
## per tank; @qcode{"shape"}, @qcode{"spill"} and @qcode{"table"} take one
## value for all or a cell array of one per tank.  Large networks build
## much faster this way, e.g.
## @code{vn_tank (net, @{"T1", "T2", "T3"@}, "area", 2, "level", [1 2 3])}.
##
## Geometry must be checked against the vessel drawings before the model
## is used to operate a plant.
##
## @seealso{vn_network, vn_feed, vn_boundary, vn_orifice, vn_show}
## @end deftypefn

function net = vn_tank (net, name, varargin)
  if (nargin < 2)
    print_usage ();
  endif
  fn = "vn_tank";
  build_check_net (fn, net);
  spec = tank_spec (net);
  if (iscell (name))
    net = build_bulk (fn, "tank", net, name, {}, {}, varargin, spec, @tank_unit);
  else
    net = build_add_unit (net, tank_unit (fn, net, name, {}, varargin, spec));
  endif
endfunction

## Option rows of a tank (layout of build_options).
function spec = tank_spec (net)
  spec = [{"shape",        "choice",   "",   {"shape", tank_shapes()};
           "area",         "positive", "m2", [];
           "diameter",     "positive", "m",  [];
           "length",       "positive", "m",  [];
           "height",       "positive", "m",  [];
           "table",        "matrix",   "",   [];
           "base",         "real",     "m",  [];
           "rim",          "rim",      "m",  [];
           "crest",        "positive", "m",  [];
           "contractions", "count2",   "",   [];
           "spill",        "ref",      "",   [];
           "level",        "nonneg",   "m",  [];
           "volume",       "nonneg",   "m3", [];
           "ua",           "nonneg",   "W/K", []};
          build_material_spec(net)];
endfunction

function shapes = tank_shapes ()
  shapes = {"prism", "horizontal", "sphere", "cone", "table"};
endfunction

## Check one tank against NET and make its unit.
function u = tank_unit (fn, net, name, ~, args, spec)
  label = build_check_name (fn, net, "tank", name);
  [par, aux, given] = build_options (fn, label, args, spec);

  table = [];
  if (! isfield (aux, "shape"))
    ## A strapping table says what the geometry is.
    aux.shape = ifelse (isfield (given, "table"), "table", "prism");
    par.shape = find (strcmp (aux.shape, tank_shapes ())) - 1;
  endif
  if (isfield (given, "table"))
    table = double (given.table);
  endif
  top = check_geometry (fn, label, aux.shape, par, table);
  check_levels (fn, label, par, top, table);

  to = "";
  if (isfield (given, "spill"))
    to = given.spill;
    if (! isempty (to))
      if (strcmp (to, name))
        build_error (fn, label, "SPILL names the tank itself; give another tank or \"\" for waste");
      endif
      if (isinf (rim_level (aux.shape, par, top)))
        build_error (fn, label, ["SPILL \"%s\" given but the tank has no ", ...
                                 "finite RIM to spill over; give RIM (m), or ", ...
                                 "HEIGHT for a prism"], to);
      endif
      build_check_ref (fn, label, net, "SPILL", to, {"tank"});
    endif
  endif
  build_check_thermal (fn, label, net, par, {"temperature", "ua"});
  [par, aux] = build_split_species (net, par, aux);
  u = build_unit (name, "tank", "", to, par, table, aux);
endfunction

## Check which sizes the shape needs and allows; return the height of a
## closed vessel (Inf for an open prism).
function top = check_geometry (fn, label, shape, par, table)
  switch (shape)
    case "prism"
      need = {};
      allow = {"area", "diameter"};
    case "horizontal"
      need = {"diameter", "length"};
      allow = need;
    case "sphere"
      need = {"diameter"};
      allow = need;
    case "cone"
      need = {"diameter", "height"};
      allow = need;
    case "table"
      need = {};
      allow = {};
  endswitch
  sizes = {"area", "diameter", "length"};
  for i = 1:numel (sizes)
    if (isfield (par, sizes{i}) && ! any (strcmp (sizes{i}, allow)))
      build_error (fn, label, ["%s (%s) does not apply to shape \"%s\"; ", ...
                               "that shape takes: %s"], upper (sizes{i}),
                   build_value_str (par.(sizes{i})), shape,
                   strjoin ([allow, {"height"}], ", "));
    endif
  endfor
  for i = 1:numel (need)
    if (! isfield (par, need{i}))
      build_error (fn, label, "shape \"%s\" needs %s (m)", shape,
                   upper (need{i}));
    endif
  endfor
  if (strcmp (shape, "prism"))
    if (isfield (par, "area") && isfield (par, "diameter"))
      build_error (fn, label, ["give AREA (%s m2) or DIAMETER (%s m), not ", ...
                               "both"], build_value_str (par.area),
                   build_value_str (par.diameter));
    elseif (! isfield (par, "area") && ! isfield (par, "diameter"))
      build_error (fn, label, "shape \"prism\" needs AREA (m2) or DIAMETER (m)");
    endif
  endif
  if (strcmp (shape, "table"))
    if (isempty (table))
      build_error (fn, label, "shape \"table\" needs TABLE [level volume]");
    endif
    build_check_table (fn, label, table);
  elseif (! isempty (table))
    build_error (fn, label, "TABLE does not apply to shape \"%s\"", shape);
  endif
  switch (shape)
    case {"horizontal", "sphere"}
      top = par.diameter;
    case "cone"
      top = par.height;
    case "table"
      top = table(end,1);
    otherwise
      top = Inf;
  endswitch
endfunction

## The rim the tank spills over: given, else the top of a closed vessel
## (a strapping table's last level, a prism's HEIGHT); Inf for none.
function rim = rim_level (shape, par, top)
  if (isfield (par, "rim"))
    rim = par.rim;
  elseif (strcmp (shape, "prism"))
    rim = Inf;
    if (isfield (par, "height"))
      rim = par.height;
    endif
  else
    rim = top;
  endif
endfunction

## The initial level and the rim must lie inside a closed vessel, and the
## tank may not start above its own rim.  A strapping table has a top, its
## last row: a rim of Inf and an initial volume above it are refused too.
function check_levels (fn, label, par, top, table)
  if (isfield (par, "level") && isfield (par, "volume"))
    build_error (fn, label, ["give LEVEL (%s m) or VOLUME (%s m3) as the ", ...
                             "initial content, not both"],
                 build_value_str (par.level), build_value_str (par.volume));
  endif
  if (! isempty (table))
    if (isfield (par, "rim") && isinf (par.rim))
      build_error (fn, label, ["RIM must lie in (0, %s] (m), the top of the ", ...
                               "strapping table: a table tank spills over its ", ...
                               "top, got Inf"], build_value_str (top));
    endif
    if (isfield (par, "volume") && par.volume > table(end,2))
      build_error (fn, label, ["VOLUME must not exceed the top of the ", ...
                               "strapping table (%s m3), got %s"],
                   build_value_str (table(end,2)), build_value_str (par.volume));
    endif
  endif
  f = {"rim", "level"};
  for i = 1:2
    ## a rim of Inf on a closed vessel too: a closed vessel spills at its top
    if (isfield (par, f{i}) && par.(f{i}) > top)
      build_error (fn, label, ["%s must not exceed the top of the vessel ", ...
                               "(%s m), got %s"], upper (f{i}),
                   build_value_str (top), build_value_str (par.(f{i})));
    endif
  endfor
  if (isfield (par, "level") && isfield (par, "rim") && par.level > par.rim)
    build_error (fn, label, "LEVEL must not exceed RIM (%s m), got %s",
                 build_value_str (par.rim), build_value_str (par.level));
  endif
endfunction

%!test
%! net = vn_tank (vn_network ("w"), "T1", "area", 2.0, "rim", 3.0, "level", 1.2);
%! u = net.units(1);
%! assert (u.name, "T1");
%! assert (u.kind, "tank");
%! assert ({u.from, u.to}, {"", ""});
%! assert (u.par.area, 2.0);
%! assert (u.par.rim, 3.0);
%! assert (u.par.level, 1.2);
%! assert (u.par.shape, 0);
%! assert (u.aux.shape, "prism");
%! assert (u.table, []);
%! assert (net.index.T1, 1);

%!test
%! net = vn_network ("w");
%! net = vn_tank (net, "T2", "shape", "horizontal", "diameter", 2, "length", 5);
%! net = vn_tank (net, "S", "shape", "Sphere", "diameter", 10, "level", 2);
%! net = vn_tank (net, "C", "shape", "cone", "diameter", 8, "height", 12, "base", -1.5);
%! assert (net.units(1).par.shape, 1);
%! assert (net.units(2).par.shape, 2);
%! assert (net.units(2).aux.shape, "sphere");
%! assert (net.units(3).par.shape, 3);
%! assert (net.units(3).par.base, -1.5);
%! assert (net.units(3).par.height, 12);
%! assert ([net.index.T2, net.index.S, net.index.C], [1 2 3]);

%!test
%! tab = [0 0; 0.5 1.2; 1.0 2.6; 2.0 5.9];
%! net = vn_tank (vn_network (), "TT", "table", tab, "volume", 2);
%! assert (net.units(1).table, tab);
%! assert (net.units(1).aux.shape, "table");
%! assert (net.units(1).par.shape, 4);
%! assert (net.units(1).par.volume, 2);
%! assert (isfield (net.units(1).par, "table"), false);

%!test
%! ## Spill over a Francis weir (1.84 (L - 0.1 n H) H^1.5) into a declared tank.
%! net = vn_tank (vn_network (), "low", "diameter", 3);
%! net = vn_tank (net, "high", "area", 4, "rim", 2.5, "crest", 1, ...
%!                "contractions", 2, "spill", "low");
%! u = net.units(2);
%! assert (u.to, "low");
%! assert ([u.par.crest, u.par.contractions, u.par.rim], [1 2 2.5]);
%! assert (isfield (u.par, "spill"), false);

%!test
%! ## Spill is allowed whenever the rim is finite, given or by default:
%! ## the top of a sphere, cone, lying cylinder or strapping table, the
%! ## height of a prism.
%! net = vn_tank (vn_network (), "C", "area", 1);
%! net = vn_tank (net, "S", "shape", "sphere", "diameter", 2, "spill", "C");
%! net = vn_tank (net, "K", "shape", "cone", "diameter", 2, "height", 3, "spill", "C");
%! net = vn_tank (net, "H", "shape", "horizontal", "diameter", 2, "length", 4, "spill", "C");
%! net = vn_tank (net, "P", "area", 1, "height", 3, "spill", "C");
%! net = vn_tank (net, "TT", "table", [0 0; 1 2; 2 5], "spill", "C", "volume", 5);
%! assert ({net.units(2:end).to}, {"C", "C", "C", "C", "C"});
%! ## and the core takes them: every one builds and runs
%! res = vn_simulate (net, [0 1]);
%! assert (res.TT.level(1), 2);

%!test
%! net = vn_network ("w", "thermal", true, "species", {"chlorine"});
%! net = vn_tank (net, "T1", "area", 4, "level", 2, "temperature", 12, ...
%!                "chlorine", 1.2, "ua", 60);
%! u = net.units(1);
%! assert ([u.par.temperature, u.par.ua], [12 60]);
%! assert (u.aux.species.chlorine, 1.2);
%! assert (isfield (u.par, "chlorine"), false);

%!test
%! ## The bulk form builds what a loop of single calls builds.
%! loop = vn_network ("w");
%! for i = 1:4
%!   loop = vn_tank (loop, sprintf ("T%d", i), "area", 1.5, "level", i / 2);
%! endfor
%! bulk = vn_tank (vn_network ("w"), {"T1", "T2", "T3", "T4"}, "area", 1.5,
%!                 "level", [0.5 1 1.5 2]);
%! assert (isequal (bulk, loop));
%! assert (bulk.units(3).par.level, 1.5);
%! assert (bulk.index.T4, 4);

%!error <Invalid call> vn_tank (vn_network ())
%!error <vn_tank: tank "T1": AREA must be a positive finite scalar \(m2\), got -2> vn_tank (vn_network (), "T1", "area", -2)
%!error <vn_tank: tank "T1": DIAMETER must be a positive finite scalar \(m\), got NaN> vn_tank (vn_network (), "T1", "diameter", NaN)
%!error <vn_tank: tank "T1": AREA must be a positive finite scalar \(m2\), got "big"> vn_tank (vn_network (), "T1", "area", "big")
%!error <vn_tank: tank "T1": RIM must be a positive scalar or Inf \(m\), got 0> vn_tank (vn_network (), "T1", "area", 1, "rim", 0)
%!error <vn_tank: tank "1T": NAME must be an identifier.*got "1T"> vn_tank (vn_network (), "1T", "area", 1)
%!error <vn_tank: tank "T1": NAME "T1" is already taken by a tank> vn_tank (vn_tank (vn_network (), "T1", "area", 1), "T1", "area", 2)
%!error <vn_tank: NET must be a network made by vn_network> vn_tank (struct ("a", 1), "T1", "area", 1)
%!error <vn_tank: tank "T1": unknown option "areas"; allowed: shape, area> vn_tank (vn_network (), "T1", "areas", 1)
%!error <vn_tank: tank "T1": give AREA \(2 m2\) or DIAMETER \(1 m\), not both> vn_tank (vn_network (), "T1", "area", 2, "diameter", 1)
%!error <vn_tank: tank "T1": shape "prism" needs AREA \(m2\) or DIAMETER> vn_tank (vn_network (), "T1", "level", 1)
%!error <vn_tank: tank "T2": shape "horizontal" needs LENGTH> vn_tank (vn_network (), "T2", "shape", "horizontal", "diameter", 2)
%!error <vn_tank: tank "C": shape "cone" needs HEIGHT> vn_tank (vn_network (), "C", "shape", "cone", "diameter", 2)
%!error <vn_tank: tank "S": LENGTH \(3\) does not apply to shape "sphere"> vn_tank (vn_network (), "S", "shape", "sphere", "diameter", 2, "length", 3)
%!error <vn_tank: tank "T1": SHAPE must be one of "prism", "horizontal", "sphere", "cone", "table", got "cube"> vn_tank (vn_network (), "T1", "shape", "cube")
%!error <vn_tank: tank "TT": TABLE volumes \(m3\) must increase strictly, got 2.6 in row 3 then 2.6 in row 4> vn_tank (vn_network (), "TT", "table", [0 0; 1 1.2; 2 2.6; 3 2.6])
%!error <vn_tank: tank "TT": TABLE levels \(m\) must increase strictly, got 1 in row 2 then 0.5 in row 3> vn_tank (vn_network (), "TT", "table", [0 0; 1 1.2; 0.5 2.6])
%!error <vn_tank: tank "TT": TABLE must be a K x 2 matrix> vn_tank (vn_network (), "TT", "table", [0 0 0; 1 1 1])
%!error <vn_tank: tank "TT": TABLE must hold finite non-negative values, got NaN in row 2, column 2> vn_tank (vn_network (), "TT", "table", [0 0; 1 NaN])
%!error <vn_tank: tank "T1": TABLE does not apply to shape "prism"> vn_tank (vn_network (), "T1", "shape", "prism", "area", 1, "table", [0 0; 1 1])
%!error <vn_tank: tank "S": LEVEL must not exceed the top of the vessel \(2 m\), got 3> vn_tank (vn_network (), "S", "shape", "sphere", "diameter", 2, "level", 3)
%!error <vn_tank: tank "T1": LEVEL must not exceed RIM \(2 m\), got 2.5> vn_tank (vn_network (), "T1", "area", 1, "rim", 2, "level", 2.5)
%!error <vn_tank: tank "T1": give LEVEL \(1 m\) or VOLUME \(2 m3\)> vn_tank (vn_network (), "T1", "area", 1, "level", 1, "volume", 2)
%!error <vn_tank: tank "T1": CONTRACTIONS must be 0, 1 or 2, got 3> vn_tank (vn_network (), "T1", "area", 1, "contractions", 3)
%!error <vn_tank: tank "T1": SPILL names unit "T9", which network "network" does not hold> vn_tank (vn_network (), "T1", "area", 1, "rim", 2, "spill", "T9")
%!error <vn_tank: tank "T1": SPILL names the tank itself> vn_tank (vn_network (), "T1", "area", 1, "rim", 2, "spill", "T1")
%!error <vn_tank: tank "T1": SPILL "T0" given but the tank has no finite RIM> vn_tank (vn_tank (vn_network (), "T0", "area", 1), "T1", "area", 1, "spill", "T0")
%!error <vn_tank: tank "TT": RIM must lie in \(0, 2\] \(m\), the top of the strapping table: a table tank spills over its top, got Inf> vn_tank (vn_network (), "TT", "table", [0 0; 1 2; 2 5], "rim", Inf)
%!error <vn_tank: tank "C2": RIM must not exceed the top of the vessel \(1.6 m\), got Inf> vn_tank (vn_network (), "C2", "shape", "sphere", "diameter", 1.6, "rim", Inf)
%!error <vn_tank: tank "C3": RIM must not exceed the top of the vessel \(2 m\), got Inf> vn_tank (vn_network (), "C3", "shape", "cone", "diameter", 1, "height", 2, "rim", Inf)
%!error <vn_tank: tank "H1": RIM must not exceed the top of the vessel \(1.2 m\), got Inf> vn_tank (vn_network (), "H1", "shape", "horizontal", "diameter", 1.2, "length", 3, "rim", Inf)
%!error <vn_tank: tank "TT": RIM must not exceed the top of the vessel \(2 m\), got 2.5> vn_tank (vn_network (), "TT", "table", [0 0; 1 2; 2 5], "rim", 2.5)
%!error <vn_tank: tank "TT": LEVEL must not exceed the top of the vessel \(2 m\), got 2.1> vn_tank (vn_network (), "TT", "table", [0 0; 1 2; 2 5], "level", 2.1)
%!error <vn_tank: tank "TT": VOLUME must not exceed the top of the strapping table \(5 m3\), got 5.5> vn_tank (vn_network (), "TT", "table", [0 0; 1 2; 2 5], "volume", 5.5)
%!error <vn_tank: tank "T1": SPILL "T0" given but the tank has no finite RIM> vn_tank (vn_tank (vn_network (), "T0", "area", 1), "T1", "area", 1, "height", 3, "rim", Inf, "spill", "T0")
%!error <vn_tank: tank "T1": SPILL "R" is a boundary; it must be a tank> vn_tank (vn_boundary (vn_network (), "R", "head", 1), "T1", "area", 1, "rim", 2, "spill", "R")
%!error <vn_tank: tank "T1": TEMPERATURE given \(12\) but network "network" is not thermal> vn_tank (vn_network (), "T1", "area", 1, "temperature", 12)
%!error <vn_tank: tank "T1": UA given \(60\) but network "network" is not thermal> vn_tank (vn_network (), "T1", "area", 1, "ua", 60)
%!error <vn_tank: tank "T1": option AREA is given twice> vn_tank (vn_network (), "T1", "area", 1, "area", 2)
%!error <vn_tank: tank "T1": options must come in name/value pairs> vn_tank (vn_network (), "T1", "area")
%!error <vn_tank: tank "T1" to "T2": AREA must be a scalar, or a vector or cell array of one value per unit \(2\), got a 1x3 double> vn_tank (vn_network (), {"T1", "T2"}, "area", [1 2 3])
%!error <vn_tank: tank "T2": LEVEL must not exceed RIM \(2 m\), got 2.5> vn_tank (vn_network (), {"T1", "T2"}, "area", 1, "rim", 2, "level", [1 2.5])
%!error <vn_tank: tank "t": NAME "t" is reserved: results carry a field of that name.*reserved names: .*stats> vn_tank (vn_network (), "t", "area", 1)

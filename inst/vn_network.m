## -*- texinfo -*-
## @deftypefn  {} {@var{net} =} vn_network ()
## @deftypefnx {} {@var{net} =} vn_network (@var{name})
## @deftypefnx {} {@var{net} =} vn_network (@var{name}, @var{option}, @var{value}, @dots{})
## @deftypefnx {} {@var{net} =} vn_network (@var{option}, @var{value}, @dots{})
## Create an empty network of vessels and the elements that join them.
##
## Add units with @code{vn_tank}, @code{vn_boundary}, @code{vn_feed},
## @code{vn_orifice}, @code{vn_resistance}, @code{vn_valve} and
## @code{vn_pump}; each returns the network, so the calls chain.  Without
## @var{name} the network is called @qcode{"network"}.  Options (SI units):
##
## @table @asis
## @item @qcode{"gravity"}
## Acceleration of gravity, m/s2 (default 9.80665, standard gravity).
## @item @qcode{"density"}
## Liquid density, kg/m3 (default 998.2, water at 20 degC).
## @item @qcode{"cp"}
## Specific heat of the liquid, J/(kg K) (default 4181.3).
## @item @qcode{"ambient"}
## Ambient temperature for heat losses, degC (default 15).
## @item @qcode{"thermal"}
## true to carry an energy balance; tanks and feeds then take
## @qcode{"temperature"} and tanks @qcode{"ua"} (default false).
## @item @qcode{"species"}
## Cell array of species names carried by the flows (default @{@}); tanks,
## feeds and boundaries then take one concentration option per species.
## @item @qcode{"decay"}
## First-order decay rate per species, 1/s (a scalar applies to all;
## default 0).
## @item @qcode{"smooth"}
## Head difference, m, below which square-root flow laws are smoothed so
## that the Jacobian stays finite (default 1e-3).
## @item @qcode{"display"}
## The units @code{vn_show}, @code{vn_plot} and @code{vn_report} print
## in: an N x 2 cell array of rows @{@var{key}, @var{unit}@} (or a row
## @{@var{key1}, @var{unit1}, @var{key2}, @var{unit2}, @dots{}@}), e.g.
## @code{@{"flow", "m3/h"; "level", "mm"@}} (default @{@}: SI).  A key is
## @itemize
## @item a dimension (see @code{vn_units}): "length", "area", "volume",
## "flow", "pressure", "temperature", "power", "time", "fraction",
## "valve coefficient", "density", "acceleration", "rate", "heat loss",
## "specific heat"; it applies to every value of that dimension;
## @item otherwise a variable name ("level", "head", "spill", "duty",
## "opening", "kv", @dots{}); it applies to that variable of every unit;
## @item or a quantity "UNIT.VARIABLE" ("T2.level"); it applies to that
## quantity only.
## @end itemize
## The most specific key wins (quantity, then variable, then dimension).
## Each unit must belong to its key's dimension; both are checked here.
## Values inside stay SI; only what is printed changes.
## @end table
##
## Models built with vesselnet must be validated against the plant before
## their results are used to operate it.
##
## @seealso{vn_tank, vn_boundary, vn_feed, vn_orifice, vn_resistance, vn_valve, vn_pump, vn_show}
## @end deftypefn

function net = vn_network (varargin)
  fn = "vn_network";
  name = "network";
  args = varargin;
  if (mod (numel (args), 2) == 1)
    name = args{1};
    args(1) = [];
    if (! (ischar (name) && rows (name) == 1 && ! isempty (name)))
      build_error (fn, "", "NAME must be a non-empty char row, got %s",
                   build_value_str (name));
    endif
  endif
  label = sprintf ("network \"%s\"", name);
  spec = {"gravity",  "positive", "m/s2",    [];
          "density",  "positive", "kg/m3",   [];
          "cp",       "positive", "J/(kg K)", [];
          "ambient",  "real",     "degC",    [];
          "thermal",  "logical",  "",        [];
          "species",  "names",    "",        [];
          "decay",    "vector",   "1/s",     [];
          "smooth",   "positive", "m",       [];
          "display",  "cell",     "",        []};
  [~, ~, given] = build_options (fn, label, args, spec);

  o = struct ("gravity", 9.80665, "density", 998.2, "cp", 4181.3,
              "ambient", 15, "thermal", false, "species", [], "decay", [],
              "smooth", 1e-3, "display", []);
  o.species = {};
  o.display = cell (0, 2);
  f = fieldnames (given);
  for i = 1:numel (f)
    o.(f{i}) = given.(f{i});
  endfor
  if (o.smooth > 0.1)
    build_error (fn, label, "SMOOTH must lie in (0, 0.1] (m), got %s",
                 build_value_str (o.smooth));
  endif
  o.species = check_species (fn, label, o.species);
  o.decay = check_decay (fn, label, o.decay, numel (o.species));
  o.display = check_display (fn, label, o.display);

  net.type = "vesselnet.network";
  net.name = name;
  net.options = o;
  net.units = struct ("name", {}, "kind", {}, "from", {}, "to", {},
                      "par", {}, "table", {}, "aux", {});
  net.index = struct ();
endfunction

## Species names: unique, and not the name of a unit option or output, so
## that "T1.chlorine" cannot be mistaken for another quantity.
function sp = check_species (fn, label, sp)
  if (ischar (sp))
    sp = {sp};
  endif
  sp = sp(:).';
  if (numel (sp) > 8)
    build_error (fn, label, "SPECIES: at most 8 are allowed, got %d",
                 numel (sp));
  endif
  reserved = {"shape", "area", "diameter", "length", "height", "base", ...
              "rim", "crest", "contractions", "spill", "level", "volume", ...
              "table", "ua", "temperature", "head", "flow", "energy"};
  for i = 1:numel (sp)
    if (any (strcmpi (sp{i}, reserved)))
      build_error (fn, label, ["SPECIES name \"%s\" is reserved for a unit ", ...
                               "option or output; choose another name"], sp{i});
    endif
    if (any (strcmp (sp{i}, sp(1:i-1))))
      build_error (fn, label, "SPECIES name \"%s\" is given twice", sp{i});
    endif
  endfor
endfunction

## One decay rate per species; a scalar applies to all.
function d = check_decay (fn, label, d, ns)
  if (isempty (d))
    d = zeros (1, ns);
  elseif (ns == 0)
    build_error (fn, label, ["DECAY given (%s) but no SPECIES are ", ...
                             "declared"], build_value_str (d));
  elseif (isscalar (d))
    d = repmat (d, 1, ns);
  elseif (numel (d) != ns)
    build_error (fn, label, ["DECAY must have one rate per species (%d), ", ...
                             "got %d"], ns, numel (d));
  endif
endfunction

## Display units: rows {key, unit}; the unit must be of the key's dimension.
function d = check_display (fn, label, d)
  if (isempty (d))
    d = cell (0, 2);
    return;
  endif
  if (rows (d) == 1 && mod (numel (d), 2) == 0 && columns (d) != 2)
    d = reshape (d, 2, []).';
  endif
  if (columns (d) != 2 || ! iscellstr (d))
    build_error (fn, label, ["DISPLAY must be an N x 2 cell array of rows ", ...
                             "{key, unit}, e.g. {\"flow\", \"m3/h\"; \"level\", ", ...
                             "\"mm\"}, got %s"], build_value_str (d));
  endif
  t = units_table ();
  dims = {t.dims.name};
  [vars, vunits] = display_variables ();
  for r = 1:rows (d)
    key = d{r,1};
    var = key;
    dot = find (key == ".", 1, "last");
    if (! isempty (dot))
      var = key(dot+1:end);
      if (! isvarname (key(1:dot-1)) || dot == 1)
        build_error (fn, label, ["DISPLAY key \"%s\" is not a dimension, ", ...
                                 "a variable or a quantity \"UNIT.VARIABLE\""], key);
      endif
    endif
    k = find (strcmp (dims, key), 1);
    if (isempty (k))
      v = find (strcmp (vars, var), 1);
      if (isempty (v))
        build_error (fn, label, ["DISPLAY key \"%s\" is not a dimension, ", ...
                                 "a variable or a quantity \"UNIT.VARIABLE\"; ", ...
                                 "dimensions: %s; variables: %s"], key,
                     strjoin (dims, ", "), strjoin (vars, ", "));
      endif
      k = find (strcmp ({t.dims.si}, vunits{v}), 1);
    endif
    [j, canon] = units_find (d{r,2});
    if (j == 0 || t.dim(j) != k)
      build_error (fn, label, ["DISPLAY unit for \"%s\" (a %s) must be one ", ...
                               "of %s, got \"%s\""], key, t.dims(k).name,
                   strjoin (t.dims(k).units, ", "), d{r,2});
    endif
    if (any (strcmp (d(1:r-1,1), key)))
      build_error (fn, label, "DISPLAY key \"%s\" is given twice", key);
    endif
    d{r,2} = canon;
  endfor
endfunction

## Variables of every kind whose unit is the SI unit of a dimension, with
## that unit; a valve's kv is a valve coefficient.
function [vars, vunits] = display_variables ()
  s = vn_schema ();
  t = units_table ();
  si = {t.dims.si};
  vars = {};
  vunits = {};
  for kind = fieldnames (s).'
    k = s.(kind{1});
    if (! isstruct (k) || ! isfield (k, "params"))
      continue;
    endif
    nm = [k.params, k.outputs];
    un = [k.units, k.ounits];
    for i = 1:numel (nm)
      u = un{i};
      if (strcmp (nm{i}, "kv"))
        u = "Kv";
      endif
      if (any (strcmp (si, u)) && ! any (strcmp (vars, nm{i})))
        vars{end+1} = nm{i};
        vunits{end+1} = u;
      endif
    endfor
  endfor
endfunction

%!test
%! net = vn_network ();
%! assert (net.options.display, cell (0, 2));
%! assert (net.type, "vesselnet.network");
%! assert (net.name, "network");
%! assert (net.options.gravity, 9.80665);  % standard gravity, 3rd CGPM 1901
%! assert (net.options.density, 998.2);    % water at 20 C, Tanaka et al. 2001
%! assert (net.options.cp, 4181.3);        % IAPWS-95 at 25 C (memory)
%! assert (net.options.ambient, 15);
%! assert (net.options.thermal, false);
%! assert (net.options.species, cell (1, 0));
%! assert (net.options.decay, zeros (1, 0));
%! assert (net.options.smooth, 1e-3);
%! assert (numel (net.units), 0);
%! assert (isstruct (net.index) && numel (fieldnames (net.index)) == 0);
%! assert (fieldnames (net.units), {"name"; "kind"; "from"; "to"; "par"; "table"; "aux"});

%!test
%! net = vn_network ("works", "Gravity", 9.81, "density", 1000, "thermal", true);
%! assert (net.name, "works");
%! assert (net.options.gravity, 9.81);
%! assert (net.options.density, 1000);
%! assert (net.options.thermal, true);
%! assert (islogical (net.options.thermal));

%!test
%! net = vn_network ("cp", 4000);
%! assert (net.name, "network");
%! assert (net.options.cp, 4000);

%!test
%! net = vn_network ("w", "species", {"chlorine", "salt"}, "decay", 2e-5);
%! assert (net.options.species, {"chlorine", "salt"});
%! assert (net.options.decay, [2e-5 2e-5]);
%! net = vn_network ("w", "species", "chlorine");
%! assert (net.options.species, {"chlorine"});
%! assert (net.options.decay, 0);

%!error <vn_network: network "w": GRAVITY must be a positive finite scalar \(m/s2\), got -9.8> vn_network ("w", "gravity", -9.8)
%!error <vn_network: network "network": DENSITY must be a positive finite scalar \(kg/m3\), got NaN> vn_network ("density", NaN)
%!error <vn_network: network "w": unknown option "pressure"; allowed: gravity, density> vn_network ("w", "pressure", 1)
%!error <vn_network: network "w": THERMAL must be true or false, got "yes"> vn_network ("w", "thermal", "yes")
%!error <vn_network: network "w": DECAY must have one rate per species \(2\), got 3> vn_network ("w", "species", {"a", "b"}, "decay", [1 2 3])
%!error <vn_network: network "w": SPECIES name "level" is reserved> vn_network ("w", "species", {"level"})
%!error <vn_network: network "w": SPECIES name "a" is given twice> vn_network ("w", "species", {"a", "a"})
%!error <vn_network: network "w": SPECIES must be a cell array of identifiers> vn_network ("w", "species", {"2x"})
%!error <vn_network: NAME must be a non-empty char row, got 3> vn_network (3)

%!test
%! net = vn_network ("w", "display", {"flow", "m3/h"; "level", "mm"});
%! assert (net.options.display, {"flow", "m3/h"; "level", "mm"});
%! net = vn_network ("w", "display", {"T2.level", "ft", "temperature", "°F", "kv", "Cv"});
%! assert (net.options.display, {"T2.level", "ft"; "temperature", "degF"; "kv", "Cv"});
%!error <vn_network: network "w": DISPLAY unit for "level" \(a length\) must be one of m, mm, cm, km, ft, in, got "m3/h"> vn_network ("w", "display", {"level", "m3/h"})
%!error <vn_network: network "w": DISPLAY unit for "flow" \(a flow\) must be one of m3/s, .*, got "furlong"> vn_network ("w", "display", {"flow", "furlong"})
%!error <vn_network: network "w": DISPLAY key "colour" is not a dimension, a variable or a quantity "UNIT.VARIABLE"; dimensions: length, area> vn_network ("w", "display", {"colour", "m"})
%!error <vn_network: network "w": DISPLAY key "flow" is given twice> vn_network ("w", "display", {"flow", "m3/h"; "flow", "L/s"})
%!error <vn_network: network "w": DISPLAY must be an N x 2 cell array> vn_network ("w", "display", {"flow"})
%!error <vn_network: network "w": DISPLAY must be a cell array> vn_network ("w", "display", "flow")

## -*- texinfo -*-
## @deftypefn {} {@var{net} =} build_bulk (@var{fn}, @var{kind}, @var{net}, @var{names}, @var{fixed}, @var{fixnames}, @var{args}, @var{spec}, @var{one})
## Add many units of one kind in one call: the bulk form of the builders.
##
## @var{names} is a cell array of unit names.  @var{fixed} holds the
## positional arguments after the name (FROM, TO or TANK), each one name
## for all units or a cell array of one name per unit; @var{fixnames} are
## their names for messages.  In @var{args} (name/value options, rows of
## @var{spec} as in build_options) a value is one for all units or, for a
## scalar option, a numeric vector or cell array of one value per unit;
## matrix, name and choice options take a cell array of one per unit.
##
## Unit @var{i} is checked by @code{@var{one} (@var{fn}, @var{net},
## @var{name}, @var{fixed}, @var{args}, @var{spec})} against the network
## holding every unit before it, as a loop of single calls would be, so the
## checks and messages are those of the single form.  The units are
## appended to a local copy of the network, which is copied once per call
## rather than once per unit.
## @end deftypefn

function net = build_bulk (fn, kind, net, names, fixed, fixnames, args, spec, one)
  build_check_net (fn, net);
  n = numel (names);
  if (! iscellstr (names) || n == 0)
    build_error (fn, kind, ["NAME must be a char identifier or a non-empty ", ...
                            "cell array of them, got %s"], build_value_str (names));
  endif
  if (n == 1)
    label = sprintf ("%s \"%s\"", kind, names{1});
  else
    label = sprintf ("%s \"%s\" to \"%s\"", kind, names{1}, names{end});
  endif
  names = names(:).';
  fix = cell (numel (fixed), n);
  for j = 1:numel (fixed)
    fix(j,:) = per_unit (fn, label, upper (fixnames{j}), fixed{j}, n, false);
  endfor
  vals = cell (numel (args), n);
  for j = 1:numel (args)
    vals(j,:) = {args{j}};
  endfor
  split = false (1, numel (args));     # option value given one per unit
  ## Options are split per unit only where they are well formed; anything
  ## else goes to every unit unchanged, for build_options to report.
  isref = false (1, numel (args));
  if (mod (numel (args), 2) == 0)
    for j = 1:2:numel (args)
      key = args{j};
      if (! (ischar (key) && rows (key) == 1))
        continue;
      endif
      k = find (strcmp (lower (key), spec(:,1)), 1);
      if (isempty (k))
        continue;
      endif
      scalar = ! any (strcmp (spec{k,2}, {"ref", "matrix", "choice", "names", "vector"}));
      vals(j+1,:) = per_unit (fn, label, upper (key), args{j+1}, n, scalar);
      v = args{j+1};
      split(j+1) = iscell (v) || (scalar && (isnumeric (v) || islogical (v))
                                  && ! isscalar (v));
      isref(j+1) = strcmp (spec{k,2}, "ref");
    endfor
  endif
  if (n >= 8)
    [done, net] = bulk_fast (fn, kind, net, names, fix, vals, split, isref,
                             spec, one);
    if (done)
      return;
    endif
  endif
  n0 = numel (net.units);
  for i = 1:n
    u = one (fn, net, names{i}, fix(:,i).', vals(:,i).', spec);
    ## Appended in place: NET is local here, so no copy per unit.
    if (n0 + i == 1)
      net.units = u;
    else
      net.units(n0+i) = u;
    endif
    net.index.(names{i}) = n0 + i;
  endfor
  net = build_bump (net, n);
endfunction

## The bulk form in time linear in the number of units.  Names and
## references are checked as vectors: every name an unused identifier,
## every reference a unit declared before the one naming it, no element
## joining a unit to itself.  Units whose options are equal and whose
## references name units of the same kinds (or none) are alike: the
## single-unit builder ONE checks the first of them, against the network
## holding every unit before it, as a loop of single calls would, and the
## others are made from its unit with their own name and references.
## When any vector check fails, DONE is false and the loop of single calls
## (in build_bulk) runs instead, so the message is the one it gives.
function [done, net] = bulk_fast (fn, kind, net, names, fix, vals, split, isref,
                                  spec, one)
  done = false;
  n = numel (names);
  n0 = numel (net.units);
  ## per-unit options must be plain numbers, or references
  num = split & ! isref;
  for j = find (num)
    c = vals(j,:);
    if (! (all (cellfun ("isreal", c)) && all (cellfun ("numel", c) == 1)
           && all (cellfun (@isnumeric, c) | cellfun ("islogical", c))))
      return;
    endif
  endfor
  refs = [fix; vals(split & isref, :)];
  if (! (iscellstr (refs) && all (cellfun ("size", refs(:), 1) <= 1)))
    return;
  endif
  refs(cellfun ("isempty", refs)) = {""};
  ## names: identifiers, unique, not taken
  if (n0 > 0)
    old = {net.units.name};
    oldkinds = {net.units.kind};
  else
    old = oldkinds = {};
  endif
  ok = ! cellfun ("isempty", regexp (names, "^[A-Za-z][A-Za-z0-9_]{0,62}$",
                                     "once"));
  if (! all (ok) || any (ismember (names, iskeyword ()))
      || numel (unique (names)) < n || any (ismember (names, old)))
    return;
  endif
  ## references: declared before the unit naming them, never the unit itself
  allnames = [old, names];
  [~, pos] = ismember (refs, allnames);
  empty = cellfun ("isempty", refs);
  mine = pos - n0;                       # position in this call, if there
  if (any (! empty(:) & (pos(:) == 0 | mine(:) >= repmat (1:n, rows (refs), 1)(:)))
      || any (strcmp (refs, repmat (names, rows (refs), 1))(:)))
    return;
  endif
  if (rows (fix) == 2 && any (strcmp (fix(1,:), fix(2,:)) & ! empty(1,:)))
    return;
  endif
  allkinds = [oldkinds, repmat({kind}, 1, n)];
  [ukinds, ~, kcode] = unique (allkinds);
  rk = zeros (size (refs));
  rk(! empty) = kcode(pos(! empty));
  ## units alike: equal option values, references to the same kinds
  sig = rk.';
  for j = find (num)
    c = cellfun (@double, vals(j,:));
    sig = [sig, c(:)];
  endfor
  [~, first, grp] = unique (sig, "rows", "first");
  grp = grp(:).';
  [first, order] = sort (first(:).');
  tmpl = cell (1, numel (first));
  made = 0;                               # units 1..made are in NET
  for g = 1:numel (first)
    i = first(g);
    net = append_units (net, names, refs, grp, tmpl, made + 1, i - 1);
    made = i - 1;
    u = one (fn, net, names{i}, fix(:,i).', vals(:,i).', spec);
    ## where each reference of the unit went (from, to), if anywhere
    slots = struct ("from", find (strcmp (refs(:,i), u.from) & ! empty(:,i), 1),
                    "to", find (strcmp (refs(:,i), u.to) & ! empty(:,i), 1));
    tmpl{order(g)} = struct ("u", u, "slots", slots);
  endfor
  net = append_units (net, names, refs, grp, tmpl, made + 1, n);
  net = build_bump (net, n);
  done = true;
endfunction

## Add units A..B of a bulk call, made from their templates, in one step.
function net = append_units (net, names, refs, grp, tmpl, a, b)
  if (b < a)
    return;
  endif
  idx = a:b;
  g = grp(idx);
  U = repmat (tmpl{g(1)}.u, 1, numel (idx));
  for t = unique (g)
    T = tmpl{t};
    at = find (g == t);
    U(at) = repmat (T.u, 1, numel (at));
    for f = {"from", "to"}
      k = T.slots.(f{1});
      if (! isempty (k))
        [U(at).(f{1})] = refs{k, idx(at)};
      endif
    endfor
  endfor
  [U.name] = names{idx};
  n0 = numel (net.units);
  if (n0 == 0)
    net.units = U;
  else
    net.units(n0+1:n0+numel (U)) = U;
  endif
  f = [fieldnames(net.index); names(idx).'];
  v = [struct2cell(net.index); num2cell(n0 + (1:numel (idx))).'];
  net.index = cell2struct (v, f, 1);
endfunction

## One value per unit: V itself, the elements of a cell of N, or for a
## scalar option the elements of a numeric or logical array of N.
function c = per_unit (fn, label, key, v, n, scalar)
  if (iscell (v) || (scalar && (isnumeric (v) || islogical (v))
                     && ! isscalar (v)))
    if (numel (v) != n)
      if (scalar)
        what = "a scalar, or a vector or cell array";
      else
        what = "one value, or a cell array";
      endif
      build_error (fn, label, "%s must be %s of one value per unit (%d), got %s",
                   key, what, n, build_value_str (v));
    endif
    if (iscell (v))
      c = v(:).';
    else
      c = num2cell (v(:).');
    endif
  else
    c = repmat ({v}, 1, n);
  endif
endfunction

%!test
%! ## Bulk calls and a loop of single calls give the same packed network.
%! loop = vn_boundary (vn_network ("b"), "R0", "head", 3);
%! lv = [0.5 1.5 2.5];
%! for i = 1:3
%!   loop = vn_tank (loop, sprintf ("T%d", i), "area", 2, "level", lv(i), "rim", 3);
%! endfor
%! loop = vn_feed (loop, "F1", "T1", "flow", 0.01);
%! loop = vn_feed (loop, "F2", "T2", "flow", -0.002);
%! loop = vn_orifice (loop, "O1", "T1", "T2", "coeff", 0.01);
%! loop = vn_orifice (loop, "O2", "T2", "", "diameter", 0.04);
%! loop = vn_resistance (loop, "R1", "R0", "T1", "r", 900);
%! loop = vn_valve (loop, "V1", "T3", "", "kv", 12, "characteristic", "equal");
%! loop = vn_valve (loop, "V2", "T3", "R0", "kv", 8, "characteristic", "linear");
%! loop = vn_pump (loop, "P1", "T2", "T3", "flow", 0.004);
%! loop = vn_pump (loop, "P2", "T3", "T1", "shutoff", 20, "k", 1e4);
%! bulk = vn_boundary (vn_network ("b"), {"R0"}, "head", 3);
%! bulk = vn_tank (bulk, {"T1", "T2", "T3"}, "area", 2, "level", lv, "rim", 3);
%! bulk = vn_feed (bulk, {"F1", "F2"}, {"T1", "T2"}, "flow", [0.01 -0.002]);
%! bulk = vn_orifice (bulk, {"O1"}, "T1", "T2", "coeff", 0.01);
%! bulk = vn_orifice (bulk, {"O2"}, {"T2"}, {""}, "diameter", 0.04);
%! bulk = vn_resistance (bulk, {"R1"}, "R0", "T1", "r", 900);
%! bulk = vn_valve (bulk, {"V1", "V2"}, "T3", {"", "R0"}, "kv", [12 8],
%!                  "characteristic", {"equal", "linear"});
%! bulk = vn_pump (bulk, {"P1"}, "T2", "T3", "flow", 0.004);
%! bulk = vn_pump (bulk, {"P2"}, "T3", "T1", "shutoff", 20, "k", 1e4);
%! a = vn_pack (loop);
%! b = vn_pack (bulk);
%! assert (isequaln (a, b));
%! assert (b.par(1,2:4), [0 0 0]);                 # prism shape code
%! j = find (strcmp (vn_schema ().valve.params, "char"));
%! assert (b.par([1 j],10:11), [12 8; 1 0]);       # kv; equal, linear
%! assert (double (b.ref(:,11).'), [3 0 -1 -1]);    # V2: T3 -> R0, 0-based
%! assert (double (b.ref(:,5).'), [-1 1 -1 -1]);    # F1 into T1

%!test
%! ## A spill into a tank declared earlier in the same call, and a table
%! ## per tank from a cell array.
%! tabs = {[0 0; 1 2], [0 0; 1 3; 2 7]};
%! net = vn_tank (vn_network (), {"A", "B"}, "table", tabs, "rim", [0.9 1.8],
%!                "spill", {"", "A"});
%! assert (net.units(2).to, "A");
%! assert (net.units(2).table, tabs{2});
%! assert ([net.index.A, net.index.B], [1 2]);

%!test
%! ## The linear-time path (8 units or more) builds what a loop builds:
%! ## spills into tanks of the same call, orifices to tanks and to waste,
%! ## per-unit values, a boundary as a source.
%! n = 12;
%! T = arrayfun (@(i) sprintf ("T%d", i), 1:n, "uniformoutput", false);
%! O = arrayfun (@(i) sprintf ("O%d", i), 1:n, "uniformoutput", false);
%! lv = 0.5 + mod (1:n, 3) / 2;
%! sp = [{""}, T(1:end-1)];
%! rim = 2 + mod (1:n, 2);
%! loop = vn_boundary (vn_network ("b"), "R0", "head", 3);
%! for i = 1:n
%!   loop = vn_tank (loop, T{i}, "area", 2, "level", lv(i), "rim", rim(i),
%!                   "spill", sp{i});
%! endfor
%! to = [T(2:end), {""}];
%! from = [{"R0"}, T(2:end)];
%! for i = 1:n
%!   loop = vn_orifice (loop, O{i}, from{i}, to{i}, "coeff", 0.01 * i);
%! endfor
%! bulk = vn_boundary (vn_network ("b"), "R0", "head", 3);
%! bulk = vn_tank (bulk, T, "area", 2, "level", lv, "rim", rim, "spill", sp);
%! bulk = vn_orifice (bulk, O, from, to, "coeff", 0.01 * (1:n));
%! assert (isequal (bulk, loop));
%! assert (bulk.index.O7, 20);
%! assert (bulk.units(20).from, "T7");

%!test
%! ## bad input in a large bulk call gives the message of the loop
%! T = arrayfun (@(i) sprintf ("T%d", i), 1:10, "uniformoutput", false);
%! net = vn_tank (vn_network ("m"), T, "area", 1);
%! O = arrayfun (@(i) sprintf ("O%d", i), 1:10, "uniformoutput", false);
%! to = [T(2:end), {"T3"}];
%! to{5} = "Q";
%! try
%!   vn_orifice (net, O, T, to, "coeff", 0.01);
%!   assert (false);
%! catch err
%!   assert (err.message, "vn_orifice: orifice \"O5\": TO names unit \"Q\", which network \"m\" does not hold; declare the tank or boundary first");
%! end_try_catch
%! O{9} = "T2";
%! try
%!   vn_orifice (net, O, T, [T(2:end), {""}], "coeff", 0.01);
%!   assert (false);
%! catch err
%!   assert (err.message, "vn_orifice: orifice \"T2\": NAME \"T2\" is already taken by a tank in network \"m\"; unit names must be unique");
%! end_try_catch

%!error <vn_tank: tank "B": SPILL names unit "C", which network "network" does not hold> vn_tank (vn_network (), {"A", "B", "C"}, "area", 1, "rim", 2, "spill", {"", "C", ""})
%!error <vn_tank: tank "T1" to "T3": LEVEL must be a scalar, or a vector or cell array of one value per unit \(3\), got a 1x2 double> vn_tank (vn_network (), {"T1", "T2", "T3"}, "area", 1, "level", [1 2])
%!error <vn_tank: tank "T2": NAME "T2" is already taken by a tank> vn_tank (vn_network (), {"T1", "T2", "T2"}, "area", 1)
%!error <vn_tank: tank "T2": AREA must be a positive finite scalar \(m2\), got -1> vn_tank (vn_network (), {"T1", "T2"}, "area", [1 -1])
%!error <vn_tank: tank: NAME must be a char identifier or a non-empty cell array of them, got an empty cell> vn_tank (vn_network (), {}, "area", 1)

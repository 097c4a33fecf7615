## -*- texinfo -*-
## @deftypefn  {} {@var{pk} =} vn_pack (@var{net})
## @deftypefnx {} {@var{pk} =} vn_pack (@var{net}, "uncached")
## Pack a network struct into the flat arrays the compiled core reads.
##
## The layout is doc/internals.md section 4.  Only names are resolved here;
## every value is checked by the core when the network is built.  The
## packed form comes from the cache of compiled networks (vn_compile),
## which packs a network once until it changes; "uncached" packs afresh.
## @end deftypefn

function pk = vn_pack (net, how)
  if (nargin < 2)
    pk = vn_compile (net).pk;
    return;
  endif
  if (! (isstruct (net) && isfield (net, "type")
         && strcmp (net.type, "vesselnet.network")))
    error ("Octave:invalid-input-arg",
           "vesselnet: NET must be a network made by vn_network");
  endif
  s = vn_schema ();
  U = net.units;
  n = numel (U);
  if (n == 0)
    error ("Octave:invalid-input-arg",
           "vesselnet: network \"%s\" has no units; declare tanks and the elements that join them first",
           net.name);
  endif
  npmax = s.npmax;
  kinds = {U.kind};
  pk.kinds = kinds;
  pk.names = {U.name};
  ref = -ones (4, n, "int32");
  par = NaN (npmax, n);
  given = false (npmax, n);
  taboff = zeros (1, n, "int32");
  tablen = zeros (1, n, "int32");

  ## References by name, all at once: "" and unknown names give 0 (-1
  ## once made 0-based); the unknown ones are errors.
  to = names_or_empty ({U.to});
  from = names_or_empty ({U.from});
  [~, ito] = ismember (to, pk.names);
  [~, ifrom] = ismember (from, pk.names);
  istank = strcmp (kinds, "tank");
  isend = strcmp (kinds, "feed") | strcmp (kinds, "heater");
  islink = ismember (kinds, {"orifice", "resistance", "valve", "pump"});
  isloop = strcmp (kinds, "controller") | strcmp (kinds, "switch");
  ref(1,istank) = ito(istank) - 1;
  ref(2,isend) = ito(isend) - 1;
  ref(1,islink) = ifrom(islink) - 1;
  ref(2,islink) = ito(islink) - 1;
  noto = cellfun ("isempty", to);
  nofrom = cellfun ("isempty", from);
  bad = ((istank | isend | islink) & ! noto & ito == 0) ...
        | (islink & ! nofrom & ifrom == 0);

  ## Parameters by kind: the par structs of one kind are joined into one
  ## struct array when their fields agree, else taken one field set at a time.
  [par, given, badpar] = pack_params (U, kinds, s, par, given);
  bad |= badpar;

  ## Controllers and switches (few) resolve their quantities in unit order;
  ## the first unit in error, whatever the check, raises its message.
  first = find (bad, 1);
  if (isempty (first))
    first = n + 1;
  endif
  if (any (isloop))
    layout = vn_quantity (net);
  endif
  for i = find (isloop)
    if (i > first)
      break;
    endif
    u = U(i);
    who = sprintf ("%s \"%s\"", u.kind, u.name);
    m = vn_quantity (net, u.aux.measure, "output", who, layout);
    c = vn_quantity (net, u.aux.manipulate, "input", who, layout);
    ref(:,i) = [m.unit-1; m.slot; c.unit-1; c.slot];
  endfor
  if (first <= n)
    unit_error (net, s, U(first));
  endif

  ## Tables, in unit order.
  tabs = {};
  if (isfield (U, "table"))
    withtab = find (! cellfun ("isempty", {U.table}));
    tabs = cell (1, numel (withtab));
    ntab = 0;
    for j = 1:numel (withtab)
      t = U(withtab(j)).table;
      taboff(withtab(j)) = ntab;
      tablen(withtab(j)) = rows (t);
      tabs{j} = reshape (t.', [], 1);
      ntab += rows (t);
    endfor
  endif
  pk.ref = ref;
  pk.par = par;
  pk.given = given;
  pk.tab = vertcat (zeros (0, 1), tabs{:});
  pk.taboff = taboff;
  pk.tablen = tablen;
  o = net.options;
  pk.opt = [o.gravity, o.density, o.cp, o.ambient, double(o.thermal), ...
            o.smooth, numel(o.species), o.decay(:).'];
  pk = vn_pack_props (net, pk);
endfunction

## Fill the parameter slots of every unit, one kind at a time; BAD marks
## units with a parameter their kind does not have.
function [par, given, bad] = pack_params (U, kinds, s, par, given)
  bad = false (1, numel (U));
  kk = unique (kinds);
  for c = 1:numel (kk)
    k = s.(kk{c});
    idx = find (strcmp (kinds, kk{c}));
    P = {U(idx).par};
    try
      S = {[P{:}]};
      cols = {idx};
    catch
      ## Field sets differ within the kind: one unit at a time.
      S = P;
      cols = num2cell (idx);
    end_try_catch
    for j = 1:numel (S)
      [slot, v, nogo] = param_slots (k, S{j});
      bad(cols{j}(nogo)) = true;
      for m = find (slot)
        par(slot(m),cols{j}) = v{m};
        given(slot(m),cols{j}) = true;
      endfor
    endfor
  endfor
endfunction

## Slots and values of the fields of S (one element per unit, one field
## set): V@{m@} holds the values of field m in unit order; slot 0 marks a
## field the kind does not have, and NOGO the units holding one.
function [slot, v, nogo] = param_slots (k, S)
  f = fieldnames (S);
  slot = zeros (1, numel (f));
  v = cell (1, numel (f));
  for m = 1:numel (f)
    j = find (strcmp (k.params, f{m}), 1);
    if (! isempty (j))
      slot(m) = j;
      v{m} = [S.(f{m})];
    endif
  endfor
  nogo = true (1, numel (S)) & any (slot == 0);
endfunction

## The messages of the first unit in error, in the order the checks are
## made for one unit: references, then parameters.
function unit_error (net, s, u)
  switch (u.kind)
    case "tank"
      unit_index (net, u.to, u, "spill");
    case {"feed", "heater"}
      unit_index (net, u.to, u, "to");
    case {"orifice", "resistance", "valve", "pump"}
      unit_index (net, u.from, u, "from");
      unit_index (net, u.to, u, "to");
  endswitch
  k = s.(u.kind);
  f = fieldnames (u.par);
  for j = 1:numel (f)
    if (! any (strcmp (k.params, f{j})))
      error ("Octave:invalid-input-arg",
             "vesselnet: %s \"%s\": unknown parameter \"%s\"; allowed: %s",
             u.kind, u.name, f{j}, strjoin (k.params, ", "));
    endif
  endfor
endfunction

## 0-based index of a referenced unit; "" means none (-1).
function idx = unit_index (net, name, u, field)
  if (isempty (name))
    idx = -1;
  else
    idx = build_find_unit (net, name);
    if (idx == 0)
      error ("Octave:invalid-input-arg",
             "vesselnet: %s \"%s\": %s names unit \"%s\", which the network does not hold",
             u.kind, u.name, field, name);
    endif
    idx -= 1;
  endif
endfunction

## Unit names as a cellstr; empty values of any class become "".
function c = names_or_empty (c)
  c(cellfun ("isempty", c)) = {""};
endfunction

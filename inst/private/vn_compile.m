## -*- texinfo -*-
## @deftypefn  {} {@var{cn} =} vn_compile (@var{net})
## @deftypefnx {} {@var{cn} =} vn_compile (@var{net}, "results")
## @deftypefnx {} {@var{cn} =} vn_compile (@var{net}, "levels")
## @deftypefnx {} {@var{cn} =} vn_compile (@var{net}, "record", @var{idx})
## The compiled form of a network, made once and reused until the network
## changes.
##
## @var{cn} holds @code{key} (the network's fingerprint), @code{pk} (the
## packed arrays of doc/internals.md section 4) and @code{layout} (the
## 0-based offsets @code{poff}, @code{ooff} of every unit's parameter and
## output blocks).  Asked for @qcode{"results"} it also holds
## @code{tmpl}, the template from which @code{__vn_assemble__} builds a
## full result without looking up a name; asked for @qcode{"levels"},
## @code{levels}, the template of a record of every tank level; asked for
## a @qcode{"record"} of the outputs @var{idx} (0-based), @code{record},
## that record's template (not kept).  Parts are made when first asked
## for.  A record template's @code{rec} lists the outputs in the order
## the core must record them (grouped by unit).
##
## The rule: the cache is keyed on a 128-bit fingerprint of the whole
## network struct (@code{__vn_hash__}: every field, name and value), so
## any change, by a builder (which also bumps @code{net.revision}) or by
## hand (@code{net.units(k).par.coeff = 0.02}), gives a new key and a new
## compiled form; an unchanged network is never packed twice.  The last
## eight networks are kept.  The environment variable
## @env{VN_COMPILE_CACHE} set to 0 turns the cache off (every call packs
## afresh), for comparisons.
## @end deftypefn

function cn = vn_compile (net, part = "", idx = [])
  persistent keys = {};
  persistent items = {};
  ## A known key was a network packed before, so it needs no checking:
  ## the common case costs the fingerprint and one comparison.
  key = __vn_hash__ (net);
  j = find (strcmp (keys, key), 1);
  if (! isempty (j) && strcmp (getenv ("VN_COMPILE_CACHE"), "0"))
    j = [];                        # the cache is off: compile afresh
  endif
  if (! isempty (j))
    cn = items{j};
    if (isempty (part) || (part(1) == "r" && numel (part) == 7
                           && ! isempty (cn.tmpl))
        || (part(1) == "l" && ! isempty (cn.levels)))
      return;
    endif
  else
    if (! (isstruct (net) && isscalar (net) && isfield (net, "type")
           && strcmp (net.type, "vesselnet.network")))
      error ("Octave:invalid-input-arg",
             "vesselnet: NET must be a network made by vn_network");
    endif
    cn.key = key;
    cn.pk = vn_pack (net, "uncached");
    cn.layout = vn_quantity (net);
    cn.tmpl = [];
    cn.levels = [];
    j = 0;
  endif
  fresh = false;
  if (strcmp (part, "results") && isempty (cn.tmpl))
    cn.tmpl = full_template (net, cn.layout);
    fresh = true;
  elseif (strcmp (part, "levels") && isempty (cn.levels))
    tanks = find (strcmp ({net.units.kind}, "tank"));
    cn.levels = record_template (net, cn.layout, cn.layout.ooff(tanks));
    fresh = true;
  elseif (strcmp (part, "record"))
    cn.record = record_template (net, cn.layout, idx);
  endif
  if (j == 0 || fresh)
    if (strcmp (getenv ("VN_COMPILE_CACHE"), "0"))
      return;
    endif
    if (j > 0)
      items{j} = cn;
    else
      ## newest first; the oldest of more than eight goes
      keys = [{key}, keys(1:min (end, 7))];
      items = [{cn}, items(1:min (end, 7))];
    endif
  endif
endfunction

## Template of a full result: per kind, the outputs and the inputs held at
## their declared values, carried properties under their network names
## (vn_props_names applied once per kind), inputs a controller or switch
## drives taking that unit's output column.
function tm = full_template (net, layout)
  s = vn_schema ();
  U = net.units;
  n = numel (U);
  kinds = {U.kind};
  names = {U.name};
  kk = unique (kinds);
  group = zeros (1, n, "int32");
  fields = cell (1, numel (kk));
  M = cell (1, n);
  S = cell (1, n);
  consts = cell (1, numel (kk));
  nconst = 0;
  for c = 1:numel (kk)
    idx = find (strcmp (kinds, kk{c}));
    k = s.(kk{c});
    inp = find (k.isinput);
    inp = inp(! cellfun (@(q) any (strcmp (q, k.outputs)), k.params(inp)));
    [outs, ounits] = vn_outputs_of (net, kk{c});
    F = [outs(:); k.params(inp)(:)];
    no = numel (outs);
    [map, F2, m2] = props_map (net, U(idx(1)), F,
                               cell2struct ([ounits(:); k.units(inp)(:)], F, 1));
    fields{c} = F2;
    group(idx) = c - 1;
    M(idx) = {m2};
    isout = map(:) <= no;
    src = zeros (numel (F2), numel (idx));
    src(isout,:) = layout.ooff(idx) + map(isout)(:);
    V = input_values (U(idx), k, inp, net.options.ambient)(map(! isout) - no, :);
    src(! isout,:) = -(nconst + reshape (1:numel (V), size (V)));
    consts{c} = V(:);
    nconst += numel (V);
    S(idx) = num2cell (src, 1);
  endfor
  nf = cellfun ("numel", fields)(group + 1);
  soff = [0, cumsum(nf)];
  src = vertcat (zeros (0, 1), S{:});
  ## inputs driven by a controller or switch: what it sets
  for i = find (strcmp (kinds, "controller") | strcmp (kinds, "switch"))
    q = U(i).aux.manipulate;
    dot = find (q == ".", 1);
    tu = build_find_unit (net, q(1:dot-1));
    f = find (strcmp (fields{group(tu)+1}, q(dot+1:end)), 1);
    o = find (strcmp (fields{group(i)+1}, "output"), 1);
    if (tu > 0 && ! isempty (f) && ! isempty (o)
        && ! any (strcmp (s.(kinds{tu}).outputs, q(dot+1:end))))
      src(soff(tu) + f) = src(soff(i) + o);
    endif
  endfor
  tm.names = names;
  tm.group = group;
  tm.fields = fields;
  tm.src = src;
  tm.const = vertcat (zeros (0, 1), consts{:});
  tm.units = cell2struct (M, names, 2);
  tm.rec = zeros (1, 0, "int32");
endfunction

## Declared values of inputs INP of units U (one kind), defaults where
## not given: one row per input, one column per unit.  A temperature not
## given is the network's AMBIENT (what the core uses), never NaN.
function vals = input_values (U, k, inp, ambient)
  vals = repmat (k.defaults(inp)(:), 1, numel (U));
  if (isempty (inp))
    return;
  endif
  P = {U.par};
  try
    S = [P{:}];
    f = fieldnames (S);
    for j = 1:numel (inp)
      if (any (strcmp (f, k.params{inp(j)})))
        vals(j,:) = [S.(k.params{inp(j)})];
      endif
    endfor
  catch
    for i = 1:numel (U)
      for j = 1:numel (inp)
        if (isfield (U(i).par, k.params{inp(j)}))
          vals(j,i) = U(i).par.(k.params{inp(j)});
        endif
      endfor
    endfor
  end_try_catch
  it = find (strcmp (k.params(inp), "temperature"));
  if (! isempty (it))
    row = vals(it,:);
    row(isnan (row)) = ambient;
    vals(it,:) = row;
  endif
endfunction

## How carried properties are named in results (the rule of
## vn_props_names, applied to the field list once per kind): on tanks,
## feeds and boundaries the core's slots c1..c8 take the declared species'
## names (unit of measure "conc") and unused slots go, as does the
## temperature of a network that is not thermal.  The result's fields F2
## come from F(MAP); M2 are their units of measure.
function [map, F2, m2] = props_map (net, U, F, m)
  map = 1:numel (F);
  F2 = F(:);
  if (any (strcmp (U.kind, {"tank", "feed", "boundary"})))
    sp = net.options.species;
    keep = true (1, numel (F));
    for j = 1:numel (F)
      f = F{j};
      if (numel (f) == 2 && f(1) == "c" && any (f(2) == "12345678"))
        k = f(2) - "0";
        keep(j) = k <= numel (sp);
        if (keep(j))
          F2{j} = sp{k};
          m.(f) = "conc";
        endif
      elseif (strcmp (f, "temperature") && ! net.options.thermal)
        keep(j) = false;
      endif
    endfor
    map = map(keep);
    uom = cellfun (@(f) m.(f), F(keep), "uniformoutput", false);
    F2 = F2(keep);
    m = cell2struct (uom(:), F2, 1);
  endif
  m2 = m;
endfunction

## Template of a record of the outputs IDX (0-based): one field per
## recorded quantity, grouped by unit in first-seen order, no units of
## measure; the core records the outputs REC in that order.
function tm = record_template (net, layout, idx)
  idx = double (idx(:).');
  ## owning unit of each output: the last block starting at or before it
  u = lookup (layout.ooff, idx);
  kinds = {net.units(u).kind};
  var = cell (1, numel (idx));
  [kk, ~, kc] = unique (kinds);
  for c = 1:numel (kk)
    outs = vn_outputs_of (net, kk{c});
    sel = kc(:).' == c;
    var(sel) = outs(idx(sel) - layout.ooff(u(sel)) + 1);
  endfor
  [uu, first, g] = unique (u, "first");
  [~, ord] = sort (first);
  rank(ord) = 1:numel (ord);
  g = rank(g(:).');
  [g, o] = sort (g);            # stable: a unit's fields keep their order
  var = var(o);
  cnt = accumarray (g(:), 1).';
  if (all (cnt == 1))
    ## one field per unit (a record of levels): units share field lists
    [fv, ~, gi] = unique (var);
    fields = cellfun (@(v) {v}, fv, "uniformoutput", false);
    group = int32 (gi(:).' - 1);
  else
    fields = mat2cell (var, 1, cnt);
    group = int32 (0:numel (ord)-1);
  endif
  tm.names = {net.units(uu(ord)).name};
  tm.group = group;
  tm.fields = fields;
  tm.src = (1:numel (idx)).';
  tm.rec = int32 (idx(o));
  tm.const = zeros (0, 1);
  tm.units = [];
endfunction

%!test
%! ## one key per content: equal networks share it, any edit changes it
%! net = vn_tank (vn_network ("k"), "T1", "area", 1, "level", 1);
%! net = vn_orifice (net, "O1", "T1", "", "coeff", 0.01);
%! a = vn_compile (net);
%! b = vn_compile (net);
%! assert (a.key, b.key);
%! net.units(2).par.coeff = 0.02;
%! c = vn_compile (net, "results");
%! assert (! strcmp (a.key, c.key));
%! assert (c.pk.par(1,2), 0.02);
%! ## the template's columns are the outputs vn_quantity finds by name
%! q = vn_quantity (net, "O1.flow", "output", "t", c.layout);
%! assert (c.tmpl.src(end), q.index + 1);
%! q = vn_quantity (net, "T1.volume", "output", "t", c.layout);
%! assert (c.tmpl.src(2), q.index + 1);

%!test
%! ## species under their network names, temperature only when thermal
%! net = vn_network ("w", "species", {"chlorine"});
%! net = vn_tank (net, "T1", "area", 1, "level", 1, "chlorine", 0.5);
%! cn = vn_compile (net, "results");
%! assert (cn.tmpl.fields{1}, {"level"; "volume"; "head"; "spill"; "chlorine"});
%! q = vn_quantity (net, "T1.chlorine", "output", "t", cn.layout);
%! assert (cn.tmpl.src(5), q.index + 1);
%! assert (cn.tmpl.units.T1.chlorine, "conc");

%!error <NET must be a network> vn_compile (struct ("a", 1))

%!test
%! ## the template names carried properties as vn_props_names does
%! for th = [false true]
%!   net = vn_network ("w", "species", {"chlorine", "iron"}, "thermal", th);
%!   net = vn_tank (net, "T1", "area", 1, "level", 1, "chlorine", 0.5);
%!   net = vn_feed (net, "F1", "T1", "flow", 0.01, "iron", 0.1);
%!   net = vn_boundary (net, "B1", "head", 2);
%!   net = vn_orifice (net, "O1", "T1", "B1", "coeff", 0.01);
%!   cn = vn_compile (net, "results");
%!   s = vn_schema ();
%!   for i = 1:numel (net.units)
%!     u = net.units(i);
%!     k = s.(u.kind);
%!     [outs, ounits] = vn_outputs_of (net, u.kind);
%!     inp = k.params(k.isinput);
%!     inp = inp(! ismember (inp, outs));
%!     uu = k.units(k.isinput);
%!     uu = uu(! ismember (k.params(k.isinput), outs));
%!     F = [outs(:); inp(:)];
%!     part = struct ();
%!     part.(u.name) = cell2struct (num2cell (1:numel (F)).', F, 1);
%!     part.units = struct ();
%!     part.units.(u.name) = cell2struct ([ounits(:); uu(:)], F, 1);
%!     sub = net;
%!     sub.units = u;
%!     part = vn_props_names (sub, part);
%!     g = cn.tmpl.group(i) + 1;
%!     assert (cn.tmpl.fields{g}, fieldnames (part.(u.name)));
%!     assert (cn.tmpl.units.(u.name), part.units.(u.name));
%!   endfor
%! endfor

## -*- texinfo -*-
## @deftypefn {} {@var{pk} =} vn_pack (@var{net})
## Pack a network struct into the flat arrays the compiled core reads.
##
## The layout is doc/internals.md section 4.  Only names are resolved here;
## every value is checked by the core when the network is built.
## @end deftypefn

function pk = vn_pack (net)
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
  pk.kinds = {U.kind};
  pk.names = {U.name};
  ref = -ones (4, n, "int32");
  par = NaN (npmax, n);
  given = false (npmax, n);
  taboff = zeros (1, n, "int32");
  tablen = zeros (1, n, "int32");
  tabs = cell (1, n);
  ntab = 0;
  for i = 1:n
    u = U(i);
    k = s.(u.kind);
    switch (u.kind)
      case "tank"
        ref(1,i) = unit_index (net, u.to, u, "spill");
      case {"feed", "heater"}
        ref(2,i) = unit_index (net, u.to, u, "to");
      case {"orifice", "resistance", "valve", "pump"}
        ref(1,i) = unit_index (net, u.from, u, "from");
        ref(2,i) = unit_index (net, u.to, u, "to");
      case {"controller", "switch"}
        who = sprintf ("%s \"%s\"", u.kind, u.name);
        m = vn_quantity (net, u.aux.measure, "output", who);
        c = vn_quantity (net, u.aux.manipulate, "input", who);
        ref(:,i) = [m.unit-1; m.slot; c.unit-1; c.slot];
    endswitch
    f = fieldnames (u.par);
    for j = 1:numel (f)
      slot = find (strcmp (k.params, f{j}), 1);
      if (isempty (slot))
        error ("Octave:invalid-input-arg",
               "vesselnet: %s \"%s\": unknown parameter \"%s\"; allowed: %s",
               u.kind, u.name, f{j}, strjoin (k.params, ", "));
      endif
      par(slot,i) = u.par.(f{j});
      given(slot,i) = true;
    endfor
    if (isfield (u, "table") && ! isempty (u.table))
      taboff(i) = ntab;
      tablen(i) = rows (u.table);
      tabs{i} = reshape (u.table.', [], 1);
      ntab += rows (u.table);
    endif
  endfor
  pk.ref = ref;
  pk.par = par;
  pk.given = given;
  pk.tab = vertcat (zeros (0, 1), tabs{:});
  pk.taboff = taboff;
  pk.tablen = tablen;
  o = net.options;
  pk.opt = [o.gravity, o.density, o.cp, o.ambient, double(o.thermal), ...
            o.smooth, numel(o.species), o.decay(:).'];
endfunction

## 0-based index of a referenced unit; "" means none (-1).
function idx = unit_index (net, name, u, field)
  if (isempty (name))
    idx = -1;
  elseif (isfield (net.index, name))
    idx = net.index.(name) - 1;
  else
    error ("Octave:invalid-input-arg",
           "vesselnet: %s \"%s\": %s names unit \"%s\", which the network does not hold",
           u.kind, u.name, field, name);
  endif
endfunction

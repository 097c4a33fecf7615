## -*- texinfo -*-
## @deftypefn {} {@var{pk} =} vn_pack_props (@var{net}, @var{pk})
## Put the species concentrations given on tanks, feeds and boundaries
## (stored by the builders in unit.aux.species) into the core's slots
## c1..c8, in the order the network declares its species.
## @end deftypefn

function pk = vn_pack_props (net, pk)
  sp = net.options.species;
  if (isempty (sp))
    return;
  endif
  s = vn_schema ();
  for i = 1:numel (net.units)
    u = net.units(i);
    if (! isfield (u, "aux") || ! isstruct (u.aux) || ! isfield (u.aux, "species"))
      continue;
    endif
    k = s.(u.kind);
    f = fieldnames (u.aux.species);
    for j = 1:numel (f)
      n = find (strcmp (sp, f{j}), 1);
      slot = find (strcmp (k.params, sprintf ("c%d", n)), 1);
      if (isempty (n) || isempty (slot))
        error ("Octave:invalid-input-arg",
               "vesselnet: %s \"%s\": species \"%s\" is not declared on the network",
               u.kind, u.name, f{j});
      endif
      pk.par(slot,i) = u.aux.species.(f{j});
      pk.given(slot,i) = true;
    endfor
  endfor
endfunction

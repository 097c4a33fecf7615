## -*- texinfo -*-
## @deftypefn {} {@var{res} =} vn_props_names (@var{net}, @var{res})
## Give carried properties their network names in a result or operating
## point: the core's concentration slots c1..c8 become the declared species
## names (res.T1.chlorine), unused slots and, on a network that is not
## thermal, temperatures are removed.
## @end deftypefn

function res = vn_props_names (net, res)
  sp = net.options.species;
  ns = numel (sp);
  slots = arrayfun (@(k) sprintf ("c%d", k), 1:8, "uniformoutput", false);
  for i = 1:numel (net.units)
    un = net.units(i).name;
    if (! isfield (res, un) || ! any (strcmp (net.units(i).kind,
                                              {"tank", "feed", "boundary"})))
      continue;
    endif
    r = res.(un);
    for k = 1:8
      if (isfield (r, slots{k}))
        if (k <= ns)
          r.(sp{k}) = r.(slots{k});
          if (isfield (res, "units") && isfield (res.units, un))
            res.units.(un).(sp{k}) = "conc";
          endif
        endif
        r = rmfield (r, slots{k});
        if (isfield (res, "units") && isfield (res.units, un)
            && isfield (res.units.(un), slots{k}))
          res.units.(un) = rmfield (res.units.(un), slots{k});
        endif
      endif
    endfor
    if (! net.options.thermal && isfield (r, "temperature"))
      r = rmfield (r, "temperature");
      if (isfield (res, "units") && isfield (res.units, un)
          && isfield (res.units.(un), "temperature"))
        res.units.(un) = rmfield (res.units.(un), "temperature");
      endif
    endif
    res.(un) = r;
  endfor
endfunction

## -*- texinfo -*-
## @deftypefn {} {@var{net} =} loop_append (@var{net}, @var{name}, @var{kind}, @var{par}, @var{aux})
## Append a controller or switch unit to the network.
## @end deftypefn

function net = loop_append (net, name, kind, par, aux)
  build_check_range (["vn_" kind], sprintf ("%s \"%s\"", kind, name), kind,
                     par);
  u = struct ("name", name, "kind", kind, "from", "", "to", "", "par", par,
              "table", [], "aux", aux);
  if (isempty (net.units))
    net.units = u;
  else
    net.units(end+1) = orderfields (u, net.units(1));
  endif
  net.index.(name) = numel (net.units);
  net = build_bump (net);
endfunction

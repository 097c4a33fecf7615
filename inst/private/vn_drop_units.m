## -*- texinfo -*-
## @deftypefn {} {@var{net} =} vn_drop_units (@var{net}, @var{drop})
## Remove units (positions @var{drop}) from a network and rebuild its
## name index; used to open loops (controllers, switches) for analysis.
## @end deftypefn

function net = vn_drop_units (net, drop)
  net.units(drop) = [];
  net.index = struct ();
  for i = 1:numel (net.units)
    net.index.(net.units(i).name) = i;
  endfor
  net = build_bump (net);
endfunction

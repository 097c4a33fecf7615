## -*- texinfo -*-
## @deftypefn {} {[@var{par}, @var{aux}] =} build_split_species (@var{net}, @var{par}, @var{aux})
## Move species concentrations from @var{par} to @code{aux.species}.
##
## The core schema has no slot per species yet, so the concentrations are
## kept aside (a struct, species name -> value) for the species balance.
## @end deftypefn

function [par, aux] = build_split_species (net, par, aux)
  sp = net.options.species;
  for i = 1:numel (sp)
    if (isfield (par, sp{i}))
      aux.species.(sp{i}) = par.(sp{i});
      par = rmfield (par, sp{i});
    endif
  endfor
endfunction

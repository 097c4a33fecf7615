## -*- texinfo -*-
## @deftypefn {} {[@var{names}, @var{units}] =} vn_outputs_of (@var{net}, @var{kind})
## The outputs a unit of @var{kind} reports in this network, with their
## units of measure: the first nout_base of the kind's list plus
## nout_species per declared species (the core's rule, from its schema).
## @end deftypefn

function [names, units] = vn_outputs_of (net, kind)
  k = vn_schema ().(kind);
  n = k.nout_base + k.nout_species * numel (net.options.species);
  names = k.outputs(1:n);
  units = k.ounits(1:n);
endfunction

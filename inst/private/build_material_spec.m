## -*- texinfo -*-
## @deftypefn {} {@var{spec} =} build_material_spec (@var{net})
## Option rows for the temperature and the species of the network.
##
## Rows in the layout of build_options.  "temperature" is always allowed
## so that build_check_thermal can say why it is refused on a network that
## is not thermal; one row per declared species (a concentration).
## @end deftypefn

function spec = build_material_spec (net)
  spec = {"temperature", "real", "degC", []};
  sp = net.options.species(:);
  if (! isempty (sp))
    spec = [spec; sp, repmat({"nonneg", "concentration", []}, numel (sp), 1)];
  endif
endfunction

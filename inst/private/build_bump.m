## -*- texinfo -*-
## @deftypefn {} {@var{net} =} build_bump (@var{net})
## Count one more change of the network in @code{net.revision}: every
## builder that adds or removes units calls it.  The cache of compiled
## networks (vn_compile) is keyed on the fingerprint of the whole network,
## the revision included, so a network changed by a builder or by hand is
## packed again.
## @end deftypefn

function net = build_bump (net)
  if (isfield (net, "revision"))
    net.revision += 1;
  else
    net.revision = 1;
  endif
endfunction

%!test
%! net = build_bump (struct ("units", []));
%! assert (net.revision, 1);
%! assert (build_bump (net).revision, 2);

## -*- texinfo -*-
## @deftypefn {} {@var{net} =} build_bump (@var{net}, @var{n})
## Count @var{n} more changes of the network (default 1) in
## @code{net.revision}: every builder that adds or removes units calls it,
## once per unit, so the bulk form of a builder leaves the revision a loop
## of single calls would.  The cache of compiled
## networks (vn_compile) is keyed on the fingerprint of the whole network,
## the revision included, so a network changed by a builder or by hand is
## packed again.
## @end deftypefn

function net = build_bump (net, n)
  if (nargin < 2)
    n = 1;
  endif
  if (isfield (net, "revision"))
    net.revision += n;
  else
    net.revision = n;
  endif
endfunction

%!test
%! net = build_bump (struct ("units", []));
%! assert (net.revision, 1);
%! assert (build_bump (net).revision, 2);
%! assert (build_bump (net, 3).revision, 4);

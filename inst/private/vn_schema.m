## -*- texinfo -*-
## @deftypefn {} {@var{s} =} vn_schema ()
## Return the compiled core's registry of unit kinds (cached).
##
## The registry is the single source of parameter names, defaults, ranges,
## units of measure and outputs; see doc/internals.md section 3.
## @end deftypefn

function s = vn_schema ()
  persistent cache;
  if (isempty (cache))
    cache = __vn_schema__ ();
  endif
  s = cache;
endfunction

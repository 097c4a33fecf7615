## -*- texinfo -*-
## @deftypefn {} {@var{R} =} lin_reach (@var{P}, @var{seeds})
## Return which states a set of seeds reaches through a sparsity pattern.
##
## @var{P} is n x n; an edge runs from state k to state l where
## @code{P(l,k)} is non-zero (k appears in the equation of l).
## @var{seeds} is n x m, one column per source (non-zero entries start
## there).  @var{R} is n x m logical: state l is true in column j when a
## path of edges leads from a seed of column j to l (the seeds included).
## Give the transpose of @var{P} to find the states that reach the seeds.
##
## The search runs compiled (@code{__vn_reach__}), depth first, in time
## proportional to the states and edges it meets.
## @seealso{lin_gain, lin_steady_part}
## @end deftypefn

function R = lin_reach (P, seeds)
  R = __vn_reach__ (sparse (double (P != 0)), double (seeds != 0));
endfunction

%!test
%! ## A chain 1 -> 2 -> 3 and a lone state 4 (analytic).
%! P = sparse ([2 3], [1 2], 1, 4, 4) + speye (4);
%! assert (lin_reach (P, [1; 0; 0; 0]), logical ([1; 1; 1; 0]));
%! assert (lin_reach (P.', [0; 0; 1; 0]), logical ([1; 1; 1; 0]));
%! assert (lin_reach (P, [0 0; 1 0; 0 0; 0 1]), logical ([0 0; 1 0; 1 0; 0 1]));

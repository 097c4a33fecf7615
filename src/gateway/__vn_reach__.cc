// R = __vn_reach__ (P, seeds)
// Graph search for the linear analysis (lin_reach): an edge runs from
// state k to state l where P(l,k) is non-zero; column j of the logical
// n x m result marks the states reached from the non-zero entries of
// seeds(:,j), seeds included.  Depth-first with an explicit stack over
// the compressed columns of P: O(n + nnz) per seed column, where a
// breadth-first search in the interpreter costs a constant per level
// (long chains of tanks).  No physics here.
#include <vector>
#include "vn_gateway.h"

DEFUN_DLD (__vn_reach__, args, ,
           "-*- texinfo -*-\n@deftypefn {} {@var{R} =} __vn_reach__ "
           "(@var{P}, @var{seeds})\nInternal: states reached along the "
           "non-zero pattern of @var{P} from the non-zero entries of each "
           "column of @var{seeds}.\n@end deftypefn")
{
  if (args.length () != 2)
    print_usage ();
  if (! args(0).issparse () || args(0).iscomplex ())
    error_with_id ("Octave:invalid-input-arg",
                   "__vn_reach__: P must be a real sparse matrix");
  SparseMatrix P = args(0).sparse_matrix_value ();
  octave_idx_type n = P.rows ();
  if (P.cols () != n)
    error_with_id ("Octave:invalid-input-arg",
                   "__vn_reach__: P must be square, got %ld x %ld",
                   (long) n, (long) P.cols ());
  Matrix S = args(1).matrix_value ();
  if (S.rows () != n)
    error_with_id ("Octave:invalid-input-arg",
                   "__vn_reach__: SEEDS must have %ld rows (one per state), "
                   "got %ld", (long) n, (long) S.rows ());
  octave_idx_type m = S.cols ();
  boolMatrix R (n, m, false);
  std::vector<octave_idx_type> stack;
  stack.reserve (n);
  for (octave_idx_type j = 0; j < m; j++)
    {
      stack.clear ();
      for (octave_idx_type i = 0; i < n; i++)
        if (S(i, j) != 0 && ! R(i, j))
          {
            R(i, j) = true;
            stack.push_back (i);
          }
      while (! stack.empty ())
        {
          octave_idx_type k = stack.back ();
          stack.pop_back ();
          for (octave_idx_type p = P.cidx (k); p < P.cidx (k + 1); p++)
            {
              octave_idx_type l = P.ridx (p);
              if (P.data (p) != 0 && ! R(l, j))
                {
                  R(l, j) = true;
                  stack.push_back (l);
                }
            }
        }
    }
  return ovl (R);
}

/*
%!test
%! ## A chain 1 -> 2 -> 3, a lone state 4 and an explicit zero 4 -> 1.
%! P = sparse ([2 3 1], [1 2 4], [1 1 0], 4, 4);
%! assert (__vn_reach__ (P, [1; 0; 0; 0]), logical ([1; 1; 1; 0]));
%! assert (__vn_reach__ (P, [0 0; 0 0; 0 0; 1 2]), logical ([0 0; 0 0; 0 0; 1 1]));
%! assert (__vn_reach__ (P.', [0; 0; 1; 0]), logical ([1; 1; 1; 0]));
%!error <square> __vn_reach__ (sparse (2, 3), [1; 1])
%!error <rows> __vn_reach__ (sparse (2, 2), [1; 1; 1])
%!error <sparse> __vn_reach__ (eye (2), [1; 1])
*/

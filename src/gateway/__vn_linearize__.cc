// [A, B, C, D, states, x0] = __vn_linearize__ (pk, x, pin, yout, sparse)
// Analytic linearisation at the state x (empty: declared levels), inputs
// as 0-based parameter indices, outputs as 0-based output indices.
#include "vn_gateway.h"

static const char *FN = "vn_linearize";

DEFUN_DLD (__vn_linearize__, args, ,
           "-*- texinfo -*-\n@deftypefn {} {[@var{A}, @var{B}, @var{C}, "
           "@var{D}] =} __vn_linearize__ (@var{pk}, @var{x}, @var{pin}, "
           "@var{yout}, @var{sparse})\nInternal: analytic Jacobians of a "
           "packed network.\n@end deftypefn")
{
  if (args.length () != 5)
    print_usage ();
  vn_gw_spec G;
  vn_gw_net H;
  vn_gw_build (args(0), G, H, FN);
  vn_net *net = H.net;
  int nx = vn_nstates (net);
  ColumnVector x (nx);
  if (args(1).isempty ())
    vn_gw_check (net, vn_initial_state (net, x.fortran_vec ()), FN);
  else
    {
      x = args(1).xcolumn_vector_value ("%s: X must be a vector", FN);
      if (x.numel () != nx)
        error_with_id ("Octave:invalid-input-arg", "%s: the operating point "
                       "has %d states; this network has %d (is it from "
                       "another network?)", FN, (int) x.numel (), nx);
    }
  int32NDArray pin = args(2).int32_array_value ();
  int32NDArray yout = args(3).int32_array_value ();
  bool sp = args(4).bool_value ();
  int nin = pin.numel (), nout = yout.numel ();
  std::vector<int> pi (nin), yo (nout);
  for (int i = 0; i < nin; i++)
    pi[i] = pin(i).value ();
  for (int i = 0; i < nout; i++)
    yo[i] = yout(i).value ();
  Matrix B (nx, nin), C (nout, nx), D (nout, nin);
  octave_value Aout;
  if (sp)
    {
      long nnz = 0;
      vn_gw_check (net, vn_jac_csc (net, 0, x.data (), &nnz, NULL, NULL,
                                    NULL), FN);
      std::vector<long> cp (nx + 1), ri (nnz);
      std::vector<double> v (nnz);
      vn_gw_check (net, vn_jac_csc (net, 0, x.data (), &nnz, cp.data (),
                                    ri.data (), v.data ()), FN);
      SparseMatrix A (nx, nx, nnz);
      for (int j = 0; j <= nx; j++)
        A.xcidx (j) = cp[j];
      for (long k = 0; k < nnz; k++)
        {
          A.xridx (k) = ri[k];
          A.xdata (k) = v[k];
        }
      Aout = A;
      vn_gw_check (net, vn_linearize_dense (net, 0, x.data (), nin,
                                            pi.data (), nout, yo.data (),
                                            NULL, B.fortran_vec (),
                                            C.fortran_vec (),
                                            D.fortran_vec ()), FN);
    }
  else
    {
      Matrix A (nx, nx);
      vn_gw_check (net, vn_linearize_dense (net, 0, x.data (), nin,
                                            pi.data (), nout, yo.data (),
                                            A.fortran_vec (),
                                            B.fortran_vec (),
                                            C.fortran_vec (),
                                            D.fortran_vec ()), FN);
      Aout = A;
    }
  Cell names (nx, 1);
  for (int i = 0; i < nx; i++)
    names(i) = std::string (vn_unit_name (net, vn_state_unit (net, i)))
               + "." + vn_state_var (net, i);
  return ovl (Aout, B, C, D, names, x);
}

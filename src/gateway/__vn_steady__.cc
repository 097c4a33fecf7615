// [x, y, uadj, info, states] = __vn_steady__ (pk, x0, padj, ytgt, target, opts)
// Steady state of a packed network from x0 (empty: declared levels);
// padj 0-based parameter indices adjusted so outputs ytgt (0-based) reach
// target.  opts: maxiter, tol, solver (0 auto, 1 dense, 2 klu), simulate.
#include "vn_gateway.h"

static const char *FN = "vn_steady";

DEFUN_DLD (__vn_steady__, args, ,
           "-*- texinfo -*-\n@deftypefn {} {[@var{x}, @var{y}, @var{uadj}, "
           "@var{info}, @var{states}] =} __vn_steady__ (@var{pk}, @var{x0}, "
           "@var{padj}, @var{ytgt}, @var{target}, @var{opts})\nInternal: "
           "steady state of a packed network.\n@end deftypefn")
{
  if (args.length () != 6)
    print_usage ();
  int32NDArray padj = args(2).int32_array_value ();
  int32NDArray ytgt = args(3).int32_array_value ();
  ColumnVector target;
  if (! args(4).isempty ())
    target = args(4).xcolumn_vector_value ("%s: TARGET must be a vector",
                                           FN);
  octave_scalar_map o = args(5).xscalar_map_value ("%s: OPTS must be a "
                                                   "struct", FN);
  int m = padj.numel ();
  if (ytgt.numel () != target.numel ())
    error ("%s: %d target outputs but %d target values (internal error)",
           FN, (int) ytgt.numel (), (int) target.numel ());
  vn_gw_spec G;
  vn_gw_net H;
  vn_gw_build (args(0), G, H, FN);
  vn_net *net = H.net;
  int nx = vn_nstates (net), ny = vn_noutputs (net);
  ColumnVector x (nx);
  if (args(1).isempty ())
    vn_gw_check (net, vn_initial_state (net, x.fortran_vec ()), FN);
  else
    {
      x = args(1).xcolumn_vector_value ("%s: the start state must be a "
                                        "vector", FN);
      if (x.numel () != nx)
        error_with_id ("Octave:invalid-input-arg", "%s: the start state has "
                       "%d values; this network has %d states (is the "
                       "operating point from another network?)", FN,
                       (int) x.numel (), nx);
    }
  std::vector<int> pa (m), yt (ytgt.numel ());
  for (int i = 0; i < m; i++)
    pa[i] = padj(i).value ();
  for (int i = 0; i < (int) yt.size (); i++)
    yt[i] = ytgt(i).value ();
  vn_steady_opts so = {};
  so.maxiter = o.contents ("maxiter").int_value ();
  so.tol = o.contents ("tol").double_value ();
  so.solver = o.contents ("solver").int_value ();
  so.simulate = o.contents ("simulate").bool_value () ? 1 : -1;
  so.nadj = m;
  so.padj = pa.data ();
  so.ntgt = yt.size ();
  so.ytgt = yt.data ();
  so.target = target.data ();
  so.stop = vn_gw_stop;
  vn_steady_info info;
  vn_gw_check (net, vn_steady (net, x.fortran_vec (), &so, &info), FN);
  ColumnVector y (ny), ua (m);
  vn_gw_check (net, vn_outputs (net, 0, x.data (), y.fortran_vec ()), FN);
  for (int i = 0; i < m; i++)
    ua(i) = vn_param_get (net, pa[i]);
  octave_scalar_map im;
  im.assign ("iterations", (double) info.iterations);
  im.assign ("simulated", info.simulated != 0);
  im.assign ("t_sim", info.t_sim);
  im.assign ("residual", info.residual);
  im.assign ("relres", info.relres);
  im.assign ("solver", info.solver == VN_SOLVER_KLU ? "klu" : "dense");
  Cell names (nx, 1);
  for (int i = 0; i < nx; i++)
    names(i) = std::string (vn_unit_name (net, vn_state_unit (net, i)))
               + "." + vn_state_var (net, i);
  return ovl (x, y, ua, im, names);
}

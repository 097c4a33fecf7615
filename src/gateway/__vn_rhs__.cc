// [f, y, states] = __vn_rhs__ (pk, x, pidx, pval)
// The right-hand side dx/dt and every output of a packed network at the
// state x (empty: the declared initial state), with the parameters of
// 0-based flat indices pidx set to pval first.  Tests use it to check the
// analytic Jacobians of __vn_linearize__ against finite differences.
#include "vn_gateway.h"

static const char *FN = "__vn_rhs__";

DEFUN_DLD (__vn_rhs__, args, ,
           "-*- texinfo -*-\n@deftypefn {} {[@var{f}, @var{y}, "
           "@var{states}] =} __vn_rhs__ (@var{pk}, @var{x}, @var{pidx}, "
           "@var{pval})\nInternal: right-hand side and outputs of a packed "
           "network.\n@end deftypefn")
{
  int nargs = args.length ();
  if (nargs != 2 && nargs != 4)
    print_usage ();
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
      x = args(1).xcolumn_vector_value ("%s: X must be a vector", FN);
      if (x.numel () != nx)
        error_with_id ("Octave:invalid-input-arg", "%s: X has %d states; "
                       "this network has %d", FN, (int) x.numel (), nx);
    }
  if (nargs == 4)
    {
      int32NDArray pidx = args(2).int32_array_value ();
      NDArray pval = args(3).array_value ();
      if (pidx.numel () != pval.numel ())
        error_with_id ("Octave:invalid-input-arg", "%s: PIDX and PVAL "
                       "differ in length", FN);
      for (octave_idx_type i = 0; i < pidx.numel (); i++)
        {
          int p = pidx(i).value ();
          if (p < 0 || p >= vn_nparams (net))
            error_with_id ("Octave:invalid-input-arg", "%s: parameter "
                           "index %d is outside [0, %d]", FN, p,
                           vn_nparams (net) - 1);
          vn_gw_check (net, vn_param_set (net, p, pval(i)), FN);
        }
    }
  vn_gw_check (net, vn_set_signals (net, 0, NULL, NULL, NULL, NULL, NULL,
                                    NULL), FN);
  ColumnVector f (nx), y (ny);
  vn_gw_check (net, vn_rhs (net, 0, x.data (), f.fortran_vec ()), FN);
  vn_gw_check (net, vn_outputs (net, 0, x.data (), y.fortran_vec ()), FN);
  Cell names (nx, 1);
  for (int i = 0; i < nx; i++)
    names(i) = std::string (vn_unit_name (net, vn_state_unit (net, i)))
               + "." + vn_state_var (net, i);
  return ovl (f, y, names);
}

/*
%!test
%! ## a tank of 2 m2 fed 0.01 m3/s: dV/dt = 0.01, level = V / A
%! pk = struct ("kinds", {{"tank", "feed"}}, "names", {{"T1", "F1"}});
%! s = __vn_schema__ ();
%! np = numel (s.tank.params);
%! npmax = s.npmax;
%! pk.ref = int32 ([-1 -1; -1 0; -1 -1; -1 -1]);
%! pk.par = NaN (npmax, 2);
%! pk.given = false (npmax, 2);
%! ia = find (strcmp (s.tank.params, "area"));
%! il = find (strcmp (s.tank.params, "level"));
%! ish = find (strcmp (s.tank.params, "shape"));
%! iflow = find (strcmp (s.feed.params, "flow"));
%! pk.par([ia il ish], 1) = [2; 1.5; 0];
%! pk.given([ia il ish], 1) = true;
%! pk.par(iflow, 2) = 0.01;
%! pk.given(iflow, 2) = true;
%! pk.tab = zeros (0, 1);
%! pk.taboff = int32 ([0 0]);
%! pk.tablen = int32 ([0 0]);
%! pk.opt = [9.80665 998.2 4181.3 15 0 1e-3 0];
%! [f, y, names] = __vn_rhs__ (pk, []);
%! assert (f, 0.01, 1e-15);
%! assert (y(1), 1.5, 1e-12);
%! assert (names, {"T1.volume"});
%! [f, y] = __vn_rhs__ (pk, 4, int32 (np + iflow - 1), 0.02);
%! assert (f, 0.02, 1e-15);
%! assert (y(1), 2, 1e-12);
*/

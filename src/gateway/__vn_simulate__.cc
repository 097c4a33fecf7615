// [X, Y, stats, states, events] = __vn_simulate__ (pk, sig, tout, x0, opts)
// events: one row per switching [t, unit (1-based), new output];
// YS: output sensitivities (nt x nout x np) when opts.sens is given.
// Integrate a packed network; x0 empty = from the declared levels.
#include "vn_gateway.h"
#include "vn_gw_cache.h"

static const char *FN = "vn_simulate";

DEFUN_DLD (__vn_simulate__, args, ,
           "-*- texinfo -*-\n@deftypefn {} {[@var{X}, @var{Y}, @var{stats}, "
           "@var{states}] =} __vn_simulate__ (@var{pk}, @var{sig}, "
           "@var{tout}, @var{x0}, @var{opts})\nInternal: integrate a packed "
           "network.\n@end deftypefn")
{
  if (args.length () != 5)
    print_usage ();
  ColumnVector tout = args(2).xcolumn_vector_value ("%s: TOUT must be a "
                                                    "vector", FN);
  octave_scalar_map o = args(4).xscalar_map_value ("%s: OPTS must be a "
                                                   "struct", FN);
  // the built handle is kept with the packed value (vn_gw_cache.h)
  vn_gw_held &held = vn_gw_cached_build (args(0), FN);
  vn_net *net = held.net;
  vn_gw_check (net, vn_gw_signals (net, args(1), FN), FN);
  int nx = vn_nstates (net), ny = vn_noutputs (net);
  ColumnVector x0 (nx);
  if (args(3).isempty ())
    vn_gw_check (net, vn_initial_state (net, x0.fortran_vec ()), FN);
  else
    {
      x0 = args(3).xcolumn_vector_value ("%s: initial state must be a "
                                         "vector", FN);
      if (x0.numel () != nx)
        error_with_id ("Octave:invalid-input-arg", "%s: initial state has "
                       "%d values; this network has %d states", FN,
                       (int) x0.numel (), nx);
    }
  vn_sim_opts so = {};
  so.rtol = o.contents ("reltol").double_value ();
  so.atol = o.contents ("abstol").double_value ();
  so.solver = o.contents ("solver").int_value ();
  so.maxsteps = o.contents ("maxsteps").long_value ();
  so.hmax = o.contents ("maxstep").double_value ();
  so.stop = vn_gw_stop;
  // opts.record: record only these outputs (0-based indices)
  std::vector<int> rec;
  if (o.isfield ("record") && ! o.contents ("record").isempty ())
    {
      int32NDArray r = o.contents ("record").int32_array_value ();
      rec.resize (r.numel ());
      for (octave_idx_type i = 0; i < r.numel (); i++)
        rec[i] = r(i).value ();
      so.nyrec = rec.size ();
      so.yrec = rec.data ();
      ny = rec.size ();
    }
  int nt = tout.numel ();
  Matrix X (nt, nx), Y (nt, ny);
  vn_sim_stats stats;
  // forward sensitivities, when asked: opts.sens (0-based parameter
  // indices), opts.sens_x0 (nx x np), opts.sens_yout (0-based outputs)
  vn_sens sens = {};
  std::vector<int> spidx, syout;
  Matrix sx0;
  NDArray YS;
  bool want_sens = o.isfield ("sens") && ! o.contents ("sens").isempty ();
  if (want_sens)
    {
      int32NDArray pp = o.contents ("sens").int32_array_value ();
      int32NDArray yy = o.contents ("sens_yout").int32_array_value ();
      sx0 = o.contents ("sens_x0").matrix_value ();
      int np = pp.numel (), nyo = yy.numel ();
      if (sx0.rows () != nx || sx0.columns () != np)
        error ("%s: initial sensitivities must be %d x %d", FN, nx, np);
      spidx.resize (np);
      syout.resize (nyo);
      for (int i = 0; i < np; i++)
        spidx[i] = pp(i).value ();
      for (int i = 0; i < nyo; i++)
        syout[i] = yy(i).value ();
      YS.resize (dim_vector (nt, nyo, np));
      sens.np = np;
      sens.pidx = spidx.data ();
      sens.x0 = sx0.data ();
      sens.ny = nyo;
      sens.yout = syout.data ();
      sens.YS = YS.fortran_vec ();
    }
  int st = vn_simulate_sens (net, x0.data (), nt, tout.data (),
                             X.fortran_vec (), Y.fortran_vec (), &so, &stats,
                             want_sens ? &sens : NULL);
  octave_scalar_map sm;
  sm.assign ("steps", (double) stats.steps);
  sm.assign ("rhs", (double) stats.rhs);
  sm.assign ("jac", (double) stats.jac);
  sm.assign ("setups", (double) stats.setups);
  sm.assign ("errfails", (double) stats.errfails);
  sm.assign ("convfails", (double) stats.convfails);
  sm.assign ("restarts", (double) stats.restarts);
  sm.assign ("wall", stats.wall);
  sm.assign ("solver", stats.solver == VN_SOLVER_KLU ? "klu" : "dense");
  sm.assign ("t_reached", stats.t_reached);
  vn_gw_check (net, st, FN);
  const Cell &names = vn_gw_state_names (held);
  long ne = vn_nevents (net);
  Matrix ev (ne, 3);
  for (long i = 0; i < ne; i++)
    {
      double t, v;
      int u;
      vn_event_get (net, i, &t, &u, &v);
      ev(i, 0) = t;
      ev(i, 1) = u + 1;
      ev(i, 2) = v;
    }
  return ovl (X, Y, sm, names, ev, YS);
}

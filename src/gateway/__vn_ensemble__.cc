// [Y, status, msgs, steps, wall] = __vn_ensemble__ (pk, sig, tout, x0, opts, pidx, P)
// Many runs of one packed network (src/core/vn_ens.h): run k sets the
// parameters pidx (0-based flat indices) to row k of P.  Y is
// nt x ny x nrun (ny: opts.record, or every output); status 0 or the
// core's VN_E* code per run, msgs the failed runs' messages; steps the
// integrator steps per run; wall the seconds of the whole ensemble.
// opts: reltol, abstol, solver, maxsteps, maxstep, record, workers, and
// jobfile: when given, the job is written there (src/core/vn_jobfile.h)
// for the MPI program instead of being run, and nothing is returned.
// [Y, status, msgs, steps, wall] = __vn_ensemble__ ("read", resultfile)
// reads the results that program wrote.
#include <chrono>
#include "vn_gateway.h"
#include "vn_ens.h"
#include "vn_jobfile.h"

// The outputs of a gateway call from per-run arrays.
static octave_value_list
ens_outputs (NDArray &Y, long nrun, const int *status, const long *steps,
             const char *msgs, size_t msglen, double wall)
{
  ColumnVector stv (nrun), sv (nrun);
  Cell mc (nrun, 1);
  for (long r = 0; r < nrun; r++)
    {
      stv(r) = status[r];
      sv(r) = steps[r];
      mc(r) = std::string (status[r] ? msgs + msglen * r : "");
    }
  return ovl (Y, stv, mc, sv, wall);
}

static const char *FN = "vn_ensemble";

DEFUN_DLD (__vn_ensemble__, args, ,
           "-*- texinfo -*-\n@deftypefn {} {[@var{Y}, @var{status}, "
           "@var{msgs}, @var{steps}, @var{wall}] =} __vn_ensemble__ "
           "(@var{pk}, @var{sig}, @var{tout}, @var{x0}, @var{opts}, "
           "@var{pidx}, @var{P})\nInternal: many runs of a packed network "
           "on several threads.\n@end deftypefn")
{
  if (args.length () == 2 && args(0).is_string ()
      && args(0).string_value () == "read")
    {
      std::string file = args(1).xstring_value ("%s: result file name "
                                                "must be a string", FN);
      vn_res r;
      char err[1024];
      if (vn_res_read (file.c_str (), &r, err, sizeof err) != VN_OK)
        error_with_id ("vesselnet:core", "%s: %s", FN, err);
      NDArray Y (dim_vector (r.nt, r.ny, r.nrun));
      std::copy (r.Y, r.Y + (size_t) r.nt * r.ny * r.nrun, Y.fortran_vec ());
      octave_value_list out = ens_outputs (Y, r.nrun, r.status, r.steps,
                                           r.msg, r.msglen, r.wall);
      vn_res_free (&r);
      return out;
    }
  if (args.length () != 7)
    print_usage ();
  ColumnVector tout = args(2).xcolumn_vector_value ("%s: TOUT must be a "
                                                    "vector", FN);
  octave_scalar_map o = args(4).xscalar_map_value ("%s: OPTS must be a "
                                                   "struct", FN);
  int32NDArray pidx = args(5).int32_array_value ();
  Matrix P = args(6).matrix_value ();
  int nvar = pidx.numel ();
  long nrun = P.rows ();
  if (P.columns () != nvar)
    error ("%s: %d parameters but %d columns of values", FN, nvar,
           (int) P.columns ());
  vn_gw_spec G;
  vn_gw_net H;
  vn_gw_build (args(0), G, H, FN);
  vn_net *net = H.net;
  vn_gw_sig S;
  vn_gw_sig_arrays (args(1), S, FN);
  vn_gw_check (net, vn_set_signals (net, S.n, S.unit.data (), S.slot.data (),
                                    S.off.data (), S.len.data (),
                                    S.hold.data (), S.data.data ()), FN);
  int nx = vn_nstates (net);
  std::vector<int> pv (nvar);
  for (int j = 0; j < nvar; j++)
    {
      pv[j] = pidx(j).value ();
      if (pv[j] < 0 || pv[j] >= vn_nparams (net))
        error ("%s: parameter index %d outside the network", FN, pv[j]);
    }
  ColumnVector x0;
  if (! args(3).isempty ())
    {
      x0 = args(3).xcolumn_vector_value ("%s: initial state must be a "
                                         "vector", FN);
      if (x0.numel () != nx)
        error_with_id ("Octave:invalid-input-arg", "%s: initial state has "
                       "%d values; this network has %d states", FN,
                       (int) x0.numel (), nx);
    }
  std::vector<int> rec;
  if (o.isfield ("record") && ! o.contents ("record").isempty ())
    {
      int32NDArray r = o.contents ("record").int32_array_value ();
      rec.resize (r.numel ());
      for (octave_idx_type i = 0; i < r.numel (); i++)
        {
          rec[i] = r(i).value ();
          if (rec[i] < 0 || rec[i] >= vn_noutputs (net))
            error ("%s: recorded output %d outside the network", FN, rec[i]);
        }
    }
  long ny = rec.empty () ? vn_noutputs (net) : (long) rec.size ();
  int nt = tout.numel ();
  double cells = (double) nt * ny * nrun;
  if (cells > 2e9)
    error_with_id ("vesselnet:too-large", "%s: %d times x %ld quantities x "
                   "%ld runs is too large a record; record fewer quantities "
                   "or use a coarser dt", FN, nt, ny, nrun);
  vn_ens_job job = {};
  job.spec = &G.s;
  job.nsig = S.n;
  job.sig_unit = S.unit.data ();
  job.sig_slot = S.slot.data ();
  job.sig_off = S.off.data ();
  job.sig_len = S.len.data ();
  job.sig_hold = S.hold.data ();
  job.sig_data = S.data.data ();
  job.nt = nt;
  job.tout = tout.data ();
  job.x0 = args(3).isempty () ? NULL : x0.data ();
  job.nvar = nvar;
  job.pidx = pv.data ();
  job.nrun = nrun;
  job.P = P.data ();
  job.sim.rtol = o.contents ("reltol").double_value ();
  job.sim.atol = o.contents ("abstol").double_value ();
  job.sim.solver = o.contents ("solver").int_value ();
  job.sim.maxsteps = o.contents ("maxsteps").long_value ();
  job.sim.hmax = o.contents ("maxstep").double_value ();
  job.sim.stop = vn_gw_stop;
  job.sim.nyrec = rec.size ();
  job.sim.yrec = rec.empty () ? NULL : rec.data ();
  job.workers = o.contents ("workers").int_value ();
  job.stop = vn_gw_stop;
  if (o.isfield ("jobfile"))
    {
      std::string file = o.contents ("jobfile").xstring_value ("%s: job "
                                                               "file name "
                                                               "must be a "
                                                               "string", FN);
      char err[1024];
      if (vn_job_write (file.c_str (), &job, err, sizeof err) != VN_OK)
        error_with_id ("vesselnet:core", "%s: %s", FN, err);
      return ovl ();
    }
  NDArray Y (dim_vector (nt, ny, nrun));
  std::vector<int> status (nrun > 0 ? nrun : 1);
  const size_t msglen = 512;
  std::vector<char> msgs ((nrun > 0 ? nrun : 1) * msglen, 0);
  std::vector<long> steps (nrun > 0 ? nrun : 1);
  vn_ens_out out = {};
  out.Y = Y.fortran_vec ();
  out.status = status.data ();
  out.msg = msgs.data ();
  out.msglen = msglen;
  out.steps = steps.data ();
  char err[1024];
  auto t0 = std::chrono::steady_clock::now ();
  int st = vn_ensemble (&job, &out, err, sizeof err);
  double wall = std::chrono::duration<double> (std::chrono::steady_clock::now ()
                                               - t0).count ();
  if (st == VN_EINTR)
    vn_gw_interrupted (FN, err);
  if (st)
    error_with_id (st == VN_EARG ? "Octave:invalid-input-arg"
                   : "vesselnet:core", "%s: %s", FN, err);
  return ens_outputs (Y, nrun, status.data (), steps.data (), msgs.data (),
                      msglen, wall);
}

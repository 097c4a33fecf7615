/* vesselnet core: many runs of one network (ensembles, what-if sweeps).
 *
 * Each run is one vn_simulate of the network built from `spec` with some
 * of its parameters set to that run's values.  Runs are spread over
 * worker threads; each worker builds its own network handle (its own
 * SUNDIALS context is made inside vn_simulate), so no state is shared
 * between threads but the read-only job and the output arrays, which
 * each run writes in its own slice.  A run that fails is reported in its
 * status and message and never stops the others.  The results do not
 * depend on the number of workers or on which worker ran which run. */
#ifndef VN_ENS_H
#define VN_ENS_H

#include "vn.h"

#ifdef __cplusplus
extern "C" {
#endif

typedef struct vn_ens_job {
  const vn_spec *spec;
  /* signals, as for vn_set_signals */
  int nsig;
  const int *sig_unit, *sig_slot, *sig_off, *sig_len, *sig_hold;
  const double *sig_data;
  int nt;
  const double *tout;
  const double *x0;       /* nx start for every run, or NULL: each run from
                             its own declared levels (vn_initial_state) */
  int nvar;               /* parameters varied */
  const int *pidx;        /* their flat indices (vn_param_index) */
  long nrun;
  const double *P;        /* nrun x nvar, column-major: row k = run k */
  vn_sim_opts sim;        /* tolerances, solver, record (nyrec, yrec) */
  int workers;            /* threads; < 1 means 1 */
  /* polled between runs and inside them; non-zero stops the ensemble */
  int (*stop) (void *);
  void *stop_data;
} vn_ens_job;

typedef struct vn_ens_out {
  double *Y;              /* nt x ny x nrun, column-major; NaN for a
                             failed run; ny = sim.nyrec, or every output */
  int *status;            /* nrun: VN_OK or the run's VN_E* status */
  char *msg;              /* nrun x msglen: the failed run's message */
  size_t msglen;
  long *steps;            /* nrun: integrator steps, may be NULL */
  long done;              /* runs finished, failed ones included */
} vn_ens_out;

/* Run the ensemble.  Returns VN_OK when every run was attempted (failed
 * runs are in out->status), VN_EINTR when stopped, or the status of a
 * failure that concerns all runs (the network does not build) with its
 * message in err. */
int vn_ensemble (const vn_ens_job *job, vn_ens_out *out, char *err,
                 size_t errlen);

#ifdef __cplusplus
}
#endif
#endif

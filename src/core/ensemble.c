#define _POSIX_C_SOURCE 200112L
/* Many runs of one network on several threads (vn_ens.h).
 *
 * Each worker builds its own network handle from the shared spec once,
 * then takes runs one at a time from a counter under a mutex: sets the
 * run's parameters (vn_param_set re-checks each value and the unit's
 * rules, as building a network with those values would), makes the
 * run's initial state and integrates it with vn_simulate into the run's
 * own slice of the output.  The KLU pattern depends only on topology,
 * so it is the same for every run.  Runs are independent: a run's result
 * is what a single vn_simulate of the network with those parameters
 * gives, whichever worker runs it.  The integrator is created per run
 * inside vn_simulate (about 10 us for a small network, bench/). */
#include <math.h>
#include <pthread.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include "vn_ens.h"
#include "vn_internal.h"

typedef struct shared {
  const vn_ens_job *job;
  vn_ens_out *out;
  pthread_mutex_t lock;
  long next;
  int halt;          /* stop handing out runs */
  int st;            /* status concerning all runs */
  char err[1024];
} shared;

/* The next run to do, or -1 when none is left or the ensemble stops. */
static long claim (shared *S)
{
  pthread_mutex_lock (&S->lock);
  long r = -1;
  if (!S->halt && S->next < S->job->nrun)
    r = S->next++;
  pthread_mutex_unlock (&S->lock);
  return r;
}

/* Stop the ensemble with status st (the first reason is kept). */
static void halt (shared *S, int st, const char *msg)
{
  pthread_mutex_lock (&S->lock);
  if (!S->halt)
    {
      S->halt = 1;
      S->st = st;
      snprintf (S->err, sizeof S->err, "%s", msg);
    }
  pthread_mutex_unlock (&S->lock);
}

static void finished (shared *S)
{
  pthread_mutex_lock (&S->lock);
  S->out->done++;
  pthread_mutex_unlock (&S->lock);
}

/* One run on this worker's network: parameters, start, integration. */
static int one_run (const vn_ens_job *job, vn_net *net, long r, double *x0,
                    double *Y, long *steps)
{
  int st = VN_OK;
  for (int j = 0; j < job->nvar && !st; j++)
    st = vn_param_set (net, job->pidx[j], job->P[r + job->nrun * j]);
  /* inputs a loop or signal moved in the last run start from nominal */
  memcpy (net->p, net->p0, (size_t) net->np * sizeof *net->p);
  if (!st)
    {
      if (job->x0)
        memcpy (x0, job->x0, (size_t) vn_nstates (net) * sizeof *x0);
      else
        st = vn_initial_state (net, x0);
    }
  vn_sim_stats stats;
  memset (&stats, 0, sizeof stats);
  if (!st)
    st = vn_simulate (net, x0, job->nt, job->tout, NULL, Y, &job->sim,
                      &stats);
  *steps = stats.steps;
  return st;
}

static void *worker (void *arg)
{
  shared *S = arg;
  const vn_ens_job *job = S->job;
  vn_ens_out *out = S->out;
  vn_net *net = NULL;
  char msg[1024] = "";
  int st = vn_net_new (job->spec, &net, msg, sizeof msg);
  if (!st)
    {
      st = vn_set_signals (net, job->nsig, job->sig_unit, job->sig_slot,
                           job->sig_off, job->sig_len, job->sig_hold,
                           job->sig_data);
      if (st)
        snprintf (msg, sizeof msg, "%s", vn_errmsg (net));
    }
  int nx = net ? vn_nstates (net) : 0;
  long ny = job->sim.nyrec > 0 ? job->sim.nyrec : net ? vn_noutputs (net) : 0;
  double *x0 = st ? NULL : malloc ((size_t) (nx + 1) * sizeof *x0);
  if (!st && !x0)
    {
      st = VN_ENOMEM;
      snprintf (msg, sizeof msg, "ensemble: out of memory for a worker");
    }
  if (st)
    {
      halt (S, st, msg);
      vn_net_free (net);
      return NULL;
    }
  long r;
  while ((r = claim (S)) >= 0)
    {
      double *Yr = out->Y + (long) job->nt * ny * r;
      long steps = 0;
      st = one_run (job, net, r, x0, Yr, &steps);
      out->status[r] = st;
      if (out->steps)
        out->steps[r] = steps;
      if (st)
        {
          for (long i = 0; i < (long) job->nt * ny; i++)
            Yr[i] = NAN;
          if (out->msg && out->msglen)
            snprintf (out->msg + out->msglen * r, out->msglen, "%s",
                      vn_errmsg (net));
          if (st == VN_EINTR)
            halt (S, VN_EINTR, vn_errmsg (net));
        }
      finished (S);
      if (job->stop && job->stop (job->stop_data))
        halt (S, VN_EINTR, "ensemble: interrupted");
    }
  free (x0);
  vn_net_free (net);
  return NULL;
}

int vn_ensemble (const vn_ens_job *job, vn_ens_out *out, char *err,
                 size_t errlen)
{
  if (err && errlen)
    err[0] = 0;
  if (!job || !out || !job->spec || job->nrun < 0 || job->nt < 1
      || job->nvar < 0 || (job->nvar > 0 && (!job->pidx || !job->P))
      || !out->Y || !out->status)
    {
      if (err && errlen)
        snprintf (err, errlen, "ensemble: incomplete job (internal error)");
      return VN_EARG;
    }
  shared S;
  memset (&S, 0, sizeof S);
  S.job = job;
  S.out = out;
  out->done = 0;
  for (long r = 0; r < job->nrun; r++)
    out->status[r] = VN_EINTR;       /* until the run is made */
  if (pthread_mutex_init (&S.lock, NULL) != 0)
    {
      if (err && errlen)
        snprintf (err, errlen, "ensemble: cannot make a mutex");
      return VN_ENOMEM;
    }
  long nw = job->workers < 1 ? 1 : job->workers;
  if (nw > job->nrun)
    nw = job->nrun > 0 ? job->nrun : 1;
  pthread_t *th = malloc ((size_t) nw * sizeof *th);
  if (!th)
    {
      pthread_mutex_destroy (&S.lock);
      if (err && errlen)
        snprintf (err, errlen, "ensemble: out of memory for %ld workers",
                  nw);
      return VN_ENOMEM;
    }
  /* worker 0 is this thread; the others are started first */
  long started = 1;
  for (long w = 1; w < nw; w++, started++)
    if (pthread_create (&th[w], NULL, worker, &S) != 0)
      break;
  worker (&S);
  for (long w = 1; w < started; w++)
    pthread_join (th[w], NULL);
  free (th);
  pthread_mutex_destroy (&S.lock);
  if (S.halt && S.st)
    {
      if (err && errlen)
        snprintf (err, errlen, "%s", S.err);
      return S.st;
    }
  return VN_OK;
}

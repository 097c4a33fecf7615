#define _POSIX_C_SOURCE 199309L
/* Integration with CVODES (BDF, Newton, analytic Jacobian): dense for
 * small networks, KLU sparse for large ones.  The run is cut into
 * segments at the signals' breakpoints and the integrator restarts at
 * each, so a step in an input is met exactly. */
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>
#include <cvodes/cvodes.h>
#include <nvector/nvector_serial.h>
#include <sunlinsol/sunlinsol_dense.h>
#include <sunlinsol/sunlinsol_klu.h>
#include <sunmatrix/sunmatrix_dense.h>
#include <sunmatrix/sunmatrix_sparse.h>
#include "vn_internal.h"

#define VN_DENSE_MAX 100  /* states: above this KLU wins (bench/) */

int vn_breakpoints (const vn_net *net, double t0, double t1, double **out,
                    int *n);

/* Which outputs are recorded: all, or a chosen few.  When every chosen
 * one belongs to a tank or boundary, only the node pass is evaluated. */
typedef struct record {
  int n;
  const int *idx;
  int nodes_only;
  int *unit;        /* owning unit of each recorded output */
} record;

/* Outputs are gathered for a block of output times and then written a
 * column at a time: X and Y are column-major with time down the rows, so
 * writing one time's values straight in touches a cache line per state
 * (perf, bench/: a sixth of a 20000-tank run, and the part growing
 * faster than N). */
typedef struct outblk {
  double *X, *Y;    /* the caller's arrays (either may be NULL) */
  int nt, nx, ny;   /* ny: columns of Y */
  int cap, k0, n;   /* capacity in times, first time held, times held */
  double *xb, *yb;  /* cap x nx and cap x ny, one time per row */
} outblk;

static void blk_flush (outblk *b)
{
  for (int i = 0; b->X && i < b->nx; i++)
    for (int j = 0; j < b->n; j++)
      b->X[b->k0 + j + (long) b->nt * i] = b->xb[(long) j * b->nx + i];
  for (int i = 0; b->Y && i < b->ny; i++)
    for (int j = 0; j < b->n; j++)
      b->Y[b->k0 + j + (long) b->nt * i] = b->yb[(long) j * b->ny + i];
  b->n = 0;
}

/* The row of output time k in the block (written out when full). */
static int blk_row (outblk *b, int k)
{
  if (b->n > 0 && (k != b->k0 + b->n || b->n == b->cap))
    blk_flush (b);
  if (b->n == 0)
    b->k0 = k;
  return b->n++;
}

typedef struct sim {
  vn_net *net;
  int interrupted;
  int rhs_fail;
  int nsw;
  int *sw;          /* unit index of each switch */
  double *scratch;  /* nx, for root evaluations */
  const vn_sens *sens;
  N_Vector *yS;
  double tcache;    /* (t, y) of the Jacobian triplets in net->jx/jp */
  double *ycache;
  int cached;
  record rec;
  long maxsteps;    /* steps allowed per output interval */
  outblk out;
  char cvmsg[256];  /* the integrator's own last complaint */
  void *mem;        /* the integrator, to ask it for a fresh Jacobian */
  double *jarea;    /* each tank's dV/dlevel where the Jacobian was taken */
  int jtaken;       /* jarea holds values */
  int forced;       /* a fresh Jacobian is asked for */
} sim;

/* CVODES reports trouble here instead of on stderr: the message joins
 * vesselnet's own diagnosis. */
static void cv_err (int code, const char *module, const char *function,
                    char *msg, void *ud)
{
  (void) code;
  (void) module;
  (void) function;
  sim *S = ud;
  snprintf (S->cvmsg, sizeof S->cvmsg, "%s", msg);
}

/* Root functions: one per switch, crossing upwards when it must act. */
static int cv_root (sunrealtype t, N_Vector y, sunrealtype *g, void *ud)
{
  sim *S = ud;
  vn_net *net = S->net;
  const double *x = N_VGetArrayPointer (y);
  vn_apply_signals (net, t);
  if (vn_eval (net, t, x, S->scratch, NULL, 0, 0, 0, 0))
    return 1;
  for (int i = 0; i < S->nsw; i++)
    g[i] = vn_switch_root (net, &net->u[S->sw[i]], x);
  return 0;
}

static int log_event (vn_net *net, double t, int unit, double value)
{
  if (net->nev == net->capev)
    {
      long cap = net->capev ? 2 * net->capev : 64;
      vn_event *e = realloc (net->ev, (size_t) cap * sizeof *e);
      if (!e)
        return VN_ENOMEM;
      net->ev = e;
      net->capev = cap;
    }
  net->ev[net->nev].t = t;
  net->ev[net->nev].unit = unit;
  net->ev[net->nev].value = value;
  net->nev++;
  return VN_OK;
}

long vn_nevents (const vn_net *net) { return net->nev; }

int vn_event_get (const vn_net *net, long i, double *t, int *unit,
                  double *value)
{
  if (i < 0 || i >= net->nev)
    return VN_EARG;
  *t = net->ev[i].t;
  *unit = net->ev[i].unit;
  *value = net->ev[i].value;
  return VN_OK;
}

/* Switches found at a root: flip those whose function crossed upwards. */
static int switch_at_root (sim *S, void *mem, double t, const double *x)
{
  int rf[64];
  int n = S->nsw < 64 ? S->nsw : 64;
  if (CVodeGetRootInfo (mem, rf) != CV_SUCCESS)
    return VN_ESOLVER;
  for (int i = 0; i < n; i++)
    if (rf[i] > 0)
      {
        vn_unit *u = &S->net->u[S->sw[i]];
        vn_switch_flip (S->net, u);
        vn_apply_signals (S->net, t);
        vn_eval (S->net, t, x, S->scratch, NULL, 0, 0, 0, 0);
        if (log_event (S->net, t, S->sw[i], u->q))
          return VN_ENOMEM;
      }
  return VN_OK;
}

/* A Jacobian kept from where a tank's level was far more sensitive to its
 * volume (a round vessel near its apex: a flat cone's level map there is
 * as steep as a prism of 2e-7 of its plan) overstates the stiffness by
 * that factor once the tank has refilled.  CVODES keeps a Jacobian up to
 * 51 steps and detects one that understates (Newton diverges), not one
 * that overstates: the Newton corrections then come out too small by the
 * same factor, pass the convergence test on their size, and the step
 * follows its predictor instead of the balances (a flat cone near empty
 * went 1.1e-5 m below empty and its neighbour's volume ended 0.72 m3
 * wrong, property suite seed 560).  So when a tank's dV/dlevel has grown
 * JAC_STALE-fold since the Jacobian was taken, the next step takes a
 * fresh one (and a fresh iteration matrix); the defaults come back once
 * it is taken.  A prism never asks; a cone filling from its apex to its
 * rim asks a handful of times. */
#define JAC_STALE 4.0
#define MSBJ_DEFAULT 51   /* SUNDIALS' own defaults (memory) */
#define MSBP_DEFAULT 20

static void jac_taken (sim *S)
{
  vn_net *net = S->net;
  for (int i = 0; i < net->nu; i++)
    S->jarea[i] = net->nd[i].istank ? net->nd[i].area : 0;
  S->jtaken = 1;
  if (S->forced)
    {
      CVodeSetJacEvalFrequency (S->mem, MSBJ_DEFAULT);
      CVodeSetLSetupFrequency (S->mem, MSBP_DEFAULT);
      S->forced = 0;
    }
}

static void jac_check (sim *S)
{
  vn_net *net = S->net;
  if (!S->jtaken || S->forced || !S->mem)
    return;
  for (int i = 0; i < net->nu; i++)
    if (net->nd[i].istank && net->nd[i].area > JAC_STALE * S->jarea[i])
      {
        CVodeSetJacEvalFrequency (S->mem, 1);
        CVodeSetLSetupFrequency (S->mem, 1);
        S->forced = 1;
        return;
      }
}

static int cv_rhs (sunrealtype t, N_Vector y, N_Vector ydot, void *ud)
{
  sim *S = ud;
  if (S->net->stop && S->net->stop (S->net->stop_data))
    {
      S->interrupted = 1;
      return -1;
    }
  int st = vn_rhs (S->net, t, N_VGetArrayPointer (y),
                   N_VGetArrayPointer (ydot));
  if (st)
    {
      S->rhs_fail = st;
      return 1;   /* recoverable: the step is retried smaller */
    }
  jac_check (S);
  return 0;
}

static int cv_jac_dense (sunrealtype t, N_Vector y, N_Vector fy,
                         SUNMatrix J, void *ud, N_Vector t1, N_Vector t2,
                         N_Vector t3)
{
  (void) fy; (void) t1; (void) t2; (void) t3;
  sim *S = ud;
  if (vn_jac_dense (S->net, t, N_VGetArrayPointer (y),
                    SUNDenseMatrix_Data (J)))
    return 1;
  jac_taken (S);
  return 0;
}

static int cv_jac_klu (sunrealtype t, N_Vector y, N_Vector fy, SUNMatrix J,
                       void *ud, N_Vector t1, N_Vector t2, N_Vector t3)
{
  (void) fy; (void) t1; (void) t2; (void) t3;
  sim *S = ud;
  vn_net *net = S->net;
  long nnz = SUNSparseMatrix_NNZ (J);
  sunindextype *cp = SUNSparseMatrix_IndexPointers (J);
  sunindextype *ri = SUNSparseMatrix_IndexValues (J);
  double *v = SUNSparseMatrix_Data (J);
  /* sunindextype is int64_t here; long is 64 bits on this platform */
  if (vn_jac_csc (net, t, N_VGetArrayPointer (y), &nnz, (long *) cp,
                  (long *) ri, v))
    return 1;
  jac_taken (S);
  return 0;
}

/* Forward sensitivity right-hand side: dS/dt = J S + df/dp, from the
 * same analytic triplets as the Jacobian, evaluated once per (t, y). */
static int cv_sens (int ns, sunrealtype t, N_Vector y, N_Vector ydot,
                    int is, N_Vector yS, N_Vector ySdot, void *ud,
                    N_Vector tmp1, N_Vector tmp2)
{
  (void) ns; (void) ydot; (void) tmp1; (void) tmp2;
  sim *S = ud;
  vn_net *net = S->net;
  const double *x = N_VGetArrayPointer (y);
  if (!S->cached || t != S->tcache
      || memcmp (x, S->ycache, (size_t) net->nx * sizeof *x) != 0)
    {
      vn_apply_signals (net, t);
      if (vn_eval (net, t, x, S->scratch, NULL, 1, 1, 0, 0))
        return 1;
      memcpy (S->ycache, x, (size_t) net->nx * sizeof *x);
      S->tcache = t;
      S->cached = 1;
    }
  const double *s = N_VGetArrayPointer (yS);
  double *sd = N_VGetArrayPointer (ySdot);
  memset (sd, 0, (size_t) net->nx * sizeof *sd);
  for (long k = 0; k < net->jx.n; k++)
    sd[net->jx.r[k]] += net->jx.v[k] * s[net->jx.c[k]];
  int pc = S->sens->pidx[is];
  for (long k = 0; k < net->jp.n; k++)
    if (net->jp.c[k] == pc)
      sd[net->jp.r[k]] += net->jp.v[k];
  return 0;
}

/* Output sensitivities at one output time: dY/dp = C S + D. */
static void store_sens (sim *S, int k, int nt, double t, const double *x)
{
  vn_net *net = S->net;
  const vn_sens *q = S->sens;
  vn_apply_signals (net, t);
  vn_eval (net, t, x, S->scratch, NULL, 0, 0, 1, 1);
  S->cached = 0;
  for (int i = 0; i < q->np; i++)
    {
      const double *s = N_VGetArrayPointer (S->yS[i]);
      for (int j = 0; j < q->ny; j++)
        q->YS[k + (long) nt * (j + (long) q->ny * i)] = 0;
      for (long m = 0; m < net->yx.n; m++)
        {
          int row = q->yrow[net->yx.r[m]];
          if (row >= 0)
            q->YS[k + (long) nt * (row + (long) q->ny * i)]
              += net->yx.v[m] * s[net->yx.c[m]];
        }
      for (long m = 0; m < net->yp.n; m++)
        {
          int row = q->yrow[net->yp.r[m]];
          if (row >= 0 && net->yp.c[m] == q->pidx[i])
            q->YS[k + (long) nt * (row + (long) q->ny * i)]
              += net->yp.v[m];
        }
    }
}

/* Add the integrator's counters since its last (re)start to the run's
 * totals: CVodeReInit sets them back to zero. */
static void add_counts (void *mem, vn_sim_stats *st)
{
  long v;
  if (CVodeGetNumSteps (mem, &v) == CV_SUCCESS) st->steps += v;
  if (CVodeGetNumRhsEvals (mem, &v) == CV_SUCCESS) st->rhs += v;
  if (CVodeGetNumJacEvals (mem, &v) == CV_SUCCESS) st->jac += v;
  if (CVodeGetNumLinSolvSetups (mem, &v) == CV_SUCCESS) st->setups += v;
  if (CVodeGetNumErrTestFails (mem, &v) == CV_SUCCESS) st->errfails += v;
  if (CVodeGetNumNonlinSolvConvFails (mem, &v) == CV_SUCCESS)
    st->convfails += v;
}

/* Restart after a breakpoint or a switch; sensitivities carry on, and
 * the counts so far go to the totals. */
static int restart (sim *S, void *mem, double t, N_Vector y,
                    vn_sim_stats *stats)
{
  add_counts (mem, stats);
  int flag = CVodeReInit (mem, t, y);
  if (flag == CV_SUCCESS && S->yS)
    {
      double tr;
      flag = CVodeGetSens (mem, &tr, S->yS);
      if (flag == CV_SUCCESS)
        flag = CVodeSensReInit (mem, CV_STAGGERED, S->yS);
    }
  S->cached = 0;
  return flag;
}

/* Absolute tolerance of each state, scaled to what it holds: a volume
 * by its tank's reference plan area times LEVEL_TOL, so every tank is
 * integrated to the same level accuracy (a sight tube is not swamped, a
 * reservoir not over-resolved); a tank's heat (V T) by the same volume
 * times 1 K; its species (V c) by that volume times the largest
 * concentration declared in the network (1 when none); any other state
 * (valve stem, heater duty, controller) by OTHER_TOL. */
#define LEVEL_TOL 1e-8   /* m */
#define OTHER_TOL 1e-8
static void state_abstol (const vn_net *net, double *atol)
{
  double cref = 0;
  for (int i = 0; i < net->nu; i++)
    {
      const vn_unit *u = &net->u[i];
      for (int k = 0; k < u->k->npar; k++)
        if (strcmp (u->k->par[k].unit, "conc") == 0)
          cref = fmax (cref, fabs (net->p[u->poff + k]));
    }
  if (!(cref > 0))
    cref = 1;
  for (int i = 0; i < net->nx; i++)
    {
      const vn_unit *u = &net->u[vn_state_unit (net, i)];
      if (u->k != &vn_kind_tank)
        {
          atol[i] = OTHER_TOL;
          continue;
        }
      int j = i - u->xoff;
      double av = vn_tank_area_ref (net, u) * LEVEL_TOL;
      atol[i] = j == 0 ? av : (j == 1 && net->thermal) ? av * 1.0 : av * cref;
    }
}

static double now (void)
{
  struct timespec ts;
  clock_gettime (CLOCK_MONOTONIC, &ts);
  return ts.tv_sec + 1e-9 * ts.tv_nsec;
}

/* What to advise when the integrator ran out of steps between t0 and
 * target (stopped at t): more steps help while the steps keep their
 * length (the last one at least a tenth of the mean since t0); when the
 * step has collapsed far below that mean, the cause is in the network. */
static void too_much_work_advice (void *mem, double t0, double t,
                                  double target, long maxsteps, char *buf,
                                  size_t len)
{
  double h = 0;
  CVodeGetLastStep (mem, &h);
  double mean = (t - t0) / (double) maxsteps;
  if (h > 0 && h >= 0.1 * mean)
    snprintf (buf, len, "; the steps were %.3g s long, %.3g s remain to "
              "t = %.6g s: raise maxsteps (now %ld, at most %.3g needed at "
              "that step) or output more often (\"dt\")", h, target - t,
              target, maxsteps, ceil ((target - t) / h));
  else
    snprintf (buf, len, "; the step has fallen to %.3g s (mean %.3g s), so "
              "more steps would not help: the state named is changing "
              "abruptly (a valve or pump switching back and forth, a "
              "controller saturating, data far from plant values); check "
              "its data, or give the network a larger \"smooth\" band", h,
              mean);
}

/* CVodeGetReturnFlagName hands back a string it malloc'ed (SUNDIALS 6.4,
 * cvodes_io.c): copy it into the caller's buffer and free it, or every
 * failure inside a fit loop leaks. */
static const char *flag_name (int flag, char *buf, size_t len)
{
  char *s = CVodeGetReturnFlagName (flag);
  snprintf (buf, len, "%s", s ? s : "unknown flag");
  free (s);
  return buf;
}
#define FLAG_NAME(flag) flag_name ((flag), (char[48]) {""}, 48)

/* the state whose weighted local error is largest: where trouble is */
static void diagnose (vn_net *net, void *mem, N_Vector y, int flag,
                      double t0, double t, double target, long maxsteps)
{
  N_Vector ele = N_VClone (y), w = N_VClone (y);
  int worst = -1;
  if (ele && w && CVodeGetEstLocalErrors (mem, ele) == CV_SUCCESS
      && CVodeGetErrWeights (mem, w) == CV_SUCCESS)
    {
      double *e = N_VGetArrayPointer (ele), *wt = N_VGetArrayPointer (w);
      double big = -1;
      for (int i = 0; i < net->nx; i++)
        if (fabs (e[i] * wt[i]) > big)
          {
            big = fabs (e[i] * wt[i]);
            worst = i;
          }
    }
  char where[256] = "";
  if (worst >= 0)
    {
      int u = vn_state_unit (net, worst);
      snprintf (where, sizeof where, "; the largest error is in %s.%s (%s "
                "\"%s\"), value %g", net->u[u].name,
                vn_state_var (net, worst), net->u[u].k->name,
                net->u[u].name, N_VGetArrayPointer (y)[worst]);
    }
  char advice[400] = "";
  if (flag == CV_TOO_MUCH_WORK)
    too_much_work_advice (mem, t0, t, target, maxsteps, advice,
                          sizeof advice);
  vn_fail (net, VN_ESOLVER, "the integrator stopped at t = %.6g s (%s)%s%s",
           t, FLAG_NAME (flag), where, advice);
  if (ele)
    N_VDestroy (ele);
  if (w)
    N_VDestroy (w);
}

static void store (vn_net *net, const record *R, outblk *B, int k,
                   double t, const double *x)
{
  int row = blk_row (B, k);
  if (B->X)                                  /* X NULL: states not kept */
    memcpy (B->xb + (long) row * B->nx, x, (size_t) B->nx * sizeof *x);
  if (!B->Y)
    return;
  double *yr = B->yb + (long) row * B->ny;
  if (!R->n)
    {
      vn_outputs (net, t, x, net->y);
      memcpy (yr, net->y, (size_t) net->ny * sizeof *yr);
      return;
    }
  if (R->nodes_only)
    {
      net->want_d = 0;
      for (int j = 0; j < R->n; j++)
        {
          vn_unit *u = &net->u[R->unit[j]];
          u->k->node (net, u, x, &net->nd[R->unit[j]]);
          u->k->outputs (net, u, &net->nd[R->unit[j]], x, net->y + u->yoff,
                         NULL);
        }
    }
  else
    vn_outputs (net, t, x, net->y);
  for (int j = 0; j < R->n; j++)
    yr[j] = net->y[R->idx[j]];
}

/* One call of CVode toward `target`: a failure is diagnosed, a switching
 * root is handled (logged, integrator restarted) and *rooted set. */
static int advance (sim *S, void *mem, double target, N_Vector y,
                    double *tr, int *rooted, vn_sim_stats *stats)
{
  vn_net *net = S->net;
  double t0 = *tr;
  int flag = CVode (mem, target, y, tr, CV_NORMAL);
  *rooted = 0;
  if (flag < 0)
    {
      stats->t_reached = *tr;
      if (S->interrupted)
        return vn_fail (net, VN_EINTR, "simulate: interrupted at t = %.6g s",
                        *tr);
      diagnose (net, mem, y, flag, t0, *tr, target, S->maxsteps);
      if (S->cvmsg[0] && !S->rhs_fail)
        {
          size_t n = strlen (net->msg);
          snprintf (net->msg + n, sizeof net->msg - n, " [CVODES: %s]",
                    S->cvmsg);
        }
      return VN_ESOLVER;
    }
  if (flag != CV_ROOT_RETURN)
    return VN_OK;
  *rooted = 1;
  int st = switch_at_root (S, mem, *tr, N_VGetArrayPointer (y));
  if (st)
    return st;
  if ((flag = restart (S, mem, *tr, y, stats)) != CV_SUCCESS)
    return vn_fail (net, VN_ESOLVER, "simulate: restart after a switch at "
                    "t = %g failed (%s)", *tr, FLAG_NAME (flag));
  stats->restarts++;
  return VN_OK;
}

/* Store output k (and its sensitivities: read from CVODES unless they
 * were just restarted from the current values). */
static int output_at (sim *S, void *mem, int k, int nt, double t, N_Vector y,
                      double *X, double *Y, int read_sens)
{
  (void) X;
  (void) Y;
  (void) nt;
  store (S->net, &S->rec, &S->out, k, t, N_VGetArrayPointer (y));
  if (!S->yS)
    return VN_OK;
  double ts;
  if (read_sens && CVodeGetSens (mem, &ts, S->yS) != CV_SUCCESS)
    return vn_fail (S->net, VN_ESOLVER, "simulate: reading the "
                    "sensitivities at t = %g failed", t);
  store_sens (S, k, nt, t, N_VGetArrayPointer (y));
  return VN_OK;
}

int vn_simulate (vn_net *net, const double *x0, int nt, const double *tout,
                 double *X, double *Y, const vn_sim_opts *o,
                 vn_sim_stats *stats)
{
  return vn_simulate_sens (net, x0, nt, tout, X, Y, o, stats, NULL);
}

int vn_simulate_sens (vn_net *net, const double *x0, int nt,
                      const double *tout, double *X, double *Y,
                      const vn_sim_opts *o, vn_sim_stats *stats,
                      vn_sens *sens)
{
  vn_sim_opts opt = {0};
  if (o)
    opt = *o;
  double rtol = opt.rtol > 0 ? opt.rtol : 1e-6;
  double atol = opt.atol > 0 ? opt.atol : 0;   /* 0: per state */
  long maxsteps = opt.maxsteps > 0 ? opt.maxsteps : 100000;
  int solver = opt.solver ? opt.solver
               : (net->nx <= VN_DENSE_MAX ? VN_SOLVER_DENSE : VN_SOLVER_KLU);
  memset (stats, 0, sizeof *stats);
  stats->solver = solver;
  if (nt < 1)
    return vn_fail (net, VN_EARG, "simulate: no output times given");
  for (int k = 0; k < nt; k++)
    if (!isfinite (tout[k]) || (k > 0 && tout[k] <= tout[k - 1]))
      return vn_fail (net, VN_EARG, "simulate: output times must be finite "
                      "and increasing; time %d is %g after %g", k + 1,
                      tout[k], k > 0 ? tout[k - 1] : NAN);
  for (int i = 0; i < net->nx; i++)
    if (!isfinite (x0[i]))
      return vn_fail (net, VN_EARG, "simulate: initial state %s.%s is not "
                      "finite (%g)", net->u[vn_state_unit (net, i)].name,
                      vn_state_var (net, i), x0[i]);
  net->stop = opt.stop;
  net->stop_data = opt.stop_data;

  /* Everything that needs freeing starts NULL, and every failure from
   * here on leaves through `done', which frees it all. */
  double *bp = NULL;
  int nbp = 0;
  sim S;
  memset (&S, 0, sizeof S);
  S.net = net;
  S.sens = sens;
  S.maxsteps = maxsteps;
  S.rec.nodes_only = 1;
  if (sens)
    sens->yrow = NULL;
  SUNContext ctx = NULL;
  N_Vector y = NULL, atolv = NULL;
  SUNMatrix J = NULL;
  SUNLinearSolver LS = NULL;
  void *mem = NULL;
  double t0w = now ();
  int flag;
  int st = vn_breakpoints (net, tout[0], tout[nt - 1], &bp, &nbp);
  if (st)
    goto done;

  if (opt.nyrec > 0)
    {
      S.rec.unit = malloc ((size_t) opt.nyrec * sizeof *S.rec.unit);
      if (!S.rec.unit)
        {
          st = vn_fail (net, VN_ENOMEM, "simulate: out of memory");
          goto done;
        }
      for (int j = 0; j < opt.nyrec; j++)
        {
          int yi = opt.yrec[j], u = -1;
          if (yi < 0 || yi >= net->ny)
            {
              st = vn_fail (net, VN_EARG, "simulate: recorded output %d "
                            "has index %d outside the network", j + 1, yi);
              goto done;
            }
          u = vn_output_unit (net, yi);
          S.rec.unit[j] = u;
          S.rec.nodes_only &= net->u[u].k->role == VN_ROLE_NODE;
        }
      S.rec.n = opt.nyrec;
      S.rec.idx = opt.yrec;
    }
  if (sens)
    {
      for (int i = 0; i < sens->np; i++)
        if (sens->pidx[i] < 0 || sens->pidx[i] >= net->np)
          {
            st = vn_fail (net, VN_EARG, "simulate: sensitivity parameter "
                          "%d has index %d outside the network", i + 1,
                          sens->pidx[i]);
            goto done;
          }
      sens->yrow = malloc ((size_t) (net->ny + 1) * sizeof *sens->yrow);
      S.ycache = malloc ((size_t) net->nx * sizeof *S.ycache);
      if (!sens->yrow || !S.ycache)
        {
          st = vn_fail (net, VN_ENOMEM, "simulate: out of memory");
          goto done;
        }
      for (int j = 0; j < net->ny; j++)
        sens->yrow[j] = -1;
      for (int j = 0; j < sens->ny; j++)
        {
          if (sens->yout[j] < 0 || sens->yout[j] >= net->ny)
            {
              st = vn_fail (net, VN_EARG, "simulate: sensitivity output "
                            "%d has index %d outside the network", j + 1,
                            sens->yout[j]);
              goto done;
            }
          sens->yrow[sens->yout[j]] = j;
        }
    }
  net->nev = 0;
  for (int i = 0; i < net->nu; i++)
    S.nsw += net->u[i].k == &vn_kind_switch;
  if (S.nsw > 64)
    {
      st = vn_fail (net, VN_EARG, "simulate: at most 64 switches are "
                    "supported, the network has %d", S.nsw);
      goto done;
    }
  S.sw = malloc ((size_t) (S.nsw + 1) * sizeof *S.sw);
  S.scratch = malloc ((size_t) net->nx * sizeof *S.scratch);
  S.jarea = malloc ((size_t) (net->nu + 1) * sizeof *S.jarea);
  /* an output block of about 4 MB, 1 to 64 times */
  S.out.X = X;
  S.out.Y = Y;
  S.out.nt = nt;
  S.out.nx = net->nx;
  S.out.ny = S.rec.n ? S.rec.n : net->ny;
  long per = (long) (S.out.nx + S.out.ny + 1) * (long) sizeof (double);
  S.out.cap = (int) (4194304 / per);
  S.out.cap = S.out.cap < 1 ? 1 : S.out.cap > 64 ? 64 : S.out.cap;
  S.out.xb = malloc ((size_t) S.out.cap * (S.out.nx + 1) * sizeof (double));
  S.out.yb = malloc ((size_t) S.out.cap * (S.out.ny + 1) * sizeof (double));
  if (!S.sw || !S.scratch || !S.jarea || !S.out.xb || !S.out.yb)
    {
      st = vn_fail (net, VN_ENOMEM, "simulate: out of memory");
      goto done;
    }
  for (int i = 0, j = 0; i < net->nu; i++)
    if (net->u[i].k == &vn_kind_switch)
      S.sw[j++] = i;

  net->seg_end = nbp > 0 ? bp[0] : tout[nt - 1];
  if (SUNContext_Create (NULL, &ctx) != 0
      || !(y = N_VNew_Serial (net->nx, ctx)))
    {
      st = vn_fail (net, VN_ENOMEM, "simulate: cannot allocate the solver");
      goto done;
    }
  memcpy (N_VGetArrayPointer (y), x0, (size_t) net->nx * sizeof (double));
  if (!(atol > 0))
    {
      if (!(atolv = N_VClone (y)))
        {
          st = vn_fail (net, VN_ENOMEM, "simulate: cannot allocate the "
                        "solver");
          goto done;
        }
      state_abstol (net, N_VGetArrayPointer (atolv));
    }
  /* No solver constraints on the volumes: the liquid gate (link.c) already
   * stops outflow from an empty tank, and constraint checks cost about
   * 15 % of a large run (bench/). */
  /* switches start at offvalue unless the measurement is beyond "on" */
  if (S.nsw)
    {
      vn_apply_signals (net, tout[0]);
      vn_eval (net, tout[0], x0, S.scratch, NULL, 0, 0, 0, 0);
      for (int i = 0; i < S.nsw; i++)
        vn_switch_start (net, &net->u[S.sw[i]], x0);
    }
  store (net, &S.rec, &S.out, 0, tout[0], x0);
  mem = CVodeCreate (CV_BDF, ctx);
  if (!mem)
    {
      st = vn_fail (net, VN_ENOMEM, "simulate: cannot create CVODES");
      goto done;
    }
  S.mem = mem;
  if ((flag = CVodeInit (mem, cv_rhs, tout[0], y)) != CV_SUCCESS
      || (flag = (atol > 0 ? CVodeSStolerances (mem, rtol, atol)
                           : CVodeSVtolerances (mem, rtol, atolv)))
         != CV_SUCCESS
      || (flag = CVodeSetUserData (mem, &S)) != CV_SUCCESS
      || (flag = CVodeSetErrHandlerFn (mem, cv_err, &S)) != CV_SUCCESS
      || (flag = CVodeSetMaxNumSteps (mem, maxsteps)) != CV_SUCCESS
      || (opt.hmax > 0 && (flag = CVodeSetMaxStep (mem, opt.hmax)) != CV_SUCCESS)
      || (S.nsw && (flag = CVodeRootInit (mem, S.nsw, cv_root)) != CV_SUCCESS))
    {
      st = vn_fail (net, VN_ESOLVER, "simulate: setting up CVODES failed "
                    "(%s)", FLAG_NAME (flag));
      goto done;
    }
  if (solver == VN_SOLVER_DENSE)
    {
      J = SUNDenseMatrix (net->nx, net->nx, ctx);
      LS = J ? SUNLinSol_Dense (y, J, ctx) : NULL;
    }
  else
    {
      long nnz = 0;
      if ((st = vn_jac_csc (net, tout[0], x0, &nnz, NULL, NULL, NULL)))
        goto done;
      J = SUNSparseMatrix (net->nx, net->nx, nnz, CSC_MAT, ctx);
      LS = J ? SUNLinSol_KLU (y, J, ctx) : NULL;
    }
  if (!J || !LS)
    {
      st = vn_fail (net, VN_ENOMEM, "simulate: cannot allocate the linear "
                    "solver");
      goto done;
    }
  if ((flag = CVodeSetLinearSolver (mem, LS, J)) != CV_SUCCESS
      || (flag = CVodeSetJacFn (mem, solver == VN_SOLVER_DENSE ? cv_jac_dense
                                                           : cv_jac_klu))
         != CV_SUCCESS)
    {
      st = vn_fail (net, VN_ESOLVER, "simulate: setting the linear solver "
                    "failed (%s)", FLAG_NAME (flag));
      goto done;
    }

  if (sens && sens->np > 0)
    {
      S.yS = N_VCloneVectorArray (sens->np, y);
      if (!S.yS)
        {
          st = vn_fail (net, VN_ENOMEM, "simulate: cannot allocate the "
                        "sensitivities");
          goto done;
        }
      for (int i = 0; i < sens->np; i++)
        memcpy (N_VGetArrayPointer (S.yS[i]), sens->x0 + (long) net->nx * i,
                (size_t) net->nx * sizeof (double));
      if ((flag = CVodeSensInit1 (mem, sens->np, CV_STAGGERED, cv_sens, S.yS))
          != CV_SUCCESS
          || (flag = CVodeSensEEtolerances (mem)) != CV_SUCCESS
          || (flag = CVodeSetSensErrCon (mem, SUNTRUE)) != CV_SUCCESS)
        {
          st = vn_fail (net, VN_ESOLVER, "simulate: setting up the "
                        "sensitivities failed (%s)",
                        FLAG_NAME (flag));
          goto done;
        }
      store_sens (&S, 0, nt, tout[0], x0);
    }
  t0w = now ();
  double t = tout[0];
  int k = 1, b = 0, rooted;
  while (k < nt)
    {
      double seg = b < nbp ? bp[b] : tout[nt - 1];
      net->seg_end = seg;
      CVodeSetStopTime (mem, seg);
      while (k < nt && tout[k] <= seg)
        {
          if ((st = advance (&S, mem, tout[k], y, &t, &rooted, stats)))
            goto stats;
          /* a root short of the output time: go on; on it: store it */
          if (rooted && tout[k] > t)
            continue;
          /* outputs at a breakpoint take the input after it */
          if (!rooted && tout[k] >= seg && b < nbp)
            net->seg_end = INFINITY;
          st = output_at (&S, mem, k, nt, tout[k], y, X, Y, !rooted);
          net->seg_end = seg;
          if (st)
            goto stats;
          k++;
        }
      if (b < nbp)
        {
          while (t < seg)
            if ((st = advance (&S, mem, seg, y, &t, &rooted, stats)))
              goto stats;
          /* restart past the breakpoint: the inputs may jump here */
          b++;
          net->seg_end = b < nbp ? bp[b] : tout[nt - 1];
          if ((flag = restart (&S, mem, seg, y, stats)) != CV_SUCCESS)
            {
              st = vn_fail (net, VN_ESOLVER, "simulate: restart at t = %g "
                            "failed (%s)", seg, FLAG_NAME (flag));
              goto stats;
            }
          stats->restarts++;
        }
    }
  stats->t_reached = t;
stats:
  stats->wall = now () - t0w;
  add_counts (mem, stats);
done:
  blk_flush (&S.out);
  net->seg_end = INFINITY;
  net->stop = NULL;
  if (mem)
    CVodeFree (&mem);
  if (LS)
    SUNLinSolFree (LS);
  if (J)
    SUNMatDestroy (J);
  if (y)
    N_VDestroy (y);
  if (atolv)
    N_VDestroy (atolv);
  if (ctx)
    SUNContext_Free (&ctx);
  free (bp);
  if (S.yS)
    N_VDestroyVectorArray (S.yS, sens->np);
  if (sens)
    {
      free (sens->yrow);
      sens->yrow = NULL;
    }
  free (S.ycache);
  free (S.rec.unit);
  free (S.sw);
  free (S.scratch);
  free (S.jarea);
  free (S.out.xb);
  free (S.out.yb);
  return st;
}

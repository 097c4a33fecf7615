/* chain_floor.c - hand-written baseline ("floor") for the vesselnet speed
 * benchmark: an N-tank orifice chain integrated by CVODES BDF with an
 * analytic Jacobian, dense or KLU sparse.  The equations are the ones in
 * bench/README.md; bench/chain_rhs.m holds the same model for ode15s.
 *
 * Usage:  chain_floor N [dense|klu|check] [FILE]
 * Prints one line on stdout:
 *   N=<n> solver=<s> wall=<s> steps=<> rhs=<> jac=<> final_h1=<> final_hN=<> setup=<s>
 * FILE (optional) receives the 721 output rows "t h_1 ... h_N".
 * Exit status 0 on success, 1 on bad usage, 2 on solver failure or a failed
 * Jacobian check. */

#define _POSIX_C_SOURCE 199309L

#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

#include <cvodes/cvodes.h>
#include <nvector/nvector_serial.h>
#include <sundials/sundials_context.h>
#include <sundials/sundials_types.h>
#include <sunlinsol/sunlinsol_dense.h>
#include <sunlinsol/sunlinsol_klu.h>
#include <sunmatrix/sunmatrix_dense.h>
#include <sunmatrix/sunmatrix_sparse.h>

/* ------------------------------------------------------------------ */
/* Case data (fixed: the comparison is only fair on identical equations) */

#define AREA   1.0     /* m2, every tank */
#define LEVEL0 1.0     /* m, initial level of every tank */
#define FEED   0.01    /* m3/s into tank 1 */
#define COEFF  0.01    /* m^2.5/s, every orifice */
#define BAND   1.0e-3  /* m, smoothing band of ssqrt and gate */
#define T_END  3600.0  /* s */
#define DT_OUT 5.0     /* s */
#define RTOL   1.0e-6
#define ATOL   1.0e-8  /* m3 */
#define DENSE_MAX 100  /* largest N solved dense by default */

typedef struct {
  sunindextype n;
  double *a;  /* dq_k/dh_src for orifice k = 0..n-1 (k = n-1 is the outlet) */
  double *b;  /* dq_k/dh_dst for orifice k = 0..n-2 */
} chain;

/* ------------------------------------------------------------------ */
/* Smoothed laws */

/* Signed square root, cubic inside |x| < BAND, C1 at the band edge. */
static double ssqrt (double x, double *dx)
{
  if (fabs (x) >= BAND) {
    double r = sqrt (fabs (x));
    *dx = 0.5 / r;
    return x > 0.0 ? r : -r;
  } else {
    double sd = sqrt (BAND), u = x / BAND;
    *dx = sd * (1.25 - 0.75 * u * u) / BAND;
    return sd * (1.25 * u - 0.25 * u * u * u);
  }
}

/* Smoothstep gate on the upstream level above its nozzle. */
static double gate (double s, double *ds)
{
  double r;
  if (s <= 0.0) {
    *ds = 0.0;
    return 0.0;
  }
  if (s >= BAND) {
    *ds = 0.0;
    return 1.0;
  }
  r = s / BAND;
  *ds = (6.0 * r - 6.0 * r * r) / BAND;
  return r * r * (3.0 - 2.0 * r);
}

/* Orifice flow from a source at level hs to a destination at level hd
 * (free discharge: hd = 0 and dst_is_tank = 0).  Returns q and its
 * derivatives with respect to the two levels. */
static double orifice (double hs, double hd, int dst_is_tank,
                       double *dq_hs, double *dq_hd)
{
  double dH = hs - hd, dsq, dg, sq, g, q;
  sq = ssqrt (dH, &dsq);
  if (dH >= 0.0 || !dst_is_tank) {
    /* free discharge gates on the source even for dH < 0, where g = 0 */
    g = gate (hs, &dg);
    q = COEFF * sq * g;
    *dq_hs = COEFF * (dsq * g + sq * dg);
    *dq_hd = -COEFF * dsq * g;
  } else {
    g = gate (hd, &dg);
    q = COEFF * sq * g;
    *dq_hs = COEFF * dsq * g;
    *dq_hd = COEFF * (-dsq * g + sq * dg);
  }
  return q;
}

/* ------------------------------------------------------------------ */
/* Right-hand side and Jacobian */

/* dV_i/dt = q_{i-1} - q_i (+ FEED for tank 1); also stores the flow
 * derivatives in c->a, c->b for the Jacobian routines. */
static void chain_eval (chain *c, const double *V, double *f)
{
  sunindextype i, n = c->n;
  double qprev = FEED, q, dhd;
  for (i = 0; i < n; i++) {
    double hs = V[i] / AREA;
    if (i < n - 1)
      q = orifice (hs, V[i + 1] / AREA, 1, &c->a[i], &c->b[i]);
    else
      q = orifice (hs, 0.0, 0, &c->a[i], &dhd);
    if (f)
      f[i] = qprev - q;
    qprev = q;
  }
}

static int rhs (realtype t, N_Vector y, N_Vector ydot, void *user)
{
  (void) t;
  chain_eval ((chain *) user, N_VGetArrayPointer (y),
              N_VGetArrayPointer (ydot));
  return 0;
}

/* Entries of the tridiagonal Jacobian d(dV/dt)/dV, column j. */
static double jac_diag (const chain *c, sunindextype j)
{
  return ((j > 0 ? c->b[j - 1] : 0.0) - c->a[j]) / AREA;
}
static double jac_sub (const chain *c, sunindextype j)   /* row j+1 */
{
  return c->a[j] / AREA;
}
static double jac_super (const chain *c, sunindextype j) /* row j-1 */
{
  return -c->b[j - 1] / AREA;
}

static void fill_dense (chain *c, const double *V, SUNMatrix J)
{
  sunindextype j, n = c->n;
  chain_eval (c, V, NULL);
  SUNMatZero (J);
  for (j = 0; j < n; j++) {
    double *col = SUNDenseMatrix_Column (J, j);
    if (j > 0)
      col[j - 1] = jac_super (c, j);
    col[j] = jac_diag (c, j);
    if (j < n - 1)
      col[j + 1] = jac_sub (c, j);
  }
}

static void fill_sparse (chain *c, const double *V, SUNMatrix J)
{
  sunindextype j, k = 0, n = c->n;
  sunindextype *cp = SUNSparseMatrix_IndexPointers (J);
  sunindextype *ri = SUNSparseMatrix_IndexValues (J);
  double *v = SUNSparseMatrix_Data (J);
  chain_eval (c, V, NULL);
  for (j = 0; j < n; j++) {
    cp[j] = k;
    if (j > 0) {
      ri[k] = j - 1;
      v[k++] = jac_super (c, j);
    }
    ri[k] = j;
    v[k++] = jac_diag (c, j);
    if (j < n - 1) {
      ri[k] = j + 1;
      v[k++] = jac_sub (c, j);
    }
  }
  cp[n] = k;
}

static int jac (realtype t, N_Vector y, N_Vector fy, SUNMatrix J,
                void *user, N_Vector t1, N_Vector t2, N_Vector t3)
{
  (void) t; (void) fy; (void) t1; (void) t2; (void) t3;
  if (SUNMatGetID (J) == SUNMATRIX_SPARSE)
    fill_sparse ((chain *) user, N_VGetArrayPointer (y), J);
  else
    fill_dense ((chain *) user, N_VGetArrayPointer (y), J);
  return 0;
}

/* ------------------------------------------------------------------ */
/* Helpers */

static double now (void)
{
  struct timespec ts;
  clock_gettime (CLOCK_MONOTONIC, &ts);
  return (double) ts.tv_sec + 1e-9 * (double) ts.tv_nsec;
}

/* Report a failed SUNDIALS call; returns nonzero on failure. */
static int failed (int flag, const char *call)
{
  if (flag < 0) {
    char *name = CVodeGetReturnFlagName (flag);
    fprintf (stderr, "chain_floor: %s failed with %d (%s)\n", call, flag,
             name ? name : "?");
    free (name);
    return 1;
  }
  return 0;
}

static int chain_alloc (chain *c, sunindextype n)
{
  c->n = n;
  c->a = calloc ((size_t) n, sizeof (double));
  c->b = calloc ((size_t) n, sizeof (double));
  return c->a && c->b;
}

static void chain_free (chain *c)
{
  free (c->a);
  free (c->b);
}

/* ------------------------------------------------------------------ */
/* Jacobian check against central finite differences */

/* Level pattern k at tank i: plain start, general levels, levels near
 * zero (gate band), small differences (ssqrt band) and reversed flow. */
static double check_level (int k, sunindextype i)
{
  double x = (double) i;
  switch (k) {
  case 0: return LEVEL0;
  case 1: return 1.0 + 0.5 * sin (1.3 * x);
  case 2: return 4.0e-4 + 3.0e-4 * sin (0.7 * x);
  case 3: return 1.0 + 4.0e-4 * sin (2.1 * x);
  default: return 0.2 + 0.05 * x;  /* rising chain: every flow reversed */
  }
}

static int check_jacobian (sunindextype n, SUNContext ctx)
{
  chain c;
  SUNMatrix D = SUNDenseMatrix (n, n, ctx);
  SUNMatrix S = SUNSparseMatrix (n, n, 3 * n - 2, CSC_MAT, ctx);
  double *V = malloc ((size_t) n * sizeof (double));
  double *fp = malloc ((size_t) n * sizeof (double));
  double *fm = malloc ((size_t) n * sizeof (double));
  double worst = 0.0, step = 1.0e-8;
  int k, ok = 1;
  sunindextype i, j, p;

  if (!D || !S || !V || !fp || !fm || !chain_alloc (&c, n)) {
    fprintf (stderr, "chain_floor: out of memory in check\n");
    return 2;
  }
  for (k = 0; k < 5; k++) {
    double scale = 0.0, err = 0.0;
    for (i = 0; i < n; i++)
      V[i] = AREA * check_level (k, i);
    fill_dense (&c, V, D);
    fill_sparse (&c, V, S);
    for (j = 0; j < n; j++) {
      double *col = SUNDenseMatrix_Column (D, j), v0 = V[j];
      sunindextype *cp = SUNSparseMatrix_IndexPointers (S);
      sunindextype *ri = SUNSparseMatrix_IndexValues (S);
      double *sv = SUNSparseMatrix_Data (S);
      V[j] = v0 + step;
      chain_eval (&c, V, fp);
      V[j] = v0 - step;
      chain_eval (&c, V, fm);
      V[j] = v0;
      for (i = 0; i < n; i++) {
        double fd = (fp[i] - fm[i]) / (2.0 * step), sp = 0.0;
        for (p = cp[j]; p < cp[j + 1]; p++)
          if (ri[p] == i)
            sp = sv[p];
        if (fabs (fd) > scale)
          scale = fabs (fd);
        if (fabs (col[i] - fd) > err)
          err = fabs (col[i] - fd);
        if (fabs (sp - fd) > err)
          err = fabs (sp - fd);
      }
    }
    err /= scale > 0.0 ? scale : 1.0;
    printf ("check pattern=%d max_rel_err=%.3e\n", k, err);
    if (err > worst)
      worst = err;
  }
  ok = worst < 1.0e-5;
  printf ("N=%ld check=%s max_rel_err=%.3e\n", (long) n,
          ok ? "pass" : "FAIL", worst);
  chain_free (&c);
  free (V); free (fp); free (fm);
  SUNMatDestroy (D);
  SUNMatDestroy (S);
  return ok ? 0 : 2;
}

/* ------------------------------------------------------------------ */
/* Integration */

static int run (sunindextype n, int sparse, const char *path, SUNContext ctx)
{
  chain c = { 0, NULL, NULL };
  N_Vector y = NULL;
  SUNMatrix J = NULL;
  SUNLinearSolver LS = NULL;
  void *mem = NULL;
  FILE *out = NULL;
  long nsteps = 0, nrhs = 0, njac = 0;
  double t0, t1, wall, setup, io = 0.0, t = 0.0, *Y;
  int flag, status = 2, k, nout = (int) (T_END / DT_OUT + 0.5);
  sunindextype i;

  t0 = now ();
  if (!chain_alloc (&c, n)) {
    fprintf (stderr, "chain_floor: out of memory for N=%ld\n", (long) n);
    goto done;
  }
  y = N_VNew_Serial (n, ctx);
  if (!y) {
    fprintf (stderr, "chain_floor: N_VNew_Serial failed\n");
    goto done;
  }
  Y = N_VGetArrayPointer (y);
  for (i = 0; i < n; i++)
    Y[i] = AREA * LEVEL0;

  mem = CVodeCreate (CV_BDF, ctx);
  if (!mem) {
    fprintf (stderr, "chain_floor: CVodeCreate failed\n");
    goto done;
  }
  if (failed (CVodeInit (mem, rhs, 0.0, y), "CVodeInit")
      || failed (CVodeSetUserData (mem, &c), "CVodeSetUserData")
      || failed (CVodeSStolerances (mem, RTOL, ATOL), "CVodeSStolerances")
      || failed (CVodeSetMaxNumSteps (mem, 10000000L), "CVodeSetMaxNumSteps"))
    goto done;

  if (sparse) {
    J = SUNSparseMatrix (n, n, 3 * n - 2, CSC_MAT, ctx);
    LS = J ? SUNLinSol_KLU (y, J, ctx) : NULL;
  } else {
    J = SUNDenseMatrix (n, n, ctx);
    LS = J ? SUNLinSol_Dense (y, J, ctx) : NULL;
  }
  if (!J || !LS) {
    fprintf (stderr, "chain_floor: matrix or linear solver creation failed"
             " for N=%ld\n", (long) n);
    goto done;
  }
  if (failed (CVodeSetLinearSolver (mem, LS, J), "CVodeSetLinearSolver")
      || failed (CVodeSetJacFn (mem, jac), "CVodeSetJacFn"))
    goto done;

  if (path) {
    out = fopen (path, "w");
    if (!out) {
      fprintf (stderr, "chain_floor: cannot write FILE '%s'\n", path);
      goto done;
    }
  }
  t1 = now ();
  setup = t1 - t0;

  /* Timed section: the integration only; time spent writing FILE is
   * measured and subtracted. */
  for (k = 0; k <= nout; k++) {
    double tout = DT_OUT * k;
    if (k > 0) {
      flag = CVode (mem, tout, y, &t, CV_NORMAL);
      if (failed (flag, "CVode"))
        goto done;
    }
    if (out) {
      double tw = now ();
      fprintf (out, "%.1f", tout);
      for (i = 0; i < n; i++)
        fprintf (out, " %.12g", Y[i] / AREA);
      fputc ('\n', out);
      io += now () - tw;
    }
  }
  wall = now () - t1 - io;

  if (failed (CVodeGetNumSteps (mem, &nsteps), "CVodeGetNumSteps")
      || failed (CVodeGetNumRhsEvals (mem, &nrhs), "CVodeGetNumRhsEvals")
      || failed (CVodeGetNumJacEvals (mem, &njac), "CVodeGetNumJacEvals"))
    goto done;

  printf ("N=%ld solver=%s wall=%.6f steps=%ld rhs=%ld jac=%ld "
          "final_h1=%.10g final_hN=%.10g setup=%.6f\n", (long) n,
          sparse ? "klu" : "dense", wall, nsteps, nrhs, njac,
          Y[0] / AREA, Y[n - 1] / AREA, setup);
  status = 0;

done:
  if (out && fclose (out) != 0) {
    fprintf (stderr, "chain_floor: error writing FILE '%s'\n", path);
    status = 2;
  }
  CVodeFree (&mem);
  if (LS)
    SUNLinSolFree (LS);
  if (J)
    SUNMatDestroy (J);
  if (y)
    N_VDestroy (y);
  chain_free (&c);
  return status;
}

static int usage (void)
{
  fprintf (stderr, "usage: chain_floor N [dense|klu|check] [FILE]\n"
           "  N      number of tanks, integer >= 1\n"
           "  dense  dense LU (default for N <= %d)\n"
           "  klu    KLU sparse LU (default for N > %d)\n"
           "  check  compare the analytic Jacobian with finite differences\n"
           "  FILE   write t and all levels at the %d output times\n",
           DENSE_MAX, DENSE_MAX, (int) (T_END / DT_OUT + 1.5));
  return 1;
}

int main (int argc, char **argv)
{
  SUNContext ctx = NULL;
  const char *mode = NULL, *path = NULL;
  char *end = NULL;
  long n;
  int status;

  if (argc < 2 || argc > 4)
    return usage ();
  n = strtol (argv[1], &end, 10);
  if (*argv[1] == '\0' || *end != '\0' || n < 1) {
    fprintf (stderr, "chain_floor: N must be an integer >= 1, got '%s'\n",
             argv[1]);
    return usage ();
  }
  if (argc >= 3)
    mode = argv[2];
  if (argc == 4)
    path = argv[3];
  if (mode && strcmp (mode, "dense") && strcmp (mode, "klu")
      && strcmp (mode, "check")) {
    fprintf (stderr, "chain_floor: solver must be dense, klu or check, got"
             " '%s'\n", mode);
    return usage ();
  }
  if (SUNContext_Create (NULL, &ctx) != 0) {
    fprintf (stderr, "chain_floor: SUNContext_Create failed\n");
    return 2;
  }
  if (mode && !strcmp (mode, "check"))
    status = check_jacobian ((sunindextype) n, ctx);
  else
    status = run ((sunindextype) n,
                  mode ? !strcmp (mode, "klu") : n > DENSE_MAX, path, ctx);
  SUNContext_Free (&ctx);
  return status;
}

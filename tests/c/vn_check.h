/* The derivative checker shared by the Jacobian tests of controllers,
 * switches, heaters and carried properties: df/dx (dense and sparse)
 * and the linearisation blocks B, C, D against central differences. */
#ifndef VN_CHECK_H
#define VN_CHECK_H

#include "vn_test.h"

#define TOL 1e-5
#define NX 24
#define NY 160
#define NP 32
#define HREL 1e-7   /* relative step in states */
#define PREL 2e-8   /* relative step in parameters */

/* A parameter to move for B and D: unit index and parameter name. */
typedef struct { int unit; const char *name; } mv_par;
#define MV_END {-1, NULL}

/* Worst relative error of analytic a against difference d (nr x nc,
 * column-major), each entry scaled by itself plus 1e-3 of its column's
 * largest entry; entries within the column's rounding noise pass.
 * NaN entries on both sides (species absent) are skipped. */
static double worst (const double *a, const double *d, int nr, int nc,
                     const double *noise, int *wr, int *wc)
{
  double w = 0;
  *wr = *wc = -1;
  for (int j = 0; j < nc; j++)
    {
      double cm = 0;
      for (int i = 0; i < nr; i++)
        if (isfinite (d[j * nr + i]))
          cm = fmax (cm, fmax (fabs (d[j * nr + i]), fabs (a[j * nr + i])));
      for (int i = 0; i < nr; i++)
        {
          double ai = a[j * nr + i], di = d[j * nr + i];
          if (isnan (di) && ai == 0)
            continue;
          double e = fabs (ai - di), s = fabs (di) + 1e-3 * cm + 1e-300;
          if (noise && e <= noise[j])
            continue;
          if (!(e / s <= w))
            {
              w = isnan (e) ? INFINITY : e / s;
              *wr = i;
              *wc = j;
            }
        }
    }
  return w;
}

/* Values f and y with parameter pi at v (the value kept afterwards). */
static int eval_p (vn_net *net, int pi, double v, const double *x, double *f,
                   double *y)
{
  if (vn_param_set (net, pi, v) != VN_OK)
    return 1;
  return vn_rhs (net, 0, x, f) || vn_outputs (net, 0, x, y);
}

/* Every derivative check at the initial state with xset's non-NaN
 * entries put in: A, sparse A, C for all outputs; B and D for mv.
 * presim: simulate 1 ms from x first, so switches take their mode. */
static void check_net (const char *label, vt_net *b, const double *xset,
                       const mv_par *mv, int presim)
{
  vn_net *net = NULL;
  int st = vt_build (b, &net);
  VT_CHECK (st == VN_OK, "%s: builds (%s)", label, st ? b->msg : "ok");
  if (st)
    return;
  int nx = vn_nstates (net), ny = vn_noutputs (net);
  if (nx > NX || ny > NY)
    {
      VT_CHECK (0, "%s: %d states, %d outputs exceed the buffers", label, nx,
                ny);
      vn_net_free (net);
      return;
    }
  static double x[NX], xs[NX], fp[NX], fm[NX], J[NX * NX], Jd[NX * NX];
  static double yp[NY], ym[NY], C[NY * NX], Cd[NY * NX];
  static double A[NX * NX], B[NX * NP], Bd[NX * NP], D[NY * NP], Dd[NY * NP];
  static double bn[NP], dn[NP];
  int wr, wc;
  vn_initial_state (net, x);
  for (int i = 0; xset && i < nx; i++)
    if (!isnan (xset[i]))
      x[i] = xset[i];
  if (presim)
    {
      /* a short run sets the switches' modes from x */
      double t[2] = {0, 1e-3};
      static double X[2 * NX], Y[2 * NY];
      vn_sim_stats stats;
      st = vn_simulate (net, x, 2, t, X, Y, NULL, &stats);
      VT_CHECK (st == VN_OK, "%s: 1 ms run (%s)", label,
                st ? vn_errmsg (net) : "ok");
    }

  for (int j = 0; j < nx; j++)
    {
      double h = HREL * fmax (1.0, fabs (x[j]));
      memcpy (xs, x, sizeof xs);
      xs[j] = x[j] + h;
      vn_rhs (net, 0, xs, fp);
      vn_outputs (net, 0, xs, yp);
      xs[j] = x[j] - h;
      vn_rhs (net, 0, xs, fm);
      vn_outputs (net, 0, xs, ym);
      for (int i = 0; i < nx; i++)
        Jd[j * nx + i] = (fp[i] - fm[i]) / (2 * h);
      for (int i = 0; i < ny; i++)
        Cd[j * ny + i] = (yp[i] - ym[i]) / (2 * h);
    }
  st = vn_jac_dense (net, 0, x, J);
  double w = worst (J, Jd, nx, nx, NULL, &wr, &wc);
  VT_CHECK (st == VN_OK && w <= TOL, "%s: df/dx against differences (%d "
            "states), worst %.2e", label, nx, w);
  if (w > TOL)
    printf ("    row %d (%s of %s), column %d: analytic %.10g, difference "
            "%.10g\n", wr, vn_state_var (net, wr),
            vn_unit_name (net, vn_state_unit (net, wr)), wc,
            J[wc * nx + wr], Jd[wc * nx + wr]);

  long nnz = 0, cp[NX + 1], ri[NX * NX];
  double val[NX * NX], Js[NX * NX];
  st = vn_jac_csc (net, 0, x, &nnz, NULL, NULL, NULL);
  if (st == VN_OK)
    st = vn_jac_csc (net, 0, x, &nnz, cp, ri, val);
  memset (Js, 0, sizeof Js);
  for (int j = 0; st == VN_OK && j < nx; j++)
    for (long k = cp[j]; k < cp[j + 1]; k++)
      Js[j * nx + ri[k]] += val[k];
  w = worst (Js, J, nx, nx, NULL, &wr, &wc);
  VT_CHECK (st == VN_OK && w <= 1e-14, "%s: sparse df/dx (%ld entries) "
            "equals dense, worst %.2e", label, nnz, w);

  int pin[NP], np = 0, yout[NY];
  for (int k = 0; mv && mv[k].unit >= 0 && np < NP; k++)
    pin[np++] = vt_pidx (b, net, mv[k].unit, mv[k].name);
  for (int i = 0; i < ny; i++)
    yout[i] = i;
  st = vn_linearize_dense (net, 0, x, np, pin, ny, yout, A, B, C, D);
  VT_CHECK (st == VN_OK && memcmp (A, J, (size_t) (nx * nx) * sizeof *A) == 0,
            "%s: linearize A is df/dx", label);
  w = worst (C, Cd, ny, nx, NULL, &wr, &wc);
  VT_CHECK (w <= TOL, "%s: C = dy/dx against differences, worst %.2e",
            label, w);
  if (w > TOL)
    printf ("    output %s, state %d: analytic %.10g, difference %.10g\n",
            vt_yname (b, net, wr), wc, C[wc * ny + wr], Cd[wc * ny + wr]);
  if (np == 0)
    {
      vn_net_free (net);
      return;
    }
  for (int j = 0; j < np; j++)
    {
      double v = vn_param_get (net, pin[j]), h = PREL * fmax (1e-2, fabs (v));
      int bad = eval_p (net, pin[j], v + h, x, fp, yp)
                | eval_p (net, pin[j], v - h, x, fm, ym);
      vn_param_set (net, pin[j], v);
      for (int i = 0; i < nx; i++)
        Bd[j * nx + i] = bad ? NAN : (fp[i] - fm[i]) / (2 * h);
      for (int i = 0; i < ny; i++)
        Dd[j * ny + i] = bad ? NAN : (yp[i] - ym[i]) / (2 * h);
      bn[j] = vt_noise (fp, nx, h);
      dn[j] = vt_noise (yp, ny, h);
      VT_CHECK (!bad, "%s: %s.%s moves by %.3g both ways", label,
                b->name[mv[j].unit], mv[j].name, h);
    }
  w = worst (B, Bd, nx, np, bn, &wr, &wc);
  VT_CHECK (w <= TOL, "%s: B = df/dp against differences (%d parameters), "
            "worst %.2e", label, np, w);
  if (w > TOL)
    printf ("    row %d, parameter %s.%s: analytic %.10g, difference "
            "%.10g\n", wr, b->name[mv[wc].unit], mv[wc].name,
            B[wc * nx + wr], Bd[wc * nx + wr]);
  w = worst (D, Dd, ny, np, dn, &wr, &wc);
  VT_CHECK (w <= TOL, "%s: D = dy/dp against differences, worst %.2e",
            label, w);
  if (w > TOL)
    printf ("    output %s, parameter %s.%s: analytic %.10g, difference "
            "%.10g\n", vt_yname (b, net, wr), b->name[mv[wc].unit], mv[wc].name,
            D[wc * ny + wr], Dd[wc * ny + wr]);
  vn_net_free (net);

#endif

/* Analytic derivatives of the energy and species balances and of
 * heaters against finite differences: df/dx (dense and sparse) and the
 * linearisation blocks B, C, D, parameters moved through vn_param_set.
 * Tanks carry V T and V c (conserved contents); flows carry their
 * upstream side's properties.  Tolerance as in test_jacobian.c: 1e-5
 * relative, floored at 1e-3 of the column's largest entry. */
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

/* A central difference's rounding noise: some hundred ulps of the
 * largest value over the step. */
static double noise_of (const double *v, int n, double h)
{
  double m = 0;
  for (int i = 0; i < n; i++)
    if (isfinite (v[i]))
      m = fmax (m, fabs (v[i]));
  return 256 * 2.2e-16 * m / h;
}

/* "unit.output" of output index yi, for failure lines. */
static const char *yname (const vt_net *b, const vn_net *net, int yi)
{
  static char buf[96];
  for (int u = 0; u < b->n; u++)
    for (int k = 0; k < vn_kind_nout (b->kind[u]); k++)
      if (vn_output_index (net, u, k) == yi)
        {
          snprintf (buf, sizeof buf, "%s.%s", b->name[u],
                    vn_kind_out_name (b->kind[u], k));
          return buf;
        }
  return "?";
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
            yname (b, net, wr), wc, C[wc * ny + wr], Cd[wc * ny + wr]);
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
      bn[j] = noise_of (fp, nx, h);
      dn[j] = noise_of (yp, ny, h);
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
            "%.10g\n", yname (b, net, wr), b->name[mv[wc].unit], mv[wc].name,
            D[wc * ny + wr], Dd[wc * ny + wr]);
  vn_net_free (net);
}

static int prism (vt_net *b, const char *name, double area, double level,
                  double temp)
{
  int t = vt_unit (b, "tank", name, -1, -1);
  vt_set (b, t, "area", area);
  vt_set (b, t, "level", level);
  if (!isnan (temp))
    vt_set (b, t, "temperature", temp);
  return t;
}

static void thermal (vt_net *b)
{
  vt_init (b);
  b->spec.thermal = 1;
}

static void thermal_tanks (void)
{
  vt_net b;
  int t, d, u;

  /* feed at 60 degC into T1 (30 degC) with heat loss, orifice out */
  thermal (&b);
  t = prism (&b, "T1", 2, 1.2, 30);
  vt_set (&b, t, "ua", 400);
  u = vt_unit (&b, "feed", "F1", -1, t);
  vt_set (&b, u, "flow", 0.01);
  vt_set (&b, u, "temperature", 60);
  u = vt_unit (&b, "orifice", "O1", t, -1);
  vt_set (&b, u, "coeff", 0.01);
  {
    const mv_par mv[] = {{0, "area"}, {0, "ua"}, {0, "base"}, {1, "flow"},
                         {1, "temperature"}, {2, "coeff"}, MV_END};
    check_net ("thermal: hot feed, heat loss, free discharge", &b, NULL, mv,
               0);
  }

  /* feed without temperature comes in at the ambient */
  thermal (&b);
  t = prism (&b, "T1", 2, 1.2, 30);
  u = vt_unit (&b, "feed", "F1", -1, t);
  vt_set (&b, u, "flow", 0.01);
  {
    const mv_par mv[] = {{0, "area"}, {1, "flow"}, MV_END};
    check_net ("thermal: feed at the ambient", &b, NULL, mv, 0);
  }

  /* draw-off: a negative feed leaves at the tank's temperature */
  thermal (&b);
  t = prism (&b, "T1", 2, 1.2, 30);
  u = vt_unit (&b, "feed", "F1", -1, t);
  vt_set (&b, u, "flow", -0.01);
  vt_set (&b, u, "temperature", 80);
  {
    const mv_par mv[] = {{0, "area"}, {1, "flow"}, MV_END};
    check_net ("thermal: draw-off at the tank's temperature", &b, NULL, mv,
               0);
  }

  /* forward and reversed flow between tanks (destination above) */
  for (int rev = 0; rev < 2; rev++)
    {
      thermal (&b);
      t = prism (&b, "T1", 2, rev ? 1.0 : 2.0, 70);
      d = prism (&b, "T2", 1, rev ? 2.5 : 0.8, 15);
      vt_set (&b, d, "ua", 100);
      u = vt_unit (&b, "orifice", "O1", t, d);
      vt_set (&b, u, "coeff", 0.01);
      const mv_par mv[] = {{0, "area"}, {1, "area"}, {1, "ua"}, {2, "coeff"},
                           MV_END};
      check_net (rev ? "thermal: reversed flow, destination above source"
                     : "thermal: forward flow tank to tank", &b, NULL, mv,
                 0);
    }

  /* boundary at 5 degC feeding a tank; a tank back-fed by a boundary */
  thermal (&b);
  t = prism (&b, "T1", 1, 1, 40);
  u = vt_unit (&b, "boundary", "MAIN", -1, -1);
  vt_set (&b, u, "head", 3);
  vt_set (&b, u, "temperature", 5);
  d = vt_unit (&b, "resistance", "R1", u, t);
  vt_set (&b, d, "r", 200);
  d = vt_unit (&b, "orifice", "O1", t, u);
  vt_set (&b, d, "coeff", 0.002);
  {
    const mv_par mv[] = {{0, "area"}, {1, "head"}, {1, "temperature"},
                         {2, "r"}, {3, "coeff"}, MV_END};
    check_net ("thermal: boundary into a tank and back-feeding it", &b,
               NULL, mv, 0);
  }

  /* spill over the rim carries heat into T2 */
  thermal (&b);
  t = prism (&b, "T1", 1, 2.05, 50);
  vt_set (&b, t, "rim", 2);
  d = prism (&b, "T2", 1, 0.5, 10);
  b.ref[4 * t] = d;
  u = vt_unit (&b, "feed", "F1", -1, t);
  vt_set (&b, u, "flow", 0.01);
  vt_set (&b, u, "temperature", 50);
  {
    const mv_par mv[] = {{0, "area"}, {0, "rim"}, {2, "flow"},
                         {2, "temperature"}, MV_END};
    check_net ("thermal: spill carrying heat into another tank", &b, NULL,
               mv, 0);
  }
}

/* Two species, the first decaying, with a thermal balance beside. */
static void species (void)
{
  static const double decay[] = {1e-3, 0};
  vt_net b;
  thermal (&b);
  b.spec.nspecies = 2;
  b.spec.decay = decay;
  int t = prism (&b, "T1", 2, 1.2, 30);
  vt_set (&b, t, "c1", 2);
  vt_set (&b, t, "c2", 0.5);
  int d = prism (&b, "T2", 1, 2.4, 20);
  vt_set (&b, d, "c1", 0.3);
  int u = vt_unit (&b, "feed", "F1", -1, t);
  vt_set (&b, u, "flow", 0.01);
  vt_set (&b, u, "c1", 5);
  vt_set (&b, u, "c2", 1);
  int o = vt_unit (&b, "orifice", "O1", t, d);   /* reversed: T2 higher */
  vt_set (&b, o, "coeff", 0.01);
  o = vt_unit (&b, "orifice", "O2", d, -1);
  vt_set (&b, o, "coeff", 0.004);
  const mv_par mv[] = {{0, "area"}, {1, "area"}, {2, "flow"}, {2, "c1"},
                       {2, "c2"}, {3, "coeff"}, MV_END};
  check_net ("species: two, decay, reversed flow, thermal", &b, NULL, mv,
             0);

  b.spec.thermal = 0;
  vt_init (&b);
  b.spec.nspecies = 1;
  b.spec.decay = decay;
  t = prism (&b, "T1", 2, 1.2, NAN);
  vt_set (&b, t, "c1", 2);
  u = vt_unit (&b, "boundary", "MAIN", -1, -1);
  vt_set (&b, u, "head", 4);
  vt_set (&b, u, "c1", 0.7);
  o = vt_unit (&b, "valve", "V1", u, t);
  vt_set (&b, o, "kv", 10);
  vt_set (&b, o, "opening", 0.8);
  o = vt_unit (&b, "orifice", "O1", t, -1);
  vt_set (&b, o, "coeff", 0.005);
  {
    const mv_par mv1[] = {{0, "area"}, {1, "head"}, {1, "c1"}, {2, "kv"},
                          {2, "opening"}, MV_END};
    check_net ("species: one, decay, from a boundary, not thermal", &b,
               NULL, mv1, 0);
  }
}

/* Heaters: direct and lagged, the duty limit, the covered-element gate
 * (10 x smooth = 10 mm above minlevel), and a temperature loop. */
static int heated (vt_net *b, double level, double duty, double lag)
{
  thermal (b);
  int t = prism (b, "T1", 1, level, 30);
  vt_set (b, t, "ua", 50);
  int u = vt_unit (b, "feed", "F1", -1, t);
  vt_set (b, u, "flow", 0.002);
  vt_set (b, u, "temperature", 15);
  u = vt_unit (b, "orifice", "O1", t, -1);
  vt_set (b, u, "coeff", 0.002);
  int h = vt_unit (b, "heater", "H1", -1, t);
  vt_set (b, h, "duty", duty);
  vt_set (b, h, "max", 2e4);
  vt_set (b, h, "minlevel", 0.5);
  if (lag > 0)
    vt_set (b, h, "lag", lag);
  return h;
}

static void heaters (void)
{
  vt_net b;
  const mv_par mv[] = {{0, "area"}, {0, "ua"}, {0, "base"}, {1, "flow"},
                       {3, "duty"}, {3, "minlevel"}, {3, "max"}, MV_END};
  const mv_par mvl[] = {{0, "area"}, {3, "duty"}, {3, "minlevel"},
                        {3, "lag"}, {3, "max"}, MV_END};
  heated (&b, 1.2, 5000, 0);
  check_net ("heater without lag, element covered", &b, NULL, mv, 0);
  heated (&b, 0.505, 5000, 0);
  check_net ("heater without lag, level inside the minlevel band", &b, NULL,
             mv, 0);
  heated (&b, 0.4, 5000, 0);
  check_net ("heater without lag, level below minlevel", &b, NULL, mv, 0);
  heated (&b, 1.2, 3e4, 0);
  check_net ("heater without lag, duty above max", &b, NULL, mv, 0);
  heated (&b, 0.505, 5000, 30);
  {
    double x[3] = {NAN, NAN, 4000};
    check_net ("heater with 30 s lag, inside the minlevel band", &b, x, mvl,
               0);
  }
  heated (&b, 1.2, 3e4, 30);
  check_net ("heater with 30 s lag, duty above max", &b, NULL, mvl, 0);

  /* TC on T1.temperature drives H1.duty (reverse acting) */
  int h = heated (&b, 1.2, 5000, 0);
  int c = vt_unit (&b, "controller", "TC", 0, 4);   /* T1.temperature */
  b.ref[4 * c + 2] = h;
  b.ref[4 * c + 3] = vt_slot (b.kind[h], "duty");
  vt_set (&b, c, "setpoint", 35);
  vt_set (&b, c, "gain", 1000);
  vt_set (&b, c, "reset", 600);
  vt_set (&b, c, "lo", 0);
  vt_set (&b, c, "hi", 2e4);
  {
    const mv_par mvc[] = {{0, "area"}, {0, "ua"}, {1, "temperature"},
                          {4, "setpoint"}, MV_END};
    double x[3] = {NAN, NAN, 5};
    check_net ("temperature loop on a heater", &b, x, mvc, 0);
  }
}

int main (void)
{
  thermal_tanks ();
  species ();
  heaters ();
  return vt_done ();
}

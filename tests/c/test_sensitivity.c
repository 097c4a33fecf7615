/* Forward sensitivities of vn_simulate_sens against central differences
 * of vn_simulate runs with one parameter moved through vn_param_set.
 * The initial-state sensitivity dx0/dp is itself a difference of
 * vn_initial_state (a tank's area moves its initial volume and heat).
 * Both sides are integrated tightly (rtol 1e-10), so with a relative
 * step 1e-4 the differences are good to about 1e-6 of the largest
 * sensitivity; the check allows 1e-4 of it, while a missing df/dp term
 * is wrong by O(1). */
#include "vn_test.h"

#define NT 5
#define NYS 5
#define NPS 4
#define NXM 8

static const double tout[NT] = {0, 150, 300, 600, 1200};

/* Heated water: F1 (15 degC) -> T1 (heat loss) -> V1 -> T2 -> O1. */
static int build (vt_net *b, vn_net **net)
{
  vt_init (b);
  b->spec.thermal = 1;
  int t1 = vt_unit (b, "tank", "T1", -1, -1);
  vt_set (b, t1, "area", 2);
  vt_set (b, t1, "level", 1.5);
  vt_set (b, t1, "temperature", 40);
  vt_set (b, t1, "ua", 2000);
  int t2 = vt_unit (b, "tank", "T2", -1, -1);
  vt_set (b, t2, "area", 1);
  vt_set (b, t2, "level", 0.5);
  int f = vt_unit (b, "feed", "F1", -1, t1);
  vt_set (b, f, "flow", 0.01);
  vt_set (b, f, "temperature", 15);
  int v = vt_unit (b, "valve", "V1", t1, t2);
  vt_set (b, v, "kv", 20);
  vt_set (b, v, "opening", 0.6);
  int o = vt_unit (b, "orifice", "O1", t2, -1);
  vt_set (b, o, "coeff", 0.005);
  return vt_build (b, net);
}

static int run (vn_net *net, double *Y, const int *yout)
{
  double x0[NXM], X[NT * NXM];
  vn_sim_opts o;
  vn_sim_stats st;
  memset (&o, 0, sizeof o);
  o.rtol = 1e-10;
  o.atol = 1e-12;
  o.nyrec = NYS;
  o.yrec = yout;
  vn_initial_state (net, x0);
  return vn_simulate (net, x0, NT, tout, X, Y, &o, &st);
}

int main (void)
{
  vt_net b;
  vn_net *net = NULL;
  if (build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "sensitivity network builds (%s)", b.msg);
      return vt_done ();
    }
  int nx = vn_nstates (net);
  int yout[NYS] = {vt_yidx (&b, net, 0, "level"),
                   vt_yidx (&b, net, 1, "level"),
                   vt_yidx (&b, net, 0, "temperature"),
                   vt_yidx (&b, net, 1, "temperature"),
                   vt_yidx (&b, net, 3, "flow")};
  const char *yn[NYS] = {"T1.level", "T2.level", "T1.temperature",
                         "T2.temperature", "V1.flow"};
  struct { int unit; const char *name; } pp[NPS] = {
    {4, "coeff"}, {0, "area"}, {3, "kv"}, {0, "ua"}};
  int pidx[NPS];
  double sx0[NXM * NPS], xp[NXM], xm[NXM], h[NPS];
  for (int j = 0; j < NPS; j++)
    {
      pidx[j] = vt_pidx (&b, net, pp[j].unit, pp[j].name);
      double v = vn_param_get (net, pidx[j]);
      h[j] = 1e-4 * fabs (v);
      vn_param_set (net, pidx[j], v + h[j]);
      vn_initial_state (net, xp);
      vn_param_set (net, pidx[j], v - h[j]);
      vn_initial_state (net, xm);
      vn_param_set (net, pidx[j], v);
      for (int i = 0; i < nx; i++)
        sx0[j * nx + i] = (xp[i] - xm[i]) / (2 * h[j]);
    }
  /* the area moves the initial volume (1.5 m per m2) and heat (x 40) */
  VT_NEAR (sx0[1 * nx + 0], 1.5, 1e-8, "dV0/dT1.area (m3 per m2)");
  VT_NEAR (sx0[1 * nx + 1], 60, 1e-6, "d(VT)0/dT1.area (m3 degC per m2)");

  double x0[NXM], X[NT * NXM], Y[NT * NYS], YS[NT * NYS * NPS];
  vn_sens s;
  memset (&s, 0, sizeof s);
  s.np = NPS;
  s.pidx = pidx;
  s.x0 = sx0;
  s.ny = NYS;
  s.yout = yout;
  s.YS = YS;
  vn_sim_opts o;
  vn_sim_stats st;
  memset (&o, 0, sizeof o);
  o.rtol = 1e-10;
  o.atol = 1e-12;
  o.nyrec = NYS;
  o.yrec = yout;
  vn_initial_state (net, x0);
  int rc = vn_simulate_sens (net, x0, NT, tout, X, Y, &o, &st, &s);
  VT_CHECK (rc == VN_OK, "vn_simulate_sens runs (%s)",
            rc ? vn_errmsg (net) : "ok");

  for (int j = 0; j < NPS; j++)
    {
      double Yp[NT * NYS], Ym[NT * NYS];
      double v = vn_param_get (net, pidx[j]);
      int bad = vn_param_set (net, pidx[j], v + h[j]) || run (net, Yp, yout);
      bad |= vn_param_set (net, pidx[j], v - h[j]) || run (net, Ym, yout);
      vn_param_set (net, pidx[j], v);
      VT_CHECK (!bad, "runs with %s.%s moved by %.3g", b.name[pp[j].unit],
                pp[j].name, h[j]);
      for (int k = 0; k < NYS; k++)
        {
          /* scale: the largest difference, floored at the difference's
           * own rounding (1e-8 of the output over the step), so an
           * output the parameter cannot move must show 0 */
          double sc = 0, w = 0, got = 0, want = 0;
          int wt = 0;
          for (int t = 0; t < NT; t++)
            sc = fmax (sc, fmax (fabs ((Yp[k * NT + t] - Ym[k * NT + t])
                                       / (2 * h[j])),
                                 1e-8 * fabs (Y[k * NT + t]) / h[j]));
          for (int t = 0; t < NT; t++)
            {
              double d = (Yp[k * NT + t] - Ym[k * NT + t]) / (2 * h[j]);
              double a = YS[(j * NYS + k) * NT + t];
              double e = fabs (a - d) / (sc + 1e-300);
              if (!(e <= w))
                {
                  w = e;
                  wt = t;
                  got = a;
                  want = d;
                }
            }
          VT_CHECK (rc == VN_OK && w <= 1e-4, "d %s / d %s.%s: worst "
                    "relative error %.2e at t = %g s (sensitivity %.8g, "
                    "difference %.8g)", yn[k], b.name[pp[j].unit],
                    pp[j].name, w, tout[wt], got, want);
        }
    }
  vn_net_free (net);
  return vt_done ();
}

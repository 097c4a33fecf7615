/* The core against closed-form results of hydraulics and vessel geometry,
 * with the published worked values of REFERENCES.md (shared project notes). */
#include "vn_test.h"

#define G0 9.80665   /* standard gravity, exact (3rd CGPM, 1901) */

static vn_sim_opts tight (void)
{
  vn_sim_opts o;
  memset (&o, 0, sizeof o);
  o.rtol = 1e-10;
  o.atol = 1e-12;
  return o;
}

static int prism_tank (vt_net *b, const char *name, double area,
                       double level)
{
  int t = vt_unit (b, "tank", name, -1, -1);
  vt_set (b, t, "area", area);
  vt_set (b, t, "level", level);
  return t;
}

/* Torricelli outflow Q = Cd a sqrt(2 g h) (Torricelli 1644; Encyclopaedia
 * Britannica 1911, "Hydraulics"): a prism of area A drains from h0 to h1
 * in t = (A / (Cd a)) sqrt(2 / g) (sqrt(h0) - sqrt(h1)).  Tank 1 m
 * across, orifice 0.05 m, Cd 0.61, 2 m to 0.5 m: 209.40 s. */
static void torricelli (void)
{
  vt_net b;
  vn_net *net = NULL;
  vt_init (&b);
  int t = vt_unit (&b, "tank", "T1", -1, -1);
  vt_set (&b, t, "diameter", 1);
  vt_set (&b, t, "level", 2);
  int o = vt_unit (&b, "orifice", "O1", t, -1);
  vt_set (&b, o, "diameter", 0.05);
  vt_set (&b, o, "cd", 0.61);
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "Torricelli: network builds (%s)", b.msg);
      return;
    }
  enum { NT = 3001 };
  static double tout[NT], X[NT], Y[NT * 64];
  for (int k = 0; k < NT; k++)
    tout[k] = 0.1 * k;
  double x0[1];
  vn_initial_state (net, x0);
  vn_sim_opts op = tight ();
  vn_sim_stats s;
  int st = vn_simulate (net, x0, NT, tout, X, Y, &op, &s);
  int yl = vt_yidx (&b, net, t, "level");
  double tcross = NAN;
  for (int k = 1; k < NT && st == VN_OK; k++)
    {
      double l0 = Y[(long) yl * NT + k - 1], l1 = Y[(long) yl * NT + k];
      if (l0 >= 0.5 && l1 < 0.5)
        {
          tcross = tout[k - 1] + 0.1 * (l0 - 0.5) / (l0 - l1);
          break;
        }
    }
  double A = VN_TEST_PI / 4, a = VN_TEST_PI * 0.05 * 0.05 / 4;
  double tref = A / (0.61 * a) * sqrt (2 / G0) * (sqrt (2.0) - sqrt (0.5));
  VT_CHECK (st == VN_OK, "Torricelli: simulation runs (%d steps)", (int) s.steps);
  VT_NEAR (tref, 209.40, 0.005, "Torricelli closed form, 2 m to 0.5 m (s)");
  VT_NEAR (tcross, 209.40, 0.05, "Torricelli simulated, 2 m to 0.5 m (s)");
  VT_NEAR (tcross, tref, 1e-3, "Torricelli simulated vs closed form (s)");
  vn_net_free (net);
}

/* Volume at a level through vn_initial_state and back through the level
 * output (Perry's Chemical Engineers' Handbook, vessel volumes). */
static void one_vessel (const char *label, int shape, double D, double L,
                        double H, double level, double vref, double vtol)
{
  vt_net b;
  vn_net *net = NULL;
  vt_init (&b);
  int t = vt_unit (&b, "tank", "T1", -1, -1);
  vt_set (&b, t, "shape", shape);
  vt_set (&b, t, "diameter", D);
  if (L > 0)
    vt_set (&b, t, "length", L);
  if (H > 0)
    vt_set (&b, t, "height", H);
  vt_set (&b, t, "level", level);
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "%s: network builds (%s)", label, b.msg);
      return;
    }
  double x0[1], y[8];
  vn_initial_state (net, x0);
  char what[160];
  snprintf (what, sizeof what, "%s: volume at level %g m (m3)", label, level);
  VT_NEAR (x0[0], vref, vtol, what);
  vn_outputs (net, 0, x0, y);
  snprintf (what, sizeof what, "%s: level back from that volume (m)", label);
  VT_NEAR (y[vt_yidx (&b, net, t, "level")], level, 1e-9, what);
  vn_net_free (net);
}

static void vessels (void)
{
  /* V = L (R^2 acos((R-h)/R) - (R-h) sqrt(2 R h - h^2)); R 1, L 5, h 0.5 */
  one_vessel ("horizontal cylinder R 1 L 5", 1, 2, 5, 0, 0.5, 3.0709, 5e-5);
  /* V = pi h^2 (3 R - h) / 3; R 5, h 2 */
  one_vessel ("sphere R 5", 2, 10, 0, 0, 2, 54.454, 5e-4);
  /* V = (pi / 3) (R / H)^2 h^3, apex down; R 4, H 12, h 5 */
  one_vessel ("cone R 4 H 12", 3, 8, 0, 12, 5, 14.544, 5e-4);
}

/* IEC 60534-2-1 (= ANSI/ISA-75.01.01), non-choked liquid:
 * Q = Kv f(x) sqrt(dp / (rho / rho0)); Kv 10, dp 0.5 bar, water: 7.0711
 * m3/h.  Driven by a head dH, dp = rho g dH and the density cancels, so
 * the head is chosen as dH = 0.5e5 / (rho0 g) with rho0 = 999.1 kg/m3,
 * the core's reference density.  Characteristics (IEC 60534-2-4): equal
 * percentage R 50 at x 0.5: f = 0.14142; quick opening f = sqrt(x)
 * (common practice). */
static double valve_flow (double density, int ch, double opening)
{
  vt_net b;
  vn_net *net = NULL;
  vt_init (&b);
  b.spec.density = density;
  double dH = 0.5e5 / (999.1 * G0);
  int t = prism_tank (&b, "T1", 1, 10);
  int r = vt_unit (&b, "boundary", "DRAIN", -1, -1);
  vt_set (&b, r, "head", 10 - dH);
  int v = vt_unit (&b, "valve", "V1", t, r);
  vt_set (&b, v, "kv", 10);
  vt_set (&b, v, "char", ch);
  vt_set (&b, v, "opening", opening);
  if (vt_build (&b, &net) != VN_OK)
    {
      printf ("    valve network: %s\n", b.msg);
      return NAN;
    }
  double x0[1], y[16];
  vn_initial_state (net, x0);
  vn_outputs (net, 0, x0, y);
  double q = y[vt_yidx (&b, net, v, "flow")] * 3600;
  vn_net_free (net);
  return q;
}

static void valves (void)
{
  VT_NEAR (valve_flow (999.1, 0, 1), 7.0711, 5e-5,
           "valve Kv 10, 0.5 bar, fully open (m3/h)");
  VT_NEAR (valve_flow (850, 0, 1), 7.0711, 5e-5,
           "same head at density 850: same volumetric flow (m3/h)");
  VT_NEAR (valve_flow (999.1, 1, 0.5), 7.0711 * 0.14142, 5e-5,
           "equal percentage R 50 at half travel (m3/h)");
  VT_NEAR (valve_flow (999.1, 2, 0.25), 7.0711 * 0.5, 5e-5,
           "quick opening at quarter travel (m3/h)");
  VT_NEAR (valve_flow (999.1, 0, 0.3), 7.0711 * 0.3, 5e-5,
           "linear at 30 % travel (m3/h)");
}

/* Francis weir, SI: Q = 1.84 (L - 0.1 n H) H^1.5 (Francis, Lowell
 * Hydraulic Experiments, 1855); L 1 m, n 2, H 0.2 m: 0.15799 m3/s.  A
 * tank fed 0.15799 m3/s with only its rim as outlet settles at H 0.2 m. */
static void weir (void)
{
  vt_net b;
  vn_net *net = NULL;
  vt_init (&b);
  int t = prism_tank (&b, "T1", 1, 1);
  vt_set (&b, t, "rim", 1);
  vt_set (&b, t, "crest", 1);
  vt_set (&b, t, "contractions", 2);
  int f = vt_unit (&b, "feed", "F1", -1, t);
  vt_set (&b, f, "flow", 0.15799);
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "weir: network builds (%s)", b.msg);
      return;
    }
  double tout[2] = {0, 300}, X[2], Y[2 * 64], x0[1];
  vn_initial_state (net, x0);
  vn_sim_opts op = tight ();
  vn_sim_stats s;
  int st = vn_simulate (net, x0, 2, tout, X, Y, &op, &s);
  VT_CHECK (st == VN_OK, "weir: simulation runs (%s)",
            st ? vn_errmsg (net) : "ok");
  double H = Y[vt_yidx (&b, net, t, "level") * 2 + 1] - 1;
  VT_NEAR (H, 0.2, 2e-5, "Francis weir L 1 n 2 at 0.15799 m3/s: head (m)");
  VT_NEAR (Y[vt_yidx (&b, net, t, "spill") * 2 + 1], 0.15799, 1e-9,
           "Francis weir: spill equals the feed at steady state (m3/s)");
  vn_net_free (net);
}

/* Pump curve H = s^2 H0 - k Q^2 (common practice) against a system
 * 10 + 0.003 Q^2 (Q in m3/h): H0 50 m, k 0.001 m/(m3/h)^2 meet at
 * 100 m3/h, 40 m; at speed 0.8 at 74.162 m3/h, 26.500 m.  The system is a
 * tank whose surface is the pump's lift, drained by an orifice into a
 * boundary 10 m up: the orifice loss Q^2 / coeff^2 is 0.003 Q^2 for
 * coeff = 1/sqrt(0.003) (m3/h)/sqrt(m) = that / 3600 in SI. */
static void pump_system (double speed, double qref, double href)
{
  vt_net b;
  vn_net *net = NULL;
  vt_init (&b);
  int w = vt_unit (&b, "boundary", "WELL", -1, -1);
  vt_set (&b, w, "head", 0);
  int t = prism_tank (&b, "T1", 1, 30);
  int p = vt_unit (&b, "pump", "P1", w, t);
  vt_set (&b, p, "shutoff", 50);
  vt_set (&b, p, "k", 0.001 * 3600 * 3600);
  vt_set (&b, p, "speed", speed);
  int r = vt_unit (&b, "boundary", "HILL", -1, -1);
  vt_set (&b, r, "head", 10);
  int o = vt_unit (&b, "orifice", "O1", t, r);
  vt_set (&b, o, "coeff", 1 / sqrt (0.003) / 3600);
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "pump: network builds (%s)", b.msg);
      return;
    }
  double tout[2] = {0, 2e4}, X[2], Y[2 * 64], x0[1];
  vn_initial_state (net, x0);
  vn_sim_opts op = tight ();
  vn_sim_stats s;
  int st = vn_simulate (net, x0, 2, tout, X, Y, &op, &s);
  VT_CHECK (st == VN_OK, "pump at speed %g: simulation runs (%s)", speed,
            st ? vn_errmsg (net) : "ok");
  char what[128];
  snprintf (what, sizeof what, "pump at speed %g: flow at steady state "
            "(m3/h)", speed);
  VT_NEAR (Y[vt_yidx (&b, net, p, "flow") * 2 + 1] * 3600, qref, 1e-3, what);
  snprintf (what, sizeof what, "pump at speed %g: head at steady state (m)",
            speed);
  VT_NEAR (Y[vt_yidx (&b, net, p, "head") * 2 + 1], href, 1e-3, what);
  VT_NEAR (Y[vt_yidx (&b, net, o, "flow") * 2 + 1] * 3600, qref, 1e-3,
           "pump system: orifice flow equals the pump flow (m3/h)");
  vn_net_free (net);
}

/* A closed ring of tanks (pumps and orifices, no feeds, no spills) holds
 * its liquid: the balances sum to zero by construction, and BDF keeps a
 * linear invariant.  Over a simulated day to 1e-9 relative. */
static void ring (void)
{
  vt_net b;
  vn_net *net = NULL;
  vt_init (&b);
  int a = prism_tank (&b, "A", 2, 3);
  int c = prism_tank (&b, "B", 1, 0.5);
  int d = prism_tank (&b, "C", 3, 1);
  vt_set (&b, d, "base", 1);
  int p = vt_unit (&b, "pump", "P1", a, c);
  vt_set (&b, p, "flow", 0.004);
  int o = vt_unit (&b, "orifice", "O1", c, d);
  vt_set (&b, o, "coeff", 0.003);
  p = vt_unit (&b, "pump", "P2", d, a);
  vt_set (&b, p, "shutoff", 8);
  vt_set (&b, p, "k", 2e5);
  o = vt_unit (&b, "orifice", "O2", a, d);
  vt_set (&b, o, "coeff", 0.001);
  vt_set (&b, o, "outlet", 0.2);
  vt_set (&b, o, "inlet", 1.5);
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "ring: network builds (%s)", b.msg);
      return;
    }
  enum { NT = 25 };
  double tout[NT], X[NT * 3], x0[3];
  for (int k = 0; k < NT; k++)
    tout[k] = 3600.0 * k;
  vn_initial_state (net, x0);
  vn_sim_opts op;
  memset (&op, 0, sizeof op);
  vn_sim_stats s;
  int st = vn_simulate (net, x0, NT, tout, X, NULL, &op, &s);
  VT_CHECK (st == VN_OK, "ring: a day simulated at default tolerances (%s)",
            st ? vn_errmsg (net) : "ok");
  double v0 = x0[0] + x0[1] + x0[2], dev = 0, moved = 0;
  for (int k = 0; k < NT; k++)
    {
      double v = X[k] + X[NT + k] + X[2 * NT + k];
      dev = fmax (dev, fabs (v - v0) / v0);
      moved = fmax (moved, fabs (X[NT + k] - x0[1]));
    }
  VT_CHECK (moved > 0.1, "ring: liquid moves between tanks (B changes by "
            "%.3g m3)", moved);
  VT_CHECK (dev <= 1e-9, "ring: total volume %.6g m3 kept to %.2e relative "
            "(want <= 1e-9)", v0, dev);
  /* the sparse (KLU) path integrates the same network to the same day */
  double Xs[NT * 3], diff = 0;
  op.solver = VN_SOLVER_KLU;
  st = vn_simulate (net, x0, NT, tout, Xs, NULL, &op, &s);
  for (int k = 0; k < NT * 3; k++)
    diff = fmax (diff, fabs (Xs[k] - X[k]));
  VT_CHECK (st == VN_OK && s.solver == VN_SOLVER_KLU && diff <= 1e-4,
            "ring: KLU run agrees with the dense run to %.2e m3 (want <= "
            "1e-4 at rtol 1e-6)", diff);
  vn_net_free (net);
}

/* A feed stepping at t = 100 s into a closed prism: the volume is
 * constant up to 100 s and rises at the feed rate after, the kink met
 * exactly because the integrator restarts at the breakpoint. */
static void breakpoint (int hold)
{
  vt_net b;
  vn_net *net = NULL;
  vt_init (&b);
  int t = prism_tank (&b, "T1", 2, 1);
  int f = vt_unit (&b, "feed", "F1", -1, t);
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "step: network builds (%s)", b.msg);
      return;
    }
  double lin[] = {0, 0, 100, 0, 100, 0.01, 1000, 0.01};
  double zoh[] = {0, 0, 100, 0.01};
  int unit = f, slot = vt_slot (b.kind[f], "flow"), off = 0;
  int len = hold ? 2 : 4;
  int st = vn_set_signals (net, 1, &unit, &slot, &off, &len, &hold,
                           hold ? zoh : lin);
  VT_CHECK (st == VN_OK, "step (%s): signal accepted (%s)",
            hold ? "hold" : "two points at t 100", st ? vn_errmsg (net) : "ok");
  enum { NT = 8 };
  double tout[NT] = {0, 50, 99.9, 100, 100.1, 150, 200, 500};
  double X[NT], Y[NT * 64], x0[1];
  vn_initial_state (net, x0);
  vn_sim_opts op;
  memset (&op, 0, sizeof op);
  vn_sim_stats s;
  st = vn_simulate (net, x0, NT, tout, X, Y, &op, &s);
  VT_CHECK (st == VN_OK && s.restarts >= 1, "step (%s): simulated with %ld "
            "restart(s)", hold ? "hold" : "two points", s.restarts);
  double err = 0;
  for (int k = 0; k < NT; k++)
    {
      double want = 2 + 0.01 * fmax (0, tout[k] - 100);
      err = fmax (err, fabs (X[k] - want));
    }
  VT_CHECK (err <= 1e-9, "step (%s): V = 2 m3 to t 100 s, then 2 + 0.01 "
            "(t - 100); worst error %.2e m3", hold ? "hold" : "two points",
            err);
  int yq = vt_yidx (&b, net, f, "flow");
  VT_CHECK (Y[yq * NT + 2] == 0 && Y[yq * NT + 3] == 0.01, "step (%s): feed "
            "output %g at 99.9 s, %g at 100 s (the value after the step)",
            hold ? "hold" : "two points", Y[yq * NT + 2], Y[yq * NT + 3]);
  /* the step between two output times is still met */
  double t2[2] = {0, 150}, X2[2];
  st = vn_simulate (net, x0, 2, t2, X2, NULL, &op, &s);
  VT_CHECK (st == VN_OK && fabs (X2[1] - 2.5) <= 1e-9, "step (%s) between "
            "outputs 0 and 150 s: V(150) = %.12g m3, want 2.5",
            hold ? "hold" : "two points", X2[1]);
  vn_net_free (net);
}

int main (void)
{
  torricelli ();
  vessels ();
  valves ();
  weir ();
  pump_system (1.0, 100, 40);
  pump_system (0.8, 74.162, 26.500);
  ring ();
  breakpoint (0);
  breakpoint (1);
  return vt_done ();
}

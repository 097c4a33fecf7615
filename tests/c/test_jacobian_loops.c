/* Analytic derivatives of controllers and switches against finite
 * differences: df/dx (dense and sparse), and the linearisation blocks
 * B = df/dp, C = dy/dx, D = dy/dp, with parameters moved through
 * vn_param_set.  Central differences err by O(h^2); with h about 1e-7
 * relative, 1e-5 (relative to the entry, floored at 1e-3 of its
 * column's largest) leaves room for rounding yet catches a missing or
 * wrong term, which is O(1) wrong.  States are put away from the kinks
 * (a limit, a switching point), where the law is smooth. */
#include "vn_check.h"
}

static int prism (vt_net *b, const char *name, double area, double level)
{
  int t = vt_unit (b, "tank", name, -1, -1);
  vt_set (b, t, "area", area);
  vt_set (b, t, "level", level);
  return t;
}

/* Output slot of a kind by name; exits if absent. */
static int oslot (int kind, const char *oname)
{
  for (int i = 0; i < vn_kind_nout (kind); i++)
    if (strcmp (vn_kind_out_name (kind, i), oname) == 0)
      return i;
  fprintf (stderr, "oslot: kind %s has no output \"%s\"\n",
           vn_kind_name (kind), oname);
  exit (2);
}

/* A controller or switch measuring mu.mout and driving cu.cpar. */
static int loop (vt_net *b, const char *kind, const char *name, int mu,
                 const char *mout, int cu, const char *cpar)
{
  int u = vt_unit (b, kind, name, mu, oslot (b->kind[mu], mout));
  b->ref[4 * u + 2] = cu;
  b->ref[4 * u + 3] = vt_slot (b->kind[cu], cpar);
  return u;
}

/* Level loop on an outlet valve: feed -> T1 -> V1 -> waste, LC on
 * T1.level driving V1.opening, direct acting (action 0).  At level 1.5
 * and setpoint 1 the error is 0.5, so u = 0.5 + gain (0.5 + I / Ti). */
static int level_loop (vt_net *b, double gain, double reset)
{
  vt_init (b);
  int t = prism (b, "T1", 2, 1.5);
  int f = vt_unit (b, "feed", "F1", -1, t);
  vt_set (b, f, "flow", 0.01);
  int v = vt_unit (b, "valve", "V1", t, -1);
  vt_set (b, v, "kv", 30);
  vt_set (b, v, "opening", 0.5);
  int c = loop (b, "controller", "LC", t, "level", v, "opening");
  vt_set (b, c, "setpoint", 1);
  vt_set (b, c, "gain", gain);
  vt_set (b, c, "reset", reset);
  vt_set (b, c, "action", 0);
  vt_set (b, c, "lo", 0);
  vt_set (b, c, "hi", 1);
  return c;
}

static void pi_controllers (void)
{
  vt_net b;
  int c;
  /* states: T1 volume, LC integral */
  const mv_par mvc[] = {{0, "area"}, {1, "flow"}, {2, "kv"},
                        {3, "setpoint"}, MV_END};
  c = level_loop (&b, 0.5, 100);
  check_net ("PI direct, limits inactive", &b, NULL, mvc, 0);

  c = level_loop (&b, 0.5, 100);
  double hi[2] = {NAN, 150};   /* u = 0.75 + 0.75 = 1.5 > hi */
  check_net ("PI direct, upper limit active, anti-windup", &b, hi, mvc, 0);

  c = level_loop (&b, 0.5, 100);
  vt_set (&b, c, "antiwindup", 0);
  check_net ("PI direct, upper limit active, no anti-windup", &b, hi, mvc,
             0);

  c = level_loop (&b, 0.5, 100);
  double lo[2] = {NAN, -300};  /* u = 0.75 - 1.5 < lo */
  check_net ("PI direct, lower limit active", &b, lo, mvc, 0);

  /* reverse acting on the inflow: LC raises F1.flow as the level falls */
  vt_init (&b);
  {
    int t = prism (&b, "T1", 2, 0.8);
    int f = vt_unit (&b, "feed", "F1", -1, t);
    vt_set (&b, f, "flow", 0.01);
    int o = vt_unit (&b, "orifice", "O1", t, -1);
    vt_set (&b, o, "coeff", 0.01);
    c = loop (&b, "controller", "LC", t, "level", f, "flow");
    vt_set (&b, c, "setpoint", 1);
    vt_set (&b, c, "gain", 0.05);
    vt_set (&b, c, "reset", 200);
    vt_set (&b, c, "lo", 0);
    vt_set (&b, c, "hi", 0.05);
    const mv_par mv[] = {{0, "area"}, {2, "coeff"}, {3, "setpoint"},
                         MV_END};
    check_net ("PI reverse on a feed, limits inactive", &b, NULL, mv, 0);
    double x[2] = {NAN, 1000};
    check_net ("PI reverse on a feed, upper limit active", &b, x, mv, 0);
  }

  /* P only (reset Inf): no integral state */
  c = level_loop (&b, 0.5, INFINITY);
  (void) c;
  check_net ("P only, no states of its own", &b, NULL, mvc, 0);
}

static void pid_controllers (void)
{
  vt_net b;
  int c;
  const mv_par mvc[] = {{0, "area"}, {1, "flow"}, {2, "kv"},
                        {3, "setpoint"}, MV_END};
  /* states: T1 volume, integral, derivative filter z */
  c = level_loop (&b, 0.5, 100);
  vt_set (&b, c, "deriv", 20);
  double x[3] = {NAN, 10, 1.45};
  check_net ("PID on a level, no measurement filter", &b, x, mvc, 0);

  c = level_loop (&b, 0.5, 100);
  vt_set (&b, c, "deriv", 20);
  vt_set (&b, c, "alpha", 0.2);
  vt_set (&b, c, "filter", 2);
  /* states: volume, integral, filtered measurement, derivative */
  double xf[4] = {NAN, 10, 1.48, 1.45};
  check_net ("PID with a 2 s measurement filter", &b, xf, mvc, 0);

  c = level_loop (&b, 0.5, 100);
  vt_set (&b, c, "deriv", 20);
  double xh[3] = {NAN, 150, 1.45};
  check_net ("PID, upper limit active, anti-windup", &b, xh, mvc, 0);

  c = level_loop (&b, 0.5, 100);
  vt_set (&b, c, "deriv", 20);
  vt_set (&b, c, "filter", 2);
  vt_set (&b, c, "action", 1);
  vt_set (&b, c, "lo", -10);
  /* reverse acting: e = 1 - m < 0, u = 0.5 - 0.25 - I / 200: */
  double xl[4] = {NAN, 400, 1.48, 1.45};
  check_net ("PID reverse, filter, lower limit active", &b, xl, mvc, 0);
}

/* A flow controller on a valve: the flow reaches it through the
 * transmitter lag (filter 1 s by default). */
static void flow_loops (void)
{
  vt_net b;
  vt_init (&b);
  int t = prism (&b, "T1", 2, 1.5);
  int f = vt_unit (&b, "feed", "F1", -1, t);
  vt_set (&b, f, "flow", 0.01);
  int v = vt_unit (&b, "valve", "V1", t, -1);
  vt_set (&b, v, "kv", 30);
  vt_set (&b, v, "opening", 0.5);
  int c = loop (&b, "controller", "FC", v, "flow", v, "opening");
  vt_set (&b, c, "setpoint", 0.012);
  vt_set (&b, c, "gain", 20);
  vt_set (&b, c, "reset", 5);
  vt_set (&b, c, "lo", 0);
  vt_set (&b, c, "hi", 1);
  const mv_par mv[] = {{0, "area"}, {1, "flow"}, {2, "kv"},
                       {3, "setpoint"}, MV_END};
  /* states: volume, integral, filtered flow */
  double x[3] = {NAN, 1, 0.011};
  check_net ("flow controller, default 1 s filter", &b, x, mv, 0);
}

/* Cascade: LC (on T1.level) sets FC.setpoint, FC (on V1.flow) drives
 * V1.opening; in both orders of the unit list (the builders always list
 * the slave first), since the master's output must reach the slave in
 * the same evaluation whatever the order. */
static void cascade (int master_first)
{
  vt_net b;
  vt_init (&b);
  int t = prism (&b, "T1", 2, 1.5);
  int f = vt_unit (&b, "feed", "F1", -1, t);
  vt_set (&b, f, "flow", 0.01);
  int v = vt_unit (&b, "valve", "V1", t, -1);
  vt_set (&b, v, "kv", 30);
  vt_set (&b, v, "opening", 0.5);
  int lc = -1, fc;
  if (master_first)
    lc = vt_unit (&b, "controller", "LC", t, oslot (b.kind[t], "level"));
  fc = loop (&b, "controller", "FC", v, "flow", v, "opening");
  if (!master_first)
    lc = vt_unit (&b, "controller", "LC", t, oslot (b.kind[t], "level"));
  b.ref[4 * lc + 2] = fc;
  b.ref[4 * lc + 3] = vt_slot (b.kind[fc], "setpoint");
  vt_set (&b, lc, "setpoint", 1);
  vt_set (&b, lc, "gain", 0.01);
  vt_set (&b, lc, "reset", 300);
  vt_set (&b, lc, "action", 0);
  vt_set (&b, lc, "bias", 0.01);
  vt_set (&b, fc, "setpoint", 0.01);
  vt_set (&b, fc, "gain", 20);
  vt_set (&b, fc, "reset", 5);
  vt_set (&b, fc, "lo", 0);
  vt_set (&b, fc, "hi", 1);
  const mv_par mv[] = {{0, "area"}, {1, "flow"}, {2, "kv"},
                       {lc, "setpoint"}, MV_END};
  /* states: volume, then each controller's (integral[, filter]); FC
   * inside its limits: u = 0.5 + 20 (sp - 0.011 + 0.001 / 5) */
  double x[4] = {NAN, NAN, NAN, NAN};
  x[master_first ? 1 : 3] = 2;             /* LC integral */
  x[master_first ? 2 : 1] = 0.001;         /* FC integral */
  x[master_first ? 3 : 2] = 0.011;         /* FC filtered flow */
  {
    /* the master's output must reach the slave in the same evaluation:
     * the same state twice gives the same balances */
    vn_net *net = NULL;
    double x0[4], f1[4], f2[4];
    if (vt_build (&b, &net) == VN_OK)
      {
        vn_initial_state (net, x0);
        for (int i = 0; i < 4; i++)
          if (!isnan (x[i]))
            x0[i] = x[i];
        vn_rhs (net, 0, x0, f1);
        x0[master_first ? 1 : 3] += 50;
        vn_rhs (net, 0, x0, f2);
        x0[master_first ? 1 : 3] -= 50;
        vn_rhs (net, 0, x0, f2);
        VT_CHECK (f1[0] == f2[0], "%s: T1 volume balance the same at the "
                  "same state after another evaluation (%.12g, %.12g)",
                  master_first ? "cascade, master first"
                               : "cascade, slave first", f1[0], f2[0]);
      }
    vn_net_free (net);
  }
  check_net (master_first ? "cascade, master listed first"
                          : "cascade, slave listed first", &b, x, mv, 0);
}

/* Level switch on a pump, on 2 m / off 1 m (empties T1): the pump's
 * speed is piecewise constant, so its derivative in the states is zero
 * in either mode and the Jacobian is the plant's at that speed. */
static int switched (vt_net *b, double level)
{
  vt_init (b);
  int t = prism (b, "T1", 2, level);
  int f = vt_unit (b, "feed", "F1", -1, t);
  vt_set (b, f, "flow", 0.01);
  int o = vt_unit (b, "orifice", "O1", t, -1);
  vt_set (b, o, "coeff", 0.005);
  int p = vt_unit (b, "pump", "P1", t, -1);
  vt_set (b, p, "flow", 0.03);
  vt_set (b, p, "speed", 0);
  int s = loop (b, "switch", "LS", t, "level", p, "speed");
  vt_set (b, s, "on", 2);
  vt_set (b, s, "off", 1);
  return s;
}

static void switches (void)
{
  vt_net b;
  const mv_par mv[] = {{0, "area"}, {1, "flow"}, {2, "coeff"},
                       {3, "flow"}, MV_END};
  for (int mode = 0; mode < 2; mode++)
    {
      double level = mode ? 2.5 : 1.5;
      int s = switched (&b, level);
      vn_net *net = NULL;
      if (vt_build (&b, &net) != VN_OK)
        {
          VT_CHECK (0, "switch: builds (%s)", b.msg);
          return;
        }
      /* the mode is taken at the start of a run */
      double x[1], t[2] = {0, 1e-3}, X[2], Y[64];
      vn_sim_stats stats;
      vn_initial_state (net, x);
      int st = vn_simulate (net, x, 2, t, X, Y, NULL, &stats);
      double y[64];
      vn_outputs (net, 0, x, y);
      double want = mode ? 1 : 0;
      VT_CHECK (st == VN_OK && y[vt_yidx (&b, net, s, "output")] == want
                && y[vt_yidx (&b, net, 3, "flow")] == 0.03 * want,
                "switch at level %g: output %g (want %g), pump flow %g", level,
                y[vt_yidx (&b, net, s, "output")], want,
                y[vt_yidx (&b, net, 3, "flow")]);
      vn_net_free (net);
      check_net (mode ? "switch on (level above on), pump running"
                      : "switch off (level inside the band), pump stopped",
                 &b, NULL, mv, 1);
    }
}

int main (void)
{
  pi_controllers ();
  pid_controllers ();
  flow_loops ();
  cascade (1);
  cascade (0);
  switches ();
  return vt_done ();
}

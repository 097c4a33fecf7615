/* Failure paths of the core: every refusal returns a status and a message
 * and frees what it took.  The leak checks themselves are made by
 * LeakSanitizer when "make sanitize" runs this program; here each path is
 * reached and its status and message are checked.
 *   - integrator failures (CVODES flag names are malloc'ed by SUNDIALS)
 *   - argument errors of vn_simulate_sens (recorded outputs, sensitivity
 *     parameters and outputs) and the switch-count limit
 *   - strapping tables whose offset or count lies outside vn_spec.ntab
 *   - a signal whose data offset is negative
 *   - a table network written to a cluster job file and read back: the
 *     spec read back carries the table length, so it builds */
#define _POSIX_C_SOURCE 200809L
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <unistd.h>
#include "vn.h"
#include "vn_jobfile.h"
#include "vn_test.h"

/* feed -> T1 -> orifice: fills towards h = (F/c)^2 = 1.44 m */
static int small_net (vt_net *b)
{
  vt_init (b);
  int t = vt_unit (b, "tank", "T1", -1, -1);
  vt_set (b, t, "area", 2);
  vt_set (b, t, "level", 1);
  int o = vt_unit (b, "orifice", "O1", t, -1);
  vt_set (b, o, "coeff", 0.01);
  int f = vt_unit (b, "feed", "F1", -1, t);
  vt_set (b, f, "flow", 0.012);
  return t;
}

enum { NT = 11 };

static void integrator_failure (void)
{
  vt_net b;
  vn_net *net = NULL;
  small_net (&b);
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "network builds (%s)", b.msg);
      return;
    }
  double tout[NT], X[NT], Y[NT * 8], x0[1];
  for (int k = 0; k < NT; k++)
    tout[k] = 1e4 * k;
  vn_initial_state (net, x0);
  vn_sim_opts op = {0};
  op.maxsteps = 2;          /* too few for 1e4 s: CV_TOO_MUCH_WORK */
  vn_sim_stats s;
  /* repeated, as inside a fit loop: each failure must free its flag name */
  for (int rep = 0; rep < 3; rep++)
    {
      int st = vn_simulate (net, x0, NT, tout, X, Y, &op, &s);
      VT_CHECK (st == VN_ESOLVER, "run %d: too few steps is a solver "
                "failure (status %d)", rep + 1, st);
      VT_CHECK (strstr (vn_errmsg (net), "CV_TOO_MUCH_WORK") != NULL,
                "run %d: message names the CVODES flag (%s)", rep + 1,
                vn_errmsg (net));
    }
  /* the handle is still good */
  op.maxsteps = 0;
  int st = vn_simulate (net, x0, NT, tout, X, Y, &op, &s);
  VT_CHECK (st == VN_OK, "the handle runs after failures (%d: %s)", st,
            vn_errmsg (net));
  VT_NEAR (X[NT - 1], 2 * 1.44, 1e-3, "volume after 1e5 s (m3), "
           "Torricelli h = (F/c)^2 (memory)");
  vn_net_free (net);
}

static void sens_argument_errors (void)
{
  vt_net b;
  vn_net *net = NULL;
  int t = small_net (&b);
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "network builds (%s)", b.msg);
      return;
    }
  double tout[NT], X[NT], Y[NT * 8], YS[NT], x0[1], sx0[1] = {0};
  for (int k = 0; k < NT; k++)
    tout[k] = 10.0 * k;
  vn_initial_state (net, x0);
  int yl = vt_yidx (&b, net, t, "level");
  int pf = vt_pidx (&b, net, 2, "flow");
  vn_sim_stats s;

  /* a recorded output outside the network */
  int badrec[2] = {yl, 999};
  vn_sim_opts op = {0};
  op.nyrec = 2;
  op.yrec = badrec;
  int st = vn_simulate (net, x0, NT, tout, X, Y, &op, &s);
  VT_CHECK (st == VN_EARG && strstr (vn_errmsg (net), "recorded output 2"),
            "recorded output out of range refused (%d: %s)", st,
            vn_errmsg (net));

  /* sensitivity parameter, then output, outside the network, with a
   * record list allocated before them */
  int goodrec[1] = {yl};
  op.nyrec = 1;
  op.yrec = goodrec;
  int pbad[1] = {-3}, pgood[1] = {pf}, ybad[1] = {4242}, ygood[1] = {yl};
  vn_sens sn = {0};
  sn.np = 1;
  sn.pidx = pbad;
  sn.x0 = sx0;
  sn.ny = 1;
  sn.yout = ygood;
  sn.YS = YS;
  st = vn_simulate_sens (net, x0, NT, tout, X, Y, &op, &s, &sn);
  VT_CHECK (st == VN_EARG && strstr (vn_errmsg (net), "sensitivity "
                                     "parameter 1"),
            "sensitivity parameter out of range refused (%d: %s)", st,
            vn_errmsg (net));
  VT_CHECK (sn.yrow == NULL, "no row map left behind");
  sn.pidx = pgood;
  sn.yout = ybad;
  st = vn_simulate_sens (net, x0, NT, tout, X, Y, &op, &s, &sn);
  VT_CHECK (st == VN_EARG && strstr (vn_errmsg (net), "sensitivity output "
                                     "1 has index 4242"),
            "sensitivity output out of range refused (%d: %s)", st,
            vn_errmsg (net));
  VT_CHECK (sn.yrow == NULL, "row map freed on the refusal");

  /* and the good call works: d level / d feed flow at t = 100 s is
   * about t / area = 50 s/m2 early on (the orifice drains a little) */
  sn.yout = ygood;
  st = vn_simulate_sens (net, x0, NT, tout, X, Y, &op, &s, &sn);
  VT_CHECK (st == VN_OK, "sensitivity run after refusals (%d: %s)", st,
            vn_errmsg (net));
  VT_CHECK (YS[NT - 1] > 40 && YS[NT - 1] < 50,
            "d level/d flow at 100 s is a little under 100/2 = 50 (got %g)",
            YS[NT - 1]);
  vn_net_free (net);
}

/* 65 level switches, each on its own pump: one more than supported. */
static void too_many_switches (void)
{
  static vt_net b;
  vn_net *net = NULL;
  vt_init (&b);
  int t = vt_unit (&b, "tank", "T1", -1, -1);
  vt_set (&b, t, "area", 2);
  vt_set (&b, t, "level", 1);
  static char names[2 * 65][16];
  int lvl = -1;
  for (int i = 0; i < vn_kind_nout (b.kind[t]); i++)
    if (strcmp (vn_kind_out_name (b.kind[t], i), "level") == 0)
      lvl = i;
  for (int i = 0; i < 65; i++)
    {
      snprintf (names[2 * i], 16, "P%d", i + 1);
      snprintf (names[2 * i + 1], 16, "S%d", i + 1);
      int p = vt_unit (&b, "pump", names[2 * i], t, -1);
      vt_set (&b, p, "flow", 1e-4);
      vt_set (&b, p, "speed", 0);
      int s = vt_unit (&b, "switch", names[2 * i + 1], t, lvl);
      b.ref[4 * s + 2] = p;
      b.ref[4 * s + 3] = vt_slot (b.kind[p], "speed");
      vt_set (&b, s, "on", 2);
      vt_set (&b, s, "off", 1);
    }
  int st = vt_build (&b, &net);
  VT_CHECK (st == VN_OK, "65 switches build (%s)", b.msg);
  if (st)
    return;
  double tout[NT], X[NT], x0[1];
  for (int k = 0; k < NT; k++)
    tout[k] = k;
  vn_initial_state (net, x0);
  int rec[1] = {0};
  vn_sim_opts op = {0};
  op.nyrec = 1;
  op.yrec = rec;
  double Y[NT];
  vn_sim_stats s;
  st = vn_simulate (net, x0, NT, tout, X, Y, &op, &s);
  VT_CHECK (st == VN_EARG && strstr (vn_errmsg (net), "at most 64 "
                                     "switches"),
            "65 switches refused (%d: %s)", st, vn_errmsg (net));
  vn_net_free (net);
}

/* A table tank whose table lies (or not) inside the packed pairs. */
static int table_tank (vt_net *b)
{
  vt_init (b);
  int t = vt_unit (b, "tank", "T1", -1, -1);
  vt_set (b, t, "shape", 4);
  vt_set (b, t, "level", 0.5);
  static const double tab[] = {0, 0, 1, 2, 2, 5};
  vt_table (b, t, tab, 3);
  int o = vt_unit (b, "orifice", "O1", t, -1);
  vt_set (b, o, "coeff", 0.01);
  return t;
}

static void table_bounds (void)
{
  vt_net b;
  vn_net *net = NULL;
  int t = table_tank (&b);
  int st = vt_build (&b, &net);
  VT_CHECK (st == VN_OK, "table tank inside its pairs builds (%s)", b.msg);
  double x0[1] = {NAN};
  if (!st)
    vn_initial_state (net, x0);
  VT_NEAR (x0[0], 1.0, 1e-12, "volume at level 0.5 in [0 0; 1 2; 2 5] "
           "(m3, linear between rows)");
  vn_net_free (net);

  struct { int off, len; long ntab; int nulltab; const char *want; } c[] = {
    {-100000000, 3, 3, 0, "lie outside the 3 packed"},
    {-1, 3, 3, 0, "rows 0 to 2 lie outside"},
    {1, 3, 3, 0, "rows 2 to 4 lie outside"},
    {0, 3, 2, 0, "lie outside the 2 packed"},
    {0, -2, 3, 0, "table row count must be 0 or more, got -2"},
    {0, 3, 3, 1, "lie outside the 0 packed"},
    {2147483000, 3, 3, 0, "lie outside"},
    {0, 3, -5, 0, "table length must be 0 or more pairs, got -5"},
  };
  for (size_t i = 0; i < sizeof c / sizeof c[0]; i++)
    {
      /* vt_build fills b.spec; then the table fields are spoilt */
      table_tank (&b);
      net = NULL;
      vt_build (&b, &net);
      vn_net_free (net);
      net = NULL;
      b.taboff[t] = c[i].off;
      b.tablen[t] = c[i].len;
      b.spec.ntab = c[i].ntab;
      b.spec.tab = c[i].nulltab ? NULL : b.tab;
      st = vn_net_new (&b.spec, &net, b.msg, sizeof b.msg);
      VT_CHECK (st == VN_EARG && net == NULL && strstr (b.msg, c[i].want)
                && (c[i].ntab < 0 || strstr (b.msg, "tank \"T1\"")),
                "table offset %d, count %d, %ld pairs%s refused: %s",
                c[i].off, c[i].len, c[i].ntab,
                c[i].nulltab ? ", no data" : "", b.msg);
      vn_net_free (net);
    }
  /* a count of zero ignores the offset: no table, a prism needs area */
  table_tank (&b);
  b.taboff[t] = -7;
  b.tablen[t] = 0;
  net = NULL;
  st = vt_build (&b, &net);
  VT_CHECK (st == VN_EARG && strstr (b.msg, "table needs at least 2 rows"),
            "no rows: the tank's own check speaks (%s)", b.msg);
  vn_net_free (net);
}

static void signal_offset (void)
{
  vt_net b;
  vn_net *net = NULL;
  small_net (&b);
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "network builds (%s)", b.msg);
      return;
    }
  int unit[1] = {2}, slot[1] = {vt_slot (b.kind[2], "flow")};
  int off[1] = {-4}, len[1] = {1}, hold[1] = {0};
  double data[2] = {0, 0.01};
  int st = vn_set_signals (net, 1, unit, slot, off, len, hold, data);
  VT_CHECK (st == VN_EARG && strstr (vn_errmsg (net), "data offset -4"),
            "negative signal offset refused (%d: %s)", st, vn_errmsg (net));
  off[0] = 0;
  st = vn_set_signals (net, 1, unit, slot, off, len, hold, data);
  VT_CHECK (st == VN_OK, "the same signal at offset 0 is taken (%s)",
            vn_errmsg (net));
  vn_net_free (net);
}

static void job_file_table (void)
{
  vt_net b;
  table_tank (&b);
  vn_net *net = NULL;
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "table network builds (%s)", b.msg);
      return;
    }
  vn_net_free (net);
  double tout[2] = {0, 10};
  vn_ens_job job = {0};
  job.spec = &b.spec;
  job.nt = 2;
  job.tout = tout;
  job.nrun = 1;
  char path[] = "/tmp/vn_test_robust_XXXXXX", err[512] = "";
  int fd = mkstemp (path);
  if (fd < 0)
    {
      VT_CHECK (0, "temporary job file");
      return;
    }
  close (fd);
  int st = vn_job_write (path, &job, err, sizeof err);
  VT_CHECK (st == VN_OK, "job with a table tank written (%s)", err);
  unsigned char *buf = NULL;
  size_t len = 0;
  vn_job_store js;
  memset (&js, 0, sizeof js);
  if (!st)
    st = vn_file_read (path, &buf, &len, err, sizeof err);
  if (!st)
    st = vn_job_parse (buf, len, &js, err, sizeof err);
  VT_CHECK (st == VN_OK, "job read back (%s)", err);
  if (!st)
    {
      VT_CHECK (js.spec.ntab == 3, "table length read back: %ld pairs (want "
                "3)", js.spec.ntab);
      net = NULL;
      char msg[1024] = "";
      st = vn_net_new (&js.spec, &net, msg, sizeof msg);
      VT_CHECK (st == VN_OK, "the job's network builds (%s)", msg);
      double x0[1] = {NAN};
      if (!st)
        vn_initial_state (net, x0);
      VT_NEAR (x0[0], 1.0, 1e-12, "volume at level 0.5 after the round "
               "trip (m3)");
      vn_net_free (net);
      vn_job_free (&js);
    }
  free (buf);
  remove (path);
}

int main (void)
{
  integrator_failure ();
  sens_argument_errors ();
  too_many_switches ();
  table_bounds ();
  signal_offset ();
  job_file_table ();
  return vt_done ();
}

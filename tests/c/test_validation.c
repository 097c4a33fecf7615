/* Every refusal of the core: the status is VN_EARG and the message names
 * the unit (or "network") and the field at fault, so that a user reading
 * it knows what to change. */
#include "vn_test.h"

/* strstr of up to three needles; NULL needles are skipped. */
static int has (const char *msg, const char *a, const char *b, const char *c)
{
  return (!a || strstr (msg, a)) && (!b || strstr (msg, b))
         && (!c || strstr (msg, c));
}

/* Builds b and expects a refusal naming a, b2 and c. */
static void refuse (const char *label, vt_net *b, const char *a,
                    const char *b2, const char *c)
{
  vn_net *net = NULL;
  int st = vt_build (b, &net);
  VT_CHECK (st == VN_EARG && net == NULL && has (b->msg, a, b2, c),
            "%s: status %d, message \"%s\"", label, st, b->msg);
  vn_net_free (net);
}

/* The smallest valid network, to be spoiled one field at a time. */
static void base (vt_net *b)
{
  vt_init (b);
  int t = vt_unit (b, "tank", "T1", -1, -1);
  vt_set (b, t, "area", 1);
  vt_set (b, t, "level", 1);
  int o = vt_unit (b, "orifice", "O1", t, -1);
  vt_set (b, o, "coeff", 0.01);
}

static int tank_of (vt_net *b, const char *name, int shape)
{
  int t = vt_unit (b, "tank", name, -1, -1);
  vt_set (b, t, "shape", shape);
  return t;
}

static void network_level (void)
{
  vt_net b;
  vn_net *net = NULL;
  char msg[256] = "";

  int st = vn_net_new (NULL, &net, msg, sizeof msg);
  VT_CHECK (st == VN_EARG && has (msg, "network", "no units", NULL),
            "NULL spec: status %d, \"%s\"", st, msg);

  vt_init (&b);
  refuse ("empty network", &b, "network", "no units", NULL);

  base (&b);
  b.spec.gravity = 0;
  refuse ("gravity 0", &b, "network", "gravity", NULL);
  base (&b);
  b.spec.density = NAN;
  refuse ("density NaN", &b, "network", "density", NULL);
  base (&b);
  b.spec.cp = -1;
  refuse ("cp negative", &b, "network", "cp", NULL);
  base (&b);
  b.spec.ambient = INFINITY;
  refuse ("ambient Inf", &b, "network", "ambient", NULL);
  base (&b);
  b.spec.smooth = 0.5;
  refuse ("smooth 0.5 m", &b, "network", "smooth", NULL);
  base (&b);
  b.spec.nspecies = 17;
  refuse ("17 species", &b, "network", "species", NULL);
  {
    static const double decay[] = {0.1, -1};
    base (&b);
    b.spec.nspecies = 2;
    b.spec.decay = decay;
    refuse ("negative decay", &b, "network", "decay of species 2", NULL);
  }

  vt_init (&b);
  {
    int u = vt_unit (&b, "boundary", "B1", -1, -1);
    vt_set (&b, u, "head", 1);
  }
  refuse ("no tanks", &b, "network", "no tanks", NULL);

  base (&b);
  b.kind[1] = 999;
  refuse ("unknown kind code", &b, "O1", "kind code 999", NULL);

  base (&b);
  b.ref[4 * 1 + 1] = 7;
  refuse ("reference outside the network", &b, "O1", "reference 2", "7");
}

/* The schema's generic range checks, on several kinds. */
static void ranges (void)
{
  vt_net b;

  base (&b);
  vt_set (&b, 0, "area", NAN);
  refuse ("NaN area", &b, "T1", "area", "NaN");
  base (&b);
  vt_set (&b, 0, "area", -2);
  refuse ("negative area", &b, "T1", "area", "-2");
  base (&b);
  vt_set (&b, 0, "area", INFINITY);
  refuse ("infinite area", &b, "T1", "area", "finite");
  base (&b);
  vt_set (&b, 0, "shape", 1.5);
  refuse ("shape code 1.5", &b, "T1", "shape", "integer");
  base (&b);
  vt_set (&b, 0, "shape", 7);
  refuse ("shape code 7", &b, "T1", "shape", "7");

  vt_init (&b);
  {
    int t = tank_of (&b, "T1", 0);
    vt_set (&b, t, "area", 1);
    int o = vt_unit (&b, "orifice", "O1", t, -1);
    vt_set (&b, o, "diameter", -0.05);
  }
  refuse ("negative orifice diameter", &b, "O1", "diameter", "-0.05");

  base (&b);
  {
    int v = vt_unit (&b, "valve", "V1", 0, -1);
    vt_set (&b, v, "kv", 10);
    vt_set (&b, v, "opening", 1.5);
  }
  refuse ("valve opening 1.5", &b, "V1", "opening", "1.5");

  base (&b);
  {
    int p = vt_unit (&b, "pump", "P1", 0, -1);
    vt_set (&b, p, "flow", 0.01);
    vt_set (&b, p, "speed", -1);
  }
  refuse ("pump speed -1", &b, "P1", "speed", "-1");
}

static void tanks (void)
{
  vt_net b;
  int t;

  base (&b);
  vt_set (&b, 0, "diameter", 1);
  refuse ("prism with area and diameter", &b, "T1", "area", "diameter");

  vt_init (&b);
  tank_of (&b, "T1", 0);
  refuse ("prism with neither area nor diameter", &b, "T1", "area",
          "diameter");

  vt_init (&b);
  t = tank_of (&b, "H1", 1);
  vt_set (&b, t, "diameter", 2);
  refuse ("horizontal cylinder without length", &b, "H1", "length", NULL);

  vt_init (&b);
  tank_of (&b, "S1", 2);
  refuse ("sphere without diameter", &b, "S1", "diameter", NULL);

  vt_init (&b);
  t = tank_of (&b, "C1", 3);
  vt_set (&b, t, "diameter", 2);
  refuse ("cone without height", &b, "C1", "height", NULL);

  vt_init (&b);
  t = tank_of (&b, "S1", 2);
  vt_set (&b, t, "diameter", 4);
  vt_set (&b, t, "rim", 4.5);
  refuse ("rim above a sphere's top", &b, "S1", "rim 4.5", "sphere");

  vt_init (&b);
  t = tank_of (&b, "S1", 2);
  vt_set (&b, t, "diameter", 4);
  vt_set (&b, t, "level", 5);
  refuse ("level above a sphere's top", &b, "S1", "level 5", "sphere");

  {
    static const double one[] = {0, 0};
    vt_init (&b);
    t = tank_of (&b, "TB", 4);
    vt_table (&b, t, one, 1);
    refuse ("table of one row", &b, "TB", "table", "2 rows");
  }
  {
    static const double bad[] = {0, 0, 1, 2, 0.5, 3};
    vt_init (&b);
    t = tank_of (&b, "TB", 4);
    vt_table (&b, t, bad, 3);
    refuse ("table with falling level", &b, "TB", "table", "row 3");
  }
  {
    static const double bad[] = {0, 0, 1, 2, 2, 1.5};
    vt_init (&b);
    t = tank_of (&b, "TB", 4);
    vt_table (&b, t, bad, 3);
    refuse ("table with falling volume", &b, "TB", "increase", "row 3");
  }
  {
    static const double bad[] = {0, 0, 1, NAN};
    vt_init (&b);
    t = tank_of (&b, "TB", 4);
    vt_table (&b, t, bad, 2);
    refuse ("table with NaN volume", &b, "TB", "table row 2", "finite");
  }
  {
    /* a strapping table has a top (its last row): rim, initial level and
     * volume above it are refused, and so is a rim of Inf */
    static const double tab[] = {0, 0, 1, 2, 2, 5};
    static const struct { const char *field; double v; const char *want; }
    c[] = {{"rim", 2.5, "rim 2.5"}, {"rim", INFINITY, "rim inf"},
           {"level", 2.1, "level 2.1"}, {"volume", 5.5, "volume 5.5"}};
    for (int i = 0; i < 4; i++)
      {
        vt_init (&b);
        t = tank_of (&b, "TB", 4);
        vt_table (&b, t, tab, 3);
        vt_set (&b, t, c[i].field, c[i].v);
        refuse (c[i].want, &b, "TB", c[i].want, "top of the strapping table");
      }
    /* at the top itself it builds */
    vt_init (&b);
    t = tank_of (&b, "TB", 4);
    vt_table (&b, t, tab, 3);
    vt_set (&b, t, "rim", 2);
    vt_set (&b, t, "level", 2);
    vn_net *ok = NULL;
    VT_CHECK (vt_build (&b, &ok) == VN_OK, "table tank at its top builds (%s)",
              b.msg);
    vn_net_free (ok);
  }

  base (&b);
  vt_set (&b, 0, "volume", 2);
  refuse ("level and volume both", &b, "T1", "level", "volume");

  base (&b);
  b.ref[0] = 0;
  refuse ("spill into itself", &b, "T1", "spill", "same tank");

  base (&b);
  {
    int r = vt_unit (&b, "boundary", "RIVER", -1, -1);
    vt_set (&b, r, "head", 0);
    b.ref[0] = r;
  }
  refuse ("spill into a boundary", &b, "T1", "spill", "RIVER");

  base (&b);
  vt_set (&b, 0, "ua", 10);
  refuse ("ua in a network that is not thermal", &b, "T1", "ua",
          "thermal");
}

static void links (void)
{
  vt_net b;
  int o;

  base (&b);
  b.ref[4] = -1;
  refuse ("link without source", &b, "O1", "source", "missing");

  base (&b);
  b.ref[5] = 1;
  refuse ("link joined to itself", &b, "O1", "itself", NULL);

  base (&b);
  o = vt_unit (&b, "orifice", "O2", 1, 0);
  vt_set (&b, o, "coeff", 0.01);
  refuse ("link whose source is a link", &b, "O2", "source", "O1");

  base (&b);
  o = vt_unit (&b, "orifice", "O2", 0, 1);
  vt_set (&b, o, "coeff", 0.01);
  refuse ("link whose destination is a link", &b, "O2", "destination",
          "O1");

  base (&b);
  b.ref[5] = 0;
  refuse ("link from a tank to the same tank", &b, "O1", "same unit",
          "T1");

  base (&b);
  {
    int r1 = vt_unit (&b, "boundary", "MAIN", -1, -1);
    int r2 = vt_unit (&b, "boundary", "RIVER", -1, -1);
    vt_set (&b, r1, "head", 5);
    vt_set (&b, r2, "head", 0);
    o = vt_unit (&b, "resistance", "R1", r1, r2);
    vt_set (&b, o, "r", 100);
  }
  refuse ("two boundaries joined", &b, "R1", "no tank", "MAIN");

  base (&b);
  vt_set (&b, 1, "diameter", 0.05);
  refuse ("orifice with coeff and diameter", &b, "O1", "coeff",
          "not both");

  vt_init (&b);
  {
    int t = tank_of (&b, "T1", 0);
    vt_set (&b, t, "area", 1);
    vt_unit (&b, "orifice", "O1", t, -1);
  }
  refuse ("orifice with neither coeff nor diameter", &b, "O1", "coeff",
          "neither");

  base (&b);
  vt_set (&b, 1, "cd", 0.6);
  refuse ("orifice with cd beside coeff", &b, "O1", "cd", "coeff");

  base (&b);
  vt_unit (&b, "resistance", "R1", 0, -1);
  refuse ("resistance without r", &b, "R1", "r (s/m2)", NULL);

  base (&b);
  vt_unit (&b, "valve", "V1", 0, -1);
  refuse ("valve without kv", &b, "V1", "kv", NULL);

  base (&b);
  o = vt_unit (&b, "pump", "P1", 0, -1);
  vt_set (&b, o, "flow", 0.01);
  vt_set (&b, o, "shutoff", 20);
  vt_set (&b, o, "k", 1e4);
  refuse ("pump in both modes", &b, "P1", "flow", "not both");

  base (&b);
  o = vt_unit (&b, "pump", "P1", 0, -1);
  vt_set (&b, o, "shutoff", 20);
  refuse ("curve pump without k", &b, "P1", "shutoff", "k");
}

static void feeds_boundaries (void)
{
  vt_net b;
  int u;

  base (&b);
  u = vt_unit (&b, "boundary", "MAIN", -1, -1);
  vt_set (&b, u, "head", 3);
  u = vt_unit (&b, "feed", "F1", -1, u);
  refuse ("feed into a boundary", &b, "F1", "MAIN", "tank");

  base (&b);
  vt_unit (&b, "feed", "F1", -1, -1);
  refuse ("feed without destination", &b, "F1", "destination", "none");

  base (&b);
  u = vt_unit (&b, "feed", "F1", -1, 0);
  vt_set (&b, u, "temperature", 20);
  refuse ("feed temperature, not thermal", &b, "F1", "temperature",
          "thermal");

  base (&b);
  vt_unit (&b, "boundary", "MAIN", -1, -1);
  refuse ("boundary without head", &b, "MAIN", "head", "required");

  base (&b);
  u = vt_unit (&b, "boundary", "MAIN", -1, -1);
  vt_set (&b, u, "head", 3);
  vt_set (&b, u, "temperature", 20);
  refuse ("boundary temperature, not thermal", &b, "MAIN", "temperature",
          "thermal");
}

/* Refusals after the network is built: signals, parameter setting,
 * linearisation, sparse capacity, simulation arguments. */
static void after_build (void)
{
  vt_net b;
  vn_net *net = NULL;
  int st;
  base (&b);
  int f = vt_unit (&b, "feed", "F1", -1, 0);
  vt_set (&b, f, "flow", 0.001);
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "after build: network builds (%s)", b.msg);
      return;
    }
  int fslot = vt_slot (b.kind[f], "flow");
  int aslot = vt_slot (b.kind[0], "area");
  double data[] = {0, 0, 100, 0.01, 50, 0.02};
  int off = 0, len = 2, unit = 0;

  st = vn_set_signals (net, 1, &unit, &aslot, &off, &len, NULL, data);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "T1", "no input",
                                  "(area)"),
            "signal on a non-input (tank area): \"%s\"", vn_errmsg (net));
  unit = 9;
  st = vn_set_signals (net, 1, &unit, &fslot, &off, &len, NULL, data);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "signal 1", "unit index",
                                  "9"),
            "signal on unit 9: \"%s\"", vn_errmsg (net));
  unit = f;
  len = 0;
  st = vn_set_signals (net, 1, &unit, &fslot, &off, &len, NULL, data);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "F1.flow", "no points",
                                  NULL),
            "signal without points: \"%s\"", vn_errmsg (net));
  len = 3;
  st = vn_set_signals (net, 1, &unit, &fslot, &off, &len, NULL, data);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "F1.flow", "decrease",
                                  "point 3"),
            "signal with decreasing times: \"%s\"", vn_errmsg (net));
  data[3] = NAN;
  len = 2;
  st = vn_set_signals (net, 1, &unit, &fslot, &off, &len, NULL, data);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "F1.flow", "not finite",
                                  "point 2"),
            "signal with a NaN value: \"%s\"", vn_errmsg (net));
  data[3] = 3e6;     /* beyond the feed's 1e6 m3/s, as at declaration */
  st = vn_set_signals (net, 1, &unit, &fslot, &off, &len, NULL, data);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "F1.flow", "point 2",
                                  "3e+06 lies outside [-1e+06, 1e+06]"),
            "signal beyond the feed's range: \"%s\"", vn_errmsg (net));
  data[3] = -1e6;
  st = vn_set_signals (net, 1, &unit, &fslot, &off, &len, NULL, data);
  VT_CHECK (st == VN_OK, "signal at the end of the feed's range: \"%s\"",
            st ? vn_errmsg (net) : "ok");

  st = vn_param_set (net, 999, 1);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "parameter index 999",
                                  NULL, NULL),
            "vn_param_set index 999: \"%s\"", vn_errmsg (net));
  int pa = vn_param_index (net, 0, aslot);
  st = vn_param_set (net, pa, -1);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "T1", "area", "-1")
            && vn_param_get (net, pa) == 1,
            "vn_param_set area -1 refused, area kept at %g: \"%s\"",
            vn_param_get (net, pa), vn_errmsg (net));
  int po = vn_param_index (net, 1, vt_slot (b.kind[1], "diameter"));
  st = vn_param_set (net, po, 0.05);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "O1", "coeff", "not both"),
            "vn_param_set diameter beside coeff refused by the kind: \"%s\"",
            vn_errmsg (net));

  double x[1] = {1}, A[1], B[1];
  int pin = 999, yout = 0;
  st = vn_linearize_dense (net, 0, x, 1, &pin, 1, &yout, A, B, NULL, NULL);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "input 1", "999", NULL),
            "linearize with parameter 999: \"%s\"", vn_errmsg (net));
  pin = pa;
  yout = 99;
  st = vn_linearize_dense (net, 0, x, 1, &pin, 1, &yout, A, B, NULL, NULL);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "output 1", "99", NULL),
            "linearize with output 99: \"%s\"", vn_errmsg (net));

  long nnz = 0, cp[2], ri[1];
  double v[1];
  st = vn_jac_csc (net, 0, x, &nnz, cp, ri, v);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "sparse", "room for 0",
                                  NULL),
            "sparse Jacobian without room: \"%s\"", vn_errmsg (net));

  double t[2] = {0, 0}, X[2];
  vn_sim_stats stats;
  st = vn_simulate (net, x, 0, t, X, NULL, NULL, &stats);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "simulate", "output times",
                                  NULL),
            "simulate with no times: \"%s\"", vn_errmsg (net));
  st = vn_simulate (net, x, 2, t, X, NULL, NULL, &stats);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "simulate", "increasing",
                                  "time 2"),
            "simulate with repeated times: \"%s\"", vn_errmsg (net));
  t[1] = 10;
  x[0] = NAN;
  st = vn_simulate (net, x, 2, t, X, NULL, NULL, &stats);
  VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "T1.volume",
                                  "not finite", NULL),
            "simulate from a NaN volume: \"%s\"", vn_errmsg (net));
  vn_net_free (net);
}

static void loops_heaters_species (void);

int main (void)
{
  network_level ();
  ranges ();
  tanks ();
  links ();
  feeds_boundaries ();
  after_build ();
  loops_heaters_species ();
  return vt_done ();
}

/* ---- controllers, switches, heaters, species count ---- */

/* T1 with a valve out, and a controller or switch kind on T1.level
 * driving V1.opening (refs overridable by the caller). */
static int looped (vt_net *b, const char *kind, const char *name)
{
  base (b);
  int v = vt_unit (b, "valve", "V1", 0, -1);
  vt_set (b, v, "kv", 10);
  vt_set (b, v, "opening", 0.5);
  int c = vt_unit (b, kind, name, 0, 0);   /* T1, output "level" */
  b->ref[4 * c + 2] = v;
  b->ref[4 * c + 3] = vt_slot (b->kind[v], "opening");
  if (strcmp (kind, "controller") == 0)
    {
      vt_set (b, c, "setpoint", 1);
      vt_set (b, c, "gain", 0.5);
    }
  else
    {
      vt_set (b, c, "on", 2);
      vt_set (b, c, "off", 1);
    }
  return c;
}

static void loops_heaters_species (void)
{
  vt_net b;
  int c;

  /* controller.c */
  c = looped (&b, "controller", "LC");
  b.given[c * vn_npmax () + vt_slot (b.kind[c], "setpoint")] = 0;
  refuse ("controller without setpoint", &b, "LC", "setpoint", "required");
  c = looped (&b, "controller", "LC");
  b.given[c * vn_npmax () + vt_slot (b.kind[c], "gain")] = 0;
  refuse ("controller without gain", &b, "LC", "gain", "required");
  c = looped (&b, "controller", "LC");
  vt_set (&b, c, "gain", 0);
  refuse ("controller gain 0", &b, "LC", "gain", "must not be 0");
  c = looped (&b, "controller", "LC");
  vt_set (&b, c, "lo", 0.8);
  vt_set (&b, c, "hi", 0.2);
  refuse ("controller lo above hi", &b, "LC", "lo < hi", "[0.8 0.2]");
  c = looped (&b, "controller", "FC");
  b.ref[4 * c] = 2;   /* measures V1.flow */
  vt_set (&b, c, "filter", 0);
  refuse ("controller on a flow with filter 0", &b, "FC", "filter > 0",
          "\"V1\"");

  /* loop.c, through a controller and a switch */
  c = looped (&b, "controller", "LC");
  b.ref[4 * c] = 1;   /* O1 has one output */
  b.ref[4 * c + 1] = 2;
  vt_set (&b, c, "filter", 1);
  refuse ("measure names no output of O1", &b, "LC", "measure",
          "unit 1, output 2");
  c = looped (&b, "switch", "LS");
  b.ref[4 * c] = -1;
  refuse ("switch measuring nothing", &b, "LS", "measure", "unit -1");
  c = looped (&b, "controller", "LC");
  b.ref[4 * c] = c;
  refuse ("controller measuring itself", &b, "LC", "its own output", NULL);
  c = looped (&b, "controller", "LC");
  b.ref[4 * c + 3] = vt_slot (b.kind[2], "kv");
  refuse ("manipulating valve kv (not an input)", &b, "LC", "manipulate",
          "input");
  c = looped (&b, "switch", "LS");
  b.ref[4 * c + 2] = -1;
  refuse ("switch manipulating nothing", &b, "LS", "manipulate", "input");
  c = looped (&b, "controller", "LC");
  b.ref[4 * c + 2] = c;
  b.ref[4 * c + 3] = vt_slot (b.kind[c], "setpoint");
  refuse ("controller driving its own setpoint", &b, "LC",
          "its own setpoint", NULL);
  c = looped (&b, "controller", "LC");
  {
    int s = vt_unit (&b, "switch", "LS", 0, 0);
    b.ref[4 * s + 2] = 2;
    b.ref[4 * s + 3] = vt_slot (b.kind[2], "opening");
    vt_set (&b, s, "on", 2);
    vt_set (&b, s, "off", 1);
  }
  refuse ("two units driving V1.opening", &b, "LS", "V1.opening",
          "already driven by \"LC\"");

  /* switch.c */
  c = looped (&b, "switch", "LS");
  b.given[c * vn_npmax () + vt_slot (b.kind[c], "off")] = 0;
  refuse ("switch without off", &b, "LS", "on and off", "required");
  c = looped (&b, "switch", "LS");
  vt_set (&b, c, "off", 2);
  refuse ("switch with on = off", &b, "LS", "equal", "(2)");

  /* heater.c */
  base (&b);
  c = vt_unit (&b, "heater", "H1", -1, 0);
  refuse ("heater in a network that is not thermal", &b, "H1", "thermal",
          NULL);
  base (&b);
  b.spec.thermal = 1;
  c = vt_unit (&b, "heater", "H1", -1, 1);
  refuse ("heater on an orifice", &b, "H1", "heat a tank", NULL);
  base (&b);
  b.spec.thermal = 1;
  c = vt_unit (&b, "heater", "H1", -1, -1);
  refuse ("heater on nothing", &b, "H1", "heat a tank", NULL);
  {
    vn_net *net = NULL;
    base (&b);
    b.spec.thermal = 1;
    c = vt_unit (&b, "heater", "H1", -1, 0);
    vt_set (&b, c, "lag", 20);
    int st = vt_build (&b, &net);
    VT_CHECK (st == VN_OK, "heater with lag 20 s builds (%s)",
              st ? b.msg : "ok");
    if (st == VN_OK)
      {
        int pl = vt_pidx (&b, net, c, "lag");
        st = vn_param_set (net, pl, 0);
        VT_CHECK (st == VN_EARG && has (vn_errmsg (net), "H1", "lag",
                                        "got 0")
                  && vn_param_get (net, pl) == 20,
                  "lag set to 0 on a lagged heater refused, kept %g: "
                  "\"%s\"", vn_param_get (net, pl), vn_errmsg (net));
      }
    vn_net_free (net);
  }

  /* the species count limit in net.c: 8 species at most */
  {
    static const double decay[9] = {0};
    base (&b);
    b.spec.nspecies = 9;
    b.spec.decay = decay;
    refuse ("9 species", &b, "network", "between 0 and 8", "got 9");
    base (&b);
    b.spec.nspecies = -1;
    refuse ("-1 species", &b, "network", "species", "got -1");
    vn_net *net = NULL;
    base (&b);
    b.spec.nspecies = 8;
    b.spec.decay = decay;
    int st = vt_build (&b, &net);
    VT_CHECK (st == VN_OK && vn_nstates (net) == 9, "8 species build: "
              "status %d, %d states (want 9)", st,
              net ? vn_nstates (net) : -1);
    vn_net_free (net);
  }
}

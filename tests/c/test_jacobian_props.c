/* Analytic derivatives of the energy and species balances and of
 * heaters against finite differences: df/dx (dense and sparse) and the
 * linearisation blocks B, C, D, parameters moved through vn_param_set.
 * Tanks carry V T and V c (conserved contents); flows carry their
 * upstream side's properties.  Tolerance as in test_jacobian.c: 1e-5
 * relative, floored at 1e-3 of the column's largest entry. */
#include "vn_check.h"
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

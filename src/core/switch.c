/* Switch: on/off action with a dead band (a level switch starting and
 * stopping a pump).  The output goes to onvalue when the measurement
 * crosses "on" moving away from "off", back to offvalue when it crosses
 * "off"; so on > off empties a tank and on < off fills one.  Switching
 * instants are found by the integrator's root finding, exactly; between
 * them the output is constant. */
#include <math.h>
#include "vn_internal.h"

enum { ON, OFF, OFFVALUE, ONVALUE, NPAR };
enum { D_MODE = 7 };

static const vn_param_info par[NPAR] = {
  {"on", NAN, -1e12, 1e12, "measured unit", 0},
  {"off", NAN, -1e12, 1e12, "measured unit", 0},
  {"offvalue", 0, -1e12, 1e12, "output unit", 0},
  {"onvalue", 1, -1e12, 1e12, "output unit", 0},
};
static const char *const out[] = {"output", "measurement"};
static const char *const ounit[] = {"output unit", "measured unit"};

static int check (vn_net *net, vn_unit *u)
{
  int st = vn_check_loop_refs (net, u);
  if (st)
    return st;
  if (!vn_given (net, u, ON) || !vn_given (net, u, OFF))
    return vn_fail_unit (net, u, "on and off set points are required");
  if (vn_par (net, u, ON) == vn_par (net, u, OFF))
    return vn_fail_unit (net, u, "on and off set points are equal (%g); "
                         "the dead band needs on != off",
                         vn_par (net, u, ON));
  const vn_unit *cu = &net->u[u->ref[2]];
  const vn_param_info *ci = &cu->k->par[u->ref[3]];
  for (int j = OFFVALUE; j <= ONVALUE; j++)
    {
      double v = vn_par (net, u, j);
      if (!(v >= ci->lo && v <= ci->hi))
        return vn_fail_unit (net, u, "%s %g lies outside the range of "
                             "%s.%s, [%g %g] (%s)", par[j].name, v,
                             cu->name, ci->name, ci->lo, ci->hi, ci->unit);
    }
  return VN_OK;
}

/* The root function: crosses zero upwards when the switch must change. */
double vn_switch_root (vn_net *net, vn_unit *u, const double *x)
{
  double on = net->p[u->poff + ON], off = net->p[u->poff + OFF];
  double s = on > off ? 1 : -1;
  double m = vn_measure (net, u, x, NULL);
  return u->d[D_MODE] ? s * (off - m) : s * (m - on);
}

void vn_switch_flip (vn_net *net, vn_unit *u)
{
  (void) net;
  u->d[D_MODE] = !u->d[D_MODE];
}

/* Start at offvalue unless the measurement starts beyond "on". */
void vn_switch_start (vn_net *net, vn_unit *u, const double *x)
{
  u->d[D_MODE] = 0;
  if (vn_switch_root (net, u, x) >= 0)
    u->d[D_MODE] = 1;
}

static double value (const vn_net *net, const vn_unit *u)
{
  return net->p[u->poff + (u->d[D_MODE] ? ONVALUE : OFFVALUE)];
}

static void pre (vn_net *net, vn_unit *u, const double *x)
{
  (void) x;
  u->q = value (net, u);
  u->dq.n = 0;
  net->p[net->u[u->ref[2]].poff + u->ref[3]] = u->q;
}

static void outputs (vn_net *net, vn_unit *u, const vn_node *nd,
                     const double *x, double *y, vn_lf *dy)
{
  (void) nd;
  y[0] = value (net, u);
  y[1] = vn_measure (net, u, x, dy ? &dy[1] : NULL);
}

const vn_kind vn_kind_switch = {
  "switch", VN_ROLE_OTHER, NPAR, par, 2, out, ounit, 0, 0,
  check, NULL, NULL, NULL, NULL, NULL, NULL, pre, NULL, outputs
};

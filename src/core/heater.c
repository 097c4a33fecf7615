/* Heater: a heat input (W) into a tank's energy balance, an input that
 * signals and controllers may drive, limited to "max", with an optional
 * first-order lag of the element (d(Q)/dt = (duty - Q) / lag).  Heat
 * reaches the liquid only while the level stands above "minlevel" (the
 * element covered; a low-level trip there is common practice): a smooth
 * gate over ten times the network's band, so a tank run dry while heated
 * keeps a bounded temperature. */
#include <math.h>
#include "smooth.h"
#include "vn_internal.h"

enum { DUTY, MAX, LAG, MINLEVEL, NPAR };

static const vn_param_info par[NPAR] = {
  {"duty", 0, -1e12, 1e12, "W", VN_P_INPUT},
  {"max", INFINITY, 0, 1e12, "W", VN_P_INF},
  {"lag", 0, 0, 1e6, "s", 0},
  {"minlevel", 0.05, 0, 1e5, "m", 0},
};
static const char *const out[] = {"duty"};
static const char *const ounit[] = {"W"};

static int check (vn_net *net, vn_unit *u)
{
  int d = u->ref[1];
  if (!net->thermal)
    return vn_fail_unit (net, u, "the network is not thermal; declare "
                         "vn_network (..., \"thermal\", true)");
  if (d < 0 || net->u[d].k != &vn_kind_tank)
    return vn_fail_unit (net, u, "it must heat a tank");
  if (u->nx && !(net->p0[u->poff + LAG] > 0))
    return vn_fail_unit (net, u, "lag must stay > 0 (s) on a heater built "
                         "with a lag, got %g", net->p0[u->poff + LAG]);
  return VN_OK;
}

static int nstates (const vn_net *net, const vn_unit *u)
{
  return net->p0[u->poff + LAG] > 0 ? 1 : 0;
}

static const char *state_var (const vn_unit *u, int i)
{
  (void) u;
  (void) i;
  return "duty";
}

/* the commanded duty, limited */
static double command (const vn_net *net, const vn_unit *u, double *d)
{
  double q = net->p[u->poff + DUTY], m = net->p[u->poff + MAX];
  *d = q < m ? 1 : 0;
  return q < m ? q : m;
}

static int init (vn_net *net, vn_unit *u, double *x)
{
  double d;
  x[0] = command (net, u, &d);
  return VN_OK;
}

static void own (vn_net *net, vn_unit *u, const double *x, double *f,
                 vn_lf *df)
{
  double lag = net->p[u->poff + LAG], d;
  double c = command (net, u, &d);
  f[u->xoff] = (c - x[u->xoff]) / lag;
  if (df)
    {
      vn_lf_x (&df[0], u->xoff, -1 / lag);
      vn_lf_p (&df[0], vn_pcol (u, DUTY), d / lag);
      vn_lf_p (&df[0], vn_pcol (u, MAX), (1 - d) / lag);
      vn_lf_p (&df[0], vn_pcol (u, LAG), -f[u->xoff] / lag);
    }
}

static double heat (vn_net *net, vn_unit *u, const vn_node *t,
                    const double *x, vn_lf *dQ)
{
  double d, Q;
  vn_lf dq;
  dq.n = 0;
  if (u->nx)
    {
      Q = x[u->xoff];
      vn_lf_x (&dq, u->xoff, 1);
    }
  else
    {
      Q = command (net, u, &d);
      vn_lf_p (&dq, vn_pcol (u, DUTY), d);
      vn_lf_p (&dq, vn_pcol (u, MAX), 1 - d);
    }
  double lmin = net->p[u->poff + MINLEVEL];
  double dg, g = vn_gate (t->level - lmin, 10 * net->smooth, &dg);
  vn_lf_axpy (dQ, g, &dq);
  vn_lf_axpy (dQ, Q * dg, &t->dH);
  vn_lf_p (dQ, t->pc_base, -Q * dg);
  vn_lf_p (dQ, vn_pcol (u, MINLEVEL), -Q * dg);
  u->q = Q * g;
  return Q * g;
}

static void outputs (vn_net *net, vn_unit *u, const vn_node *nd,
                     const double *x, double *y, vn_lf *dy)
{
  (void) net;
  (void) nd;
  (void) x;
  y[0] = u->q;
  if (dy)
    vn_lf_axpy (&dy[0], 1, &u->dq);
}

const vn_kind vn_kind_heater = {
  "heater", VN_ROLE_HEAT, NPAR, par, 1, out, ounit, 0, 0,
  check, nstates, state_var, init, NULL, NULL, own, NULL, heat, outputs
};

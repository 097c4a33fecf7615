/* Feed: a flow set from outside (an input) into a tank.  A negative feed
 * is a draw-off, gated so that it cannot take liquid the tank lacks. */
#include <math.h>
#include "smooth.h"
#include "vn_internal.h"

enum { FLOW, TEMP, C1, NPAR = C1 + VN_NSP };

static const vn_param_info par[NPAR] = {
  {"flow", 0, -1e6, 1e6, "m3/s", VN_P_INPUT},
  {"temperature", NAN, -50, 400, "degC", VN_P_INPUT},
  {"c1", 0, 0, 1e12, "conc", VN_P_INPUT}, {"c2", 0, 0, 1e12, "conc", VN_P_INPUT},
  {"c3", 0, 0, 1e12, "conc", VN_P_INPUT}, {"c4", 0, 0, 1e12, "conc", VN_P_INPUT},
  {"c5", 0, 0, 1e12, "conc", VN_P_INPUT}, {"c6", 0, 0, 1e12, "conc", VN_P_INPUT},
  {"c7", 0, 0, 1e12, "conc", VN_P_INPUT}, {"c8", 0, 0, 1e12, "conc", VN_P_INPUT},
};

/* What a feed or a boundary carries: its temperature (the ambient when
 * not given) and concentrations, parameters that signals may drive.  The
 * two kinds share the slot layout [.., temperature, c1..c8] at slot 1. */
void vn_feed_props (const vn_net *net, const vn_unit *u, vn_node *nd)
{
  double T = net->p[u->poff + TEMP];
  nd->xE = -1;
  nd->xM0 = -1;
  nd->T = isnan (T) ? net->ambient : T;
  nd->pcT = isnan (T) ? -1 : vn_pcol (u, TEMP);
  nd->dTdV = nd->dTdE = 0;
  nd->pcc0 = vn_pcol (u, C1);
  for (int k = 0; k < net->nspecies; k++)
    {
      nd->c[k] = net->p[u->poff + C1 + k];
      nd->dcdV[k] = nd->dcdM[k] = 0;
    }
}
static const char *const out[] = {"flow"};
static const char *const ounit[] = {"m3/s"};

static int check (vn_net *net, vn_unit *u)
{
  int d = u->ref[1];
  if (d < 0 || net->u[d].k != &vn_kind_tank)
    return vn_fail_unit (net, u, "destination %s%s%s must be a tank",
                         d >= 0 ? "\"" : "", d >= 0 ? net->u[d].name : "(none)",
                         d >= 0 ? "\"" : "");
  if (!net->thermal && vn_given (net, u, TEMP))
    return vn_fail_unit (net, u, "temperature is given but the network is "
                         "not thermal");
  return VN_OK;
}

static double flow (vn_net *net, vn_unit *u, const vn_node *s,
                    const vn_node *d, const double *x, vn_lf *dq)
{
  (void) s;
  (void) x;
  double F = net->p[u->poff + FLOW];
  if (F >= 0)
    {
      vn_lf_p (dq, vn_pcol (u, FLOW), 1);
      vn_lf_axpy (dq, 0, &d->dH);
      return F;
    }
  /* a draw-off: the liquid gate at the bottom of the tank */
  vn_lf de;
  vn_lf *pde = dq ? &de : NULL;
  vn_lf_zero (pde);
  int dry;
  double e = vn_tank_above (net, d, 0, -1, pde, &dry);
  double dg, g = vn_gate_liquid (e, net->smooth, dry, &dg);
  vn_lf_p (dq, vn_pcol (u, FLOW), g);
  vn_lf_axpy (dq, F * dg, pde);
  return F * g;
}

const vn_kind vn_kind_feed = {
  "feed", VN_ROLE_LINK, NPAR, par, 1, out, ounit, 0, 0,
  check, NULL, NULL, NULL, NULL, flow, NULL, NULL, NULL, vn_link_flow_output
};

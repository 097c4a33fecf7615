/* Feed: a flow set from outside (an input) into a tank.  A negative feed
 * is a draw-off, gated so that it cannot take liquid the tank lacks. */
#include <math.h>
#include "smooth.h"
#include "vn_internal.h"

enum { FLOW, TEMP, NPAR };

static const vn_param_info par[NPAR] = {
  {"flow", 0, -1e6, 1e6, "m3/s", VN_P_INPUT},
  {"temperature", NAN, -50, 400, "degC", VN_P_INPUT},
};
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
  double dg, g = vn_gate (d->level, net->smooth, &dg);
  vn_lf_p (dq, vn_pcol (u, FLOW), g);
  vn_lf_axpy (dq, F * dg, &d->dH);
  vn_lf_p (dq, d->pc_base, -F * dg);
  return F * g;
}

const vn_kind vn_kind_feed = {
  "feed", VN_ROLE_LINK, NPAR, par, 1, out, ounit,
  check, NULL, NULL, NULL, NULL, flow, NULL, NULL, vn_link_flow_output
};

/* Linear resistance: F = dH / r (laminar flow, a long small pipe, or a
 * model simplified around an operating point). */
#include <math.h>
#include "vn_internal.h"

enum { R, OUTLET, INLET, NPAR };

static const vn_param_info par[NPAR] = {
  {"r", NAN, 1e-12, 1e15, "s/m2", 0},
  {"outlet", 0, 0, 1e5, "m", 0},
  {"inlet", 0, 0, 1e5, "m", 0},
};
static const char *const out[] = {"flow"};
static const char *const ounit[] = {"m3/s"};

static int check (vn_net *net, vn_unit *u)
{
  int st = vn_link_check_ends (net, u);
  if (st)
    return st;
  if (!vn_given (net, u, R))
    return vn_fail_unit (net, u, "r (s/m2) is required");
  return VN_OK;
}

static double flow (vn_net *net, vn_unit *u, const vn_node *s,
                    const vn_node *d, const double *x, vn_lf *dq)
{
  (void) x;
  double out_ = net->p[u->poff + OUTLET], in_ = net->p[u->poff + INLET];
  double r = net->p[u->poff + R];
  vn_lf ddh, dg;
  vn_lf *pdh = dq ? &ddh : NULL, *pg = dq ? &dg : NULL;
  vn_lf_zero (pdh);
  vn_lf_zero (pg);
  double dh = vn_link_dh (u, s, d, out_, in_, vn_pcol (u, OUTLET),
                          vn_pcol (u, INLET), pdh);
  double g = vn_link_gate (net, s, d, dh, out_, in_, vn_pcol (u, OUTLET),
                           vn_pcol (u, INLET), net->smooth, pg);
  if (dq)
    {
      vn_lf_axpy (dq, g / r, &ddh);
      vn_lf_axpy (dq, dh / r, &dg);
      vn_lf_p (dq, vn_pcol (u, R), -dh * g / (r * r));
    }
  return dh * g / r;
}

const vn_kind vn_kind_resistance = {
  "resistance", VN_ROLE_LINK, NPAR, par, 1, out, ounit, 0, 0,
  check, NULL, NULL, NULL, NULL, flow, NULL, NULL, NULL, vn_link_flow_output
};

/* Boundary: a fixed-head node (a river, a main, a reservoir too large to
 * move).  Its head is an input, so a signal can drive it. */
#include <math.h>
#include "vn_internal.h"

enum { HEAD, TEMP, C1, NPAR = C1 + VN_NSP };

static const vn_param_info par[NPAR] = {
  {"head", NAN, -1e5, 1e5, "m", VN_P_INPUT},
  {"temperature", NAN, -50, 400, "degC", VN_P_INPUT},
  {"c1", 0, 0, 1e12, "conc", VN_P_INPUT}, {"c2", 0, 0, 1e12, "conc", VN_P_INPUT},
  {"c3", 0, 0, 1e12, "conc", VN_P_INPUT}, {"c4", 0, 0, 1e12, "conc", VN_P_INPUT},
  {"c5", 0, 0, 1e12, "conc", VN_P_INPUT}, {"c6", 0, 0, 1e12, "conc", VN_P_INPUT},
  {"c7", 0, 0, 1e12, "conc", VN_P_INPUT}, {"c8", 0, 0, 1e12, "conc", VN_P_INPUT},
};
static const char *const out[] = {"head"};
static const char *const ounit[] = {"m"};

static int check (vn_net *net, vn_unit *u)
{
  if (!vn_given (net, u, HEAD))
    return vn_fail_unit (net, u, "head (m) is required");
  if (!net->thermal && vn_given (net, u, TEMP))
    return vn_fail_unit (net, u, "temperature is given but the network is "
                         "not thermal");
  return VN_OK;
}

static void node (vn_net *net, vn_unit *u, const double *x, vn_node *nd)
{
  (void) x;
  nd->istank = 0;
  nd->H = net->p[u->poff + HEAD];
  nd->level = NAN;
  nd->base = NAN;
  nd->V = 0;
  nd->area = INFINITY;
  nd->pc_base = -1;
  nd->xV = -1;
  vn_feed_props (net, u, nd);
  nd->dH.n = 0;
  vn_lf_p (&nd->dH, vn_pcol (u, HEAD), 1);
}

static void outputs (vn_net *net, vn_unit *u, const vn_node *nd,
                     const double *x, double *y, vn_lf *dy)
{
  (void) net;
  (void) u;
  (void) x;
  y[0] = nd->H;
  if (dy)
    vn_lf_axpy (&dy[0], 1, &nd->dH);
}

const vn_kind vn_kind_boundary = {
  "boundary", VN_ROLE_NODE, NPAR, par, 1, out, ounit, 0, 0,
  check, NULL, NULL, NULL, node, NULL, NULL, NULL, NULL, outputs
};

/* Orifice: F = coeff ssqrt(dH), or with a discharge coefficient and a
 * bore, coeff = Cd (pi d^2 / 4) sqrt(2 g) (Torricelli, 1644).  The
 * square root is smoothed below the network's band. */
#include <math.h>
#include "smooth.h"
#include "vn_internal.h"

enum { COEFF, CD, DIAM, OUTLET, INLET, NPAR };

static const vn_param_info par[NPAR] = {
  {"coeff", NAN, 1e-12, 1e6, "m2.5/s", 0},
  {"cd", 0.61, 0.01, 1, "1", 0},
  {"diameter", NAN, 1e-6, 1e3, "m", 0},
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
  int gc = vn_given (net, u, COEFF), gd = vn_given (net, u, DIAM);
  if (gc == gd)
    return vn_fail_unit (net, u, "give coeff (m2.5/s) or diameter (m, with "
                         "cd), %s", gc ? "not both" : "got neither");
  if (gc && vn_given (net, u, CD))
    return vn_fail_unit (net, u, "cd goes with diameter, not with coeff");
  /* the coefficient is no input: compute it once (again when a parameter
   * is set, since vn_param_set re-runs this check) */
  u->d[0] = gc ? vn_par (net, u, COEFF)
               : VN_PI / 4 * sqrt (2 * net->g) * vn_par (net, u, CD)
                 * vn_par (net, u, DIAM) * vn_par (net, u, DIAM);
  return VN_OK;
}

/* the coefficient and its derivatives */
static double coeff (const vn_net *net, const vn_unit *u, vn_lf *dc)
{
  if (!dc)
    return u->d[0];
  if (vn_given (net, u, COEFF))
    {
      vn_lf_p (dc, vn_pcol (u, COEFF), 1);
      return net->p[u->poff + COEFF];
    }
  double cd = net->p[u->poff + CD], d = net->p[u->poff + DIAM];
  double k = VN_PI / 4 * sqrt (2 * net->g);
  vn_lf_p (dc, vn_pcol (u, CD), k * d * d);
  vn_lf_p (dc, vn_pcol (u, DIAM), 2 * k * cd * d);
  return k * cd * d * d;
}

static double flow (vn_net *net, vn_unit *u, const vn_node *s,
                    const vn_node *d, const double *x, vn_lf *dq)
{
  (void) x;
  double out_ = net->p[u->poff + OUTLET], in_ = net->p[u->poff + INLET];
  vn_lf ddh, dg, dc;
  vn_lf *pdh = dq ? &ddh : NULL, *pg = dq ? &dg : NULL, *pc = dq ? &dc : NULL;
  vn_lf_zero (pdh);
  vn_lf_zero (pg);
  vn_lf_zero (pc);
  double dh = vn_link_dh (u, s, d, out_, in_, vn_pcol (u, OUTLET),
                          vn_pcol (u, INLET), pdh);
  double g = vn_link_gate (net, s, d, dh, out_, in_, vn_pcol (u, OUTLET),
                           vn_pcol (u, INLET), net->smooth, pg);
  double c = coeff (net, u, pc);
  double ds, r = vn_ssqrt (dh, net->smooth, &ds);
  if (dq)
    {
      vn_lf_axpy (dq, c * g * ds, &ddh);
      vn_lf_axpy (dq, c * r, &dg);
      vn_lf_axpy (dq, r * g, &dc);
    }
  return c * r * g;
}

const vn_kind vn_kind_orifice = {
  "orifice", VN_ROLE_LINK, NPAR, par, 1, out, ounit, 0, 0,
  check, NULL, NULL, NULL, NULL, flow, NULL, NULL, NULL, vn_link_flow_output
};

/* Pump: fixed flow scaled by relative speed, or a centrifugal curve
 * H = s^2 H0 - k Q^2 (affinity laws: Q ~ s, H ~ s^2; common practice)
 * delivering against the lift between its suction and its discharge,
 * with a check valve (no reverse flow).  Suction is lost smoothly as the
 * source level falls to the outlet nozzle. */
#include <math.h>
#include "smooth.h"
#include "vn_internal.h"

enum { FLOW, SHUTOFF, K, SPEED, OUTLET, INLET, SUCTION, NPAR };

static const vn_param_info par[NPAR] = {
  {"flow", NAN, 0, 1e4, "m3/s", 0},
  {"shutoff", NAN, 1e-6, 1e5, "m", 0},
  {"k", NAN, 1e-12, 1e15, "m/(m3/s)2", 0},
  {"speed", 1, 0, 10, "1", VN_P_INPUT},
  {"outlet", 0, 0, 1e5, "m", 0},
  {"inlet", 0, 0, 1e5, "m", 0},
  {"suction", NAN, 1e-6, 10, "m", 0},
};
static const char *const out[] = {"flow", "head"};
static const char *const ounit[] = {"m3/s", "m"};

static int fixed (const vn_net *net, const vn_unit *u)
{
  return vn_given (net, u, FLOW);
}

static int check (vn_net *net, vn_unit *u)
{
  int st = vn_link_check_ends (net, u);
  if (st)
    return st;
  int gf = vn_given (net, u, FLOW);
  int gc = vn_given (net, u, SHUTOFF) || vn_given (net, u, K);
  if (gf && gc)
    return vn_fail_unit (net, u, "give flow (fixed-flow pump) or shutoff "
                         "and k (curve), not both");
  if (!gf && !(vn_given (net, u, SHUTOFF) && vn_given (net, u, K)))
    return vn_fail_unit (net, u, "a curve pump needs shutoff (m) and k "
                         "(m/(m3/s)2); a fixed-flow pump needs flow (m3/s)");
  return VN_OK;
}

static double band (const vn_net *net, const vn_unit *u)
{
  return vn_given (net, u, SUCTION) ? net->p[u->poff + SUCTION]
                                    : net->smooth;
}

static double flow (vn_net *net, vn_unit *u, const vn_node *s,
                    const vn_node *d, const double *x, vn_lf *dq)
{
  (void) x;
  double out_ = net->p[u->poff + OUTLET], in_ = net->p[u->poff + INLET];
  double sp = net->p[u->poff + SPEED];
  vn_lf dg, ddh;
  vn_lf *pg = dq ? &dg : NULL, *pdh = dq ? &ddh : NULL;
  vn_lf_zero (pg);
  vn_lf_zero (pdh);
  /* suction gate: liquid at the outlet nozzle of the source */
  double g = vn_link_gate (net, s, NULL, 1.0, out_, in_, vn_pcol (u, OUTLET),
                           vn_pcol (u, INLET), band (net, u), pg);
  if (vn_given (net, u, SUCTION) && s->istank)
    {
      /* a wider band lowers the gate: g(l/b), dg/db = -g'(l) l / b */
      double dgs, bd = band (net, u);
      int dry;
      double sl = vn_tank_above (net, s, out_, vn_pcol (u, OUTLET), NULL,
                                 &dry);
      vn_gate_liquid (sl, bd, dry, &dgs);
      vn_lf_p (pg, vn_pcol (u, SUCTION), -dgs * sl / bd);
    }
  double dh = vn_link_dh (u, s, d, out_, in_, vn_pcol (u, OUTLET),
                          vn_pcol (u, INLET), pdh);
  if (fixed (net, u))
    {
      double F = net->p[u->poff + FLOW];
      if (dq)
        {
          vn_lf_p (dq, vn_pcol (u, FLOW), sp * g);
          vn_lf_p (dq, vn_pcol (u, SPEED), F * g);
          vn_lf_axpy (dq, F * sp, &dg);
          vn_lf_axpy (dq, 0, &ddh);
        }
      u->d[0] = -dh;
      return F * sp * g;
    }
  double H0 = net->p[u->poff + SHUTOFF], k = net->p[u->poff + K];
  /* net head left for flow: s^2 H0 - lift, lift = -dh */
  double hn = sp * sp * H0 + dh, dr;
  double r = vn_psqrt (hn, net->smooth, &dr);
  double sk = sqrt (k);
  double q = g * r / sk;
  if (dq)
    {
      double c = g * dr / sk;
      vn_lf_axpy (dq, c, &ddh);
      vn_lf_p (dq, vn_pcol (u, SPEED), c * 2 * sp * H0);
      vn_lf_p (dq, vn_pcol (u, SHUTOFF), c * sp * sp);
      vn_lf_p (dq, vn_pcol (u, K), -0.5 * q / k);
      vn_lf_axpy (dq, r / sk, &dg);
    }
  u->d[0] = sp * sp * H0 - k * q * q;
  u->d[1] = q;
  return q;
}

static void outputs (vn_net *net, vn_unit *u, const vn_node *nd,
                     const double *x, double *y, vn_lf *dy)
{
  (void) nd;
  (void) x;
  y[0] = u->q;
  y[1] = u->d[0];
  if (!dy)
    return;
  vn_lf_axpy (&dy[0], 1, &u->dq);
  if (fixed (net, u))
    {
      /* head = the lift, -dh, from the nodes as the flow saw them */
      const vn_node *s = &net->nd[u->ref[0]];
      const vn_node *d = u->ref[1] >= 0 ? &net->nd[u->ref[1]] : NULL;
      vn_lf ddh;
      vn_lf_zero (&ddh);
      vn_link_dh (u, s, d, net->p[u->poff + OUTLET], net->p[u->poff + INLET],
                  vn_pcol (u, OUTLET), vn_pcol (u, INLET), &ddh);
      vn_lf_axpy (&dy[1], -1, &ddh);
      return;
    }
  /* head = s^2 H0 - k q^2, q the pump law's flow (u->q also holds the
   * return from below empty, link.c) */
  double sp = net->p[u->poff + SPEED], H0 = net->p[u->poff + SHUTOFF];
  double k = net->p[u->poff + K], q = u->d[1];
  const vn_node *s = &net->nd[u->ref[0]];
  const vn_node *d = u->ref[1] >= 0 ? &net->nd[u->ref[1]] : NULL;
  vn_lf ddry;
  vn_lf_zero (&ddry);
  vn_link_dry (s, d, &ddry);
  vn_lf_p (&dy[1], vn_pcol (u, SPEED), 2 * sp * H0);
  vn_lf_p (&dy[1], vn_pcol (u, SHUTOFF), sp * sp);
  vn_lf_p (&dy[1], vn_pcol (u, K), -q * q);
  vn_lf_axpy (&dy[1], -2 * k * q, &u->dq);
  vn_lf_axpy (&dy[1], 2 * k * q, &ddry);
}

const vn_kind vn_kind_pump = {
  "pump", VN_ROLE_LINK, NPAR, par, 2, out, ounit, 0, 0,
  check, NULL, NULL, NULL, NULL, flow, NULL, NULL, NULL, outputs
};

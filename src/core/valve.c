/* Control valve, liquid sizing of IEC 60534-2-1 (= ANSI/ISA-75.01.01),
 * non-choked turbulent flow:
 *   Q [m3/h] = Kv f(x) sqrt(dp [bar] / (rho / rho0)),  dp = rho g dH,
 * so Q [m3/s] = Kv f(x) / 3600 sqrt(rho0 g dH / 1e5): for a head-driven
 * flow the density cancels.  rho0 = 999.1 kg/m3, water at 15 degC
 * (memory).  Inherent characteristics (IEC 60534-2-4): linear f = x;
 * equal percentage f = R^(x-1), run linearly to 0 below x = 0.02 so the
 * valve shuts tight (common practice); quick opening f = sqrt(x) (common
 * practice).  Optional actuator lag: d(pos)/dt = (opening - pos) / lag. */
#include <math.h>
#include "smooth.h"
#include "vn_internal.h"

enum { KV, OPENING, CHAR, RANGE, LAG, OUTLET, INLET, NPAR };
enum { LINEAR = 0, EQUAL = 1, QUICK = 2 };
#define RHO0 999.1
#define XS 0.02

static const vn_param_info par[NPAR] = {
  {"kv", NAN, 1e-9, 1e6, "m3/h", 0},
  {"opening", 1, 0, 1, "1", VN_P_INPUT},
  {"char", 0, 0, 2, "code", VN_P_CODE},
  {"rangeability", 50, 1.0001, 1e4, "1", 0},
  {"lag", 0, 0, 1e6, "s", 0},
  {"outlet", 0, 0, 1e5, "m", 0},
  {"inlet", 0, 0, 1e5, "m", 0},
};
static const char *const out[] = {"flow", "position"};
static const char *const ounit[] = {"m3/s", "1"};

static int check (vn_net *net, vn_unit *u)
{
  int st = vn_link_check_ends (net, u);
  if (st)
    return st;
  if (!vn_given (net, u, KV))
    return vn_fail_unit (net, u, "kv (m3/h at 1 bar) is required");
  /* the lag owns a state: once built, it cannot come or go */
  if (u->nx && !(net->p0[u->poff + LAG] > 0))
    return vn_fail_unit (net, u, "lag must stay > 0 (s) on a valve built "
                         "with an actuator lag, got %g",
                         net->p0[u->poff + LAG]);
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
  return "position";
}

static double clip01 (double x, double *d)
{
  if (x <= 0 || x >= 1)
    {
      *d = 0;
      return x <= 0 ? 0 : 1;
    }
  *d = 1;
  return x;
}

static int init (vn_net *net, vn_unit *u, double *x)
{
  double d;
  x[0] = clip01 (net->p[u->poff + OPENING], &d);
  return VN_OK;
}

/* the inherent characteristic f(x) and df/dx, dfdR */
static double characteristic (int ch, double x, double R, double *dfdx,
                              double *dfdR)
{
  *dfdR = 0;
  switch (ch)
    {
    case EQUAL:
      if (x >= XS)
        {
          double f = pow (R, x - 1);
          *dfdx = f * log (R);
          *dfdR = (x - 1) * f / R;
          return f;
        }
      {
        double fs = pow (R, XS - 1);
        *dfdx = fs / XS;
        *dfdR = x / XS * (XS - 1) * fs / R;
        return fs * x / XS;
      }
    case QUICK:
      return vn_ssqrt (x, 1e-3, dfdx);
    default:
      *dfdx = 1;
      return x;
    }
}

/* the stem position actually seen by the flow, and where it comes from */
static double position (const vn_net *net, const vn_unit *u, const double *x,
                        vn_lf *dpos)
{
  double d;
  if (u->nx)
    {
      double pos = clip01 (x[u->xoff], &d);
      vn_lf_x (dpos, u->xoff, d);
      return pos;
    }
  double pos = clip01 (net->p[u->poff + OPENING], &d);
  vn_lf_p (dpos, vn_pcol (u, OPENING), d);
  return pos;
}

static double flow (vn_net *net, vn_unit *u, const vn_node *s,
                    const vn_node *d, const double *x, vn_lf *dq)
{
  double out_ = net->p[u->poff + OUTLET], in_ = net->p[u->poff + INLET];
  double kv = net->p[u->poff + KV], R = net->p[u->poff + RANGE];
  int ch = (int) net->p[u->poff + CHAR];
  vn_lf ddh, dg, dpos;
  vn_lf *pdh = dq ? &ddh : NULL, *pg = dq ? &dg : NULL, *pp = dq ? &dpos : NULL;
  vn_lf_zero (pdh);
  vn_lf_zero (pg);
  vn_lf_zero (pp);
  double dh = vn_link_dh (u, s, d, out_, in_, vn_pcol (u, OUTLET),
                          vn_pcol (u, INLET), pdh);
  double g = vn_link_gate (net, s, d, dh, out_, in_, vn_pcol (u, OUTLET),
                           vn_pcol (u, INLET), net->smooth, pg);
  double pos = position (net, u, x, pp);
  double dfdx, dfdR, f = characteristic (ch, pos, R, &dfdx, &dfdR);
  double k = kv / 3600 * sqrt (RHO0 * net->g / 1e5);
  double ds, r = vn_ssqrt (dh, net->smooth, &ds);
  double q = k * f * r * g;
  if (dq)
    {
      vn_lf_axpy (dq, k * f * ds * g, &ddh);
      vn_lf_axpy (dq, k * f * r, &dg);
      vn_lf_axpy (dq, k * dfdx * r * g, &dpos);
      vn_lf_p (dq, vn_pcol (u, KV), q / kv);
      vn_lf_p (dq, vn_pcol (u, RANGE), k * dfdR * r * g);
    }
  return q;
}

static void own (vn_net *net, vn_unit *u, const double *x, double *f,
                 vn_lf *df)
{
  double lag = net->p[u->poff + LAG], d;
  double cmd = clip01 (net->p[u->poff + OPENING], &d);
  f[u->xoff] = (cmd - x[u->xoff]) / lag;
  if (df)
    {
      vn_lf_x (&df[0], u->xoff, -1 / lag);
      vn_lf_p (&df[0], vn_pcol (u, OPENING), d / lag);
      vn_lf_p (&df[0], vn_pcol (u, LAG), -f[u->xoff] / lag);
    }
}

static void outputs (vn_net *net, vn_unit *u, const vn_node *nd,
                     const double *x, double *y, vn_lf *dy)
{
  (void) nd;
  y[0] = u->q;
  y[1] = position (net, u, x, dy ? &dy[1] : NULL);
  if (dy)
    vn_lf_axpy (&dy[0], 1, &u->dq);
}

const vn_kind vn_kind_valve = {
  "valve", VN_ROLE_LINK, NPAR, par, 2, out, ounit, 0, 0,
  check, nstates, state_var, init, NULL, flow, own, NULL, NULL, outputs
};

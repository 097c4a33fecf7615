/* Controller: a PI/PID unit inside the network, on any measured quantity
 * (UNIT.OUTPUT) driving any input (UNIT.INPUT), ideal (ISA) form:
 *   e = s (setpoint - m),  s = +1 reverse acting, -1 direct acting
 *   u = bias + Kc (e + I / Ti - s Td dm/dt),  clipped to [lo, hi]
 * with derivative on the measurement through a filter of time constant
 * alpha Td, and anti-windup by back-calculation with tracking time Ti:
 *   dI/dt = e + (u - u_raw) / Kc
 * (Astrom and Hagglund, Advanced PID Control, ISA 2006, ch. 3; memory).
 * A measurement that is not a node output (a flow, say) reaches the
 * controller through a first-order transmitter lag ("filter", 1 s by
 * default), so the controller never meets an algebraic loop with the
 * valve it drives.  Gains are in engineering units: output per measured
 * unit. */
#include <math.h>
#include "vn_internal.h"

enum { SP, GAIN, RESET, DERIV, FILTER, ACTION, LO, HI, BIAS, AW, ALPHA,
       NPAR };
/* derived constants: which states exist and their positions */
enum { D_URAW, D_TF, D_HASI, D_HASF, D_HASZ, D_BIAS };

static const vn_param_info par[NPAR] = {
  {"setpoint", NAN, -1e12, 1e12, "measured unit", VN_P_INPUT},
  {"gain", NAN, -1e12, 1e12, "output per measured unit", 0},
  {"reset", INFINITY, 1e-6, 1e12, "s", VN_P_INF},
  {"deriv", 0, 0, 1e12, "s", 0},
  {"filter", NAN, 0, 1e6, "s", 0},
  {"action", 1, 0, 1, "code", VN_P_CODE},
  {"lo", -INFINITY, -1e12, 1e12, "output unit", VN_P_INF},
  {"hi", INFINITY, -1e12, 1e12, "output unit", VN_P_INF},
  {"bias", NAN, -1e12, 1e12, "output unit", 0},
  {"antiwindup", 1, 0, 1, "code", VN_P_CODE},
  {"alpha", 0.1, 0.01, 1, "1", 0},
};
static const char *const out[] = {"output", "measurement", "error"};
static const char *const ounit[] = {"output unit", "measured unit",
                                    "measured unit"};

static int check (vn_net *net, vn_unit *u)
{
  int st = vn_check_loop_refs (net, u);
  if (st)
    return st;
  if (!vn_given (net, u, SP))
    return vn_fail_unit (net, u, "setpoint is required");
  if (!vn_given (net, u, GAIN) || vn_par (net, u, GAIN) == 0)
    return vn_fail_unit (net, u, "gain is required and must not be 0 "
                         "(give the sign by action, the size by gain)");
  double lo = vn_par (net, u, LO), hi = vn_par (net, u, HI);
  if (!(lo < hi))
    return vn_fail_unit (net, u, "limits must satisfy lo < hi, got [%g %g]",
                         lo, hi);
  const vn_unit *cu = &net->u[u->ref[2]];
  const vn_param_info *ci = &cu->k->par[u->ref[3]];
  if (!(fmax (lo, ci->lo) < fmin (hi, ci->hi)))
    return vn_fail_unit (net, u, "limits [%g %g] leave nothing of the "
                         "range of %s.%s, [%g %g] (%s)", lo, hi, cu->name,
                         ci->name, ci->lo, ci->hi, ci->unit);
  const vn_unit *mu = &net->u[u->ref[0]];
  double tf = vn_par (net, u, FILTER);
  if (!vn_given (net, u, FILTER))
    tf = mu->k->role == VN_ROLE_NODE ? 0 : 1.0;
  if (tf == 0 && mu->k->role != VN_ROLE_NODE)
    return vn_fail_unit (net, u, "it measures %s \"%s\", which responds "
                         "at once to the inputs; give filter > 0 (s, the "
                         "transmitter lag)", mu->k->name, mu->name);
  u->d[D_TF] = tf;
  u->d[D_HASI] = isfinite (vn_par (net, u, RESET));
  u->d[D_HASF] = tf > 0;
  u->d[D_HASZ] = vn_par (net, u, DERIV) > 0;
  int pidx = net->u[u->ref[2]].poff + u->ref[3];
  u->d[D_BIAS] = vn_given (net, u, BIAS) ? vn_par (net, u, BIAS)
                                         : net->p0[pidx];
  return VN_OK;
}

static int nstates (const vn_net *net, const vn_unit *u)
{
  (void) net;
  return (int) (u->d[D_HASI] + u->d[D_HASF] + u->d[D_HASZ]);
}

/* positions of the integral, filter and derivative states (-1 absent) */
static void layout (const vn_unit *u, int *xi, int *xf, int *xz)
{
  int k = u->xoff;
  *xi = u->d[D_HASI] ? k++ : -1;
  *xf = u->d[D_HASF] ? k++ : -1;
  *xz = u->d[D_HASZ] ? k++ : -1;
}

static const char *state_var (const vn_unit *u, int i)
{
  int xi, xf, xz;
  layout (u, &xi, &xf, &xz);
  int s = u->xoff + i;
  return s == xi ? "integral" : s == xf ? "filtered" : "derivative";
}

/* Integral 0 (bumpless at zero error); the filter states start at the
 * measurement, which vn_initial_state supplies once the plant is known
 * (x is then the whole state vector and settle is 1). */
static int init (vn_net *net, vn_unit *u, double *x)
{
  (void) net;
  for (int j = 0; j < u->nx; j++)
    x[j] = 0;
  return VN_OK;
}

void vn_controller_settle (vn_net *net, vn_unit *u, double *x)
{
  int xi, xf, xz;
  layout (u, &xi, &xf, &xz);
  if (xf < 0 && xz < 0)
    return;
  double m = vn_measure (net, u, x, NULL);
  if (xf >= 0)
    x[xf] = m;
  if (xz >= 0)
    x[xz] = m;
}

/* The controlled measurement m and the error e, with derivatives. */
static double measurement (vn_net *net, vn_unit *u, const double *x,
                           vn_lf *dm)
{
  int xi, xf, xz;
  layout (u, &xi, &xf, &xz);
  if (xf >= 0)
    {
      vn_lf_x (dm, xf, 1);
      return x[xf];
    }
  return vn_measure (net, u, x, dm);
}

static void pre (vn_net *net, vn_unit *u, const double *x)
{
  if (net->hold_loops)
    {
      u->q = u->d[D_BIAS];
      u->dq.n = 0;
      net->p[net->u[u->ref[2]].poff + u->ref[3]] = u->q;
      return;
    }
  int xi, xf, xz;
  layout (u, &xi, &xf, &xz);
  double s = net->p[u->poff + ACTION] ? 1 : -1;
  double Kc = net->p[u->poff + GAIN], Ti = net->p[u->poff + RESET];
  double a = net->p[u->poff + ALPHA];
  vn_lf dm, de;
  dm.n = de.n = 0;
  double m = measurement (net, u, x, &dm);
  double e = s * (net->p[u->poff + SP] - m);
  vn_lf_p (&de, vn_pcol (u, SP), s);
  vn_lf_axpy (&de, -s, &dm);
  vn_lf du;
  du.n = 0;
  double ur = u->d[D_BIAS] + Kc * e;
  vn_lf_axpy (&du, Kc, &de);
  if (xi >= 0)
    {
      ur += Kc * x[xi] / Ti;
      vn_lf_x (&du, xi, Kc / Ti);
    }
  if (xz >= 0)
    {
      /* -s Kc Td dm/dt with dm/dt ~ (m - z) / (alpha Td) */
      ur += -s * Kc * (m - x[xz]) / a;
      vn_lf_axpy (&du, -s * Kc / a, &dm);
      vn_lf_x (&du, xz, s * Kc / a);
    }
  /* the settings as parameters (tuning studies, fits) */
  {
    double dKc = e;
    if (xi >= 0)
      {
        dKc += x[xi] / Ti;
        vn_lf_p (&du, vn_pcol (u, RESET), -Kc * x[xi] / (Ti * Ti));
      }
    if (xz >= 0)
      {
        dKc += -s * (m - x[xz]) / a;
        vn_lf_p (&du, vn_pcol (u, ALPHA), s * Kc * (m - x[xz]) / (a * a));
      }
    vn_lf_p (&du, vn_pcol (u, GAIN), dKc);
    if (vn_given (net, u, BIAS))
      vn_lf_p (&du, vn_pcol (u, BIAS), 1);
  }
  /* the output stays within the driven input's range as well as the
   * limits (a valve cannot open past 1), so what is reported is what
   * the element receives and anti-windup acts at the real end stop */
  const vn_param_info *ci = &net->u[u->ref[2]].k->par[u->ref[3]];
  double lo = fmax (net->p[u->poff + LO], ci->lo);
  double hi = fmin (net->p[u->poff + HI], ci->hi);
  double uu = ur < lo ? lo : ur > hi ? hi : ur;
  vn_lf_scale (&du, (ur < lo || ur > hi) ? 0.0 : 1.0);
  u->d[D_URAW] = ur;
  u->q = uu;
  u->dq = du;
  /* the input the controller drives */
  net->p[net->u[u->ref[2]].poff + u->ref[3]] = uu;
}

static void own (vn_net *net, vn_unit *u, const double *x, double *f,
                 vn_lf *df)
{
  int xi, xf, xz;
  layout (u, &xi, &xf, &xz);
  double s = net->p[u->poff + ACTION] ? 1 : -1;
  double Kc = net->p[u->poff + GAIN], Td = net->p[u->poff + DERIV];
  double a = net->p[u->poff + ALPHA];
  int j = 0;
  vn_lf dm;
  dm.n = 0;
  double m = measurement (net, u, x, df ? &dm : NULL);
  if (xi >= 0)
    {
      double e = s * (net->p[u->poff + SP] - m);
      double aw = net->p[u->poff + AW] ? 1 : 0;
      f[xi] = e + aw * (u->q - u->d[D_URAW]) / Kc;
      if (df)
        {
          /* u - u_raw: -du_raw where clipped, 0 where not */
          int clipped = u->q != u->d[D_URAW];
          vn_lf_p (&df[j], vn_pcol (u, SP), s);
          vn_lf_axpy (&df[j], -s, &dm);
          if (clipped && aw)
            {
              /* du_raw/Kc = de + dI/Ti + ...: the error terms cancel */
              double Ti = net->p[u->poff + RESET];
              vn_lf_p (&df[j], vn_pcol (u, SP), -s);
              vn_lf_axpy (&df[j], s, &dm);
              vn_lf_x (&df[j], xi, -1 / Ti);
              if (xz >= 0)
                {
                  vn_lf_axpy (&df[j], s / a, &dm);
                  vn_lf_x (&df[j], xz, -s / a);
                }
            }
          else
            {
              /* keep the pattern fixed */
              vn_lf_x (&df[j], xi, 0);
              if (xz >= 0)
                vn_lf_x (&df[j], xz, 0);
            }
        }
      j++;
    }
  if (xf >= 0)
    {
      double tf = u->d[D_TF];
      vn_lf dpv;
      dpv.n = 0;
      double pv = vn_measure (net, u, x, df ? &dpv : NULL);
      f[xf] = (pv - x[xf]) / tf;
      if (df)
        {
          vn_lf_axpy (&df[j], 1 / tf, &dpv);
          vn_lf_x (&df[j], xf, -1 / tf);
        }
      j++;
    }
  if (xz >= 0)
    {
      double tz = a * Td;
      f[xz] = (m - x[xz]) / tz;
      if (df)
        {
          vn_lf_axpy (&df[j], 1 / tz, &dm);
          vn_lf_x (&df[j], xz, -1 / tz);
        }
    }
}

static void outputs (vn_net *net, vn_unit *u, const vn_node *nd,
                     const double *x, double *y, vn_lf *dy)
{
  (void) nd;
  double s = net->p[u->poff + ACTION] ? 1 : -1;
  y[0] = u->q;
  y[1] = measurement (net, u, x, dy ? &dy[1] : NULL);
  y[2] = s * (net->p[u->poff + SP] - y[1]);
  if (dy)
    {
      vn_lf_axpy (&dy[0], 1, &u->dq);
      vn_lf_p (&dy[2], vn_pcol (u, SP), s);
      vn_lf_axpy (&dy[2], -s, &dy[1]);
    }
}

const vn_kind vn_kind_controller = {
  "controller", VN_ROLE_OTHER, NPAR, par, 3, out, ounit, 0, 0,
  check, nstates, state_var, init, NULL, NULL, own, pre, NULL, outputs
};

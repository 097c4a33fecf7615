/* Input signals: piecewise tables on input parameters.  A jump is two
 * points at the same time; the value is right-continuous, except that at
 * the end of the integration segment under way (net->seg_end) the left
 * limit is taken, so each segment sees a smooth input. */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include "vn_internal.h"

int vn_set_signals (vn_net *net, int nsig, const int *unit, const int *slot,
                    const int *off, const int *len, const int *hold,
                    const double *data)
{
  memcpy (net->p, net->p0, (size_t) net->np * sizeof *net->p);
  free (net->sig);
  free (net->sigdata);
  net->sig = NULL;
  net->sigdata = NULL;
  net->nsig = 0;
  if (nsig <= 0)
    return VN_OK;
  long total = 0;
  for (int i = 0; i < nsig; i++)
    {
      if (unit[i] < 0 || unit[i] >= net->nu)
        return vn_fail (net, VN_EARG, "signal %d: unit index %d is outside "
                        "the network", i + 1, unit[i]);
      const vn_unit *u = &net->u[unit[i]];
      int pidx = vn_param_index (net, unit[i], slot[i]);
      if (pidx < 0 || !net->isinput[pidx])
        return vn_fail (net, VN_EARG, "signal %d: %s \"%s\" has no input "
                        "in slot %d (%s); signals drive inputs only", i + 1,
                        u->k->name, u->name, slot[i],
                        pidx >= 0 ? u->k->par[slot[i]].name : "no such slot");
      if (net->override && net->override[pidx] >= 0)
        {
          const vn_unit *o = &net->u[net->override[pidx]];
          int ctl = o->k == &vn_kind_controller;
          return vn_fail (net, VN_EARG, "signal on %s.%s: that input is "
                          "driven by %s \"%s\"; %s", u->name,
                          u->k->par[slot[i]].name, o->k->name, o->name,
                          ctl ? "drive the controller's setpoint instead"
                              : "a switch sets it from its on and off "
                                "levels; signals may drive only inputs "
                                "no switch or controller sets");
        }
      if (off[i] < 0)
        return vn_fail (net, VN_EARG, "signal %d on %s.%s: data offset %d "
                        "is negative", i + 1, u->name,
                        u->k->par[slot[i]].name, off[i]);
      if (len[i] < 1)
        return vn_fail (net, VN_EARG, "signal %d on %s.%s: it has no "
                        "points", i + 1, u->name, u->k->par[slot[i]].name);
      for (int k = 0; k < len[i]; k++)
        {
          double t = data[2 * ((long) off[i] + k)];
          double v = data[2 * ((long) off[i] + k) + 1];
          if (!isfinite (t) || !isfinite (v))
            return vn_fail (net, VN_EARG, "signal on %s.%s: point %d is "
                            "not finite (t %g, value %g)", u->name,
                            u->k->par[slot[i]].name, k + 1, t, v);
          /* the input's schema range, as for a declared value: the
           * callers clip a position past its travel before packing */
          const vn_param_info *pi = &u->k->par[slot[i]];
          if (v < pi->lo || v > pi->hi)
            return vn_fail (net, VN_EARG, "signal on %s.%s: point %d "
                            "(t %g) value %g lies outside [%g, %g] (%s)",
                            u->name, pi->name, k + 1, t, v, pi->lo, pi->hi,
                            pi->unit);
          if (k > 0 && t < data[2 * ((long) off[i] + k - 1)])
            return vn_fail (net, VN_EARG, "signal on %s.%s: times must "
                            "not decrease, point %d at t %g follows %g",
                            u->name, u->k->par[slot[i]].name, k + 1, t,
                            data[2 * ((long) off[i] + k - 1)]);
        }
      total += len[i];
    }
  net->sig = calloc ((size_t) nsig, sizeof *net->sig);
  net->sigdata = malloc ((size_t) (2 * total) * sizeof *net->sigdata);
  if (!net->sig || !net->sigdata)
    return VN_ENOMEM;
  long pos = 0;
  for (int i = 0; i < nsig; i++)
    {
      net->sig[i].pidx = vn_param_index (net, unit[i], slot[i]);
      net->sig[i].off = (int) pos;
      net->sig[i].len = len[i];
      net->sig[i].hold = hold ? hold[i] : 0;
      memcpy (net->sigdata + 2 * pos, data + 2 * (long) off[i],
              (size_t) (2 * len[i]) * sizeof (double));
      pos += len[i];
    }
  net->nsig = nsig;
  return VN_OK;
}

/* Value of one table at t; left limit when `left`. */
static double table_value (const double *d, int n, int hold, double t,
                           int left)
{
  if (left ? t <= d[0] : t < d[0])
    return d[1];
  if (left ? t > d[2 * (n - 1)] : t >= d[2 * (n - 1)])
    return d[2 * (n - 1) + 1];
  /* binary search for the segment k with d[k] <= t < d[k+1]
   * (left: d[k] < t <= d[k+1]); so d[k+1] > d[k] */
  int lo = 0, hi = n - 1;
  while (hi - lo > 1)
    {
      int mid = (lo + hi) / 2;
      double tm = d[2 * mid];
      if (left ? tm < t : tm <= t)
        lo = mid;
      else
        hi = mid;
    }
  double t0 = d[2 * lo], t1 = d[2 * hi];
  double v0 = d[2 * lo + 1], v1 = d[2 * hi + 1];
  if (hold)
    return v0;
  return v0 + (v1 - v0) * (t - t0) / (t1 - t0);
}

/* Only signal-driven entries of p differ from p0, so only they are set. */
void vn_apply_signals (vn_net *net, double t)
{
  int left = t >= net->seg_end;
  for (int i = 0; i < net->nsig; i++)
    {
      const vn_signal *s = &net->sig[i];
      net->p[s->pidx] = table_value (net->sigdata + 2 * (long) s->off,
                                     s->len, s->hold, t, left);
    }
}

/* All signal times strictly inside (t0, t1), sorted, unique; caller frees. */
int vn_breakpoints (const vn_net *net, double t0, double t1, double **out,
                    int *n)
{
  long total = 0;
  for (int i = 0; i < net->nsig; i++)
    total += net->sig[i].len;
  double *b = malloc ((size_t) (total + 1) * sizeof *b);
  if (!b)
    return VN_ENOMEM;
  int m = 0;
  for (int i = 0; i < net->nsig; i++)
    for (int k = 0; k < net->sig[i].len; k++)
      {
        double t = net->sigdata[2 * ((long) net->sig[i].off + k)];
        if (t > t0 && t < t1)
          b[m++] = t;
      }
  /* insertion sort is enough: signals have few points */
  for (int i = 1; i < m; i++)
    {
      double v = b[i];
      int j = i - 1;
      while (j >= 0 && b[j] > v)
        {
          b[j + 1] = b[j];
          j--;
        }
      b[j + 1] = v;
    }
  int u = 0;
  for (int i = 0; i < m; i++)
    if (u == 0 || b[i] > b[u - 1])
      b[u++] = b[i];
  *out = b;
  *n = u;
  return VN_OK;
}

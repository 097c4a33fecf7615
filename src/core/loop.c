/* What controllers and switches share: reading the measured quantity
 * and claiming the input they drive. */
#include <math.h>
#include <stdlib.h>
#include "vn_internal.h"

/* The measured value: an output of another unit, evaluated on the spot
 * from what the framework has computed so far (node outputs after the
 * node pass, flows after the flow pass). */
double vn_measure (vn_net *net, const vn_unit *u, const double *x,
                   vn_lf *dm)
{
  vn_unit *m = &net->u[u->ref[0]];
  double y[VN_NOUTMAX];
  vn_lf dy[VN_NOUTMAX];
  for (int j = 0; j < m->nout; j++)
    {
      dy[j].n = 0;
      y[j] = NAN;   /* outputs the network does not carry */
    }
  m->k->outputs (net, m, &net->nd[u->ref[0]], x, y, dm ? dy : NULL);
  vn_lf_axpy (dm, 1, &dy[u->ref[1]]);
  return y[u->ref[1]];
}

int vn_check_loop_refs (vn_net *net, vn_unit *u)
{
  int self = (int) (u - net->u);
  int mu = u->ref[0], mo = u->ref[1], cu = u->ref[2], cp = u->ref[3];
  if (mu < 0 || mu >= net->nu || mo < 0 || mo >= net->u[mu].nout)
    return vn_fail_unit (net, u, "measure must name an output of a unit "
                         "(unit %d, output %d given)", mu, mo);
  if (mu == self)
    return vn_fail_unit (net, u, "it cannot measure its own output");
  if (net->u[mu].nout > VN_NOUTMAX)
    return vn_fail_unit (net, u, "measured unit has too many outputs");
  if (cu < 0 || cu >= net->nu || cp < 0 || cp >= net->u[cu].k->npar
      || !(net->u[cu].k->par[cp].flags & VN_P_INPUT))
    return vn_fail_unit (net, u, "manipulate must name an input (a feed "
                         "flow, valve opening, pump speed, boundary head, "
                         "heater duty or controller setpoint)");
  if (cu == self)
    return vn_fail_unit (net, u, "it cannot manipulate its own setpoint");
  int pidx = net->u[cu].poff + cp;
  if (!net->override)
    {
      net->override = malloc ((size_t) net->np * sizeof *net->override);
      if (!net->override)
        return VN_ENOMEM;
      for (int i = 0; i < net->np; i++)
        net->override[i] = -1;
    }
  if (net->override[pidx] >= 0 && net->override[pidx] != self)
    return vn_fail_unit (net, u, "%s.%s is already driven by \"%s\"; one "
                         "controller or switch per input",
                         net->u[cu].name, net->u[cu].k->par[cp].name,
                         net->u[net->override[pidx]].name);
  net->override[pidx] = self;
  return VN_OK;
}

/* Cascade depth of loop unit i: how many controllers or switches its
 * output passes through (each driving the next one's setpoint) before it
 * reaches the plant; -1 when the chain closes on itself. */
static int cascade_depth (const vn_net *net, int i)
{
  int depth = 0;
  for (int j = net->u[i].ref[2]; net->u[j].k->pre; j = net->u[j].ref[2])
    if (++depth > net->nloop)
      return -1;
  return depth;
}

int vn_loop_order (vn_net *net)
{
  net->nloop = 0;
  for (int i = 0; i < net->nu; i++)
    net->nloop += net->u[i].k->pre != NULL;
  free (net->loop_order);
  net->loop_order = malloc ((size_t) (net->nloop + 1)
                            * sizeof *net->loop_order);
  int *depth = malloc ((size_t) (net->nu + 1) * sizeof *depth);
  if (!net->loop_order || !depth)
    {
      free (depth);
      return VN_ENOMEM;
    }
  int n = 0, maxd = 0;
  for (int i = 0; i < net->nu; i++)
    {
      if (!net->u[i].k->pre)
        continue;
      depth[i] = cascade_depth (net, i);
      if (depth[i] < 0)
        {
          free (depth);
          return vn_fail_unit (net, &net->u[i], "its output comes back to "
                               "its own setpoint through the controllers "
                               "it drives; a cascade must end at a plant "
                               "input");
        }
      if (depth[i] > maxd)
        maxd = depth[i];
      /* derivatives chain through at most 8 driven inputs (lf.c) */
      if (depth[i] > 6)
        {
          int levels = depth[i] + 1;
          free (depth);
          return vn_fail_unit (net, &net->u[i], "it heads a cascade of %d "
                               "controllers or switches; at most 7 are "
                               "supported", levels);
        }
    }
  /* deepest (outermost) first; declaration order within a depth */
  for (int d = maxd; d >= 0; d--)
    for (int i = 0; i < net->nu; i++)
      if (net->u[i].k->pre && depth[i] == d)
        net->loop_order[n++] = i;
  free (depth);
  return VN_OK;
}

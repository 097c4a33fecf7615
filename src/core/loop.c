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
  /* a cascade's inner (slave) controller reads the setpoint the outer
   * one writes, so the outer must act first: declared first */
  if (net->u[cu].k->pre && cu < self)
    return vn_fail_unit (net, u, "it drives the setpoint of \"%s\", "
                         "declared before it; declare the outer (master) "
                         "controller first", net->u[cu].name);
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

/* What every two-ended flow element shares: the driving head by the
 * nozzle rule and the liquid gate.
 *
 * Driving head dH = max(Hs, zs) - ref, with zs = base_s + outlet and
 *   ref = max(Hd, zd), zd = base_d + inlet   (destination a tank)
 *       = Hd                                 (a fixed-head boundary)
 *       = zs                                 (free discharge, Torricelli)
 * so a destination surface below its inlet does not push back
 * (non-interacting) and one above it does (interacting, flow may reverse).
 * Gate: forward flow needs liquid at the source's outlet, reverse flow
 * liquid at the destination's inlet; a smooth step over the band keeps a
 * tank from delivering liquid it does not hold. */
#include <math.h>
#include "smooth.h"
#include "vn_internal.h"

double vn_link_dh (const vn_unit *u, const vn_node *s, const vn_node *d,
                   double outlet, double inlet, int pc_outlet, int pc_inlet,
                   vn_lf *ddh)
{
  (void) u;
  double es, zs = 0;
  if (s->istank)
    {
      zs = s->base + outlet;
      int above = s->H >= zs;
      es = above ? s->H : zs;
      vn_lf_axpy (ddh, above ? 1.0 : 0.0, &s->dH);
      vn_lf_p (ddh, pc_outlet, above ? 0.0 : 1.0);
      vn_lf_p (ddh, s->pc_base, above ? 0.0 : 1.0);
    }
  else
    {
      es = s->H;
      zs = outlet;
      vn_lf_axpy (ddh, 1.0, &s->dH);
    }
  double ed;
  if (!d)
    {
      ed = zs;
      if (s->istank)
        {
          /* dH = max(Hs, zs) - zs: the level above the outlet */
          vn_lf_p (ddh, pc_outlet, -1.0);
          vn_lf_p (ddh, s->pc_base, -1.0);
        }
      else
        vn_lf_p (ddh, pc_outlet, -1.0);
    }
  else if (d->istank)
    {
      double zd = d->base + inlet;
      int above = d->H >= zd;
      ed = above ? d->H : zd;
      vn_lf_axpy (ddh, above ? -1.0 : 0.0, &d->dH);
      vn_lf_p (ddh, pc_inlet, above ? 0.0 : -1.0);
      vn_lf_p (ddh, d->pc_base, above ? 0.0 : -1.0);
    }
  else
    {
      ed = d->H;
      vn_lf_axpy (ddh, -1.0, &d->dH);
    }
  return es - ed;
}

/* Gate on the liquid available upstream of the flow's direction: a
 * smooth step of the liquid above the nozzle (vn_tank_above), reversing
 * the flow in proportion to a volume below empty. */
double vn_link_gate (const vn_net *net, const vn_node *s, const vn_node *d,
                     double dh, double outlet, double inlet, int pc_outlet,
                     int pc_inlet, double band, vn_lf *dg)
{
  int fwd = dh >= 0;
  double gs = 1, gd = 1, dgs = 0, dgd = 0;
  vn_lf es, ed;
  vn_lf *pes = dg ? &es : NULL, *ped = dg ? &ed : NULL;
  vn_lf_zero (pes);
  vn_lf_zero (ped);
  /* without derivatives only the upstream side matters */
  int dry;
  if (s && s->istank && (fwd || dg))
    {
      double e = vn_tank_above (net, s, outlet, pc_outlet, pes, &dry);
      gs = vn_gate_liquid (e, band, dry, &dgs);
    }
  if (d && d->istank && (!fwd || dg))
    {
      double e = vn_tank_above (net, d, inlet, pc_inlet, ped, &dry);
      gd = vn_gate_liquid (e, band, dry, &dgd);
    }
  if (!dg)
    return fwd ? gs : gd;
  if (s && s->istank)
    vn_lf_axpy (dg, fwd ? dgs : 0, &es);
  if (d && d->istank)
    vn_lf_axpy (dg, fwd ? 0 : dgd, &ed);
  return fwd ? gs : gd;
}

/* Below empty (an excursion of the integrator, within its tolerance) a
 * tank has no outflow.  A gated flow out of it reverses there in
 * proportion (vn_gate_liquid), but free discharge has no driving head
 * left, so without a further term an empty tank is a neutral state: the
 * integrator's accepted errors add up and a tank drained dry drifts ever
 * lower.  Every link joined to a tank holding a negative volume V
 * therefore also returns -V / TAU_DRY to it from the other end (from
 * waste when it discharges freely): empty attracts, volume stays
 * conserved between tanks, and the term is zero wherever the volume is
 * not negative.  TAU_DRY is long beside the gate's own reversal, so the
 * slope of the balance hardly changes through empty and Newton keeps
 * converging there (a stiff return made the iterates cycle about empty). */
#define TAU_DRY 1.0   /* s */

double vn_link_dry (const vn_node *s, const vn_node *d, vn_lf *dq)
{
  double q = 0;
  if (s && s->istank)
    {
      int neg = s->V < 0;
      q += neg ? s->V / TAU_DRY : 0;
      vn_lf_x (dq, s->xV, neg ? 1 / TAU_DRY : 0);
    }
  if (d && d->istank)
    {
      int neg = d->V < 0;
      q -= neg ? d->V / TAU_DRY : 0;
      vn_lf_x (dq, d->xV, neg ? -1 / TAU_DRY : 0);
    }
  return q;
}

/* A link joins a node (tank or boundary) to a node or to free discharge,
 * never a unit to itself, never two boundaries. */
int vn_link_check_ends (vn_net *net, vn_unit *u)
{
  int self = (int) (u - net->u);
  int s = u->ref[0], d = u->ref[1];
  if (s < 0)
    return vn_fail_unit (net, u, "source is missing; name a tank or a "
                         "boundary");
  if (net->u[s].k->role != VN_ROLE_NODE)
    return vn_fail_unit (net, u, "source \"%s\" is a %s; it must be a tank "
                         "or a boundary", net->u[s].name, net->u[s].k->name);
  if (s == self || d == self)
    return vn_fail_unit (net, u, "it is joined to itself");
  if (d >= 0 && net->u[d].k->role != VN_ROLE_NODE)
    return vn_fail_unit (net, u, "destination \"%s\" is a %s; it must be a "
                         "tank, a boundary or \"\" for free discharge",
                         net->u[d].name, net->u[d].k->name);
  if (d == s)
    return vn_fail_unit (net, u, "source and destination are the same unit "
                         "\"%s\"", net->u[s].name);
  int stank = net->u[s].k == &vn_kind_tank;
  int dtank = d >= 0 && net->u[d].k == &vn_kind_tank;
  if (!stank && !dtank)
    return vn_fail_unit (net, u, "joins no tank (source \"%s\"%s%s); at "
                         "least one end must be a tank", net->u[s].name,
                         d >= 0 ? ", destination " : "",
                         d >= 0 ? net->u[d].name : "");
  return VN_OK;
}

/* The output of an element whose only output is its flow. */
void vn_link_flow_output (vn_net *net, vn_unit *u, const vn_node *nd,
                          const double *x, double *y, vn_lf *dy)
{
  (void) net;
  (void) nd;
  (void) x;
  y[0] = u->q;
  if (dy)
    vn_lf_axpy (&dy[0], 1, &u->dq);
}

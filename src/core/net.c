/* Building a network from flat arrays: copy, validate, lay out the
 * parameter, state and output vectors.  Every value is checked here, so
 * the evaluation code can trust what it reads. */
#include <math.h>
#include <stdarg.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include "vn_internal.h"

const vn_kind *vn_kind_get (int k);

int vn_fail (vn_net *net, int status, const char *fmt, ...)
{
  va_list ap;
  va_start (ap, fmt);
  vsnprintf (net->msg, sizeof net->msg, fmt, ap);
  va_end (ap);
  return status;
}

int vn_fail_unit (vn_net *net, const vn_unit *u, const char *fmt, ...)
{
  char body[768];
  va_list ap;
  va_start (ap, fmt);
  vsnprintf (body, sizeof body, fmt, ap);
  va_end (ap);
  snprintf (net->msg, sizeof net->msg, "%s \"%s\": %s", u->k->name, u->name,
            body);
  return VN_EARG;
}

const char *vn_errmsg (const vn_net *net) { return net ? net->msg : ""; }

void vn_net_free (vn_net *net)
{
  if (!net)
    return;
  free (net->u);
  free (net->p);
  free (net->p0);
  free (net->given);
  free (net->isinput);
  free (net->tab);
  free (net->decay);
  free (net->sig);
  free (net->sigdata);
  free (net->nd);
  free (net->dy);
  free (net->y);
  vn_trip_free (&net->jx);
  vn_trip_free (&net->jp);
  vn_trip_free (&net->yx);
  vn_trip_free (&net->yp);
  free (net->colptr);
  free (net->rowind);
  free (net->map);
  free (net->override);
  free (net->loop_order);
  free (net->fwork);
  free (net->ev);
  free (net);
}

/* Range check of one given value against the schema. */
static int check_value (vn_net *net, vn_unit *u, int slot, double v)
{
  const vn_param_info *pi = &u->k->par[slot];
  if (isnan (v))
    return vn_fail_unit (net, u, "%s must be a number (%s), got NaN",
                         pi->name, pi->unit);
  if (isinf (v) && !(pi->flags & VN_P_INF))
    return vn_fail_unit (net, u, "%s must be finite (%s), got %g",
                         pi->name, pi->unit, v);
  /* the infinity that is the default (no integral, no limit) is allowed */
  if (isinf (v) && v == pi->def)
    return VN_OK;
  if (v < pi->lo || v > pi->hi)
    return vn_fail_unit (net, u, "%s must lie in [%g, %g] (%s), got %g",
                         pi->name, pi->lo, pi->hi, pi->unit, v);
  if ((pi->flags & VN_P_CODE) && v != floor (v))
    return vn_fail_unit (net, u, "%s must be an integer code, got %g",
                         pi->name, v);
  return VN_OK;
}

static int setup_globals (vn_net *net, const vn_spec *s)
{
  net->g = s->gravity;
  net->rho = s->density;
  net->cp = s->cp;
  net->ambient = s->ambient;
  net->smooth = s->smooth;
  net->thermal = s->thermal;
  net->nspecies = s->nspecies;
  if (!(net->g > 0) || !isfinite (net->g))
    return vn_fail (net, VN_EARG, "network: gravity must be a positive "
                    "finite number (m/s2), got %g", net->g);
  if (!(net->rho > 0) || !isfinite (net->rho))
    return vn_fail (net, VN_EARG, "network: density must be a positive "
                    "finite number (kg/m3), got %g", net->rho);
  if (!(net->cp > 0) || !isfinite (net->cp))
    return vn_fail (net, VN_EARG, "network: cp must be a positive finite "
                    "number (J/(kg K)), got %g", net->cp);
  if (!isfinite (net->ambient))
    return vn_fail (net, VN_EARG, "network: ambient must be a finite "
                    "temperature (degC), got %g", net->ambient);
  if (!(net->smooth > 0) || !(net->smooth <= 0.1))
    return vn_fail (net, VN_EARG, "network: smooth must lie in (0, 0.1] "
                    "(m), got %g", net->smooth);
  if (net->nspecies < 0 || net->nspecies > VN_NSP)
    return vn_fail (net, VN_EARG, "network: between 0 and %d species are "
                    "allowed, got %d", VN_NSP, net->nspecies);
  if (net->nspecies > 0)
    {
      net->decay = calloc ((size_t) net->nspecies, sizeof *net->decay);
      if (!net->decay)
        return VN_ENOMEM;
      for (int i = 0; i < net->nspecies; i++)
        {
          double k = s->decay ? s->decay[i] : 0;
          if (!(k >= 0) || !isfinite (k))
            return vn_fail (net, VN_EARG, "network: decay of species %d "
                            "must be a non-negative finite rate (1/s), "
                            "got %g", i + 1, k);
          net->decay[i] = k;
        }
    }
  return VN_OK;
}

/* A unit's table must lie inside the spec's ntab pairs: the offset and
 * count come from outside (a packed struct can be made by hand), so they
 * are checked before anything is read through them. */
static int check_table_span (vn_net *net, const vn_spec *s, int i)
{
  const vn_unit *u = &net->u[i];
  if (!s->tablen || s->tablen[i] == 0)
    return VN_OK;
  int off = s->taboff ? s->taboff[i] : -1, len = s->tablen[i];
  if (len < 0)
    return vn_fail_unit (net, u, "table row count must be 0 or more, got "
                         "%d", len);
  if (s->ntab < 0)
    return vn_fail (net, VN_EARG, "network: table length must be 0 or "
                    "more pairs, got %ld", s->ntab);
  if (!s->tab || off < 0 || (long) off + len > s->ntab)
    return vn_fail_unit (net, u, "table rows %ld to %ld lie outside the "
                         "%ld packed (level, volume) pairs", (long) off + 1,
                         (long) off + len, s->tab ? s->ntab : 0L);
  return VN_OK;
}

static int setup_units (vn_net *net, const vn_spec *s)
{
  int np = 0;
  long ntab = 0;
  for (int i = 0; i < s->nunit; i++)
    {
      vn_unit *u = &net->u[i];
      u->kind = s->kind[i];
      u->k = vn_kind_get (u->kind);
      snprintf (u->name, sizeof u->name, "%s",
                s->name && s->name[i] ? s->name[i] : "?");
      if (!u->k)
        return vn_fail (net, VN_EARG, "unit \"%s\": unknown kind code %d",
                        u->name, s->kind[i]);
      for (int j = 0; j < 4; j++)
        {
          int r = s->ref ? s->ref[4 * i + j] : -1;
          u->ref[j] = r;
        }
      u->poff = np;
      np += u->k->npar;
      int st = check_table_span (net, s, i);
      if (st)
        return st;
      if (s->tablen && s->tablen[i] > 0)
        ntab += s->tablen[i];
    }
  net->np = np;
  net->p = calloc ((size_t) (np ? np : 1), sizeof *net->p);
  net->p0 = calloc ((size_t) (np ? np : 1), sizeof *net->p0);
  net->given = calloc ((size_t) (np ? np : 1), 1);
  net->isinput = calloc ((size_t) (np ? np : 1), 1);
  net->tab = calloc ((size_t) (2 * ntab + 1), sizeof *net->tab);
  if (!net->p || !net->p0 || !net->given || !net->isinput || !net->tab)
    return VN_ENOMEM;

  long tpos = 0;
  for (int i = 0; i < s->nunit; i++)
    {
      vn_unit *u = &net->u[i];
      for (int j = 0; j < u->k->npar; j++)
        {
          const vn_param_info *pi = &u->k->par[j];
          int given = s->given && s->given[(long) i * VN_NPMAX + j];
          double v = given ? s->par[(long) i * VN_NPMAX + j] : pi->def;
          if (given)
            {
              int st = check_value (net, u, j, v);
              if (st)
                return st;
            }
          net->p0[u->poff + j] = v;
          net->given[u->poff + j] = (unsigned char) given;
          net->isinput[u->poff + j] = (pi->flags & VN_P_INPUT) != 0;
        }
      if (s->tablen && s->tablen[i] > 0)
        {
          memcpy (net->tab + 2 * tpos, s->tab + 2 * (long) s->taboff[i],
                  (size_t) (2 * s->tablen[i]) * sizeof (double));
          u->tab = net->tab + 2 * tpos;
          u->ntab = s->tablen[i];
          tpos += s->tablen[i];
        }
      /* controllers and switches hold an output index in ref[1] and a
       * parameter slot in ref[3]; their kind checks those */
      for (int j = 0; j < 4; j++)
        if (!(u->k->pre && (j == 1 || j == 3))
            && (u->ref[j] < -1 || u->ref[j] >= s->nunit))
          return vn_fail_unit (net, u, "reference %d is %d, outside the "
                               "network's %d units", j + 1, u->ref[j],
                               s->nunit);
    }
  memcpy (net->p, net->p0, (size_t) np * sizeof *net->p);
  return VN_OK;
}

static int setup_layout (vn_net *net)
{
  int nx = 0, ny = 0;
  /* output counts first: a controller's check reads the measured unit's */
  for (int i = 0; i < net->nu; i++)
    {
      vn_unit *u = &net->u[i];
      u->nout = u->k->nout_base
                ? u->k->nout_base + u->k->nout_species * net->nspecies
                : u->k->nout;
    }
  for (int i = 0; i < net->nu; i++)
    {
      vn_unit *u = &net->u[i];
      if (u->k->check)
        {
          int st = u->k->check (net, u);
          if (st)
            return st;
        }
      u->xoff = nx;
      u->nx = u->k->nstates ? u->k->nstates (net, u) : 0;
      nx += u->nx;
      u->yoff = ny;
      ny += u->nout;
    }
  net->nx = nx;
  net->ny = ny;
  int st = vn_loop_order (net);
  if (st)
    return st;
  net->nd = calloc ((size_t) (net->nu > 0 ? net->nu : 1), sizeof *net->nd);
  net->dy = calloc ((size_t) (ny ? ny : 1), sizeof *net->dy);
  net->y = calloc ((size_t) (ny ? ny : 1), sizeof *net->y);
  if (!net->nd || !net->dy || !net->y)
    return VN_ENOMEM;
  for (int i = 0; i < ny; i++)
    net->y[i] = NAN;
  return VN_OK;
}

int vn_net_new (const vn_spec *s, vn_net **out, char *msg, size_t msglen)
{
  *out = NULL;
  vn_net *net = calloc (1, sizeof *net);
  if (!net)
    {
      if (msg && msglen)
        snprintf (msg, msglen, "out of memory");
      return VN_ENOMEM;
    }
  int st = VN_OK;
  if (!s || s->nunit <= 0)
    st = vn_fail (net, VN_EARG, "network: it has no units; declare tanks "
                  "and the elements that join them first");
  if (!st)
    st = setup_globals (net, s);
  if (!st)
    {
      net->nu = s->nunit;
      net->u = calloc ((size_t) s->nunit, sizeof *net->u);
      st = net->u ? setup_units (net, s) : VN_ENOMEM;
    }
  if (!st)
    st = setup_layout (net);
  if (!st && net->nx == 0)
    st = vn_fail (net, VN_EARG, "network: it has no tanks, so nothing "
                  "changes in time; declare at least one tank");
  net->seg_end = INFINITY;
  if (st)
    {
      if (msg && msglen)
        snprintf (msg, msglen, "%s",
                  st == VN_ENOMEM && !net->msg[0] ? "out of memory" : net->msg);
      vn_net_free (net);
      return st;
    }
  *out = net;
  return VN_OK;
}

/* ---- accessors ---- */
int vn_nstates (const vn_net *net) { return net->nx; }
int vn_noutputs (const vn_net *net) { return net->ny; }
int vn_nparams (const vn_net *net) { return net->np; }
int vn_nunits (const vn_net *net) { return net->nu; }

/* Which block of a unit: its states, parameters or outputs. */
enum { BLK_X, BLK_P, BLK_Y };

static void block (const vn_unit *u, int which, int *off, int *n)
{
  *off = which == BLK_X ? u->xoff : which == BLK_P ? u->poff : u->yoff;
  *n = which == BLK_X ? u->nx : which == BLK_P ? u->k->npar : u->nout;
}

/* The unit whose block [off, off + n) holds index i: blocks follow unit
 * order, so the owner is the last unit starting at or before i (a unit
 * with an empty block there starts after it), found by bisection so that
 * naming every state of a large network stays linear; -1 if none. */
static int owner (const vn_net *net, int i, int which)
{
  int lo = 0, hi = net->nu - 1, j = -1, off, n;
  while (lo <= hi)
    {
      int m = lo + (hi - lo) / 2;
      block (&net->u[m], which, &off, &n);
      if (off <= i)
        {
          j = m;
          lo = m + 1;
        }
      else
        hi = m - 1;
    }
  if (j < 0)
    return -1;
  block (&net->u[j], which, &off, &n);
  return i < off + n ? j : -1;
}

int vn_state_unit (const vn_net *net, int i)
{
  return owner (net, i, BLK_X);
}

int vn_output_unit (const vn_net *net, int i)
{
  return owner (net, i, BLK_Y);
}

const char *vn_state_var (const vn_net *net, int i)
{
  int j = vn_state_unit (net, i);
  if (j < 0)
    return "";
  const vn_unit *u = &net->u[j];
  return u->k->state_var ? u->k->state_var (u, i - u->xoff) : "state";
}

const char *vn_unit_name (const vn_net *net, int u)
{
  return (u >= 0 && u < net->nu) ? net->u[u].name : "";
}

int vn_param_index (const vn_net *net, int unit, int slot)
{
  if (unit < 0 || unit >= net->nu || slot < 0 || slot >= net->u[unit].k->npar)
    return -1;
  return net->u[unit].poff + slot;
}

int vn_output_index (const vn_net *net, int unit, int out)
{
  if (unit < 0 || unit >= net->nu || out < 0 || out >= net->u[unit].nout)
    return -1;
  return net->u[unit].yoff + out;
}

int vn_param_is_input (const vn_net *net, int index)
{
  return index >= 0 && index < net->np && net->isinput[index];
}

double vn_param_get (const vn_net *net, int index)
{
  return (index >= 0 && index < net->np) ? net->p0[index] : NAN;
}

static int unit_of_param (const vn_net *net, int index)
{
  return owner (net, index, BLK_P);
}

int vn_param_set (vn_net *net, int index, double value)
{
  int j = unit_of_param (net, index);
  if (j < 0)
    return vn_fail (net, VN_EARG, "parameter index %d is outside the "
                    "network's %d parameters", index, net->np);
  vn_unit *u = &net->u[j];
  int st = check_value (net, u, index - u->poff, value);
  if (st)
    return st;
  double old = net->p0[index];
  unsigned char oldg = net->given[index];
  net->p0[index] = net->p[index] = value;
  net->given[index] = 1;
  if (u->k->check && (st = u->k->check (net, u)) != VN_OK)
    {
      net->p0[index] = net->p[index] = old;
      net->given[index] = oldg;
      u->k->check (net, u);
    }
  return st;
}

int vn_initial_state (vn_net *net, double *x0)
{
  for (int i = 0; i < net->nu; i++)
    {
      vn_unit *u = &net->u[i];
      if (u->nx && u->k->init)
        {
          int st = u->k->init (net, u, x0 + u->xoff);
          if (st)
            return st;
        }
      else
        for (int j = 0; j < u->nx; j++)
          x0[u->xoff + j] = 0;
    }
  /* controllers' filters start at the measurement of the plant as
   * declared, every controller output at its bias (the driven input's
   * declared value unless a bias is given): what the transmitter shows
   * before the loops act.  Iterating the measurement through the loop
   * instead diverges when the loop gain exceeds 1. */
  int any = 0;
  for (int i = 0; i < net->nu; i++)
    any |= net->u[i].k == &vn_kind_controller && net->u[i].nx > 0;
  if (any)
    {
      net->hold_loops = 1;
      int st = vn_eval (net, 0, x0, NULL, NULL, 0, 0, 0, 0);
      net->hold_loops = 0;
      if (st)
        return st;
      for (int i = 0; i < net->nu; i++)
        if (net->u[i].k == &vn_kind_controller)
          vn_controller_settle (net, &net->u[i], x0);
    }
  return VN_OK;
}

/* The evaluation framework: node heads, element flows, the volume
 * balances dV/dt = sum(in) - sum(out), outputs, and the emission of their
 * analytic derivatives as triplets.  The kinds supply the laws; this file
 * supplies the balances, which are the same for every kind. */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include "vn_internal.h"

#define VN_OWNMAX 12

static inline void balance (vn_net *net, int tank, double sign, double q,
                     const vn_lf *dq, double *f, int want_jx, int want_jp)
{
  if (tank < 0 || !net->nd[tank].istank)
    return;
  int row = net->u[tank].xoff;
  f[row] += sign * q;
  if (want_jx || want_jp)
    vn_emit (net, row, sign, dq, want_jx ? &net->jx : NULL,
             want_jp ? &net->jp : NULL);
}

/* A carried property j (0: temperature when thermal, then each species)
 * of a node, and its derivative scaled by a. */
static double prop (const vn_net *net, const vn_node *n, int j, double a,
                    vn_lf *d)
{
  if (net->thermal && j == 0)
    {
      if (n->xE >= 0)
        {
          vn_lf_x (d, n->xV, a * n->dTdV);
          vn_lf_x (d, n->xE, a * n->dTdE);
        }
      else if (n->pcT >= 0)
        vn_lf_p (d, n->pcT, a);
      return n->T;
    }
  int k = j - net->thermal;
  if (n->xM0 >= 0)
    {
      vn_lf_x (d, n->xV, a * n->dcdV[k]);
      vn_lf_x (d, n->xM0 + k, a * n->dcdM[k]);
    }
  else if (n->pcc0 >= 0)
    vn_lf_p (d, n->pcc0 + k, a);
  return n->c[k];
}

/* Row of property j in a tank's balances. */
static int prop_row (const vn_net *net, const vn_node *n, int j)
{
  return (net->thermal && j == 0) ? n->xE : n->xM0 + j - net->thermal;
}

/* A flow q from ps to pd carries the upstream side's temperature and
 * concentrations: flux q * p_up out of a source tank and into a
 * destination tank (both ends' entries are added, structurally). */
static void carry (vn_net *net, const vn_node *ps, int stank,
                   const vn_node *pd, int dtank, double q, const vn_lf *dq,
                   double *f, int want_jx, int want_jp)
{
  int fwd = q >= 0 || !pd;
  int want = want_jx || want_jp;
  int np = net->thermal + net->nspecies;
  for (int j = 0; j < np; j++)
    {
      vn_lf df;
      df.n = 0;
      vn_lf *pdf = want ? &df : NULL;
      double vs = prop (net, ps, j, fwd ? q : 0, pdf);
      double vd = pd ? prop (net, pd, j, fwd ? 0 : q, pdf) : vs;
      double up = fwd ? vs : vd;
      vn_lf_axpy (pdf, up, dq);
      double flux = q * up;
      if (stank)
        {
          int r = prop_row (net, ps, j);
          f[r] -= flux;
          if (want)
            vn_emit (net, r, -1, &df, want_jx ? &net->jx : NULL,
                     want_jp ? &net->jp : NULL);
        }
      if (dtank)
        {
          int r = prop_row (net, pd, j);
          f[r] += flux;
          if (want)
            vn_emit (net, r, 1, &df, want_jx ? &net->jx : NULL,
                     want_jp ? &net->jp : NULL);
        }
    }
}

int vn_eval (vn_net *net, double t, const double *x, double *f, double *y,
             int want_jx, int want_jp, int want_yx, int want_yp)
{
  (void) t;
  int want_d = want_jx || want_jp;
  int want_dy = want_yx || want_yp;
  net->want_d = want_d || want_dy;
  net->jx.n = net->jp.n = net->yx.n = net->yp.n = 0;
  /* outputs only: the balances are not summed (own states still are) */
  int balances = f != NULL || want_d;
  int nprop = net->thermal + net->nspecies;
  double *fw = f;
  if (!fw)
    {
      if (!net->fwork
          && !(net->fwork = malloc ((size_t) net->nx * sizeof *net->fwork)))
        return VN_ENOMEM;
      fw = net->fwork;
    }
  memset (fw, 0, (size_t) net->nx * sizeof *fw);

  /* nodes: heads (and tank spills) from the states */
  for (int i = 0; i < net->nu; i++)
    {
      vn_unit *u = &net->u[i];
      if (u->k->role == VN_ROLE_NODE)
        u->k->node (net, u, x, &net->nd[i]);
    }
  /* controllers and switches set the inputs they drive, the outer one
   * of a cascade first */
  for (int k = 0; k < net->nloop; k++)
    {
      vn_unit *u = &net->u[net->loop_order[k]];
      u->k->pre (net, u, x);
    }
  /* own dynamics and element flows; controllers' own states last, once
   * the flows they may measure are known */
  for (int pass = 0; pass < 1 + (net->nloop > 0); pass++)
  for (int i = 0; i < net->nu; i++)
    {
      vn_unit *u = &net->u[i];
      if ((pass == 1) != (u->k->role == VN_ROLE_OTHER))
        continue;
      /* a tank has own terms only with properties (heat loss, decay) */
      if (u->k->own && u->nx > (u->k->role == VN_ROLE_NODE))
        {
          vn_lf df[VN_OWNMAX];
          for (int j = 0; j < u->nx && j < VN_OWNMAX; j++)
            df[j].n = 0;
          u->k->own (net, u, x, fw, want_d ? df : NULL);
          if (want_d)
            for (int j = 0; j < u->nx && j < VN_OWNMAX; j++)
              vn_emit (net, u->xoff + j, 1.0, &df[j],
                       want_jx ? &net->jx : NULL, want_jp ? &net->jp : NULL);
        }
      if (u->k->role == VN_ROLE_LINK)
        {
          const vn_node *s = u->ref[0] >= 0 ? &net->nd[u->ref[0]] : NULL;
          const vn_node *d = u->ref[1] >= 0 ? &net->nd[u->ref[1]] : NULL;
          u->dq.n = 0;
          u->q = u->k->flow (net, u, s, d, x,
                             (want_d || want_dy) ? &u->dq : NULL);
          u->q += vn_link_dry (s, d, (want_d || want_dy) ? &u->dq : NULL);
          if (balances)
            {
              balance (net, u->ref[0], -1.0, u->q, &u->dq, fw, want_jx,
                       want_jp);
              balance (net, u->ref[1], +1.0, u->q, &u->dq, fw, want_jx,
                       want_jp);
              if (nprop)
                {
                  vn_node own_props;
                  const vn_node *ps = s;
                  if (!s)
                    {
                      vn_feed_props (net, u, &own_props);
                      ps = &own_props;
                    }
                  carry (net, ps, s && s->istank, d, d && d->istank, u->q,
                         &u->dq, fw, want_jx, want_jp);
                }
            }
        }
      else if (balances && u->k->role == VN_ROLE_NODE && net->nd[i].istank)
        {
          /* the spill over the rim leaves this tank for ref[0] or waste */
          balance (net, i, -1.0, u->q, &u->dq, fw, want_jx, want_jp);
          balance (net, u->ref[0], +1.0, u->q, &u->dq, fw, want_jx,
                   want_jp);
          if (nprop)
            carry (net, &net->nd[i], 1,
                   u->ref[0] >= 0 ? &net->nd[u->ref[0]] : NULL,
                   u->ref[0] >= 0, u->q, &u->dq, fw, want_jx, want_jp);
        }
      else if (u->k->role == VN_ROLE_HEAT)
        {
          /* heat into the tank's energy: d(VT)/dt += Q / (rho cp) */
          const vn_node *tk = &net->nd[u->ref[1]];
          u->dq.n = 0;
          double Q = u->k->heat (net, u, tk, x,
                                 (want_d || want_dy) ? &u->dq : NULL);
          if (balances)
            {
              double c = 1 / (net->rho * net->cp);
              fw[tk->xE] += c * Q;
              if (want_d)
                vn_emit (net, tk->xE, c, &u->dq, want_jx ? &net->jx : NULL,
                         want_jp ? &net->jp : NULL);
            }
        }
    }
  if (y || want_dy)
    for (int i = 0; i < net->nu; i++)
      {
        vn_unit *u = &net->u[i];
        double *yu = net->y + u->yoff;
        vn_lf *dyu = net->dy + u->yoff;
        for (int j = 0; j < u->nout; j++)
          dyu[j].n = 0;
        u->k->outputs (net, u, &net->nd[i], x, yu, want_dy ? dyu : NULL);
        if (want_dy)
          for (int j = 0; j < u->nout; j++)
            vn_emit (net, u->yoff + j, 1.0, &dyu[j],
                     want_yx ? &net->yx : NULL, want_yp ? &net->yp : NULL);
        if (y)
          memcpy (y + u->yoff, yu, (size_t) u->nout * sizeof *y);
      }
  for (int i = 0; i < net->nx && f; i++)
    if (!isfinite (fw[i]))
      return vn_fail (net, VN_ESOLVER, "the balance of %s \"%s\" is not "
                      "finite (%g)", net->u[vn_state_unit (net, i)].k->name,
                      net->u[vn_state_unit (net, i)].name, fw[i]);
  return VN_OK;
}

int vn_rhs (vn_net *net, double t, const double *x, double *f)
{
  vn_apply_signals (net, t);
  return vn_eval (net, t, x, f, NULL, 0, 0, 0, 0);
}

int vn_outputs (vn_net *net, double t, const double *x, double *y)
{
  vn_apply_signals (net, t);
  return vn_eval (net, t, x, NULL, y, 0, 0, 0, 0);
}

int vn_jac_dense (vn_net *net, double t, const double *x, double *J)
{
  vn_apply_signals (net, t);
  int st = vn_eval (net, t, x, NULL, NULL, 1, 0, 0, 0);
  if (st)
    return st;
  long n = net->nx;
  memset (J, 0, (size_t) (n * n) * sizeof *J);
  for (long k = 0; k < net->jx.n; k++)
    J[(long) net->jx.c[k] * n + net->jx.r[k]] += net->jx.v[k];
  return VN_OK;
}

int vn_linearize_dense (vn_net *net, double t, const double *x,
                        int nin, const int *pin, int nout, const int *yout,
                        double *A, double *B, double *C, double *D)
{
  for (int j = 0; j < nin; j++)
    if (pin[j] < 0 || pin[j] >= net->np)
      return vn_fail (net, VN_EARG, "input %d: parameter index %d outside "
                      "the network", j + 1, pin[j]);
  for (int j = 0; j < nout; j++)
    if (yout[j] < 0 || yout[j] >= net->ny)
      return vn_fail (net, VN_EARG, "output %d: index %d outside the "
                      "network", j + 1, yout[j]);
  vn_apply_signals (net, t);
  int st = vn_eval (net, t, x, NULL, NULL, A != NULL, B != NULL, C != NULL,
                    D != NULL);
  if (st)
    return st;
  long n = net->nx;
  /* parameter -> input column and output -> row maps */
  int *pcol = malloc ((size_t) (net->np + 1) * sizeof *pcol);
  int *yrow = malloc ((size_t) (net->ny + 1) * sizeof *yrow);
  if (!pcol || !yrow)
    {
      free (pcol);
      free (yrow);
      return VN_ENOMEM;
    }
  for (int i = 0; i < net->np; i++)
    pcol[i] = -1;
  for (int i = 0; i < net->ny; i++)
    yrow[i] = -1;
  for (int j = 0; j < nin; j++)
    pcol[pin[j]] = j;
  for (int j = 0; j < nout; j++)
    yrow[yout[j]] = j;
  if (A)
    {
      memset (A, 0, (size_t) (n * n) * sizeof *A);
      for (long k = 0; k < net->jx.n; k++)
        A[(long) net->jx.c[k] * n + net->jx.r[k]] += net->jx.v[k];
    }
  if (B)
    {
      memset (B, 0, (size_t) (n * nin) * sizeof *B);
      for (long k = 0; k < net->jp.n; k++)
        if (pcol[net->jp.c[k]] >= 0)
          B[(long) pcol[net->jp.c[k]] * n + net->jp.r[k]] += net->jp.v[k];
    }
  if (C)
    {
      memset (C, 0, (size_t) ((long) nout * n) * sizeof *C);
      for (long k = 0; k < net->yx.n; k++)
        if (yrow[net->yx.r[k]] >= 0)
          C[(long) net->yx.c[k] * nout + yrow[net->yx.r[k]]] += net->yx.v[k];
    }
  if (D)
    {
      memset (D, 0, (size_t) ((long) nout * nin) * sizeof *D);
      for (long k = 0; k < net->yp.n; k++)
        if (yrow[net->yp.r[k]] >= 0 && pcol[net->yp.c[k]] >= 0)
          D[(long) pcol[net->yp.c[k]] * nout + yrow[net->yp.r[k]]]
            += net->yp.v[k];
    }
  free (pcol);
  free (yrow);
  return VN_OK;
}

/* Build the compressed-column pattern of df/dx (diagonal always present,
 * since the integrator adds the identity) and the map from each emitted
 * triplet to its slot.  The emission order depends only on topology. */
static int build_pattern (vn_net *net)
{
  long n = net->nx, m = net->jx.n;
  long *cnt = calloc ((size_t) (n + 1), sizeof *cnt);
  long *pos = malloc ((size_t) (m + n + 1) * sizeof *pos);
  long *tmprow = malloc ((size_t) (m + n + 1) * sizeof *tmprow);
  long *tmpk = malloc ((size_t) (m + n + 1) * sizeof *tmpk);
  free (net->colptr);
  free (net->rowind);
  free (net->map);
  net->colptr = malloc ((size_t) (n + 1) * sizeof *net->colptr);
  net->map = malloc ((size_t) (m + 1) * sizeof *net->map);
  if (!cnt || !pos || !tmprow || !tmpk || !net->colptr || !net->map)
    {
      free (cnt);
      free (pos);
      free (tmprow);
      free (tmpk);
      return VN_ENOMEM;
    }
  /* bucket the triplets (and diagonal) by column */
  for (long k = 0; k < m; k++)
    cnt[net->jx.c[k] + 1]++;
  for (long j = 0; j < n; j++)
    cnt[j + 1]++;
  for (long j = 0; j < n; j++)
    cnt[j + 1] += cnt[j];
  long *fill = malloc ((size_t) (n + 1) * sizeof *fill);
  if (!fill)
    {
      free (cnt);
      free (pos);
      free (tmprow);
      free (tmpk);
      return VN_ENOMEM;
    }
  memcpy (fill, cnt, (size_t) (n + 1) * sizeof *fill);
  for (long j = 0; j < n; j++)
    {
      tmprow[fill[j]] = j;
      tmpk[fill[j]++] = -1;
    }
  for (long k = 0; k < m; k++)
    {
      long j = net->jx.c[k];
      tmprow[fill[j]] = net->jx.r[k];
      tmpk[fill[j]++] = k;
    }
  /* sort rows inside each column (columns are short), merge repeats */
  net->rowind = malloc ((size_t) (m + n + 1) * sizeof *net->rowind);
  if (!net->rowind)
    {
      free (cnt);
      free (pos);
      free (tmprow);
      free (tmpk);
      free (fill);
      return VN_ENOMEM;
    }
  long nnz = 0;
  for (long j = 0; j < n; j++)
    {
      long a = cnt[j], b = cnt[j + 1];
      for (long i = a + 1; i < b; i++)
        {
          long r = tmprow[i], kk = tmpk[i], q = i - 1;
          while (q >= a && tmprow[q] > r)
            {
              tmprow[q + 1] = tmprow[q];
              tmpk[q + 1] = tmpk[q];
              q--;
            }
          tmprow[q + 1] = r;
          tmpk[q + 1] = kk;
        }
      net->colptr[j] = nnz;
      for (long i = a; i < b; i++)
        {
          if (i == a || tmprow[i] != tmprow[i - 1])
            net->rowind[nnz++] = tmprow[i];
          if (tmpk[i] >= 0)
            net->map[tmpk[i]] = nnz - 1;
        }
    }
  net->colptr[n] = nnz;
  net->nnz = nnz;
  net->nmap = m;
  free (cnt);
  free (pos);
  free (tmprow);
  free (tmpk);
  free (fill);
  return VN_OK;
}

int vn_jac_csc (vn_net *net, double t, const double *x, long *nnz,
                long *colptr, long *rowind, double *val)
{
  vn_apply_signals (net, t);
  int st = vn_eval (net, t, x, NULL, NULL, 1, 0, 0, 0);
  if (st)
    return st;
  if (!net->map || net->nmap != net->jx.n)
    if ((st = build_pattern (net)) != VN_OK)
      return st;
  if (!colptr)
    {
      *nnz = net->nnz;
      return VN_OK;
    }
  if (*nnz < net->nnz)
    return vn_fail (net, VN_EARG, "sparse Jacobian needs %ld entries, "
                    "room for %ld given", net->nnz, *nnz);
  memcpy (colptr, net->colptr, (size_t) (net->nx + 1) * sizeof *colptr);
  memcpy (rowind, net->rowind, (size_t) net->nnz * sizeof *rowind);
  memset (val, 0, (size_t) net->nnz * sizeof *val);
  for (long k = 0; k < net->jx.n; k++)
    val[net->map[k]] += net->jx.v[k];
  *nnz = net->nnz;
  return VN_OK;
}

/* Derivative linear forms and triplet buffers (see vn_internal.h). */
#include <stdlib.h>
#include "vn_internal.h"

void vn_lf_add (vn_lf *d, int col, int isp, double v)
{
  /* merge a repeated column so long chains stay inside VN_LF */
  for (int i = 0; i < d->n; i++)
    if (d->col[i] == col && d->isp[i] == isp)
      {
        d->v[i] += v;
        return;
      }
  if (d->n < VN_LF)
    {
      d->col[d->n] = col;
      d->isp[d->n] = (unsigned char) isp;
      d->v[d->n] = v;
      d->n++;
    }
}

void vn_lf_axpy_ (vn_lf *d, double a, const vn_lf *s)
{
  for (int i = 0; i < s->n; i++)
    vn_lf_add (d, s->col[i], s->isp[i], a * s->v[i]);
}

int vn_trip_add (vn_trip *T, int r, int c, double v)
{
  if (T->n == T->cap)
    {
      long cap = T->cap ? 2 * T->cap : 256;
      int *nr = realloc (T->r, (size_t) cap * sizeof *nr);
      if (!nr)
        return VN_ENOMEM;
      T->r = nr;
      int *nc = realloc (T->c, (size_t) cap * sizeof *nc);
      if (!nc)
        return VN_ENOMEM;
      T->c = nc;
      double *nv = realloc (T->v, (size_t) cap * sizeof *nv);
      if (!nv)
        return VN_ENOMEM;
      T->v = nv;
      T->cap = cap;
    }
  T->r[T->n] = r;
  T->c[T->n] = c;
  T->v[T->n] = v;
  T->n++;
  return VN_OK;
}

void vn_trip_free (vn_trip *T)
{
  free (T->r);
  free (T->c);
  free (T->v);
  T->r = T->c = NULL;
  T->v = NULL;
  T->n = T->cap = 0;
}

/* Add sign * d to row `row`: state columns to tx, parameter columns to
 * tp (either may be NULL). */
static void emit (vn_net *net, int row, double sign, const vn_lf *d,
                  vn_trip *tx, vn_trip *tp, int depth)
{
  for (int i = 0; i < d->n; i++)
    {
      int c = d->col[i];
      if (d->isp[i] && net->override && net->override[c] >= 0 && depth < 8)
        {
          /* an input set by a controller: chain through its output */
          emit (net, row, sign * d->v[i], &net->u[net->override[c]].dq, tx,
                tp, depth + 1);
          continue;
        }
      vn_trip *T = d->isp[i] ? tp : tx;
      if (T)
        vn_trip_add (T, row, c, sign * d->v[i]);
    }
}

/* Emission also resolves inputs driven by controllers and switches: the
 * derivative passes through the controller's output to its states. */
void vn_emit (vn_net *net, int row, double sign, const vn_lf *d,
              vn_trip *tx, vn_trip *tp)
{
  emit (net, row, sign, d, tx, tp, 0);
}

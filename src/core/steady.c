/* Steady states: Newton's method on the balances f(x, u) = 0, extended
 * for the inverse problem by output(x, u) = target with the adjusted
 * inputs as extra unknowns.  The step is globalised by backtracking on
 * the scaled residual 0.5 ||W F||^2 (Dennis and Schnabel, Numerical
 * Methods for Unconstrained Optimization and Nonlinear Equations, 1983,
 * section 6.3); linear systems by LAPACK dgesv (small) or KLU (large).
 * On failure a short simulation brings the state nearer and Newton is
 * retried.  When no steady state exists, the reason is given in plant
 * terms: a tank that can only fill, one that runs dry, a pump that cannot
 * reach its head. */
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <klu.h>
#include "vn_internal.h"

#define DENSE_MAX 100      /* unknowns: above this KLU (as vn_simulate) */
#define LS_MIN 1e-6        /* smallest line-search step fraction */
#define ARMIJO 1e-4

extern void dgesv_ (const int *n, const int *nrhs, double *a, const int *lda,
                    int *ipiv, double *b, const int *ldb, int *info);

typedef struct ss {
  vn_net *net;
  const vn_steady_opts *o;
  int nx, m, n, solver, maxiter;
  double tol, qs;
  double *z, *zt, *F, *Ft, *dz, *w, *y, *lo, *hi;
  double *J, *B, *C, *D;   /* dense J (n x n) or the B C D blocks */
  int *ipiv, *isvol;
  long *cp, *ri, *acp, *ari;
  double *v, *av;
  long annz;
  int iters;
} ss;

/* ---- small helpers ---- */

static int slot_of (const vn_unit *u, const char *name)
{
  for (int j = 0; j < u->k->npar; j++)
    if (strcmp (u->k->par[j].name, name) == 0)
      return j;
  return -1;
}

static double par_named (const vn_net *net, const vn_unit *u,
                         const char *name, double dflt)
{
  int j = slot_of (u, name);
  return j < 0 ? dflt : net->p[u->poff + j];
}

static int given_named (const vn_net *net, const vn_unit *u,
                        const char *name)
{
  int j = slot_of (u, name);
  return j >= 0 && net->given[u->poff + j];
}

static int is_tank (const vn_net *net, int i)
{
  return i >= 0 && net->u[i].k == &vn_kind_tank;
}

/* tank.c keeps the rim height (Inf: none) in d[6] */
static int has_rim (const vn_unit *u)
{
  return isfinite (u->d[6]);
}

static int is_boundary (const vn_net *net, int i)
{
  return i >= 0 && net->u[i].k == &vn_kind_boundary;
}

/* ---- residual and Jacobian of the extended system ---- */

static void set_inputs (ss *S, const double *z)
{
  for (int k = 0; k < S->m; k++)
    {
      int p = S->o->padj[k];
      S->net->p0[p] = S->net->p[p] = z[S->nx + k];
      S->net->given[p] = 1;
    }
}

static int residual (ss *S, const double *z, double *F)
{
  vn_net *net = S->net;
  set_inputs (S, z);
  vn_apply_signals (net, 0);
  int st = vn_eval (net, 0, z, F, S->m ? S->y : NULL, 0, 0, 0, 0);
  if (st)
    return st;
  for (int k = 0; k < S->m; k++)
    F[S->nx + k] = S->y[S->o->ytgt[k]] - S->o->target[k];
  return VN_OK;
}

static double merit (const ss *S, const double *F)
{
  double s = 0;
  for (int i = 0; i < S->n; i++)
    s += (S->w[i] * F[i]) * (S->w[i] * F[i]);
  return 0.5 * s;
}

static double maxscaled (const ss *S, const double *F, int *where)
{
  double big = 0;
  *where = -1;
  for (int i = 0; i < S->n; i++)
    if (fabs (S->w[i] * F[i]) > big)
      {
        big = fabs (S->w[i] * F[i]);
        *where = i;
      }
  return big;
}

/* Solve J dz = -F at z, dense. */
static int solve_dense (ss *S, const double *z, const double *F, double *dz,
                        double sigma)
{
  vn_net *net = S->net;
  int nx = S->nx, m = S->m, n = S->n;
  set_inputs (S, z);
  int st;
  if (m == 0)
    st = vn_jac_dense (net, 0, z, S->J);
  else
    {
      double *A = S->J + (long) n * n;   /* scratch after J */
      st = vn_linearize_dense (net, 0, z, m, S->o->padj, m, S->o->ytgt, A,
                               S->B, S->C, S->D);
      if (!st)
        for (int j = 0; j < n; j++)
          for (int i = 0; i < n; i++)
            {
              double v;
              if (i < nx && j < nx)
                v = A[(long) j * nx + i];
              else if (i < nx)
                v = S->B[(long) (j - nx) * nx + i];
              else if (j < nx)
                v = S->C[(long) j * m + (i - nx)];
              else
                v = S->D[(long) (j - nx) * m + (i - nx)];
              S->J[(long) j * n + i] = v;
            }
    }
  if (st)
    return st;
  for (int i = 0; i < nx; i++)
    S->J[(long) i * n + i] -= sigma;
  for (int i = 0; i < n; i++)
    dz[i] = -F[i];
  int one = 1, info = 0;
  dgesv_ (&n, &one, S->J, &n, S->ipiv, dz, &n, &info);
  if (info != 0)
    return vn_fail (net, VN_ESOLVER, "steady: the Jacobian is singular "
                    "(pivot %d)", info);
  return VN_OK;
}

/* Solve J dz = -F at z with KLU on the compressed-column Jacobian, the
 * output rows and adjusted-input columns appended. */
static int solve_klu (ss *S, const double *z, const double *F, double *dz,
                      double sigma)
{
  vn_net *net = S->net;
  int nx = S->nx, m = S->m, n = S->n;
  set_inputs (S, z);
  long nnz = S->annz;
  int st = vn_jac_csc (net, 0, z, &nnz, S->cp, S->ri, S->v);
  if (st)
    return st;
  /* the pattern always holds the diagonal */
  for (int j = 0; j < nx && sigma != 0; j++)
    for (long q = S->cp[j]; q < S->cp[j + 1]; q++)
      if (S->ri[q] == j)
        S->v[q] -= sigma;
  const double *J;
  const long *cp, *ri;
  if (m == 0)
    {
      J = S->v;
      cp = S->cp;
      ri = S->ri;
    }
  else
    {
      st = vn_linearize_dense (net, 0, z, m, S->o->padj, m, S->o->ytgt,
                               NULL, S->B, S->C, S->D);
      if (st)
        return st;
      long k = 0;
      for (int j = 0; j < n; j++)
        {
          S->acp[j] = k;
          if (j < nx)
            {
              for (long q = S->cp[j]; q < S->cp[j + 1]; q++)
                {
                  S->ari[k] = S->ri[q];
                  S->av[k++] = S->v[q];
                }
              for (int i = 0; i < m; i++)
                if (S->C[(long) j * m + i] != 0)
                  {
                    S->ari[k] = nx + i;
                    S->av[k++] = S->C[(long) j * m + i];
                  }
            }
          else
            {
              for (int i = 0; i < nx; i++)
                if (S->B[(long) (j - nx) * nx + i] != 0)
                  {
                    S->ari[k] = i;
                    S->av[k++] = S->B[(long) (j - nx) * nx + i];
                  }
              for (int i = 0; i < m; i++)
                {
                  S->ari[k] = nx + i;
                  S->av[k++] = S->D[(long) (j - nx) * m + i];
                }
            }
        }
      S->acp[n] = k;
      J = S->av;
      cp = S->acp;
      ri = S->ari;
    }
  klu_l_common c;
  klu_l_defaults (&c);
  klu_l_symbolic *sym = klu_l_analyze (n, (long *) cp, (long *) ri, &c);
  klu_l_numeric *num = sym ? klu_l_factor ((long *) cp, (long *) ri,
                                           (double *) J, sym, &c) : NULL;
  for (int i = 0; i < n; i++)
    dz[i] = -F[i];
  int ok = num && klu_l_solve (sym, num, n, 1, dz, &c);
  if (num)
    klu_l_free_numeric (&num, &c);
  if (sym)
    klu_l_free_symbolic (&sym, &c);
  if (!ok)
    return vn_fail (net, c.status == KLU_OUT_OF_MEMORY ? VN_ENOMEM
                    : VN_ESOLVER, "steady: the sparse Jacobian is %s (KLU "
                    "status %d)", c.status == KLU_SINGULAR ? "singular"
                    : "not factorable", (int) c.status);
  return VN_OK;
}

/* Keep volumes non-negative and adjusted inputs inside their ranges. */
static void project (const ss *S, double *z)
{
  for (int i = 0; i < S->nx; i++)
    if (S->isvol[i] && z[i] < 0)
      z[i] = 0;
  for (int k = 0; k < S->m; k++)
    {
      double *v = &z[S->nx + k];
      if (*v < S->lo[k])
        *v = S->lo[k];
      if (*v > S->hi[k])
        *v = S->hi[k];
    }
}

static int solve (ss *S, const double *z, const double *F, double *dz,
                  double sigma)
{
  return S->solver == VN_SOLVER_KLU ? solve_klu (S, z, F, dz, sigma)
                                    : solve_dense (S, z, F, dz, sigma);
}

/* Pseudo-transient continuation: implicit Euler steps on the balances
 * with a step dt that grows as the residual falls (switched evolution
 * relaxation; Kelley and Keyes, SIAM J. Numer. Anal. 35 (1998)), so the
 * iterate follows the plant's own settling and becomes Newton's method
 * near the answer.  Used when plain Newton stalls far from it. */
static int ptc (ss *S, double dt)
{
  vn_net *net = S->net;
  int n = S->n, where;
  int st = residual (S, S->z, S->F);
  if (st)
    return st;
  double nrm = sqrt (2 * merit (S, S->F));
  for (int it = 0; it < 10 * S->maxiter; it++)
    {
      if (maxscaled (S, S->F, &where) <= S->tol)
        return VN_OK;
      if (net->stop && net->stop (net->stop_data))
        return vn_fail (net, VN_EINTR, "steady: interrupted");
      st = solve (S, S->z, S->F, S->dz, 1 / dt);
      S->iters++;
      if (st == VN_OK)
        {
          for (int i = 0; i < n; i++)
            S->zt[i] = S->z[i] + S->dz[i];
          project (S, S->zt);
          st = residual (S, S->zt, S->Ft);
        }
      if (st == VN_ENOMEM || st == VN_EINTR)
        return st;
      double nt = st == VN_OK ? sqrt (2 * merit (S, S->Ft)) : INFINITY;
      if (!(nt <= 10 * nrm))
        {
          /* too bold: shorter pseudo-time step */
          dt *= 0.25;
          if (dt < 1e-12)
            break;
          continue;
        }
      memcpy (S->z, S->zt, (size_t) n * sizeof *S->z);
      memcpy (S->F, S->Ft, (size_t) n * sizeof *S->F);
      /* grow at least geometrically: implicit Euler is stable for any
       * step, and a residual that falls allows more (SER) */
      dt *= fmin (fmax (nrm / fmax (nt, 1e-300), 2), 10);
      nrm = nt;
    }
  return vn_fail (net, VN_ESOLVER, "steady: pseudo-transient continuation "
                  "did not converge");
}

/* Two more full Newton steps once converged, kept while they lower the
 * residual: in a long chain small per-tank residuals of one sign add up
 * along the levels, and Newton's last steps remove them cheaply. */
static int polish (ss *S, double phi)
{
  for (int k = 0; k < 2 && phi > 0; k++)
    {
      if (solve (S, S->z, S->F, S->dz, 0) != VN_OK)
        break;
      for (int i = 0; i < S->n; i++)
        S->zt[i] = S->z[i] + S->dz[i];
      project (S, S->zt);
      if (residual (S, S->zt, S->Ft) != VN_OK)
        break;
      double pt = merit (S, S->Ft);
      if (!(pt < phi))
        break;
      memcpy (S->z, S->zt, (size_t) S->n * sizeof *S->z);
      memcpy (S->F, S->Ft, (size_t) S->n * sizeof *S->F);
      phi = pt;
    }
  residual (S, S->z, S->F);
  return VN_OK;
}

/* Newton with backtracking from S->z; VN_OK when converged. */
static int newton (ss *S)
{
  vn_net *net = S->net;
  int n = S->n, where;
  int st = residual (S, S->z, S->F);
  if (st)
    return st;
  double phi = merit (S, S->F);
  for (int it = 0; it <= S->maxiter; it++)
    {
      if (maxscaled (S, S->F, &where) <= S->tol)
        return polish (S, phi);
      if (it == S->maxiter)
        break;
      if (net->stop && net->stop (net->stop_data))
        return vn_fail (net, VN_EINTR, "steady: interrupted");
      st = solve (S, S->z, S->F, S->dz, 0);
      if (st)
        return st;
      S->iters++;
      double lam = 1, phit = phi;
      int accepted = 0;
      while (lam >= LS_MIN)
        {
          for (int i = 0; i < n; i++)
            S->zt[i] = S->z[i] + lam * S->dz[i];
          project (S, S->zt);
          st = residual (S, S->zt, S->Ft);
          if (st == VN_OK)
            {
              phit = merit (S, S->Ft);
              if (phit <= (1 - 2 * ARMIJO * lam) * phi)
                {
                  accepted = 1;
                  break;
                }
            }
          else if (st != VN_ESOLVER)
            return st;
          lam *= 0.5;
        }
      if (!accepted)
        {
          /* stalled: accept a tiny residual as converged (round-off) */
          residual (S, S->z, S->F);
          if (maxscaled (S, S->F, &where) <= 1e3 * S->tol)
            return VN_OK;
          return vn_fail (net, VN_ESOLVER, "steady: the line search "
                          "stalled after %d iterations", it + 1);
        }
      memcpy (S->z, S->zt, (size_t) n * sizeof *S->z);
      memcpy (S->F, S->Ft, (size_t) n * sizeof *S->F);
      phi = phit;
    }
  residual (S, S->z, S->F);
  return vn_fail (net, VN_ESOLVER, "steady: no convergence in %d "
                  "iterations", S->maxiter);
}

/* ---- diagnosis in plant terms ---- */

/* A tank from which no outlet (free discharge, boundary, draw-off, spill)
 * can be reached while liquid flows in fills for ever. */
static int check_outlets (vn_net *net)
{
  int nu = net->nu;
  unsigned char *dr = calloc ((size_t) nu, 1);
  double *in = calloc ((size_t) nu, sizeof *in);
  if (!dr || !in)
    {
      free (dr);
      free (in);
      return VN_ENOMEM;
    }
  /* direct outlets */
  for (int i = 0; i < nu; i++)
    {
      const vn_unit *u = &net->u[i];
      int s = u->ref[0], d = u->ref[1];
      if (u->k == &vn_kind_tank && has_rim (u) && u->ref[0] < 0)
        dr[i] = 1;
      if (u->k == &vn_kind_feed && is_tank (net, d))
        {
          double F = par_named (net, u, "flow", 0);
          if (F < 0)
            dr[d] = 1;
          else
            in[d] += F;
        }
      if (u->k->role != VN_ROLE_LINK || u->k == &vn_kind_feed)
        continue;
      int pump = u->k == &vn_kind_pump;
      if (is_tank (net, s) && (d < 0 || is_boundary (net, d)))
        dr[s] = 1;
      if (!pump && is_tank (net, d) && is_boundary (net, s))
        dr[d] = 1;   /* flow may reverse into the boundary */
      if (pump && is_boundary (net, s) && is_tank (net, d))
        in[d] += 1;  /* a pump from a main: inflow of unknown size */
    }
  /* propagate along links and spills until nothing changes; sweeps go
   * forwards and backwards in turn, so a chain takes two, not N */
  for (int changed = 1, pass = 0; changed; pass++)
    {
      changed = 0;
      for (int ii = 0; ii < nu; ii++)
        {
          int i = (pass % 2) ? nu - 1 - ii : ii;
          const vn_unit *u = &net->u[i];
          int s = u->ref[0], d = u->ref[1];
          if (u->k == &vn_kind_tank && has_rim (u) && s >= 0
              && dr[s] && !dr[i])
            dr[i] = 1, changed = 1;
          if (u->k->role != VN_ROLE_LINK || u->k == &vn_kind_feed
              || !is_tank (net, s) || !is_tank (net, d))
            continue;
          if (dr[d] && !dr[s])
            dr[s] = 1, changed = 1;
          if (u->k != &vn_kind_pump && dr[s] && !dr[d])
            dr[d] = 1, changed = 1;
        }
    }
  int bad = -1;
  for (int i = 0; i < nu && bad < 0; i++)
    if (is_tank (net, i) && !dr[i] && in[i] > 0)
      bad = i;
  /* the tank that fills is where that liquid ends up: follow links and
   * spills downstream (every tank there is undrained too) to a tank with
   * no way on, or round a loop back to one already seen */
  int fill = bad;
  if (bad >= 0)
    {
      memset (dr, 0, (size_t) nu);
      for (int moved = 1; moved;)
        {
          moved = 0;
          dr[fill] = 1;
          for (int i = 0; i < nu && !moved; i++)
            {
              const vn_unit *u = &net->u[i];
              int s = u->ref[0], d = u->ref[1];
              if (u->k == &vn_kind_tank && has_rim (u) && s >= 0
                  && i == fill && !dr[s])
                fill = s, moved = 1;
              else if (u->k->role == VN_ROLE_LINK && u->k != &vn_kind_feed
                       && s == fill && is_tank (net, d) && !dr[d])
                fill = d, moved = 1;
            }
        }
    }
  int st = VN_OK;
  if (bad >= 0 && fill != bad)
    st = vn_fail (net, VN_ENOSTEADY, "tank \"%s\" has no outlet: liquid "
                  "fed to tank \"%s\" flows on into it, and no free "
                  "discharge, boundary, draw-off or spill over a rim can be "
                  "reached from it, so its volume keeps rising; add an "
                  "outlet or give it a rim", net->u[fill].name,
                  net->u[bad].name);
  else if (bad >= 0)
    st = vn_fail (net, VN_ENOSTEADY, "tank \"%s\" has no outlet: no free "
                  "discharge, boundary, draw-off or spill over a rim can be "
                  "reached from it, yet liquid flows in, so its volume keeps "
                  "rising; add an outlet or give it a rim",
                  net->u[bad].name);
  free (dr);
  free (in);
  return st;
}

/* Liquid above a nozzle at height z of tank node i as the gates see it:
 * the equivalent level of vn_tank_above (volume above the nozzle over the
 * gate area; the level above the nozzle in a prism).  In a round vessel
 * near its apex the level itself overstates it many times (a cone's 5 cm
 * is 0.6 mm over its gate area), so a pump starved by its suction gate
 * must be judged on this, not on the level. */
static double above (const vn_net *net, int i, double z)
{
  return vn_tank_above (net, &net->nd[i], z, -1, NULL, NULL);
}

/* At an answer: a tank that runs dry under a draw it cannot meet, or a
 * curve pump that cannot reach the head it works against. */
static int check_answer (ss *S)
{
  vn_net *net = S->net;
  double band = net->smooth;
  residual (S, S->z, S->F);
  for (int i = 0; i < net->nu; i++)
    {
      const vn_unit *u = &net->u[i];
      int s = u->ref[0], d = u->ref[1];
      if (u->k == &vn_kind_pump && is_tank (net, s))
        {
          double sp = par_named (net, u, "speed", 1);
          double out = par_named (net, u, "outlet", 0);
          double lev = above (net, s, out);
          /* the pump's own suction band, as pump.c gates it */
          double pb = given_named (net, u, "suction")
                      ? par_named (net, u, "suction", band) : band;
          double want = given_named (net, u, "flow")
                        ? par_named (net, u, "flow", 0) * sp : NAN;
          if (sp > 0 && lev < 2 * pb
              && (isnan (want) || u->q < (1 - 1e-6) * want))
            return vn_fail (net, VN_ENOSTEADY, "tank \"%s\" runs dry: pump "
                            "\"%s\" draws more than flows in even with the "
                            "level down at its outlet nozzle (it passes only "
                            "%g m3/s); the level would have to be negative; "
                            "lower the pump's flow or speed or raise the "
                            "inflow", net->u[s].name, u->name, u->q);
        }
      if (u->k == &vn_kind_feed && is_tank (net, d))
        {
          double F = par_named (net, u, "flow", 0);
          if (F < 0 && u->q > (1 - 1e-6) * F)
            return vn_fail (net, VN_ENOSTEADY, "tank \"%s\" runs dry: "
                            "draw-off \"%s\" asks %g m3/s but only %g m3/s "
                            "can be taken with the tank empty; the level "
                            "would have to be negative", net->u[d].name,
                            u->name, -F, -u->q);
        }
      if (u->k == &vn_kind_pump && given_named (net, u, "shutoff"))
        {
          double sp = par_named (net, u, "speed", 1);
          double H0 = par_named (net, u, "shutoff", 0);
          double out = par_named (net, u, "outlet", 0);
          double inl = par_named (net, u, "inlet", 0);
          const vn_node *ns = s >= 0 ? &net->nd[s] : NULL;
          const vn_node *nd = d >= 0 ? &net->nd[d] : NULL;
          if (!ns || sp <= 0)
            continue;
          double hs = ns->istank ? fmax (ns->H, ns->base + out) : ns->H;
          double hd = !nd ? (ns->istank ? ns->base + out : out)
                      : nd->istank ? fmax (nd->H, nd->base + inl) : nd->H;
          double lift = hd - hs, head = sp * sp * H0;
          if (head - lift <= band)
            return vn_fail (net, VN_ENOSTEADY, "pump \"%s\" cannot deliver: "
                            "it must lift %g m (from \"%s\" at head %g m to "
                            "%s%s%s at %g m) but its shutoff head at speed %g is "
                            "%g m, so no flow passes; raise the speed or "
                            "choose a pump with more head", u->name, lift,
                            net->u[s].name, hs, nd ? "\"" : "",
                            nd ? net->u[d].name : "free discharge",
                            nd ? "\"" : "", hd, sp, head);
        }
    }
  return VN_OK;
}

/* After every attempt failed: say which tank keeps filling or emptying
 * at the last state reached. */
static int diagnose (ss *S, int st, double tsim)
{
  vn_net *net = S->net;
  if (residual (S, S->z, S->F))
    return st;
  int worst = -1;
  double big = 0;
  for (int i = 0; i < S->nx; i++)
    if (S->isvol[i] && fabs (S->F[i]) > big)
      {
        big = fabs (S->F[i]);
        worst = i;
      }
  if (worst >= 0 && big > 1e-6 * S->qs && tsim > 0)
    {
      int t = vn_state_unit (net, worst);
      const vn_unit *u = &net->u[t];
      if (S->F[worst] > 0)
        return vn_fail (net, VN_ENOSTEADY, "tank \"%s\" keeps filling: at "
                        "level %g m%s, %g m3/s more flows in than its "
                        "outlets pass%s; no steady state exists at these inputs; "
                        "raise the outlet capacity, lower the inflow or "
                        "give the tank a rim", u->name, net->nd[t].level,
                        " (reached by simulation)",
                        S->F[worst], has_rim (u) ? ""
                        : " and it has no rim to spill over");
      if (above (net, t, 0) < 2 * net->smooth)
        return vn_fail (net, VN_ENOSTEADY, "tank \"%s\" runs dry: its "
                        "outlets take %g m3/s more than flows in even with "
                        "the tank empty; the level would have to be "
                        "negative", u->name, -S->F[worst]);
    }
  int where;
  double r = maxscaled (S, S->F, &where);
  if (where >= 0 && where < S->nx)
    {
      char why[1024];
      snprintf (why, sizeof why, "%s", net->msg);
      int t = vn_state_unit (net, where);
      return vn_fail (net, VN_ESOLVER, "steady: Newton's method did not "
                      "converge (scaled residual %g, largest in %s.%s); %s",
                      r, net->u[t].name, vn_state_var (net, where),
                      strncmp (why, "steady: ", 8) ? why : why + 8);
    }
  if (where >= S->nx)
    {
      int k = where - S->nx, yi = S->o->ytgt[k];
      const vn_unit *u = &net->u[vn_output_unit (net, yi)];
      int o = yi - u->yoff;
      return vn_fail (net, VN_ENOSTEADY, "the targets cannot be met with "
                      "the adjusted inputs: target %d, %s.%s = %g (%s), is "
                      "missed by %g (the inputs may be at their limits)",
                      k + 1, u->name, o < u->k->nout ? u->k->out[o] : "?",
                      S->o->target[k],
                      o < u->k->nout ? u->k->ounit[o] : "", S->F[where]);
    }
  return st;
}

/* ---- set-up and the attempts ---- */

static void ss_free (ss *S)
{
  free (S->z); free (S->zt); free (S->F); free (S->Ft); free (S->dz);
  free (S->w); free (S->y); free (S->lo); free (S->hi); free (S->J);
  free (S->B); free (S->C); free (S->D); free (S->ipiv); free (S->isvol);
  free (S->cp); free (S->ri); free (S->acp); free (S->ari); free (S->v);
  free (S->av);
}

static int ss_alloc (ss *S)
{
  vn_net *net = S->net;
  int n = S->n, nx = S->nx, m = S->m;
  size_t dn = (size_t) (n > 0 ? n : 1);
#define AL(p, cnt) ((p = calloc ((size_t) (cnt) + 1, sizeof *(p))) != NULL)
  if (!AL (S->z, dn) || !AL (S->zt, dn) || !AL (S->F, dn) || !AL (S->Ft, dn)
      || !AL (S->dz, dn) || !AL (S->w, dn) || !AL (S->y, net->ny)
      || !AL (S->lo, m) || !AL (S->hi, m) || !AL (S->isvol, nx)
      || !AL (S->B, (long) nx * m) || !AL (S->C, (long) nx * m)
      || !AL (S->D, (long) m * m))
    return VN_ENOMEM;
  if (S->solver == VN_SOLVER_DENSE)
    {
      if (!AL (S->J, (long) n * n + (long) nx * nx) || !AL (S->ipiv, n))
        return VN_ENOMEM;
    }
  else
    {
      long nnz = 0;
      double *x0 = S->zt;
      vn_initial_state (net, x0);
      int st = vn_jac_csc (net, 0, x0, &nnz, NULL, NULL, NULL);
      if (st)
        return st;
      S->annz = nnz;
      long big = nnz + 2L * nx * m + (long) m * m;
      if (!AL (S->cp, nx + 1) || !AL (S->ri, nnz) || !AL (S->v, nnz)
          || !AL (S->acp, n + 1) || !AL (S->ari, big) || !AL (S->av, big))
        return VN_ENOMEM;
    }
#undef AL
  return VN_OK;
}

/* The slowest time constant at x, V / |dF/dV| over the tanks, bounded. */
static double slowest (ss *S, const double *x)
{
  vn_net *net = S->net;
  if (vn_eval (net, 0, x, S->Ft, NULL, 1, 0, 0, 0))
    return 3600;
  double *diag = calloc ((size_t) S->nx + 1, sizeof *diag);
  if (!diag)
    return 3600;
  for (long k = 0; k < net->jx.n; k++)
    if (net->jx.r[k] == net->jx.c[k])
      diag[net->jx.r[k]] += net->jx.v[k];
  double tmax = 0;
  for (int i = 0; i < S->nx; i++)
    if (S->isvol[i] && diag[i] < 0)
      tmax = fmax (tmax, -1 / diag[i]);
  free (diag);
  if (!(tmax > 0))
    tmax = 3600;
  return fmin (fmax (tmax, 10), 1e6);
}

int vn_steady (vn_net *net, double *x, const vn_steady_opts *o,
               vn_steady_info *info)
{
  vn_steady_opts def = {0};
  if (!o)
    o = &def;
  memset (info, 0, sizeof *info);
  if (o->nadj != o->ntgt)
    return vn_fail (net, VN_EARG, "steady: %d targets but %d adjusted "
                    "inputs; give as many inputs to adjust as targets",
                    o->ntgt, o->nadj);
  for (int k = 0; k < o->nadj; k++)
    {
      if (!vn_param_is_input (net, o->padj[k]))
        return vn_fail (net, VN_EARG, "steady: adjusted parameter %d "
                        "(index %d) is not an input", k + 1, o->padj[k]);
      if (o->ytgt[k] < 0 || o->ytgt[k] >= net->ny
          || !isfinite (o->target[k]))
        return vn_fail (net, VN_EARG, "steady: target %d (output index %d, "
                        "value %g) is not a finite output value", k + 1,
                        o->ytgt[k], o->target[k]);
    }
  for (int i = 0; i < net->nx; i++)
    if (!isfinite (x[i]))
      return vn_fail (net, VN_EARG, "steady: start state %s.%s is not "
                      "finite (%g)", net->u[vn_state_unit (net, i)].name,
                      vn_state_var (net, i), x[i]);
  ss S;
  memset (&S, 0, sizeof S);
  S.net = net;
  S.o = o;
  S.nx = net->nx;
  S.m = o->nadj;
  S.n = S.nx + S.m;
  S.solver = o->solver ? o->solver
             : (S.n <= DENSE_MAX ? VN_SOLVER_DENSE : VN_SOLVER_KLU);
  S.maxiter = o->maxiter > 0 ? o->maxiter : 60;
  S.tol = o->tol > 0 ? o->tol : 1e-10;
  info->solver = S.solver;
  net->stop = o->stop;
  net->stop_data = o->stop_data;
  int st = ss_alloc (&S);
  if (st)
    {
      ss_free (&S);
      net->stop = NULL;
      return st == VN_ENOMEM ? vn_fail (net, st, "steady: out of memory")
                             : st;
    }
  for (int i = 0; i < S.nx; i++)
    S.isvol[i] = strcmp (vn_state_var (net, i), "volume") == 0;
  for (int k = 0; k < S.m; k++)
    {
      int p = o->padj[k], u = -1;
      for (int j = 0; j < net->nu; j++)
        if (p >= net->u[j].poff && p < net->u[j].poff + net->u[j].k->npar)
          u = j;
      const vn_param_info *pi = &net->u[u].k->par[p - net->u[u].poff];
      S.lo[k] = pi->lo;
      S.hi[k] = pi->hi;
    }
  /* a tank that can only fill has no steady state: say so at once */
  if ((st = check_outlets (net)) != VN_OK)
    goto done;
  memcpy (S.z, x, (size_t) S.nx * sizeof *S.z);
  for (int k = 0; k < S.m; k++)
    S.z[S.nx + k] = net->p0[o->padj[k]];
  double *z0 = calloc ((size_t) S.n + 1, sizeof *z0);
  if (!z0)
    {
      st = VN_ENOMEM;
      goto done;
    }
  memcpy (z0, S.z, (size_t) S.n * sizeof *z0);
  /* weights: balances relative to the network's flows, targets to their
   * own size, other states (integrals, positions) as they come */
  if ((st = residual (&S, S.z, S.F)) != VN_OK)
    {
      free (z0);
      goto done;
    }
  S.qs = 1e-9;
  for (int i = 0; i < net->nu; i++)
    if (net->u[i].k->role == VN_ROLE_LINK || is_tank (net, i))
      S.qs = fmax (S.qs, fabs (net->u[i].q));
  for (int i = 0; i < S.n; i++)
    S.w[i] = i >= S.nx ? 1 / fmax (fabs (o->target[i - S.nx]), 1e-3)
             : S.isvol[i] ? 1 / S.qs : 1;

  /* attempt 1 from the start; then simulate 10, 100, 1000 slowest time
   * constants (cumulative) and retry from where the run ended */
  double tsim = 0, tau = slowest (&S, S.z);
  st = newton (&S);
  if (st == VN_ESOLVER)
    {
      memcpy (S.z, z0, (size_t) S.n * sizeof *S.z);
      st = ptc (&S, 0.1 * tau);
      if (st == VN_OK)
        st = newton (&S);
    }
  for (int a = 0; st != VN_OK && st != VN_EINTR && st != VN_ENOMEM
                  && o->simulate >= 0 && a < 3; a++)
    {
      if (a == 0)
        {
          memcpy (S.z, z0, (size_t) S.n * sizeof *S.z);
          set_inputs (&S, S.z);
        }
      double span = 10 * tau * pow (10, a);
      double tout[2] = {tsim, tsim + span};
      double *X = calloc (2 * (size_t) S.nx, sizeof *X);
      if (!X)
        {
          st = VN_ENOMEM;
          break;
        }
      vn_sim_opts so = {0};
      so.solver = S.nx <= DENSE_MAX ? VN_SOLVER_DENSE : VN_SOLVER_KLU;
      so.stop = o->stop;
      so.stop_data = o->stop_data;
      so.maxsteps = 20000;
      vn_sim_stats sst;
      set_inputs (&S, S.z);
      int sst_ = vn_simulate (net, S.z, 2, tout, X, NULL, &so, &sst);
      net->stop = o->stop;
      net->stop_data = o->stop_data;
      if (sst_ == VN_EINTR)
        {
          free (X);
          st = sst_;
          break;
        }
      if (sst_ != VN_OK)
        {
          free (X);
          break;
        }
      for (int i = 0; i < S.nx; i++)
        S.z[i] = X[1 + 2 * (long) i];
      free (X);
      tsim = tout[1];
      double *zs = z0;     /* keep the simulated state for a diagnosis */
      memcpy (zs, S.z, (size_t) S.n * sizeof *zs);
      st = newton (&S);
      if (st == VN_ESOLVER)
        {
          memcpy (S.z, zs, (size_t) S.n * sizeof *S.z);
          st = ptc (&S, 0.1 * tau);
          if (st == VN_OK)
            st = newton (&S);
        }
      info->simulated = 1;
      info->t_sim = tsim;
      if (st != VN_OK)
        memcpy (S.z, zs, (size_t) S.n * sizeof *S.z);
    }
  if (st != VN_OK && st != VN_EINTR && st != VN_ENOMEM && st != VN_EARG)
    st = diagnose (&S, st, tsim);
  if (st == VN_OK)
    st = check_answer (&S);
  free (z0);
  if (st == VN_OK)
    {
      int where;
      memcpy (x, S.z, (size_t) S.nx * sizeof *x);
      residual (&S, S.z, S.F);
      double r = 0;
      for (int i = 0; i < S.nx; i++)
        r = fmax (r, fabs (S.F[i]));
      info->residual = r;
      info->relres = maxscaled (&S, S.F, &where);
    }
done:
  info->iterations = S.iters;
  net->stop = NULL;
  ss_free (&S);
  return st;
}

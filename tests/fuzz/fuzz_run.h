/* Bytes to a vesselnet network and a round of work on it, shared by the
 * libFuzzer harness (tests/fuzz/fuzz_core.c), the seed writer
 * (tests/fuzz/seeds.c) and the replay test (tests/c/test_fuzz_replay.c).
 *
 * The bytes are read front to back; past the end every byte reads 0, so
 * any input decodes.  Layout (one byte each unless said):
 *   header   units (1 + b % 8); flags (bit 0 thermal, bits 1-2 species,
 *            bit 7 wild network options read as values); per species a
 *            decay value
 *   per unit kind (b % kinds); 4 references (b < 128: unit b % (units +
 *            1) - 1; b < 240: index b - 129 for output indices and
 *            slots; else an outlandish one); a 4-byte given mask (slot j
 *            given when bit j is set); a value per given slot; a table
 *            byte (tanks: bit 0 table, bits 1-3 rows, bit 7 wild offset)
 *            and per row two step bytes
 *   signals  count (b % 4); per signal unit, slot, points (1 + b % 4),
 *            hold, per point a time step byte and a value
 *   start    a byte: bit 4 set reads a start value per state
 *   run      horizon (10^(b % 5) s); flags (bit 0 sensitivities, then a
 *            parameter and an output byte; bits 2-3 solver; bit 1 steady
 *            target, then parameter, output and value; bit 5 steady may
 *            simulate)
 * A value is two bytes a, b: a < 160 picks a point of the schema range
 * (log-spaced where the range spans decades), 160 <= a < 240 a special
 * value (0, NaN, Inf, the range's ends and just past them, ...), a >= 240
 * the next 8 bytes as a raw double.
 *
 * Work is bounded: at most 4 output intervals, maxsteps 2000 per
 * interval, and a stop callback that ends a run after FZ_POLLS polls; the
 * steady search has 30 iterations.  Invariants that make a "crash":
 * statuses are VN_OK or a VN_E* code, a failure leaves a message, a
 * declared start is finite, balances at a finite state are finite or
 * refused, and a run that succeeds gives finite states. */
#ifndef VN_FUZZ_RUN_H
#define VN_FUZZ_RUN_H

#include <limits.h>
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include "vn.h"

#define FZ_MAXU 8
#define FZ_MAXTAB 64
#define FZ_MAXSIGPTS 16
#define FZ_POLLS 60000L

typedef struct fz_reader {
  const uint8_t *d;
  size_t n, pos;
} fz_reader;

static uint8_t fz_byte (fz_reader *r)
{
  return r->pos < r->n ? r->d[r->pos++] : 0;
}

/* A value for a parameter whose schema range is [lo, hi]. */
static double fz_value (fz_reader *r, double lo, double hi, double def)
{
  unsigned a = fz_byte (r), b = fz_byte (r);
  if (a >= 240)
    {
      uint8_t raw[8];
      double v;
      for (int i = 0; i < 8; i++)
        raw[i] = fz_byte (r);
      memcpy (&v, raw, sizeof v);
      return v;
    }
  if (a >= 160)
    {
      const double sp[] = {0, 1, -1, 0.5, 2, 10, 1e-12, 1e12, -1e12, NAN,
                           INFINITY, -INFINITY, 1e308, -0.0, 5e-324, lo, hi,
                           lo - fabs (lo) * 1e-9 - 1e-300,
                           hi + fabs (hi) * 1e-9 + 1e-300, def};
      return sp[b % (sizeof sp / sizeof sp[0])];
    }
  double f = ((a % 160) * 256 + b) / (160.0 * 256 - 1);
  if (lo > 0 && hi / lo > 1e3)
    return exp (log (lo) + (log (hi) - log (lo)) * f);
  if (lo < 0 && hi > 0 && hi - lo > 1e3)
    {
      /* signed, log-spaced magnitudes from 1e-9 up to the range's end */
      double g = 2 * f - 1, m = fmin (-lo, hi);
      double v = exp (log (1e-9) + (log (m) - log (1e-9)) * fabs (g));
      return g < 0 ? -v : v;
    }
  return lo + (hi - lo) * f;
}

static int fz_ref (fz_reader *r, int nunit)
{
  uint8_t b = fz_byte (r);
  if (b < 0x80)                 /* a unit, or -1 */
    return (int) (b % (nunit + 1)) - 1;
  if (b < 0xF0)                 /* an output index or parameter slot */
    return (int) (b - 0x80) - 1;
  const int wild[] = {-2, nunit, 1000, INT_MIN, INT_MAX, -100000000, 31, 32,
                      -1, 0, 1, 2, 3, 4, 5, 6};
  return wild[b % 16];
}

/* Everything one input decodes to. */
typedef struct fz_case {
  int nunit;
  int kind[FZ_MAXU];
  char names[FZ_MAXU][16];
  const char *name[FZ_MAXU];
  int ref[4 * FZ_MAXU];
  double par[32 * FZ_MAXU];
  unsigned char given[32 * FZ_MAXU];
  double tab[2 * FZ_MAXTAB];
  int taboff[FZ_MAXU], tablen[FZ_MAXU];
  double decay[4];
  vn_spec spec;
} fz_case;

static void fz_decode_spec (fz_reader *r, fz_case *c)
{
  memset (c, 0, sizeof *c);
  int npmax = vn_npmax ();
  if (npmax > 32)
    abort ();
  c->nunit = 1 + fz_byte (r) % FZ_MAXU;
  uint8_t fl = fz_byte (r);
  vn_spec *s = &c->spec;
  s->thermal = fl & 1;
  s->nspecies = (fl >> 1) & 3;
  s->gravity = 9.80665;
  s->density = 998.2;
  s->cp = 4181.3;
  s->ambient = 20;
  s->smooth = 1e-3;
  if (fl & 0x80)
    {
      s->gravity = fz_value (r, 0.1, 100, 9.80665);
      s->density = fz_value (r, 1, 1e5, 998.2);
      s->cp = fz_value (r, 1, 1e5, 4181.3);
      s->ambient = fz_value (r, -50, 400, 20);
      s->smooth = fz_value (r, 1e-9, 0.1, 1e-3);
    }
  for (int i = 0; i < s->nspecies; i++)
    c->decay[i] = fz_value (r, 0, 1, 0);
  s->decay = c->decay;
  long ntab = 0;
  for (int u = 0; u < c->nunit; u++)
    {
      int k = fz_byte (r) % vn_kind_count ();
      c->kind[u] = k;
      snprintf (c->names[u], sizeof c->names[u], "U%d", u + 1);
      c->name[u] = c->names[u];
      for (int j = 0; j < 4; j++)
        c->ref[4 * u + j] = fz_ref (r, c->nunit);
      uint32_t mask = 0;
      for (int j = 0; j < 4; j++)
        mask |= (uint32_t) fz_byte (r) << (8 * j);
      for (int j = 0; j < vn_kind_npar (k); j++)
        if (mask & (1u << j))
          {
            const vn_param_info *pi = vn_kind_param (k, j);
            c->par[u * npmax + j] = fz_value (r, pi->lo, pi->hi, pi->def);
            c->given[u * npmax + j] = 1;
          }
      uint8_t tb = fz_byte (r);
      c->taboff[u] = 0;
      c->tablen[u] = 0;
      if (strcmp (vn_kind_name (k), "tank") == 0 && (tb & 1))
        {
          int rows = (tb >> 1) & 7;
          if (ntab + rows > FZ_MAXTAB)
            rows = (int) (FZ_MAXTAB - ntab);
          double l = 0, v = 0;
          for (int i = 0; i < rows; i++)
            {
              c->tab[2 * (ntab + i)] = l;
              c->tab[2 * (ntab + i) + 1] = v;
              l += fz_byte (r) / 16.0;
              v += fz_byte (r) / 4.0;
            }
          c->taboff[u] = (int) ntab;
          c->tablen[u] = rows;
          if (tb & 0x80)
            c->taboff[u] = (tb & 0x40) ? -100000000 : (int) ntab + 3;
          ntab += rows;
        }
    }
  s->nunit = c->nunit;
  s->kind = c->kind;
  s->name = c->name;
  s->ref = c->ref;
  s->par = c->par;
  s->given = c->given;
  s->tab = c->tab;
  s->ntab = ntab;
  s->taboff = c->taboff;
  s->tablen = c->tablen;
}

static long fz_polls;

static int fz_stop (void *data)
{
  (void) data;
  return ++fz_polls > FZ_POLLS;
}

static int fz_status_ok (int st)
{
  return st == VN_OK || st == VN_EARG || st == VN_ENOMEM || st == VN_ESOLVER
         || st == VN_EINTR || st == VN_ENOSTEADY;
}

/* A broken invariant: say which and abort, so the fuzzer keeps the input. */
static void fz_check (int ok, const char *what, int st, const vn_net *net)
{
  if (ok)
    return;
  fprintf (stderr, "fuzz invariant broken: %s (status %d, message \"%s\")\n",
           what, st, vn_errmsg (net));
  abort ();
}

/* The seed writer defines FZ_VERBOSE to see how far each seed gets. */
#ifdef FZ_VERBOSE
#define FZ_SAY(what, st, net)                                                \
  printf ("  %s: status %d %s\n", what, st, (st) ? vn_errmsg (net) : "")
#else
#define FZ_SAY(what, st, net) ((void) 0)
#endif

#define FZ_STATUS(st, net, what)                                             \
  fz_check (fz_status_ok (st) && ((st) == VN_OK || vn_errmsg (net)[0]),     \
            what, st, net)

/* Signals: on any unit and slot (the core refuses what is no input). */
static void fz_signals (fz_reader *r, vn_net *net, const fz_case *c)
{
  int n = fz_byte (r) % 4;
  int unit[3], slot[3], off[3], len[3], hold[3];
  double data[2 * 3 * 4];
  int pos = 0;
  for (int i = 0; i < n; i++)
    {
      unit[i] = fz_byte (r) % c->nunit;
      int k = c->kind[unit[i]];
      slot[i] = fz_byte (r) % vn_kind_npar (k);
      len[i] = 1 + fz_byte (r) % 4;
      hold[i] = fz_byte (r) & 1;
      off[i] = pos;
      const vn_param_info *pi = vn_kind_param (k, slot[i]);
      double t = 0;
      for (int j = 0; j < len[i]; j++)
        {
          t += fz_byte (r);
          data[2 * (pos + j)] = t;
          data[2 * (pos + j) + 1] = fz_value (r, pi->lo, pi->hi, pi->def);
        }
      pos += len[i];
    }
  int st = vn_set_signals (net, n, unit, slot, off, len, hold, data);
  FZ_STATUS (st, net, "vn_set_signals");
  FZ_SAY ("signals", st, net);
  if (st)
    vn_set_signals (net, 0, NULL, NULL, NULL, NULL, NULL, NULL);
}

/* Jacobians and linearisation at x. */
static void fz_derivatives (vn_net *net, const double *x)
{
  int nx = vn_nstates (net), ny = vn_noutputs (net), np = vn_nparams (net);
  double *f = malloc ((size_t) nx * sizeof *f);
  double *y = malloc ((size_t) (ny + 1) * sizeof *y);
  double *J = malloc ((size_t) nx * nx * sizeof *J);
  int st = vn_rhs (net, 0, x, f);
  FZ_STATUS (st, net, "vn_rhs");
  int xfin = 1;
  for (int i = 0; i < nx; i++)
    xfin &= isfinite (x[i]) != 0;
  for (int i = 0; st == VN_OK && xfin && i < nx; i++)
    fz_check (isfinite (f[i]), "vn_rhs OK gives finite balances at a "
              "finite state", st, net);
  st = vn_outputs (net, 0, x, y);
  FZ_STATUS (st, net, "vn_outputs");
  st = vn_jac_dense (net, 0, x, J);
  FZ_STATUS (st, net, "vn_jac_dense");
  long nnz = 0;
  st = vn_jac_csc (net, 0, x, &nnz, NULL, NULL, NULL);
  FZ_STATUS (st, net, "vn_jac_csc count");
  if (!st)
    {
      fz_check (nnz >= 0 && nnz <= (long) nx * nx, "nnz within nx^2", st, net);
      long *cp = malloc ((size_t) (nx + 1) * sizeof *cp);
      long *ri = malloc ((size_t) (nnz + 1) * sizeof *ri);
      double *v = malloc ((size_t) (nnz + 1) * sizeof *v);
      st = vn_jac_csc (net, 0, x, &nnz, cp, ri, v);
      FZ_STATUS (st, net, "vn_jac_csc");
      free (cp);
      free (ri);
      free (v);
    }
  /* inputs: every input parameter plus a bad index; outputs: all + bad */
  int *pin = malloc ((size_t) (np + 1) * sizeof *pin);
  int *yout = malloc ((size_t) (ny + 1) * sizeof *yout);
  int nin = 0;
  for (int i = 0; i < np; i++)
    if (vn_param_is_input (net, i))
      pin[nin++] = i;
  for (int i = 0; i < ny; i++)
    yout[i] = i;
  double *B = malloc ((size_t) nx * (nin + 1) * sizeof *B);
  double *C = malloc ((size_t) (ny + 1) * nx * sizeof *C);
  double *D = malloc ((size_t) (ny + 1) * (nin + 1) * sizeof *D);
  st = vn_linearize_dense (net, 0, x, nin, pin, ny, yout, J, B, C, D);
  FZ_STATUS (st, net, "vn_linearize_dense");
  pin[nin] = np + 7;
  st = vn_linearize_dense (net, 0, x, nin + 1, pin, ny, yout, NULL, B, C, D);
  fz_check (st == VN_EARG, "a parameter index outside the network refused",
            st, net);
  free (f);
  free (y);
  free (J);
  free (pin);
  free (yout);
  free (B);
  free (C);
  free (D);
}

static void fz_simulate (fz_reader *r, vn_net *net, const double *x0)
{
  int nx = vn_nstates (net), ny = vn_noutputs (net), np = vn_nparams (net);
  double T = pow (10, fz_byte (r) % 5);
  uint8_t fl = fz_byte (r);
  enum { NT = 5 };
  double tout[NT];
  for (int k = 0; k < NT; k++)
    tout[k] = T * k / (NT - 1);
  double *X = malloc ((size_t) NT * nx * sizeof *X);
  double *Y = malloc ((size_t) NT * (ny + 1) * sizeof *Y);
  vn_sim_opts op = {0};
  op.maxsteps = 2000;
  op.solver = (fl >> 2) % 3;
  op.stop = fz_stop;
  vn_sim_stats stats;
  fz_polls = 0;
  vn_sens sn = {0};
  int pidx[1] = {0}, yo[1] = {0};
  double *sx0 = calloc ((size_t) nx, sizeof *sx0);
  double *YS = malloc ((size_t) NT * sizeof *YS);
  if ((fl & 1) && np > 0 && ny > 0)
    {
      pidx[0] = fz_byte (r) % np;
      yo[0] = fz_byte (r) % ny;
      sn.np = 1;
      sn.pidx = pidx;
      sn.x0 = sx0;
      sn.ny = 1;
      sn.yout = yo;
      sn.YS = YS;
    }
  int st = vn_simulate_sens (net, x0, NT, tout, X, Y, &op, &stats,
                             sn.np ? &sn : NULL);
  FZ_STATUS (st, net, "vn_simulate");
  FZ_SAY ("simulate", st, net);
  if (st == VN_OK)
    for (long i = 0; i < (long) NT * nx; i++)
      fz_check (isfinite (X[i]), "a finished run has finite states", st,
                net);

  /* steady state, sometimes with a target on an output */
  vn_steady_opts so = {0};
  so.maxiter = 30;
  so.solver = op.solver;
  so.simulate = (fl & 32) ? 1 : -1;
  so.stop = fz_stop;
  int padj[1], ytgt[1];
  double target[1];
  if ((fl & 2) && np > 0 && ny > 0)
    {
      padj[0] = fz_byte (r) % np;
      ytgt[0] = fz_byte (r) % ny;
      target[0] = fz_value (r, -10, 10, 1);
      so.nadj = so.ntgt = 1;
      so.padj = padj;
      so.ytgt = ytgt;
      so.target = target;
    }
  double *x = malloc ((size_t) nx * sizeof *x);
  memcpy (x, x0, (size_t) nx * sizeof *x);
  vn_steady_info info;
  fz_polls = 0;
  st = vn_steady (net, x, &so, &info);
  FZ_STATUS (st, net, "vn_steady");
  FZ_SAY ("steady", st, net);
  free (x);
  free (X);
  free (Y);
  free (sx0);
  free (YS);
}

/* The whole round for one input; always returns 0. */
static int fz_run (const uint8_t *data, size_t size)
{
  fz_reader r = {data, size, 0};
  static fz_case c;
  fz_decode_spec (&r, &c);
  vn_net *net = NULL;
  char msg[1024] = "";
  int st = vn_net_new (&c.spec, &net, msg, sizeof msg);
  if (!fz_status_ok (st) || (st && (!msg[0] || net)))
    {
      fprintf (stderr, "fuzz invariant broken: vn_net_new status %d, "
               "message \"%s\"\n", st, msg);
      abort ();
    }
  if (st)
    return 0;
  fz_signals (&r, net, &c);
  int nx = vn_nstates (net);
  double *x0 = malloc ((size_t) nx * sizeof *x0);
  st = vn_initial_state (net, x0);
  FZ_STATUS (st, net, "vn_initial_state");
  for (int i = 0; st == VN_OK && i < nx; i++)
    fz_check (isfinite (x0[i]), "vn_initial_state OK gives a finite state",
              st, net);
  if (!st)
    {
      uint8_t pf = fz_byte (&r);
      if (pf & 16)
        for (int i = 0; i < nx; i++)
          x0[i] = fz_value (&r, 0, 1e3, x0[i]);
      fz_derivatives (net, x0);
      fz_simulate (&r, net, x0);
    }
  free (x0);
  vn_net_free (net);
  return 0;
}

#endif

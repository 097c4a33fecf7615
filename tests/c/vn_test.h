/* Tiny helpers for the core's C tests: counted checks that print one line
 * each, and a builder that fills a vn_spec unit by unit with parameters
 * given by name, so a test reads like the network it describes. */
#ifndef VN_TEST_H
#define VN_TEST_H

#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include "vn.h"

#define VN_TEST_PI 3.14159265358979323846

static int vt_pass, vt_fail;

/* One check: prints "ok - ..." or "FAIL - ..." and counts it. */
#define VT_CHECK(cond, ...)                                                  \
  do                                                                         \
    {                                                                        \
      int vt_ok_ = (cond) ? 1 : 0;                                           \
      printf ("%s - ", vt_ok_ ? "ok" : "FAIL");                              \
      printf (__VA_ARGS__);                                                  \
      printf ("\n");                                                         \
      if (vt_ok_)                                                            \
        vt_pass++;                                                           \
      else                                                                   \
        vt_fail++;                                                           \
    }                                                                        \
  while (0)

/* |got - want| <= tol, with both numbers in the line. */
#define VT_NEAR(got, want, tol, what)                                        \
  do                                                                         \
    {                                                                        \
      double vt_g_ = (got), vt_w_ = (want), vt_t_ = (tol);                   \
      VT_CHECK (fabs (vt_g_ - vt_w_) <= vt_t_,                               \
                "%s: got %.10g, want %.10g (tol %.3g)", what, vt_g_, vt_w_,  \
                vt_t_);                                                      \
    }                                                                        \
  while (0)

/* Ends main: the summary line the test runner reads. */
static inline int vt_done (void)
{
  printf ("%d passed, %d failed\n", vt_pass, vt_fail);
  return vt_fail ? 1 : 0;
}

/* ---- network builder ---- */
#define VT_MAXU 160
#define VT_MAXTAB 256

typedef struct vt_net {
  int n;
  int kind[VT_MAXU];
  const char *name[VT_MAXU];
  int ref[4 * VT_MAXU];
  double par[32 * VT_MAXU];
  unsigned char given[32 * VT_MAXU];
  double tab[2 * VT_MAXTAB];
  int taboff[VT_MAXU], tablen[VT_MAXU];
  int ntab;
  vn_spec spec;
  char msg[1024];
} vt_net;

static inline void vt_init (vt_net *b)
{
  memset (b, 0, sizeof *b);
  for (int i = 0; i < 4 * VT_MAXU; i++)
    b->ref[i] = -1;
  b->spec.gravity = 9.80665;   /* standard gravity, 3rd CGPM (1901) */
  b->spec.density = 998.2;
  b->spec.cp = 4181.3;
  b->spec.ambient = 20;
  b->spec.smooth = 1e-3;
}

/* Adds a unit of the named kind joining r0 -> r1; returns its index. */
static inline int vt_unit (vt_net *b, const char *kind, const char *name,
                           int r0, int r1)
{
  int u = b->n++;
  if (u >= VT_MAXU || vn_npmax () > 32)
    {
      fprintf (stderr, "vt_unit: builder too small\n");
      exit (2);
    }
  b->kind[u] = vn_kind_find (kind);
  if (b->kind[u] < 0)
    {
      fprintf (stderr, "vt_unit: no kind \"%s\"\n", kind);
      exit (2);
    }
  b->name[u] = name;
  b->ref[4 * u] = r0;
  b->ref[4 * u + 1] = r1;
  return u;
}

/* Slot of a parameter by name; exits when the schema has no such name,
 * since every later check would be meaningless. */
static inline int vt_slot (int kind, const char *pname)
{
  for (int i = 0; i < vn_kind_npar (kind); i++)
    if (strcmp (vn_kind_param (kind, i)->name, pname) == 0)
      return i;
  fprintf (stderr, "vt_slot: kind %s has no parameter \"%s\"\n",
           vn_kind_name (kind), pname);
  exit (2);
}

static inline void vt_set (vt_net *b, int u, const char *pname, double v)
{
  int s = vt_slot (b->kind[u], pname);
  b->par[u * vn_npmax () + s] = v;
  b->given[u * vn_npmax () + s] = 1;
}

/* A strapping table of n (level, volume) pairs for unit u. */
static inline void vt_table (vt_net *b, int u, const double *pairs, int n)
{
  b->taboff[u] = b->ntab;
  b->tablen[u] = n;
  memcpy (b->tab + 2 * b->ntab, pairs, (size_t) (2 * n) * sizeof *pairs);
  b->ntab += n;
}

static inline int vt_build (vt_net *b, vn_net **net)
{
  b->spec.nunit = b->n;
  b->spec.kind = b->kind;
  b->spec.name = b->name;
  b->spec.ref = b->ref;
  b->spec.par = b->par;
  b->spec.given = b->given;
  b->spec.tab = b->tab;
  b->spec.ntab = b->ntab;
  b->spec.taboff = b->taboff;
  b->spec.tablen = b->tablen;
  b->msg[0] = 0;
  return vn_net_new (&b->spec, net, b->msg, sizeof b->msg);
}

/* Parameter index in the built network of (unit, name). */
static inline int vt_pidx (const vt_net *b, const vn_net *net, int u,
                           const char *pname)
{
  return vn_param_index (net, u, vt_slot (b->kind[u], pname));
}

/* Output index of (unit, output name), -1 if none. */
static inline int vt_yidx (const vt_net *b, const vn_net *net, int u,
                           const char *oname)
{
  for (int i = 0; i < vn_kind_nout (b->kind[u]); i++)
    if (strcmp (vn_kind_out_name (b->kind[u], i), oname) == 0)
      return vn_output_index (net, u, i);
  return -1;
}


/* Rounding noise of a central difference with step h over values v: a
 * few hundred ulps of the largest finite value, over h. */
static inline double vt_noise (const double *v, int n, double h)
{
  double m = 0;
  for (int i = 0; i < n; i++)
    if (isfinite (v[i]))
      m = fmax (m, fabs (v[i]));
  return 256 * 2.2e-16 * m / h;
}

/* "unit.output" of output index yi, for failure lines. */
static inline const char *vt_yname (const vt_net *b, const vn_net *net,
                                    int yi)
{
  static char buf[128];
  for (int u = 0; u < b->n; u++)
    for (int k = 0; k < vn_kind_nout (b->kind[u]); k++)
      if (vn_output_index (net, u, k) == yi)
        {
          snprintf (buf, sizeof buf, "%s.%s", b->name[u],
                    vn_kind_out_name (b->kind[u], k));
          return buf;
        }
  return "?";
}

#endif

/* Tank: a well-mixed vessel whose state is its liquid volume.  Level
 * comes from the geometry; above the rim liquid spills over a weir.
 *
 * Geometry (Perry's Chemical Engineers' Handbook, vessel volumes):
 *   prism       V = A h
 *   horizontal  V = L (R^2 acos((R-h)/R) - (R-h) sqrt(2 R h - h^2))
 *   sphere      V = pi h^2 (3 R - h) / 3
 *   cone        V = (pi/3) (R/H)^2 h^3 (apex down)
 *   table       strapping table of (level, volume), linear between points
 * Spill: Francis weir, SI, Q = 1.84 (L - 0.1 n H) H^1.5 (Francis, Lowell
 * Hydraulic Experiments, 1855).
 * Beyond the top of a closed vessel, and below zero volume (a solver
 * excursion), the level continues linearly so level(V) stays invertible;
 * dV/dlevel is floored at 1 % of the largest plan area so the Jacobian
 * stays finite where a round vessel's surface shrinks to a line. */
#include <math.h>
#include "vn_internal.h"

enum { SHAPE, AREA, DIAM, LEN, HEIGHT, BASE, RIM, CREST, CONTR, LEVEL,
       VOLUME, UA, TEMP, C1, NPAR = C1 + VN_NSP };
#define VMIN 1e-9   /* m3: below this a tank's properties are held */
enum { PRISM = 0, HORIZ = 1, SPHERE = 2, CONE = 3, TABLE = 4 };
/* derived constants in u->d */
enum { D_A, D_R, D_L, D_VTOP, D_HTOP, D_AMAX, D_RIM, D_CREST };
#define D_THERMAL 8   /* 1 when the network is thermal (for state names) */

static const vn_param_info par[NPAR] = {
  {"shape", 0, 0, 4, "code", VN_P_CODE},
  {"area", NAN, 1e-9, 1e9, "m2", 0},
  {"diameter", NAN, 1e-6, 1e5, "m", 0},
  {"length", NAN, 1e-6, 1e5, "m", 0},
  {"height", NAN, 1e-6, 1e5, "m", 0},
  {"base", 0, -1e5, 1e5, "m", 0},
  {"rim", INFINITY, 1e-6, 1e5, "m", VN_P_INF},
  {"crest", NAN, 1e-6, 1e5, "m", 0},
  {"contractions", 0, 0, 2, "1", VN_P_CODE},
  {"level", 0, 0, 1e5, "m", 0},
  {"volume", NAN, 0, 1e12, "m3", 0},
  {"ua", 0, 0, 1e9, "W/K", 0},
  {"temperature", NAN, -50, 400, "degC", 0},
  {"c1", 0, 0, 1e12, "conc", 0}, {"c2", 0, 0, 1e12, "conc", 0},
  {"c3", 0, 0, 1e12, "conc", 0}, {"c4", 0, 0, 1e12, "conc", 0},
  {"c5", 0, 0, 1e12, "conc", 0}, {"c6", 0, 0, 1e12, "conc", 0},
  {"c7", 0, 0, 1e12, "conc", 0}, {"c8", 0, 0, 1e12, "conc", 0},
};
static const char *const out[] = {"level", "volume", "head", "spill",
                                  "temperature", "c1", "c2", "c3", "c4",
                                  "c5", "c6", "c7", "c8"};
static const char *const ounit[] = {"m", "m3", "m", "m3/s", "degC", "conc",
                                    "conc", "conc", "conc", "conc", "conc",
                                    "conc", "conc"};
#define NOUT 13

static const char *shape_name (int s)
{
  static const char *const n[] = {"prism", "horizontal", "sphere", "cone",
                                  "table"};
  return (s >= 0 && s <= 4) ? n[s] : "?";
}

/* Volume and plan area at level h inside the vessel's own height. */
static double vol_at (const vn_unit *u, int shape, double h, double *area)
{
  const double *d = u->d;
  double R = d[D_R];
  switch (shape)
    {
    case HORIZ:
      {
        double c = sqrt (fmax (0, 2 * R * h - h * h));
        *area = 2 * d[D_L] * c;
        return d[D_L] * (R * R * acos ((R - h) / R) - (R - h) * c);
      }
    case SPHERE:
      *area = VN_PI * h * (2 * R - h);
      return VN_PI * h * h * (3 * R - h) / 3;
    case CONE:
      {
        double k = VN_PI * (R / d[D_HTOP]) * (R / d[D_HTOP]);
        *area = k * h * h;
        return k * h * h * h / 3;
      }
    case TABLE:
      {
        const double *t = u->tab;
        int n = u->ntab, i = 0;
        while (i < n - 2 && h > t[2 * (i + 1)])
          i++;
        double s = (t[2 * i + 3] - t[2 * i + 1]) / (t[2 * i + 2] - t[2 * i]);
        *area = s;
        return t[2 * i + 1] + s * (h - t[2 * i]);
      }
    default:
      *area = d[D_A];
      return d[D_A] * h;
    }
}

/* Level and dlevel/dV from the volume. */
static double level_of (const vn_unit *u, int shape, double V, double *dldV)
{
  const double *d = u->d;
  double amin = 0.01 * d[D_AMAX], a;
  if (shape == PRISM)
    {
      *dldV = 1 / d[D_A];
      return V / d[D_A];
    }
  if (shape == TABLE)
    {
      const double *t = u->tab;
      int n = u->ntab, lo = 0, hi = n - 1;
      while (hi - lo > 1)
        {
          int mid = (lo + hi) / 2;
          if (t[2 * mid + 1] <= V)
            lo = mid;
          else
            hi = mid;
        }
      double s = (t[2 * hi] - t[2 * lo]) / (t[2 * hi + 1] - t[2 * lo + 1]);
      *dldV = s;
      return t[2 * lo] + s * (V - t[2 * lo + 1]);
    }
  if (V <= 0)
    {
      *dldV = 1 / amin;
      return V / amin;
    }
  if (V >= d[D_VTOP])
    {
      double atop = shape == CONE ? d[D_AMAX] : amin;
      *dldV = 1 / atop;
      return d[D_HTOP] + (V - d[D_VTOP]) / atop;
    }
  double h;
  if (shape == CONE)
    {
      double k = VN_PI * (d[D_R] / d[D_HTOP]) * (d[D_R] / d[D_HTOP]);
      h = cbrt (3 * V / k);
      a = k * h * h;
    }
  else
    {
      /* Newton on V(h) = V inside a bisection bracket */
      double lo = 0, hi = d[D_HTOP];
      h = d[D_HTOP] * V / d[D_VTOP];
      for (int it = 0; it < 60; it++)
        {
          double r = vol_at (u, shape, h, &a) - V;
          if (r > 0)
            hi = h;
          else
            lo = h;
          double hn = a > 0 ? h - r / a : 0.5 * (lo + hi);
          if (!(hn > lo && hn < hi))
            hn = 0.5 * (lo + hi);
          if (fabs (hn - h) <= 1e-14 * d[D_HTOP])
            {
              h = hn;
              break;
            }
          h = hn;
        }
      vol_at (u, shape, h, &a);
    }
  *dldV = 1 / fmax (a, amin);
  return h;
}

/* Volume held at level h (for initial states), continuing as level_of. */
static double volume_of (const vn_unit *u, int shape, double h)
{
  const double *d = u->d;
  double a;
  if (shape == PRISM || shape == TABLE)
    {
      if (shape == TABLE)
        {
          const double *t = u->tab;
          int n = u->ntab, i = 0;
          while (i < n - 2 && h > t[2 * (i + 1)])
            i++;
          double s = (t[2 * i + 3] - t[2 * i + 1]) / (t[2 * i + 2] - t[2 * i]);
          return t[2 * i + 1] + s * (h - t[2 * i]);
        }
      return d[D_A] * h;
    }
  if (h >= d[D_HTOP])
    {
      double atop = shape == CONE ? d[D_AMAX] : 0.01 * d[D_AMAX];
      return d[D_VTOP] + (h - d[D_HTOP]) * atop;
    }
  return vol_at (u, shape, fmax (h, 0), &a);
}

static int check (vn_net *net, vn_unit *u)
{
  int shape = (int) vn_par (net, u, SHAPE);
  double *d = u->d;
  int ga = vn_given (net, u, AREA), gd = vn_given (net, u, DIAM);
  double D = vn_par (net, u, DIAM);
  d[D_R] = D / 2;
  d[D_L] = vn_par (net, u, LEN);
  switch (shape)
    {
    case PRISM:
      if (ga && gd)
        return vn_fail_unit (net, u, "give area or diameter, not both "
                             "(area %g m2, diameter %g m)",
                             vn_par (net, u, AREA), D);
      if (!ga && !gd)
        return vn_fail_unit (net, u, "a prism tank needs area (m2) or "
                             "diameter (m)");
      d[D_A] = ga ? vn_par (net, u, AREA) : VN_PI * D * D / 4;
      d[D_AMAX] = d[D_A];
      d[D_HTOP] = vn_given (net, u, HEIGHT) ? vn_par (net, u, HEIGHT)
                                            : INFINITY;
      d[D_VTOP] = d[D_A] * d[D_HTOP];
      break;
    case HORIZ:
      if (!gd || !vn_given (net, u, LEN))
        return vn_fail_unit (net, u, "a horizontal cylinder needs diameter "
                             "(m) and length (m)");
      d[D_HTOP] = D;
      d[D_AMAX] = D * d[D_L];
      d[D_VTOP] = VN_PI * d[D_R] * d[D_R] * d[D_L];
      break;
    case SPHERE:
      if (!gd)
        return vn_fail_unit (net, u, "a sphere needs diameter (m)");
      d[D_HTOP] = D;
      d[D_AMAX] = VN_PI * d[D_R] * d[D_R];
      d[D_VTOP] = 4 * VN_PI * d[D_R] * d[D_R] * d[D_R] / 3;
      break;
    case CONE:
      if (!gd || !vn_given (net, u, HEIGHT))
        return vn_fail_unit (net, u, "a cone needs diameter (m, at the top) "
                             "and height (m, apex to top)");
      d[D_HTOP] = vn_par (net, u, HEIGHT);
      d[D_AMAX] = VN_PI * d[D_R] * d[D_R];
      d[D_VTOP] = d[D_AMAX] * d[D_HTOP] / 3;
      break;
    case TABLE:
      if (u->ntab < 2)
        return vn_fail_unit (net, u, "table needs at least 2 rows [level "
                             "volume], got %d", u->ntab);
      for (int i = 0; i < u->ntab; i++)
        {
          double l = u->tab[2 * i], v = u->tab[2 * i + 1];
          if (!isfinite (l) || !isfinite (v) || l < 0 || v < 0)
            return vn_fail_unit (net, u, "table row %d must hold a finite "
                                 "non-negative level and volume, got [%g "
                                 "%g]", i + 1, l, v);
          if (i > 0 && (l <= u->tab[2 * i - 2] || v <= u->tab[2 * i - 1]))
            return vn_fail_unit (net, u, "table must increase strictly in "
                                 "level and volume; row %d [%g %g] follows "
                                 "[%g %g]", i + 1, l, v, u->tab[2 * i - 2],
                                 u->tab[2 * i - 1]);
        }
      {
        int n = u->ntab;
        d[D_AMAX] = (u->tab[2 * n - 1] - u->tab[2 * n - 3])
                    / (u->tab[2 * n - 2] - u->tab[2 * n - 4]);
        d[D_HTOP] = INFINITY;
        d[D_VTOP] = INFINITY;
      }
      break;
    default:
      return vn_fail_unit (net, u, "shape code %d is not one of prism, "
                           "horizontal, sphere, cone, table", shape);
    }
  /* the rim: given, else the top of a vessel that has one */
  double rim = vn_par (net, u, RIM);
  if (!vn_given (net, u, RIM))
    rim = (shape == PRISM && !vn_given (net, u, HEIGHT)) ? INFINITY
                                                         : d[D_HTOP];
  if ((shape == HORIZ || shape == SPHERE || shape == CONE)
      && rim > d[D_HTOP] * (1 + 1e-12))
    return vn_fail_unit (net, u, "rim %g m lies above the top of the %s "
                         "(%g m); the rim is at most the vessel's height",
                         rim, shape_name (shape), d[D_HTOP]);
  d[D_RIM] = rim;
  double crest = vn_par (net, u, CREST);
  if (!vn_given (net, u, CREST))
    crest = shape == HORIZ ? d[D_L] : 2 * sqrt (VN_PI * d[D_AMAX]);
  d[D_CREST] = crest;
  d[D_THERMAL] = net->thermal;
  double lev = vn_par (net, u, LEVEL);
  if ((shape == HORIZ || shape == SPHERE || shape == CONE)
      && lev > d[D_HTOP])
    return vn_fail_unit (net, u, "level %g m lies above the top of the %s "
                         "(%g m)", lev, shape_name (shape), d[D_HTOP]);
  if (vn_given (net, u, VOLUME) && vn_given (net, u, LEVEL))
    return vn_fail_unit (net, u, "give the initial level or volume, not "
                         "both");
  if (u->ref[0] == (int) (u - net->u))
    return vn_fail_unit (net, u, "spill cannot flow back into the same "
                         "tank");
  if (u->ref[0] >= 0 && net->u[u->ref[0]].kind != vn_kind_find ("tank"))
    return vn_fail_unit (net, u, "spill destination \"%s\" is a %s; it "
                         "must be a tank (or \"\" for waste)",
                         net->u[u->ref[0]].name, net->u[u->ref[0]].k->name);
  if (!net->thermal && (vn_given (net, u, UA) || vn_given (net, u, TEMP)))
    return vn_fail_unit (net, u, "%s is given but the network is not "
                         "thermal; declare vn_network (..., \"thermal\", "
                         "true)", vn_given (net, u, UA) ? "ua"
                                                        : "temperature");
  return VN_OK;
}

/* States: volume; V T (m3 degC) when thermal; V c per species.  The
 * contents, not the intensive values, are balanced (conserved form), so
 * energy and mass are conserved exactly and an emptying tank stays sane. */
static int nstates (const vn_net *net, const vn_unit *u)
{
  (void) u;
  return 1 + net->thermal + net->nspecies;
}

static const char *state_var (const vn_unit *u, int i)
{
  static const char *const sp[VN_NSP] = {"species1", "species2", "species3",
                                         "species4", "species5", "species6",
                                         "species7", "species8"};
  int th = i == 1 && u->d[D_THERMAL];
  if (i == 0)
    return "volume";
  if (th)
    return "heat";
  int k = i - 1 - (int) u->d[D_THERMAL];
  return (k >= 0 && k < VN_NSP) ? sp[k] : "state";
}

static int init (vn_net *net, vn_unit *u, double *x)
{
  int shape = (int) vn_par (net, u, SHAPE);
  double V = vn_given (net, u, VOLUME) ? vn_par (net, u, VOLUME)
                                       : volume_of (u, shape,
                                                    vn_par (net, u, LEVEL));
  x[0] = V;
  int j = 1;
  if (net->thermal)
    {
      double T = vn_given (net, u, TEMP) ? vn_par (net, u, TEMP)
                                         : net->ambient;
      x[j++] = V * T;
    }
  for (int k = 0; k < net->nspecies; k++)
    x[j++] = V * vn_par (net, u, C1 + k);
  return VN_OK;
}

/* Heat loss to ambient, UA (T - Ta) / (rho cp), and first-order decay of
 * each species, k M: the tank's own terms in its energy and species
 * balances (flows are added by the framework). */
static void own (vn_net *net, vn_unit *u, const double *x, double *f,
                 vn_lf *df)
{
  const vn_node *nd = &net->nd[u - net->u];
  int j = 1;
  if (net->thermal)
    {
      double c = net->p[u->poff + UA] / (net->rho * net->cp);
      f[u->xoff + j] += -c * (nd->T - net->ambient);
      if (df)
        {
          vn_lf_x (&df[j], u->xoff, -c * nd->dTdV);
          vn_lf_x (&df[j], u->xoff + j, -c * nd->dTdE);
          vn_lf_p (&df[j], vn_pcol (u, UA),
                   -(nd->T - net->ambient) / (net->rho * net->cp));
        }
      j++;
    }
  for (int k = 0; k < net->nspecies; k++, j++)
    {
      f[u->xoff + j] += -net->decay[k] * x[u->xoff + j];
      if (df)
        vn_lf_x (&df[j], u->xoff + j, -net->decay[k]);
    }
}

static void node (vn_net *net, vn_unit *u, const double *x, vn_node *nd)
{
  int shape = (int) net->p[u->poff + SHAPE];
  double V = x[u->xoff], dldV;
  double l = level_of (u, shape, V, &dldV);
  double base = net->p[u->poff + BASE];
  nd->istank = 1;
  nd->V = V;
  nd->level = l;
  nd->base = base;
  nd->H = base + l;
  nd->area = 1 / dldV;
  nd->pc_base = vn_pcol (u, BASE);
  nd->xV = u->xoff;
  nd->xE = nd->xM0 = nd->pcT = nd->pcc0 = -1;
  nd->T = NAN;
  /* carried properties from the contents: T = E/V, c = M/V, held as the
   * volume falls below VMIN so an empty tank keeps a finite value */
  if (net->thermal || net->nspecies)
  {
    double Ve = V > VMIN ? V : VMIN;
    int j = u->xoff + 1;
    nd->xE = -1;
    nd->pcT = -1;
    nd->T = NAN;
    if (net->thermal)
      {
        double E = x[j];
        nd->xE = j++;
        nd->T = E / Ve;
        nd->dTdE = 1 / Ve;
        nd->dTdV = V > VMIN ? -E / (V * V) : 0;
      }
    nd->xM0 = net->nspecies ? j : -1;
    nd->pcc0 = -1;
    for (int k = 0; k < net->nspecies; k++, j++)
      {
        nd->c[k] = x[j] / Ve;
        nd->dcdM[k] = 1 / Ve;
        nd->dcdV[k] = V > VMIN ? -x[j] / (V * V) : 0;
      }
  }
  nd->dH.n = 0;
  u->dq.n = 0;
  vn_lf *dH = net->want_d ? &nd->dH : NULL;
  vn_lf *dq = net->want_d ? &u->dq : NULL;
  vn_lf_x (dH, u->xoff, dldV);
  if (shape == PRISM)
    {
      /* level = V / A: the area (or diameter) can be estimated */
      double A = u->d[D_A], dldA = -V / (A * A);
      if (vn_given (net, u, AREA))
        vn_lf_p (dH, vn_pcol (u, AREA), dldA);
      else
        vn_lf_p (dH, vn_pcol (u, DIAM),
                 dldA * VN_PI * net->p[u->poff + DIAM] / 2);
    }
  else if (shape != TABLE)
    {
      /* round vessels: dlevel/dp = -(dV/dp at fixed level) / (dV/dlevel),
       * inside the vessel's height (0 in the linear extensions) */
      double R = u->d[D_R], h = l, in = V > 0 && V < u->d[D_VTOP];
      double dVdD = 0, dVdL = 0, dVdH = 0;
      if (in && shape == HORIZ)
        {
          double c = sqrt (fmax (0, 2 * R * h - h * h));
          dVdD = u->d[D_L] * (R * acos ((R - h) / R) - c);
          dVdL = V / u->d[D_L];
        }
      else if (in && shape == SPHERE)
        dVdD = VN_PI * h * h / 2;
      else if (in && shape == CONE)
        {
          dVdD = V / R;
          dVdH = -2 * V / u->d[D_HTOP];
        }
      vn_lf_p (dH, vn_pcol (u, DIAM), -dVdD * dldV);
      if (shape == HORIZ)
        vn_lf_p (dH, vn_pcol (u, LEN), -dVdL * dldV);
      if (shape == CONE)
        vn_lf_p (dH, vn_pcol (u, HEIGHT), -dVdH * dldV);
    }
  vn_lf_p (dH, vn_pcol (u, BASE), 1);
  /* spill over the rim (Francis) */
  double H = l - u->d[D_RIM];
  u->q = 0;
  if (isfinite (u->d[D_RIM]))
    {
      double n = net->p[u->poff + CONTR], L = u->d[D_CREST];
      double q = 0, dqdH = 0, dqdL = 0;
      if (H > 0)
        {
          double Le = fmax (L - 0.1 * n * H, 0), sh = sqrt (H);
          q = 1.84 * Le * H * sh;
          dqdH = 1.84 * (1.5 * Le * sh - (Le > 0 ? 0.1 * n * H * sh : 0));
          dqdL = Le > 0 ? 1.84 * H * sh : 0;
        }
      u->q = q;
      vn_lf_axpy (dq, dqdH, dH);
      vn_lf_p (dq, vn_pcol (u, BASE), -dqdH);
      if (vn_given (net, u, RIM))
        vn_lf_p (dq, vn_pcol (u, RIM), -dqdH);
      else if (shape == PRISM && vn_given (net, u, HEIGHT))
        vn_lf_p (dq, vn_pcol (u, HEIGHT), -dqdH);
      else if (shape == HORIZ || shape == SPHERE)
        vn_lf_p (dq, vn_pcol (u, DIAM), -dqdH);   /* rim = top */
      else if (shape == CONE)
        vn_lf_p (dq, vn_pcol (u, HEIGHT), -dqdH);
      /* the crest, given or (prism) the perimeter of a round plan */
      if (vn_given (net, u, CREST))
        vn_lf_p (dq, vn_pcol (u, CREST), dqdL);
      else if (shape == PRISM && vn_given (net, u, AREA))
        vn_lf_p (dq, vn_pcol (u, AREA), dqdL * sqrt (VN_PI / u->d[D_A]));
      else if (shape == PRISM)
        vn_lf_p (dq, vn_pcol (u, DIAM), dqdL * VN_PI);
    }
}

static void outputs (vn_net *net, vn_unit *u, const vn_node *nd,
                     const double *x, double *y, vn_lf *dy)
{
  (void) x;
  y[0] = nd->level;
  y[1] = nd->V;
  y[2] = nd->H;
  y[3] = u->q;
  /* temperature only when carried (else NaN) */
  y[4] = net->thermal ? nd->T : NAN;
  for (int k = 0; k < net->nspecies; k++)
    y[5 + k] = nd->c[k];
  if (!dy)
    return;
  if (net->thermal)
    {
      vn_lf_x (&dy[4], nd->xV, nd->dTdV);
      vn_lf_x (&dy[4], nd->xE, nd->dTdE);
    }
  for (int k = 0; k < net->nspecies; k++)
    {
      vn_lf_x (&dy[5 + k], nd->xV, nd->dcdV[k]);
      vn_lf_x (&dy[5 + k], nd->xM0 + k, nd->dcdM[k]);
    }
  vn_lf_axpy (&dy[0], 1, &nd->dH);
  vn_lf_p (&dy[0], vn_pcol (u, BASE), -1);
  vn_lf_x (&dy[1], u->xoff, 1);
  vn_lf_axpy (&dy[2], 1, &nd->dH);
  vn_lf_axpy (&dy[3], 1, &u->dq);
}

const vn_kind vn_kind_tank = {
  /* outputs: level, volume, head, spill, temperature (NaN unless thermal),
   * then one concentration per declared species */
  "tank", VN_ROLE_NODE, NPAR, par, NOUT, out, ounit, 5, 1,
  check, nstates, state_var, init, node, NULL, own, NULL, NULL, outputs
};

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
 * Where a round vessel's plan area vanishes (the apex of a cone, the
 * bottom of a sphere or lying cylinder, and the top of the last two) the
 * exact level has an infinite slope dlevel/dV, so any flow gated on the
 * level (liquid gate, pump suction) would be a non-Lipschitz function of
 * the volume: the integrator steps over the band and a dry tank drifts
 * below empty.  In a band of 1e-3 of the vessel's height the level is
 * instead a quadratic in the volume from the apex (exact level and slope
 * at the band's edge, finite slope at the apex), so near empty every
 * vessel behaves like a prism of finite area.  Below zero volume (a
 * solver excursion within tolerance) and beyond the top of a closed
 * vessel the level continues linearly so level(V) stays invertible:
 * below empty with the vessel's largest plan area, so a volume within
 * the integrator's tolerance (scaled by that area) is a level within
 * its level tolerance; above the top of a sphere or lying cylinder with
 * the slope its top band ends with, so level(V), and the spill at the
 * default rim there, stay C1 where a full vessel rests. */
#include <math.h>
#include "vn_internal.h"

enum { SHAPE, AREA, DIAM, LEN, HEIGHT, BASE, RIM, CREST, CONTR, LEVEL,
       VOLUME, UA, TEMP, C1, NPAR = C1 + VN_NSP };
#define VMIN 1e-9   /* m3: below this a tank's properties are held */
enum { PRISM = 0, HORIZ = 1, SPHERE = 2, CONE = 3, TABLE = 4 };
/* derived constants in u->d */
enum { D_A, D_R, D_L, D_VTOP, D_HTOP, D_AMAX, D_RIM, D_CREST };
#define D_THERMAL 8   /* 1 when the network is thermal (for state names) */
/* the apex band of a round vessel: its level hb, volume and area there */
enum { D_HB = 9, D_VB = 10, D_AB = 11 };
#define BAND 1e-3     /* band height over the vessel's height */
#define GATE_AREA 1e-2  /* least gate area over the largest plan area */

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

/* The bottom (and, for a sphere or lying cylinder, the top) band of a
 * round vessel, where its plan area vanishes: level = a y + b y^2 in the
 * volume y measured from the apex, matching the exact level and slope at
 * the band's edge hb and passing through the apex with the finite slope
 * a.  dlevel/dV stays bounded, so every flow gated on the level is a
 * smooth function of the volume near empty (as in a prism) and the
 * analytic Jacobian is exact there. */
static void band_coef (const vn_unit *u, double *a, double *b)
{
  const double *d = u->d;
  *a = 2 * d[D_HB] / d[D_VB] - 1 / d[D_AB];
  *b = (1 / d[D_AB] - d[D_HB] / d[D_VB]) / d[D_VB];
}

static int has_top_band (int shape)
{
  return shape == HORIZ || shape == SPHERE;
}

/* Area of the linear continuation below empty, and above the top. */
static double area_below (const vn_unit *u)
{
  return u->d[D_AMAX];
}

static double area_above (const vn_unit *u, int shape)
{
  /* a cone's top is its widest section; a sphere's or lying cylinder's
   * top band ends with the slope a of band_coef, and the continuation
   * keeps it, so level(V) stays C1 through the top (a kink there, where a
   * full vessel spills at its default rim, made the integrator fail its
   * error test at the smallest step) */
  double a, b;
  if (shape == CONE)
    return u->d[D_AMAX];
  band_coef (u, &a, &b);
  return 1 / a;
}

/* Level and dlevel/dV from the volume. */
static double level_of (const vn_unit *u, int shape, double V, double *dldV)
{
  const double *d = u->d;
  double a;
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
      /* past the last row (the top, where the rim is at the latest) the
       * last segment continues: a level there is the weir head over the
       * rim, carried by the last row's area */
      double s = (t[2 * hi] - t[2 * lo]) / (t[2 * hi + 1] - t[2 * lo + 1]);
      *dldV = s;
      return t[2 * lo] + s * (V - t[2 * lo + 1]);
    }
  if (V <= 0)
    {
      /* a solver excursion below empty: the reference area, so a volume
       * error within the integrator's tolerance is a level error within
       * its level tolerance */
      *dldV = 1 / area_below (u);
      return V / area_below (u);
    }
  if (V >= d[D_VTOP])
    {
      double atop = area_above (u, shape);
      *dldV = 1 / atop;
      return d[D_HTOP] + (V - d[D_VTOP]) / atop;
    }
  double ca, cb;
  band_coef (u, &ca, &cb);
  if (V < d[D_VB])
    {
      *dldV = ca + 2 * cb * V;
      return (ca + cb * V) * V;
    }
  if (has_top_band (shape) && V > d[D_VTOP] - d[D_VB])
    {
      double y = d[D_VTOP] - V;
      *dldV = ca + 2 * cb * y;
      return d[D_HTOP] - (ca + cb * y) * y;
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
  /* outside the bands the area is at least that at the band's edge */
  *dldV = 1 / fmax (a, d[D_AB]);
  return h;
}

/* Volume y above the apex at level h inside a band (the inverse of
 * a y + b y^2 on its rising branch). */
static double band_volume (const vn_unit *u, double h)
{
  double a, b;
  band_coef (u, &a, &b);
  return 2 * h / (a + sqrt (fmax (0, a * a + 4 * b * h)));
}

/* Volume held at level h (for initial states), the inverse of level_of. */
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
    return d[D_VTOP] + (h - d[D_HTOP]) * area_above (u, shape);
  if (h <= 0)
    return h * area_below (u);
  if (h < d[D_HB])
    return band_volume (u, h);
  if (has_top_band (shape) && h > d[D_HTOP] - d[D_HB])
    return d[D_VTOP] - band_volume (u, d[D_HTOP] - h);
  return vol_at (u, shape, h, &a);
}

/* The band of a round vessel: a fixed fraction of its height, so the
 * level map scales with the vessel (and its parameter derivatives follow
 * from that scaling). */
static void set_band (vn_unit *u, int shape)
{
  double *d = u->d, ab;
  d[D_HB] = BAND * d[D_HTOP];
  d[D_VB] = vol_at (u, shape, d[D_HB], &ab);
  d[D_AB] = ab;
}

/* Volume, plan area and its slope dA/dlevel of the level map at level z
 * (a nozzle's height): the inverse of level_of, branch by branch. */
static double map_at (const vn_unit *u, int shape, double z, double *A,
                      double *dA)
{
  const double *d = u->d;
  double a, b, V;
  band_coef (u, &a, &b);
  if (z < 0)
    {
      *A = area_below (u);
      *dA = 0;
      return z * *A;
    }
  if (z >= d[D_HTOP])
    {
      *A = area_above (u, shape);
      *dA = 0;
      return d[D_VTOP] + (z - d[D_HTOP]) * *A;
    }
  if (z < d[D_HB])
    {
      V = band_volume (u, z);
      *A = 1 / (a + 2 * b * V);
      *dA = -2 * b * *A * *A * *A;
      return V;
    }
  if (has_top_band (shape) && z > d[D_HTOP] - d[D_HB])
    {
      double y = band_volume (u, d[D_HTOP] - z);
      *A = 1 / (a + 2 * b * y);
      *dA = 2 * b * *A * *A * *A;
      return d[D_VTOP] - y;
    }
  V = vol_at (u, shape, z, A);
  if (shape == SPHERE)
    *dA = VN_PI * (2 * d[D_R] - 2 * z);
  else if (shape == CONE)
    *dA = 2 * *A / z;
  else
    {
      double c = sqrt (fmax (0, 2 * d[D_R] * z - z * z));
      *dA = c > 0 ? 2 * d[D_L] * (d[D_R] - z) / c : 0;
    }
  return V;
}

/* The largest plan area: of a prism, of a round vessel's widest section,
 * of the steepest segment of a strapping table. */
double vn_tank_area_ref (const vn_net *net, const vn_unit *u)
{
  if ((int) net->p[u->poff + SHAPE] == TABLE)
    {
      double a = 0;
      for (int i = 1; i < u->ntab; i++)
        a = fmax (a, (u->tab[2 * i + 1] - u->tab[2 * i - 1])
                     / (u->tab[2 * i] - u->tab[2 * i - 2]));
      return a;
    }
  return u->d[D_AMAX];
}

/* Below empty: the deficit V / Ag(0) as an equivalent level (prism: the
 * level itself; table: over its first segment's area; round: over the
 * gate area at the bottom). */
static double deficit (const vn_net *net, const vn_unit *u, int shape,
                       const vn_node *nd, int pc_z, vn_lf *de)
{
  const double *d = u->d;
  double V = nd->V, e;
  if (pc_z >= 0)
    vn_lf_p (de, pc_z, 0);
  if (shape == PRISM)
    {
      vn_lf_axpy (de, 1, &nd->dH);
      vn_lf_p (de, nd->pc_base, -1);
      return nd->level;
    }
  if (shape == TABLE)
    {
      double a1 = (u->tab[3] - u->tab[1]) / (u->tab[2] - u->tab[0]);
      vn_lf_x (de, u->xoff, 1 / a1);
      return V / a1;
    }
  /* the gate area at the bottom, as in vn_tank_above at z = 0, so the
   * gate's slope is the same on both sides of empty; both candidates
   * scale with the plan (D^2, or D L) */
  double A0, dA0, D = net->p[u->poff + DIAM];
  map_at (u, shape, 0, &A0, &dA0);
  double Ag = fmax (A0, GATE_AREA * d[D_AMAX]);
  e = V / Ag;
  vn_lf_x (de, u->xoff, 1 / Ag);
  if (shape == HORIZ)
    {
      vn_lf_p (de, vn_pcol (u, DIAM), -e / D);
      vn_lf_p (de, vn_pcol (u, LEN), -e / d[D_L]);
    }
  else
    {
      vn_lf_p (de, vn_pcol (u, DIAM), -2 * e / D);
      if (shape == CONE)
        vn_lf_p (de, vn_pcol (u, HEIGHT), 0);
    }
  return e;
}

/* Liquid above a nozzle at level z (above the base) of a tank, as an
 * equivalent level e, for the liquid gate and pump suction.  Prism and
 * table: e = level - z.  Round vessels: e = (V - V(z)) / Ag with
 * Ag = max(A(z), GATE_AREA Amax), so near a nozzle where the plan area
 * vanishes (a cone's apex, a sphere's bottom) the gate still closes over a
 * volume of at least GATE_AREA Amax times its band: it closes smoothly in
 * volume, at a rate the integrator resolves, instead of over a sliver of
 * volume far below its tolerance.  Elsewhere Ag = A(z) and e is the level
 * above the nozzle to first order.  Below empty (V < 0, *dry set) e is
 * the deficit V / Ag(0) whatever the nozzle, for the gate's reversal.
 * Derivatives: the state, the nozzle height (column pc_z) and the
 * vessel's dimensions (scaling, as in node ()). */
double vn_tank_above (const vn_net *net, const vn_node *nd, double z,
                      int pc_z, vn_lf *de, int *dry)
{
  const vn_unit *u = &net->u[nd - net->nd];
  const double *d = u->d;
  int shape = (int) net->p[u->poff + SHAPE];
  if (dry)
    *dry = nd->V < 0;
  if (nd->V < 0)
    return deficit (net, u, shape, nd, pc_z, de);
  if (shape == PRISM || shape == TABLE)
    {
      vn_lf_axpy (de, 1, &nd->dH);
      vn_lf_p (de, nd->pc_base, -1);
      if (pc_z >= 0)
        vn_lf_p (de, pc_z, -1);
      return nd->level - z;
    }
  double Az, dAz, Vz = map_at (u, shape, z, &Az, &dAz);
  double Ak = GATE_AREA * d[D_AMAX];
  int useA = Az > Ak;
  double Ag = useA ? Az : Ak, e = (nd->V - Vz) / Ag;
  if (!de)
    return e;
  vn_lf_x (de, u->xoff, 1 / Ag);
  if (pc_z >= 0)
    vn_lf_p (de, pc_z, -Az / Ag - (useA ? e * dAz / Ag : 0));
  /* dVz/dp and dAg/dp at fixed z for each dimension */
  double D = net->p[u->poff + DIAM], dVD, dAD, dVo = 0, dAo = 0;
  int pco;
  if (shape == SPHERE)
    {
      dVD = (3 * Vz - z * Az) / D;
      dAD = useA ? (2 * Az - z * dAz) / D : 2 * Ak / D;
      pco = -1;
    }
  else if (shape == HORIZ)
    {
      double L = d[D_L];
      dVD = (2 * Vz - z * Az) / D;
      dAD = useA ? (Az - z * dAz) / D : Ak / D;
      dVo = Vz / L;
      dAo = Ag / L;
      pco = vn_pcol (u, LEN);
    }
  else
    {
      double H = d[D_HTOP];
      dVD = 2 * Vz / D;
      dAD = 2 * Ag / D;
      dVo = (Vz - z * Az) / H;
      dAo = useA ? -z * dAz / H : 0;
      pco = vn_pcol (u, HEIGHT);
    }
  vn_lf_p (de, vn_pcol (u, DIAM), -dVD / Ag - e * dAD / Ag);
  if (pco >= 0)
    vn_lf_p (de, pco, -dVo / Ag - e * dAo / Ag);
  return e;
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
      set_band (u, shape);
      break;
    case SPHERE:
      if (!gd)
        return vn_fail_unit (net, u, "a sphere needs diameter (m)");
      d[D_HTOP] = D;
      d[D_AMAX] = VN_PI * d[D_R] * d[D_R];
      d[D_VTOP] = 4 * VN_PI * d[D_R] * d[D_R] * d[D_R] / 3;
      set_band (u, shape);
      break;
    case CONE:
      if (!gd || !vn_given (net, u, HEIGHT))
        return vn_fail_unit (net, u, "a cone needs diameter (m, at the top) "
                             "and height (m, apex to top)");
      d[D_HTOP] = vn_par (net, u, HEIGHT);
      d[D_AMAX] = VN_PI * d[D_R] * d[D_R];
      d[D_VTOP] = d[D_AMAX] * d[D_HTOP] / 3;
      set_band (u, shape);
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
        /* the table's last row is the vessel's top: the rim defaults to
         * it and may not lie above it (Inf included), so the level never
         * runs up the last segment unbounded; above the rim only the
         * weir head stands, over the last segment's area */
        d[D_HTOP] = u->tab[2 * n - 2];
        d[D_VTOP] = u->tab[2 * n - 1];
        if (vn_given (net, u, RIM)
            && !(vn_par (net, u, RIM) <= d[D_HTOP] * (1 + 1e-12)))
          return vn_fail_unit (net, u, "rim %g m lies above the top of "
                               "the strapping table (%g m); a table tank "
                               "spills over its top, so its rim is at "
                               "most the table's last level",
                               vn_par (net, u, RIM), d[D_HTOP]);
        if (vn_par (net, u, LEVEL) > d[D_HTOP])
          return vn_fail_unit (net, u, "level %g m lies above the top of "
                               "the strapping table (%g m)",
                               vn_par (net, u, LEVEL), d[D_HTOP]);
        if (vn_given (net, u, VOLUME) && vn_par (net, u, VOLUME) > d[D_VTOP])
          return vn_fail_unit (net, u, "volume %g m3 lies above the top of "
                               "the strapping table (%g m3)",
                               vn_par (net, u, VOLUME), d[D_VTOP]);
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
      /* round vessels: the level map is h = S phi(V / (scales)), the
       * same function scaled (bands and continuations too), so at fixed
       * volume dh/dS = (h - n V dh/dV) / S for a length S entering the
       * volume scale as S^n: sphere D^3; cylinder D^2 L; cone D^2 H with
       * the level scaled by H. */
      double D = net->p[u->poff + DIAM], s = V * dldV;
      if (shape == SPHERE)
        vn_lf_p (dH, vn_pcol (u, DIAM), (l - 3 * s) / D);
      else if (shape == HORIZ)
        {
          vn_lf_p (dH, vn_pcol (u, DIAM), (l - 2 * s) / D);
          vn_lf_p (dH, vn_pcol (u, LEN), -s / u->d[D_L]);
        }
      else
        {
          vn_lf_p (dH, vn_pcol (u, DIAM), -2 * s / D);
          vn_lf_p (dH, vn_pcol (u, HEIGHT), (l - s) / u->d[D_HTOP]);
        }
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
      /* the crest: given, else the perimeter of a round plan (or of the
       * top of a sphere or cone), or a lying cylinder's length */
      if (vn_given (net, u, CREST))
        vn_lf_p (dq, vn_pcol (u, CREST), dqdL);
      else if (shape == PRISM && vn_given (net, u, AREA))
        vn_lf_p (dq, vn_pcol (u, AREA), dqdL * sqrt (VN_PI / u->d[D_A]));
      else if (shape == PRISM || shape == SPHERE || shape == CONE)
        vn_lf_p (dq, vn_pcol (u, DIAM), dqdL * VN_PI);   /* pi D */
      else if (shape == HORIZ)
        vn_lf_p (dq, vn_pcol (u, LEN), dqdL);            /* the length */
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

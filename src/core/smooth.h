/* Smoothed forms of the non-smooth laws, C1 everywhere, exact outside a
 * small band d (the network's "smooth" option, 1 mm by default), so the
 * Jacobian stays finite where a square root has infinite slope. */
#ifndef VN_SMOOTH_H
#define VN_SMOOTH_H

#include <math.h>

/* Signed square root; below |x| < d an odd cubic matching value and slope
 * at |x| = d: sqrt(d) (1.25 r - 0.25 r^3), r = x/d. */
static inline double vn_ssqrt (double x, double d, double *dfdx)
{
  double ax = fabs (x);
  if (ax >= d)
    {
      double s = sqrt (ax);
      *dfdx = 0.5 / s;
      return x >= 0 ? s : -s;
    }
  double r = x / d, sd = sqrt (d);
  *dfdx = sd * (1.25 - 0.75 * r * r) / d;
  return sd * (1.25 * r - 0.25 * r * r * r);
}

/* One-sided square root: 0 for x <= 0; below d a cubic with zero value
 * and slope at 0 (a check valve closes smoothly):
 * sqrt(d) (2.5 r^2 - 1.5 r^3). */
static inline double vn_psqrt (double x, double d, double *dfdx)
{
  if (x <= 0)
    {
      *dfdx = 0;
      return 0;
    }
  if (x >= d)
    {
      double s = sqrt (x);
      *dfdx = 0.5 / s;
      return s;
    }
  double r = x / d, sd = sqrt (d);
  *dfdx = sd * (5.0 * r - 4.5 * r * r) / d;
  return sd * (2.5 * r * r - 1.5 * r * r * r);
}

/* Smooth step from 0 (s <= 0) to 1 (s >= d): 3 r^2 - 2 r^3. */
static inline double vn_gate (double s, double d, double *dgds)
{
  if (s <= 0)
    {
      *dgds = 0;
      return 0;
    }
  if (s >= d)
    {
      *dgds = 0;
      return 1;
    }
  double r = s / d;
  *dgds = 6.0 * r * (1.0 - r) / d;
  return r * r * (3.0 - 2.0 * r);
}

/* The liquid gate on the liquid s above a nozzle, band d: r (2 - r) for
 * 0 < r = s/d < 1, 1 above.  It opens with a finite slope, so a tank
 * drawn down to a nozzle approaches it exponentially (a hyperbolic rest
 * point), not along s^2.  Below the nozzle it is 0, except below empty
 * (`dry`, s then the deficit, a solver excursion): there it continues as
 * 2 r, reversing the flow in proportion, so empty attracts from both
 * sides with one slope at a bottom nozzle. */
static inline double vn_gate_liquid (double s, double d, int dry,
                                     double *dgds)
{
  double r = s / d;
  if (r >= 1)
    {
      *dgds = 0;
      return 1;
    }
  if (r <= 0 && !dry)
    {
      *dgds = 0;
      return 0;
    }
  if (r <= 0)
    {
      *dgds = 2.0 / d;
      return 2.0 * r;
    }
  *dgds = 2.0 * (1.0 - r) / d;
  return r * (2.0 - r);
}

#endif

/* The registry of unit kinds: the single source of parameter names,
 * defaults, ranges and outputs, read by the Octave layer through
 * __vn_schema__ so that no list is written twice. */
#include <string.h>
#include "vn_internal.h"

static const vn_kind *const kinds[] = {
  &vn_kind_tank, &vn_kind_boundary, &vn_kind_feed, &vn_kind_orifice,
  &vn_kind_resistance, &vn_kind_valve, &vn_kind_pump, &vn_kind_controller,
  &vn_kind_switch, &vn_kind_heater
};
#define NKINDS ((int) (sizeof kinds / sizeof kinds[0]))

int vn_kind_count (void) { return NKINDS; }

static const vn_kind *kind_at (int k)
{
  return (k >= 0 && k < NKINDS) ? kinds[k] : NULL;
}

const vn_kind *vn_kind_get (int k) { return kind_at (k); }

const char *vn_kind_name (int k)
{
  const vn_kind *K = kind_at (k);
  return K ? K->name : NULL;
}

int vn_kind_find (const char *name)
{
  for (int k = 0; k < NKINDS; k++)
    if (strcmp (kinds[k]->name, name) == 0)
      return k;
  return -1;
}

int vn_kind_npar (int k)
{
  const vn_kind *K = kind_at (k);
  return K ? K->npar : 0;
}

const vn_param_info *vn_kind_param (int k, int slot)
{
  const vn_kind *K = kind_at (k);
  return (K && slot >= 0 && slot < K->npar) ? &K->par[slot] : NULL;
}

int vn_kind_nout (int k)
{
  const vn_kind *K = kind_at (k);
  return K ? K->nout : 0;
}

const char *vn_kind_out_name (int k, int i)
{
  const vn_kind *K = kind_at (k);
  return (K && i >= 0 && i < K->nout) ? K->out[i] : NULL;
}

const char *vn_kind_out_unit (int k, int i)
{
  const vn_kind *K = kind_at (k);
  return (K && i >= 0 && i < K->nout) ? K->ounit[i] : NULL;
}

int vn_npmax (void) { return VN_NPMAX; }

void vn_kind_nout_rule (int k, int *base, int *per_species)
{
  const vn_kind *K = kind_at (k);
  *base = K ? (K->nout_base ? K->nout_base : K->nout) : 0;
  *per_species = K ? K->nout_species : 0;
}

const char *vn_status_str (int status)
{
  switch (status)
    {
    case VN_OK: return "ok";
    case VN_EARG: return "invalid input";
    case VN_ENOMEM: return "out of memory";
    case VN_ESOLVER: return "solver failure";
    case VN_EINTR: return "interrupted";
    case VN_ENOSTEADY: return "no steady state";
    default: return "unknown status";
    }
}

// Built network handles kept between gateway calls.  A packed network
// that comes from the compiled-network cache (inst/private/vn_compile.m)
// is the very same Octave value call after call; it is held here with
// the handle built from it, so the next call with that value skips the
// conversion and the build.  Holding the value is what makes this safe:
// any change to a held value makes Octave copy it first, and the changed
// copy is a different value, built afresh.  A handle is reusable: each
// run sets its signals and start again.  The last two are kept.
#ifndef VN_GW_CACHE_H
#define VN_GW_CACHE_H

#include <memory>
#include <vector>
#include "vn_gateway.h"

struct vn_gw_held
{
  octave_value pk;
  vn_net *net = nullptr;
  Cell states;              // state names, made on first use
  bool named = false;
  ~vn_gw_held () { vn_net_free (net); }
};

static inline std::vector<std::unique_ptr<vn_gw_held>> &
vn_gw_held_list ()
{
  static std::vector<std::unique_ptr<vn_gw_held>> list;
  return list;
}

// The handle for packed network PK, built now or found held.
static inline vn_gw_held &
vn_gw_cached_build (const octave_value &pk, const char *fn)
{
  auto &list = vn_gw_held_list ();
  for (auto &h : list)
    if (h->pk.internal_rep () == pk.internal_rep ())
      return *h;
  std::unique_ptr<vn_gw_held> h (new vn_gw_held);
  vn_gw_spec G;
  vn_gw_net H;
  vn_gw_build (pk, G, H, fn);
  h->net = H.net;
  H.net = nullptr;
  h->pk = pk;
  list.insert (list.begin (), std::move (h));
  if (list.size () > 2)
    list.pop_back ();
  return *list.front ();
}

// State names "UNIT.VAR" of a held network, made once.
static inline const Cell &
vn_gw_state_names (vn_gw_held &h)
{
  if (! h.named)
    {
      int nx = vn_nstates (h.net);
      h.states = Cell (nx, 1);
      for (int i = 0; i < nx; i++)
        h.states(i) = std::string (vn_unit_name (h.net, vn_state_unit (h.net, i)))
                      + "." + vn_state_var (h.net, i);
      h.named = true;
    }
  return h.states;
}

#endif

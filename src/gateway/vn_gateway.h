// Shared by the gateways: turn the packed network struct (doc/internals.md
// section 4) into a vn_spec, build the core's handle, apply signals, and
// report the core's status as an Octave error.  No physics here.
#ifndef VN_GATEWAY_H
#define VN_GATEWAY_H

#include <string>
#include <vector>
#include <octave/oct.h>
#include <octave/ov-struct.h>
#include <octave/Cell.h>
#include <octave/quit.h>
#include "vn.h"

// Owns the arrays a vn_spec points into.
struct vn_gw_spec
{
  std::vector<int> kind, ref, taboff, tablen;
  std::vector<std::string> names;
  std::vector<const char *> cnames;
  std::vector<double> par, tab, decay;
  std::vector<unsigned char> given;
  vn_spec s;
};

static inline octave_value
vn_gw_field (const octave_scalar_map &m, const char *f, const char *fn)
{
  if (! m.isfield (f))
    error ("%s: packed network lacks field '%s' (internal error)", fn, f);
  return m.getfield (f);
}

static inline void
vn_gw_pack (const octave_value &v, vn_gw_spec &G, const char *fn)
{
  if (! v.isstruct ())
    error ("%s: NET must be a packed vesselnet network", fn);
  octave_scalar_map pk = v.scalar_map_value ();
  Cell kinds = vn_gw_field (pk, "kinds", fn).cell_value ();
  Cell names = vn_gw_field (pk, "names", fn).cell_value ();
  int n = kinds.numel ();
  if (names.numel () != n)
    error ("%s: packed network has %d kinds but %d names", fn, n,
           (int) names.numel ());
  int npmax = vn_npmax ();
  G.kind.resize (n);
  G.names.resize (n);
  G.cnames.resize (n);
  for (int i = 0; i < n; i++)
    {
      std::string k = kinds(i).string_value ();
      G.kind[i] = vn_kind_find (k.c_str ());
      G.names[i] = names(i).string_value ();
      if (G.kind[i] < 0)
        error ("%s: unit \"%s\" has unknown kind \"%s\"", fn,
               G.names[i].c_str (), k.c_str ());
    }
  for (int i = 0; i < n; i++)
    G.cnames[i] = G.names[i].c_str ();
  int32NDArray ref = vn_gw_field (pk, "ref", fn).int32_array_value ();
  NDArray par = vn_gw_field (pk, "par", fn).array_value ();
  boolNDArray given = vn_gw_field (pk, "given", fn).bool_array_value ();
  if (ref.numel () != 4 * n || par.numel () != (octave_idx_type) npmax * n
      || given.numel () != par.numel ())
    error ("%s: packed network arrays have inconsistent sizes", fn);
  G.ref.resize (4 * n);
  G.par.resize (npmax * n);
  G.given.resize (npmax * n);
  for (int i = 0; i < 4 * n; i++)
    G.ref[i] = ref(i).value ();
  for (octave_idx_type i = 0; i < par.numel (); i++)
    {
      G.par[i] = par(i);
      G.given[i] = given(i);
    }
  NDArray tab = vn_gw_field (pk, "tab", fn).array_value ();
  int32NDArray toff = vn_gw_field (pk, "taboff", fn).int32_array_value ();
  int32NDArray tlen = vn_gw_field (pk, "tablen", fn).int32_array_value ();
  if (toff.numel () != n || tlen.numel () != n)
    error ("%s: packed table offsets have the wrong size", fn);
  G.tab.assign (tab.data (), tab.data () + tab.numel ());
  G.taboff.resize (n);
  G.tablen.resize (n);
  for (int i = 0; i < n; i++)
    {
      G.taboff[i] = toff(i).value ();
      G.tablen[i] = tlen(i).value ();
      if (G.tablen[i] > 0
          && 2 * ((long) G.taboff[i] + G.tablen[i]) > (long) G.tab.size ())
        error ("%s: table of unit \"%s\" runs past the packed data", fn,
               G.names[i].c_str ());
    }
  NDArray opt = vn_gw_field (pk, "opt", fn).array_value ();
  if (opt.numel () < 7)
    error ("%s: packed options are too short", fn);
  vn_spec &s = G.s;
  s.nunit = n;
  s.kind = G.kind.data ();
  s.name = G.cnames.data ();
  s.ref = G.ref.data ();
  s.par = G.par.data ();
  s.given = G.given.data ();
  s.tab = G.tab.empty () ? NULL : G.tab.data ();
  s.taboff = G.taboff.data ();
  s.tablen = G.tablen.data ();
  s.gravity = opt(0);
  s.density = opt(1);
  s.cp = opt(2);
  s.ambient = opt(3);
  s.thermal = opt(4) != 0;
  s.smooth = opt(5);
  s.nspecies = (int) opt(6);
  if (s.nspecies < 0 || opt.numel () < 7 + s.nspecies)
    error ("%s: packed species decay rates are missing", fn);
  G.decay.resize (s.nspecies > 0 ? s.nspecies : 1);
  for (int i = 0; i < s.nspecies; i++)
    G.decay[i] = opt(7 + i);
  s.decay = G.decay.data ();
}

// Signals from the packed struct of doc/internals.md section 5, as the
// arrays vn_set_signals takes (owned here).
struct vn_gw_sig
{
  std::vector<int> unit, slot, off, len, hold;
  NDArray data;
  int n = 0;
};

static inline void
vn_gw_sig_arrays (const octave_value &v, vn_gw_sig &S, const char *fn)
{
  S.n = 0;
  if (v.isempty ())
    return;
  if (! v.isstruct ())
    error ("%s: SIGNALS must be a packed signal struct", fn);
  octave_scalar_map sg = v.scalar_map_value ();
  int32NDArray unit = vn_gw_field (sg, "unit", fn).int32_array_value ();
  int32NDArray slot = vn_gw_field (sg, "par", fn).int32_array_value ();
  int32NDArray off = vn_gw_field (sg, "off", fn).int32_array_value ();
  int32NDArray len = vn_gw_field (sg, "len", fn).int32_array_value ();
  int32NDArray hold = vn_gw_field (sg, "hold", fn).int32_array_value ();
  S.data = vn_gw_field (sg, "data", fn).array_value ();
  int m = unit.numel ();
  if (slot.numel () != m || off.numel () != m || len.numel () != m
      || hold.numel () != m)
    error ("%s: packed signal arrays have inconsistent sizes", fn);
  S.unit.resize (m);
  S.slot.resize (m);
  S.off.resize (m);
  S.len.resize (m);
  S.hold.resize (m);
  long need = 0;
  for (int i = 0; i < m; i++)
    {
      S.unit[i] = unit(i).value ();
      S.slot[i] = slot(i).value ();
      S.off[i] = off(i).value ();
      S.len[i] = len(i).value ();
      S.hold[i] = hold(i).value ();
      if (S.off[i] < 0 || S.len[i] < 0)
        error ("%s: signal %d has a negative offset or length", fn, i + 1);
      if (2 * ((long) S.off[i] + S.len[i]) > need)
        need = 2 * ((long) S.off[i] + S.len[i]);
    }
  if (need > S.data.numel ())
    error ("%s: packed signal data are too short", fn);
  S.n = m;
}

static inline int
vn_gw_signals (vn_net *net, const octave_value &v, const char *fn)
{
  vn_gw_sig S;
  vn_gw_sig_arrays (v, S, fn);
  return vn_set_signals (net, S.n, S.unit.data (), S.slot.data (),
                         S.off.data (), S.len.data (), S.hold.data (),
                         S.data.data ());
}

// Owns a network handle for the life of a gateway call, so every exit
// (error () throws) frees it.
struct vn_gw_net
{
  vn_net *net = nullptr;
  ~vn_gw_net () { vn_net_free (net); }
};

static inline void
vn_gw_build (const octave_value &pk, vn_gw_spec &G, vn_gw_net &H,
             const char *fn)
{
  vn_gw_pack (pk, G, fn);
  char msg[1024] = "";
  int st = vn_net_new (&G.s, &H.net, msg, sizeof msg);
  if (st)
    error_with_id (st == VN_EARG ? "Octave:invalid-input-arg"
                                 : "vesselnet:core", "%s: %s", fn, msg);
}

static inline void
vn_gw_check (vn_net *net, int st, const char *fn)
{
  if (st == VN_OK)
    return;
  if (st == VN_EINTR)
    {
      octave_quit ();
      error_with_id ("vesselnet:interrupted", "%s: %s", fn, vn_errmsg (net));
    }
  const char *id = st == VN_EARG ? "Octave:invalid-input-arg"
                   : st == VN_ENOSTEADY ? "vesselnet:no-steady-state"
                   : st == VN_ESOLVER ? "vesselnet:solver-failure"
                   : "vesselnet:core";
  error_with_id (id, "%s: %s", fn, vn_errmsg (net));
}

// Polled by the core: Ctrl-C sets octave_signal_caught.
static inline int
vn_gw_stop (void *)
{
  return octave_signal_caught || octave_interrupt_state > 0;
}

static inline Matrix
vn_gw_vector (const double *v, int n)
{
  Matrix m (n, 1);
  for (int i = 0; i < n; i++)
    m(i) = v[i];
  return m;
}

#endif

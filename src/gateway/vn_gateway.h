// Shared by the gateways: turn the packed network struct (doc/internals.md
// section 4) into a vn_spec, build the core's handle, apply signals, and
// report the core's status as an Octave error.  No physics here.
#ifndef VN_GATEWAY_H
#define VN_GATEWAY_H

#include <cmath>
#include <cstdio>
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
    error_with_id ("Octave:invalid-input-arg", "%s: packed struct lacks "
                   "field '%s' (internal error)", fn, f);
  return m.getfield (f);
}

// A hand-made packed struct must give an error, never a crash: every
// field is checked for type, size and range before the core reads it.
static inline void
vn_gw_bad (const char *fn, const char *f, const char *what)
{
  error_with_id ("Octave:invalid-input-arg", "%s: packed field '%s' %s "
                 "(internal error or a hand-made struct)", fn, f, what);
}

// A number as Octave prints it in messages (NaN, Inf, 1e+08).
static inline std::string
vn_gw_num (double x)
{
  if (std::isnan (x))
    return "NaN";
  if (std::isinf (x))
    return x > 0 ? "Inf" : "-Inf";
  char b[32];
  snprintf (b, sizeof b, "%g", x);
  return b;
}

// A real numeric (or logical) field of n elements (n < 0: any count).
static inline NDArray
vn_gw_numbers (const octave_scalar_map &m, const char *f, octave_idx_type n,
               const char *fn)
{
  octave_value v = vn_gw_field (m, f, fn);
  if (! (v.isnumeric () || v.islogical ()) || v.iscomplex ())
    vn_gw_bad (fn, f, "must be a real numeric array");
  NDArray a = v.array_value ();
  if (n >= 0 && a.numel () != n)
    {
      std::string w = "must have " + std::to_string ((long) n)
                      + " elements, got " + std::to_string ((long) a.numel ());
      vn_gw_bad (fn, f, w.c_str ());
    }
  return a;
}

// Whole numbers in [lo, hi], converted to int only once they are known
// to fit (a NaN or 1e10 cast to int is undefined behaviour).
static inline std::vector<int>
vn_gw_ints (const octave_scalar_map &m, const char *f, octave_idx_type n,
            double lo, double hi, const char *fn)
{
  NDArray a = vn_gw_numbers (m, f, n, fn);
  std::vector<int> r (a.numel ());
  for (octave_idx_type i = 0; i < a.numel (); i++)
    {
      double x = a(i);
      if (! (x >= lo && x <= hi) || x != std::floor (x))
        {
          char w[160];
          snprintf (w, sizeof w, "element %ld must be a whole number in "
                    "[%.10g, %.10g], got %s", (long) i + 1, lo, hi,
                    vn_gw_num (x).c_str ());
          vn_gw_bad (fn, f, w);
        }
      r[i] = (int) x;
    }
  return r;
}

// A cell of n character strings.
static inline std::vector<std::string>
vn_gw_strings (const octave_scalar_map &m, const char *f, const char *fn)
{
  octave_value v = vn_gw_field (m, f, fn);
  if (! v.iscell ())
    vn_gw_bad (fn, f, "must be a cell array of strings");
  Cell c = v.cell_value ();
  std::vector<std::string> r (c.numel ());
  for (octave_idx_type i = 0; i < c.numel (); i++)
    {
      if (! c(i).is_string () || c(i).rows () > 1)
        vn_gw_bad (fn, f, "must be a cell array of strings");
      r[i] = c(i).string_value ();
    }
  return r;
}

static inline void
vn_gw_pack (const octave_value &v, vn_gw_spec &G, const char *fn)
{
  if (! v.isstruct () || v.numel () != 1)
    error_with_id ("Octave:invalid-input-arg", "%s: NET must be a packed "
                   "vesselnet network", fn);
  octave_scalar_map pk = v.scalar_map_value ();
  std::vector<std::string> kinds = vn_gw_strings (pk, "kinds", fn);
  G.names = vn_gw_strings (pk, "names", fn);
  int n = kinds.size ();
  if ((long) G.names.size () != n)
    error_with_id ("Octave:invalid-input-arg", "%s: packed network has %d "
                   "kinds but %d names", fn, n, (int) G.names.size ());
  if (n > 100000000)
    vn_gw_bad (fn, "kinds", "has more than 1e8 units");
  const double imax = 2147483647.0;
  int npmax = vn_npmax ();
  G.kind.resize (n);
  G.cnames.resize (n);
  for (int i = 0; i < n; i++)
    {
      G.kind[i] = vn_kind_find (kinds[i].c_str ());
      if (G.kind[i] < 0)
        error_with_id ("Octave:invalid-input-arg", "%s: unit \"%s\" has "
                       "unknown kind \"%s\"", fn, G.names[i].c_str (),
                       kinds[i].c_str ());
      G.cnames[i] = G.names[i].c_str ();
    }
  // references: unit indices, or (controllers, switches) output indices
  // and parameter slots; the core checks which is which
  G.ref = vn_gw_ints (pk, "ref", 4 * (octave_idx_type) n, -1, imax, fn);
  NDArray par = vn_gw_numbers (pk, "par", (octave_idx_type) npmax * n, fn);
  NDArray given = vn_gw_numbers (pk, "given", par.numel (), fn);
  G.par.assign (par.data (), par.data () + par.numel ());
  G.given.resize (given.numel ());
  for (octave_idx_type i = 0; i < given.numel (); i++)
    {
      if (given(i) != 0 && given(i) != 1)
        vn_gw_bad (fn, "given", "must hold only 0 and 1");
      G.given[i] = given(i) != 0;
    }
  NDArray tab = vn_gw_numbers (pk, "tab", -1, fn);
  if (tab.numel () % 2)
    vn_gw_bad (fn, "tab", "must hold (level, volume) pairs: an even count");
  G.tab.assign (tab.data (), tab.data () + tab.numel ());
  long ntab = tab.numel () / 2;
  G.taboff = vn_gw_ints (pk, "taboff", n, 0, imax, fn);
  G.tablen = vn_gw_ints (pk, "tablen", n, 0, imax, fn);
  for (int i = 0; i < n; i++)
    if (G.tablen[i] > 0 && (long) G.taboff[i] + G.tablen[i] > ntab)
      error_with_id ("Octave:invalid-input-arg", "%s: table of unit \"%s\" "
                     "runs past the %ld packed (level, volume) pairs", fn,
                     G.names[i].c_str (), ntab);
  NDArray opt = vn_gw_numbers (pk, "opt", -1, fn);
  if (opt.numel () < 7)
    vn_gw_bad (fn, "opt", "must have at least 7 elements");
  double nsp = opt(6);
  if (! (nsp >= 0 && nsp <= 64) || nsp != std::floor (nsp))
    {
      char w[120];
      snprintf (w, sizeof w, "element 7 (species count) must be a whole "
                "number in [0, 64], got %s", vn_gw_num (nsp).c_str ());
      vn_gw_bad (fn, "opt", w);
    }
  if (opt(4) != 0 && opt(4) != 1)
    vn_gw_bad (fn, "opt", "element 5 (thermal) must be 0 or 1");
  vn_spec &s = G.s;
  s = vn_spec ();
  s.nunit = n;
  s.kind = G.kind.data ();
  s.name = G.cnames.data ();
  s.ref = G.ref.data ();
  s.par = G.par.data ();
  s.given = G.given.data ();
  s.tab = G.tab.empty () ? NULL : G.tab.data ();
  s.ntab = ntab;
  s.taboff = G.taboff.data ();
  s.tablen = G.tablen.data ();
  s.gravity = opt(0);
  s.density = opt(1);
  s.cp = opt(2);
  s.ambient = opt(3);
  s.thermal = opt(4) != 0;
  s.smooth = opt(5);
  s.nspecies = (int) nsp;
  if (opt.numel () < 7 + s.nspecies)
    error_with_id ("Octave:invalid-input-arg", "%s: packed network has %d "
                   "species but only %d decay rates", fn, s.nspecies,
                   (int) opt.numel () - 7);
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
  if (! v.isstruct () || v.numel () != 1)
    error_with_id ("Octave:invalid-input-arg", "%s: SIGNALS must be a packed "
                   "signal struct", fn);
  octave_scalar_map sg = v.scalar_map_value ();
  const double imax = 2147483647.0;
  S.unit = vn_gw_ints (sg, "unit", -1, 0, imax, fn);
  int m = S.unit.size ();
  S.slot = vn_gw_ints (sg, "par", m, 0, imax, fn);
  S.off = vn_gw_ints (sg, "off", m, 0, imax, fn);
  S.len = vn_gw_ints (sg, "len", m, 0, imax, fn);
  S.hold = vn_gw_ints (sg, "hold", m, 0, 1, fn);
  S.data = vn_gw_numbers (sg, "data", -1, fn);
  long need = 0;
  for (int i = 0; i < m; i++)
    if (2 * ((long) S.off[i] + S.len[i]) > need)
      need = 2 * ((long) S.off[i] + S.len[i]);
  if (need > S.data.numel ())
    error_with_id ("Octave:invalid-input-arg", "%s: packed signal data are "
                   "too short", fn);
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

// Ctrl-C stopped the core: the pending interrupt is taken over by an
// error the caller can catch (id vesselnet:interrupted), so the session
// goes on with its workspace as it was, and a script sees why it stopped.
static inline void
vn_gw_interrupted (const char *fn, const char *why)
{
  octave_signal_caught = 0;
  octave_interrupt_state = 0;
  error_with_id ("vesselnet:interrupted", "%s: %s (Ctrl-C)", fn, why);
}

static inline void
vn_gw_check (vn_net *net, int st, const char *fn)
{
  if (st == VN_OK)
    return;
  if (st == VN_EINTR)
    vn_gw_interrupted (fn, vn_errmsg (net));
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

// key = __vn_hash__ (x)
// A 128-bit fingerprint (32 hex characters) of any Octave value: class,
// size and every stored byte, struct field names and cell contents
// included.  vn_compile keys its cache of compiled networks on it, so a
// network edited by hand (net.units(k).par.coeff = ...) is never served
// the compiled form of the network it was before.  Not cryptographic: a
// cache key against accidental equality, not against an adversary.
//
// The last few values fingerprinted are held here, so asking again for
// the very same value (the same network passed again) costs nothing: the
// value is held, so any change to it makes Octave copy it first and the
// changed one is a new value, fingerprinted afresh.
#include <cstdint>
#include <cstring>
#include <sstream>
#include <utility>
#include <vector>
#include "vn_gateway.h"

namespace
{
// Two independent 64-bit lanes, each a multiply-xorshift mix per word.
struct fp
{
  uint64_t a = 0x9e3779b97f4a7c15ULL, b = 0xc2b2ae3d27d4eb4fULL;
  void word (uint64_t w)
  {
    a = (a ^ w) * 0xff51afd7ed558ccdULL;
    a ^= a >> 32;
    b = (b + w) * 0x94d049bb133111ebULL;
    b ^= b >> 29;
  }
  void bytes (const void *p, size_t n)
  {
    const unsigned char *c = static_cast<const unsigned char *> (p);
    word (n);
    while (n >= 8)
      {
        uint64_t w;
        std::memcpy (&w, c, 8);
        word (w);
        c += 8;
        n -= 8;
      }
    if (n)
      {
        uint64_t w = 0;
        std::memcpy (&w, c, n);
        word (w);
      }
  }
  void str (const std::string &s) { bytes (s.data (), s.size ()); }
};

void walk (const octave_value &v, fp &h, int depth)
{
  if (depth > 64)
    error ("__vn_hash__: value nested deeper than 64 levels");
  builtin_type_t bt = v.builtin_type ();
  if (bt == btyp_unknown)
    h.str (v.class_name ());
  else
    h.word ((uint64_t) bt + 1000);
  dim_vector dv = v.dims ();
  for (int i = 0; i < dv.ndims (); i++)
    h.word ((uint64_t) dv(i));
  // fields in name order (the struct's own map): field order is no content
  if (v.isstruct () && dv.numel () == 1)
    {
      octave_scalar_map m = v.scalar_map_value ();
      for (auto p = m.begin (); p != m.end (); ++p)
        {
          h.str (p->first);
          walk (m.contents (p), h, depth + 1);
        }
    }
  else if (v.isstruct ())
    {
      octave_map m = v.map_value ();
      for (auto p = m.begin (); p != m.end (); ++p)
        {
          h.str (p->first);
          const Cell &c = m.contents (p);
          for (octave_idx_type i = 0; i < c.numel (); i++)
            walk (c(i), h, depth + 1);
        }
    }
  else if (v.iscell ())
    {
      Cell c = v.cell_value ();
      for (octave_idx_type i = 0; i < c.numel (); i++)
        walk (c(i), h, depth + 1);
    }
  else if (v.is_string () || v.is_char_matrix ())
    {
      charNDArray s = v.char_array_value ();
      h.bytes (s.data (), s.numel ());
    }
  else if (v.islogical ())
    {
      boolNDArray b = v.bool_array_value ();
      h.bytes (b.data (), b.numel () * sizeof (bool));
    }
  else if (v.isnumeric () && v.iscomplex ())
    {
      ComplexNDArray z = v.complex_array_value ();
      h.bytes (z.data (), z.numel () * sizeof (Complex));
    }
  else if (v.isnumeric () && v.is_scalar_type ())
    {
      double d = v.double_value ();
      h.bytes (&d, sizeof d);
    }
  else if (v.isnumeric ())
    {
      NDArray d = v.array_value ();
      h.bytes (d.data (), d.numel () * sizeof (double));
    }
  else
    {
      // anything else (function handles, objects): its printed form
      std::ostringstream os;
      v.print_raw (os, true);
      h.str (os.str ());
    }
}
}

DEFUN_DLD (__vn_hash__, args, ,
           "-*- texinfo -*-\n@deftypefn {} {@var{key} =} __vn_hash__ "
           "(@var{x})\nInternal: a 128-bit fingerprint of any value, as 32 "
           "hex characters.\n@end deftypefn")
{
  if (args.length () != 1)
    print_usage ();
  static std::vector<std::pair<octave_value, std::string>> held;
  const octave_base_value *rep = args(0).internal_rep ();
  for (const auto &e : held)
    if (e.first.internal_rep () == rep)
      return ovl (e.second);
  fp h;
  walk (args(0), h, 0);
  char key[33];
  snprintf (key, sizeof key, "%016llx%016llx", (unsigned long long) h.a,
            (unsigned long long) h.b);
  // the newest first; a value is held until four newer ones came
  held.insert (held.begin (), std::make_pair (args(0), std::string (key)));
  if (held.size () > 4)
    held.pop_back ();
  return ovl (std::string (key));
}

// res = __vn_assemble__ (tmpl, t, X, Y, states)
// Build a result struct from a template made once per network
// (inst/private/vn_compile.m, doc/internals.md section 7): res.t, one
// field per unit holding its columns, res.x, res.states and, when the
// template has them, res.units.  No name is looked up here: the template
// says which column of Y (or which held value) each field takes.
//   tmpl.names   1 x n unit names, in result order
//   tmpl.group   1 x n int32, 0-based index into tmpl.fields
//   tmpl.fields  cell of cellstr: the field names of each group
//   tmpl.src     per unit in order, one entry per field of its group:
//                k > 0 the k-th column of Y, k < 0 the held value
//                tmpl.const(-k) repeated down the times
//   tmpl.const   held values
//   tmpl.units   units of measure (struct), or [] for none
#include "vn_gateway.h"

static const char *FN = "vn_results";

DEFUN_DLD (__vn_assemble__, args, ,
           "-*- texinfo -*-\n@deftypefn {} {@var{res} =} __vn_assemble__ "
           "(@var{tmpl}, @var{t}, @var{X}, @var{Y}, @var{states})\nInternal: "
           "assemble a result struct from a template.\n@end deftypefn")
{
  if (args.length () != 5)
    print_usage ();
  octave_scalar_map tm = args(0).xscalar_map_value ("%s: template must be a "
                                                    "struct", FN);
  Cell names = vn_gw_field (tm, "names", FN).cell_value ();
  int32NDArray group = vn_gw_field (tm, "group", FN).int32_array_value ();
  Cell fields = vn_gw_field (tm, "fields", FN).cell_value ();
  NDArray src = vn_gw_field (tm, "src", FN).array_value ();
  NDArray cst = vn_gw_field (tm, "const", FN).array_value ();
  octave_value units = vn_gw_field (tm, "units", FN);
  Matrix Y = args(3).matrix_value ();
  ColumnVector t = args(1).column_vector_value ();
  octave_idx_type nt = t.numel (), ny = Y.columns ();
  if (Y.rows () != nt && ny > 0)
    error ("%s: Y has %d rows for %d times (internal error)", FN,
           (int) Y.rows (), (int) nt);
  octave_idx_type n = names.numel ();
  if (group.numel () != n)
    error ("%s: template groups do not match its units (internal error)", FN);
  std::vector<octave_fields> keys (fields.numel ());
  for (octave_idx_type g = 0; g < fields.numel (); g++)
    keys[g] = octave_fields (fields(g).cellstr_value ());
  octave_scalar_map res;
  res.assign ("t", t);
  octave_idx_type pos = 0;
  const double *yd = Y.data ();
  for (octave_idx_type i = 0; i < n; i++)
    {
      int g = group(i).value ();
      if (g < 0 || g >= (int) keys.size ())
        error ("%s: template group %d out of range (internal error)", FN, g);
      octave_scalar_map m (keys[g]);
      octave_idx_type nf = keys[g].nfields ();
      if (pos + nf > src.numel ())
        error ("%s: template sources run out (internal error)", FN);
      for (octave_idx_type f = 0; f < nf; f++)
        {
          double s = src(pos + f);
          ColumnVector c (nt);
          if (s >= 1 && s <= ny)
            std::copy (yd + (octave_idx_type) (s - 1) * nt,
                       yd + (octave_idx_type) s * nt, c.fortran_vec ());
          else if (s <= -1 && -s <= cst.numel ())
            c.fill (cst((octave_idx_type) (-s - 1)));
          else
            error ("%s: template source %g out of range (internal error)",
                   FN, s);
          m.contents (f) = c;
        }
      pos += nf;
      res.assign (names(i).string_value (), m);
    }
  res.assign ("x", args(2));
  res.assign ("states", args(4));
  if (units.isstruct ())
    res.assign ("units", units);
  return ovl (res);
}

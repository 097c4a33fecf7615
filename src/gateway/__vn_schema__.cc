// __vn_schema__ (): the core's registry of unit kinds, their parameters
// (names, defaults, ranges, units of measure, input flags) and outputs.
#include "vn_gateway.h"

DEFUN_DLD (__vn_schema__, , ,
           "-*- texinfo -*-\n@deftypefn {} {@var{s} =} __vn_schema__ ()\n"
           "Internal: the compiled core's unit kinds and parameters.\n"
           "@end deftypefn")
{
  octave_scalar_map s;
  int nk = vn_kind_count ();
  Cell kinds (1, nk);
  for (int k = 0; k < nk; k++)
    {
      kinds(k) = vn_kind_name (k);
      int np = vn_kind_npar (k), no = vn_kind_nout (k);
      Cell pn (1, np), pu (1, np), on (1, no), ou (1, no);
      Matrix def (1, np), lo (1, np), hi (1, np);
      boolNDArray inp (dim_vector (1, np)), code (dim_vector (1, np));
      for (int i = 0; i < np; i++)
        {
          const vn_param_info *pi = vn_kind_param (k, i);
          pn(i) = pi->name;
          pu(i) = pi->unit;
          def(i) = pi->def;
          lo(i) = pi->lo;
          hi(i) = pi->hi;
          inp(i) = (pi->flags & VN_P_INPUT) != 0;
          code(i) = (pi->flags & VN_P_CODE) != 0;
        }
      for (int i = 0; i < no; i++)
        {
          on(i) = vn_kind_out_name (k, i);
          ou(i) = vn_kind_out_unit (k, i);
        }
      octave_scalar_map m;
      m.assign ("params", pn);
      m.assign ("defaults", def);
      m.assign ("lo", lo);
      m.assign ("hi", hi);
      m.assign ("units", pu);
      m.assign ("isinput", inp);
      m.assign ("iscode", code);
      m.assign ("outputs", on);
      m.assign ("ounits", ou);
      int base, per;
      vn_kind_nout_rule (k, &base, &per);
      m.assign ("nout_base", base);
      m.assign ("nout_species", per);
      s.assign (vn_kind_name (k), m);
    }
  s.assign ("kinds", kinds);
  s.assign ("npmax", vn_npmax ());
  return ovl (s);
}

## -*- texinfo -*-
## @deftypefn {} {[@var{opt}, @var{taken}] =} integrator_option (@var{opt}, @var{fn}, @var{name}, @var{val})
## Take one of the integrator options that every simulating command
## shares (@qcode{"reltol"}, @qcode{"abstol"}, @qcode{"maxstep"},
## @qcode{"maxsteps"}, @qcode{"solver"}) into @var{opt}, checked, with
## messages under the command name @var{fn}.  @var{taken} is false when
## @var{name} is none of them, so the caller goes on with its own.
##
## Allowed ranges (closed):
## @table @asis
## @item reltol
## [1e-12, 0.1]: below, double precision cannot deliver it; above, a
## result is not worth an engineer's time.
## @item abstol
## [1e-18, 1e3], in the states' own units (m3, m3 K, ...).
## @item maxstep
## [1e-6, 1e9] s.
## @item maxsteps
## a whole number in [1, 1e9] (steps between two outputs).
## @end table
## @end deftypefn

function [opt, taken] = integrator_option (opt, fn, name, val)
  taken = true;
  switch (name)
    case {"reltol", "abstol", "maxstep", "maxsteps"}
      [lo, hi, uom] = option_range (name);
      num = isnumeric (val) && isreal (val) && isscalar (val);
      ok = num && val >= lo && val <= hi;
      if (ok && strcmp (name, "maxsteps"))
        ok = val == fix (val);
      endif
      if (! ok)
        what = ifelse (strcmp (name, "maxsteps"), "be a whole number in",
                      "lie in");
        error ("Octave:invalid-input-arg",
               "%s: option \"%s\" must %s [%.6g, %.6g]%s, got %s", fn,
               name, what, lo, hi, uom, build_value_str (val));
      endif
      opt.(name) = double (val);
    case "solver"
      j = find (strcmpi ({"auto", "dense", "klu"}, val));
      if (! ischar (val) || isempty (j))
        error ("Octave:invalid-input-arg",
               "%s: option \"solver\" must be \"auto\", \"dense\" or \"klu\", got %s",
               fn, build_value_str (val));
      endif
      opt.solver = j - 1;
    otherwise
      taken = false;
  endswitch
endfunction

## The closed range allowed for a numeric integrator option, and its unit.
function [lo, hi, uom] = option_range (name)
  switch (name)
    case "reltol"
      lo = 1e-12; hi = 0.1; uom = "";
    case "abstol"
      lo = 1e-18; hi = 1e3; uom = " (units of each state)";
    case "maxstep"
      lo = 1e-6; hi = 1e9; uom = " (s)";
    case "maxsteps"
      lo = 1; hi = 1e9; uom = "";
  endswitch
endfunction

%!test
%! [o, t] = integrator_option (struct (), "vn_x", "solver", "KLU");
%! assert (t && o.solver == 2);
%! [o, t] = integrator_option (struct (), "vn_x", "dt", 5);
%! assert (! t && isempty (fieldnames (o)));
%! o = integrator_option (struct (), "vn_x", "reltol", 1e-12);
%! o = integrator_option (o, "vn_x", "reltol", 0.1);
%! o = integrator_option (o, "vn_x", "abstol", 1e-16);
%! o = integrator_option (o, "vn_x", "maxsteps", 1e9);
%! o = integrator_option (o, "vn_x", "maxstep", 1e-3);
%! assert ([o.reltol, o.abstol, o.maxsteps, o.maxstep], [0.1 1e-16 1e9 1e-3]);
%!error <vn_x: option "reltol" must lie in \[1e-12, 0.1\], got -1> integrator_option (struct (), "vn_x", "reltol", -1)
%!error <vn_x: option "reltol" must lie in \[1e-12, 0.1\], got 2> integrator_option (struct (), "vn_x", "reltol", 2)
%!error <vn_x: option "reltol" must lie in \[1e-12, 0.1\], got 1e-15> integrator_option (struct (), "vn_x", "reltol", 1e-15)
%!error <vn_x: option "reltol" must lie in \[1e-12, 0.1\], got NaN> integrator_option (struct (), "vn_x", "reltol", NaN)
%!error <vn_x: option "reltol" must lie in \[1e-12, 0.1\], got "1e-6"> integrator_option (struct (), "vn_x", "reltol", "1e-6")
%!error <vn_x: option "abstol" must lie in \[1e-18, 1000\] \(units of each state\), got 5000> integrator_option (struct (), "vn_x", "abstol", 5e3)
%!error <vn_x: option "maxstep" must lie in \[1e-06, 1e\+09\] \(s\), got Inf> integrator_option (struct (), "vn_x", "maxstep", Inf)
%!error <vn_x: option "maxsteps" must be a whole number in \[1, 1e\+09\], got 1.5> integrator_option (struct (), "vn_x", "maxsteps", 1.5)
%!error <vn_x: option "maxsteps" must be a whole number in \[1, 1e\+09\], got 1e\+12> integrator_option (struct (), "vn_x", "maxsteps", 1e12)
%!error <vn_x: option "solver" must be "auto", "dense" or "klu", got "lu"> integrator_option (struct (), "vn_x", "solver", "lu")

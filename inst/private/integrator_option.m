## -*- texinfo -*-
## @deftypefn {} {[@var{opt}, @var{taken}] =} integrator_option (@var{opt}, @var{fn}, @var{name}, @var{val})
## Take one of the integrator options that every simulating command
## shares (@qcode{"reltol"}, @qcode{"abstol"}, @qcode{"maxstep"},
## @qcode{"maxsteps"}, @qcode{"solver"}) into @var{opt}, checked, with
## messages under the command name @var{fn}.  @var{taken} is false when
## @var{name} is none of them, so the caller goes on with its own.
## @end deftypefn

function [opt, taken] = integrator_option (opt, fn, name, val)
  taken = true;
  switch (name)
    case {"reltol", "abstol", "maxstep"}
      if (! (isscalar (val) && isreal (val) && val > 0 && isfinite (val)))
        error ("Octave:invalid-input-arg",
               "%s: option \"%s\" must be a positive number", fn, name);
      endif
      opt.(name) = val;
    case "maxsteps"
      if (! (isscalar (val) && val >= 1 && val == fix (val)))
        error ("Octave:invalid-input-arg",
               "%s: option \"maxsteps\" must be a positive integer", fn);
      endif
      opt.maxsteps = val;
    case "solver"
      j = find (strcmpi ({"auto", "dense", "klu"}, val));
      if (! ischar (val) || isempty (j))
        error ("Octave:invalid-input-arg",
               "%s: option \"solver\" must be \"auto\", \"dense\" or \"klu\"", fn);
      endif
      opt.solver = j - 1;
    otherwise
      taken = false;
  endswitch
endfunction

%!test
%! [o, t] = integrator_option (struct (), "vn_x", "solver", "KLU");
%! assert (t && o.solver == 2);
%! [o, t] = integrator_option (struct (), "vn_x", "dt", 5);
%! assert (! t && isempty (fieldnames (o)));
%!error <vn_x: option "reltol" must be a positive number> integrator_option (struct (), "vn_x", "reltol", -1)
%!error <vn_x: option "maxsteps" must be a positive integer> integrator_option (struct (), "vn_x", "maxsteps", 1.5)

## -*- texinfo -*-
## @deftypefn {} {@var{opt} =} fit_options (@var{args}, @var{np})
## Parse the options of vn_fit for @var{np} parameters.
## @end deftypefn

function opt = fit_options (args, np)
  opt = struct ("lower", zeros (np, 1), "upper", Inf (np, 1), "maxiter", 50,
                "tol", 1e-6, "reltol", 1e-8, "abstol", 1e-10,
                "verbose", false);
  [names, vals] = vn_option_pairs (args, "vn_fit");
  for i = 1:numel (names)
    name = names{i};
    val = vals{i};
    switch (lower (name))
      case {"lower", "upper"}
        if (! (isnumeric (val) && isreal (val)
               && (isscalar (val) || numel (val) == np)))
          error ("Octave:invalid-input-arg",
                 "vn_fit: option \"%s\" must be a scalar or %d bounds, one per parameter",
                 lower (name), np);
        endif
        opt.(lower (name)) = double (val(:)) .* ones (np, 1);
      case "maxiter"
        if (! (isscalar (val) && isreal (val) && val >= 1 && val == fix (val)))
          error ("Octave:invalid-input-arg",
                 "vn_fit: option \"maxiter\" must be a positive integer");
        endif
        opt.maxiter = val;
      case {"tol", "reltol", "abstol"}
        if (! (isscalar (val) && isreal (val) && val > 0 && val < 1))
          error ("Octave:invalid-input-arg",
                 "vn_fit: option \"%s\" must lie in (0, 1)", lower (name));
        endif
        opt.(lower (name)) = val;
      case "verbose"
        if (! (isscalar (val) && (islogical (val) || isnumeric (val))))
          error ("Octave:invalid-input-arg",
                 "vn_fit: option \"verbose\" must be true or false");
        endif
        opt.verbose = logical (val);
      otherwise
        error ("Octave:invalid-input-arg",
               "vn_fit: unknown option \"%s\"; allowed: lower, upper, maxiter, tol, reltol, abstol, verbose",
               name);
    endswitch
  endfor
  if (any (opt.lower < 0) || any (opt.upper <= opt.lower))
    error ("Octave:invalid-input-arg",
           "vn_fit: bounds must satisfy 0 <= lower < upper (parameters are fitted as logarithms, so they stay positive)");
  endif
endfunction

## -*- texinfo -*-
## @deftypefn {} {@var{opt} =} fit_options (@var{args}, @var{np})
## Parse the options of vn_fit for the parameters @var{params}.
## @end deftypefn

function opt = fit_options (args, params)
  np = numel (params);
  opt = struct ("lower", -Inf (np, 1), "upper", Inf (np, 1),
                "bounds", NaN (np, 2), "starts", 1, "maxiter", 50,
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
      case "bounds"
        opt.bounds = bounds (val, params);
      case "starts"
        if (! (isscalar (val) && isreal (val) && val >= 1 && val == fix (val)
               && val <= 10000))
          error ("Octave:invalid-input-arg",
                 "vn_fit: option \"starts\" must be a whole number of starts in [1, 10000]");
        endif
        opt.starts = double (val);
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
               "vn_fit: unknown option \"%s\"; allowed: bounds, lower, upper, starts, maxiter, tol, reltol, abstol, verbose",
               name);
    endswitch
  endfor
  b = opt.bounds;
  has = ! isnan (b(:, 1));
  opt.lower(has) = max (opt.lower(has), b(has, 1));
  opt.upper(has) = min (opt.upper(has), b(has, 2));
  if (any (isnan (opt.lower) | isnan (opt.upper)) || any (opt.upper <= opt.lower))
    error ("Octave:invalid-input-arg",
           "vn_fit: bounds must satisfy lower < upper for every parameter");
  endif
endfunction

## "bounds": an np x 2 matrix [low high] (NaN rows: none), or a cell
## {NAME, [low high], ...} naming some of the parameters.
function b = bounds (val, params)
  np = numel (params);
  b = NaN (np, 2);
  if (isnumeric (val) && isreal (val) && isequal (size (val), [np 2]))
    b = double (val);
  elseif (iscell (val) && mod (numel (val), 2) == 0)
    for i = 1:2:numel (val)
      j = [];
      if (ischar (val{i}))
        j = find (strcmp (params, val{i}), 1);
      endif
      lh = val{i+1};
      if (isempty (j) || ! (isnumeric (lh) && isreal (lh) && numel (lh) == 2))
        error ("Octave:invalid-input-arg",
               "vn_fit: option \"bounds\": give {NAME, [LOW HIGH], ...} with NAME one of the fitted parameters (%s)",
               strjoin (params, ", "));
      endif
      b(j, :) = double (lh(:).');
    endfor
  else
    error ("Octave:invalid-input-arg",
           "vn_fit: option \"bounds\" must be a %dx2 matrix [LOW HIGH] (a row per parameter) or {NAME, [LOW HIGH], ...}",
           np);
  endif
  bad = find (xor (isnan (b(:, 1)), isnan (b(:, 2))) | b(:, 1) >= b(:, 2), 1);
  if (! isempty (bad))
    error ("Octave:invalid-input-arg",
           "vn_fit: option \"bounds\" for %s must be [LOW HIGH] with LOW < HIGH, got [%g %g]",
           params{bad}, b(bad, 1), b(bad, 2));
  endif
endfunction

## -*- texinfo -*-
## @deftypefn {} {@var{P} =} fit_params (@var{net}, @var{params}, @var{ex}, @var{opt})
## Resolve the parameters vn_fit is asked to fit.  Each is one of
## @table @asis
## @item @qcode{"UNIT.PARAM"}
## a numeric parameter of a unit, shared by every test;
## @item @qcode{"UNIT.PARAM@@K"}
## the same, for test K only (K a number or the test's name): a tank's
## starting level in each of several tests;
## @item @qcode{"QUANTITY:offset"}, @qcode{"QUANTITY:scale"}
## the sensor of a measured quantity, shared by every test that measures
## it: measured = scale * model + offset.
## @end table
## Returns a struct array: @code{name}, @code{type} ("unit", "offset",
## "scale"), @code{q} (vn_quantity of a unit parameter), @code{quantity}
## (measured by a sensor), @code{exper} (0 for all tests), @code{space}
## ("log" or "linear"), @code{value} (start), @code{lo}, @code{hi} (the
## bounds of the fit: schema range and the options), @code{slo},
## @code{shi} (the box "starts" are spread in) and @code{maxstep} (largest
## step per iteration in the fit's space).
##
## A unit parameter is fitted as its logarithm when it is a positive
## physical parameter: its schema range starts above zero, or at zero for
## anything but a length, volume, temperature or concentration (levels and
## elevations may be zero, so they are fitted as they are).  The scale of
## a sensor is fitted as a logarithm, its offset as it is.
## @end deftypefn

function P = fit_params (net, params, ex, opt)
  s = vn_schema ();
  np = numel (params);
  P = struct ("name", params, "type", "unit", "q", [], "quantity", "",
              "exper", 0, "space", "log", "value", 0, "lo", -Inf, "hi", Inf,
              "slo", NaN, "shi", NaN, "maxstep", 1);
  for i = 1:np
    name = params{i};
    colon = find (name == ":", 1);
    if (! isempty (colon))
      P(i) = sensor (P(i), name, colon, ex);
    else
      P(i) = unit_param (P(i), net, s, name, ex);
    endif
    ## bounds from the options, then the box "starts" are spread in
    lo = max (P(i).lo, opt.lower(i));
    hi = min (P(i).hi, opt.upper(i));
    if (strcmp (P(i).space, "log"))
      lo = max (lo, realmin);
    endif
    if (! (lo < hi))
      error ("Octave:invalid-input-arg",
             "vn_fit: %s: the bounds [%g, %g] leave no room (its allowed range is [%g, %g])",
             name, opt.lower(i), opt.upper(i), P(i).lo, P(i).hi);
    endif
    P(i).lo = lo;
    P(i).hi = hi;
    P(i).value = min (max (P(i).value, lo), hi);
    if (all (isfinite (opt.bounds(i, :))))
      P(i).slo = max (opt.bounds(i, 1), lo);
      P(i).shi = min (opt.bounds(i, 2), hi);
    else
      P(i).slo = max (P(i).slo, lo);
      P(i).shi = min (P(i).shi, hi);
    endif
    if (strcmp (P(i).space, "linear"))
      P(i).maxstep = (P(i).shi - P(i).slo) / 2;
    endif
  endfor
  seen = arrayfun (@(p) sprintf ("%s@%d", strtok (p.name, "@"), p.exper), P,
                   "uniformoutput", false);
  base = cellfun (@(n) strtok (n, "@"), params, "uniformoutput", false);
  for i = 1:np
    if (P(i).exper > 0 && any (strcmp (base, base{i}) & [P.exper] == 0))
      error ("Octave:invalid-input-arg",
             "vn_fit: %s is fitted for all tests and %s for one; name it one way",
             base{i}, params{i});
    endif
  endfor
  if (numel (unique (seen)) < np)
    error ("Octave:invalid-input-arg",
           "vn_fit: PARAMS names a parameter twice: %s", strjoin (params, ", "));
  endif
endfunction

## "QUANTITY:offset" or "QUANTITY:scale".
function p = sensor (p, name, colon, ex)
  qn = name(1:colon-1);
  what = name(colon+1:end);
  if (! any (strcmp (what, {"offset", "scale"})))
    error ("Octave:invalid-input-arg",
           "vn_fit: %s: a sensor parameter is \"QUANTITY:offset\" or \"QUANTITY:scale\", got \":%s\"",
           name, what);
  endif
  y = [];
  for k = 1:numel (ex)
    j = find (strcmp (ex(k).names, qn), 1);
    if (! isempty (j))
      v = ex(k).data(:, j);
      if (isfield (ex, "censored") && ! isempty (ex(k).censored))
        v(ex(k).censored(:, j)) = NaN;
      endif
      y = [y; v(! isnan (v))];
    endif
  endfor
  if (isempty (y))
    error ("Octave:invalid-input-arg",
           "vn_fit: %s: no test measures \"%s\", so its sensor cannot be fitted",
           name, qn);
  endif
  p.type = what;
  p.quantity = qn;
  if (strcmp (what, "offset"))
    ## offsets are fitted as they are; starts within 10 % of the largest
    ## reading either side of zero
    p.space = "linear";
    p.value = 0;
    w = 0.1 * max ([abs(y); eps]);
    p.slo = -w;
    p.shi = w;
  else
    ## a gain error: positive, fitted as a logarithm; starts within a
    ## factor of 2 of 1
    p.space = "log";
    p.value = 1;
    p.lo = 1e-6;
    p.hi = 1e6;
    p.slo = 0.5;
    p.shi = 2;
  endif
endfunction

## "UNIT.PARAM" or "UNIT.PARAM@K".
function p = unit_param (p, net, s, name, ex)
  at = find (name == "@", 1);
  if (! isempty (at))
    which = name(at+1:end);
    name = name(1:at-1);
    k = str2double (which);
    if (isnan (k))
      k = find (strcmp ({ex.name}, which), 1);
    endif
    if (! (isscalar (k) && k == fix (k) && k >= 1 && k <= numel (ex)))
      error ("Octave:invalid-input-arg",
             "vn_fit: %s@%s: after \"@\" give a test number 1..%d or the name of a test",
             name, which, numel (ex));
    endif
    p.exper = k;
  endif
  q = vn_quantity (net, name, "param", "vn_fit");
  kind = s.(q.kind);
  un = net.units(q.unit);
  if (isfield (un.par, q.var))
    v = un.par.(q.var);
  else
    v = kind.defaults(q.slot + 1);
  endif
  if (! (isnumeric (v) && isscalar (v) && isfinite (v)))
    error ("Octave:invalid-input-arg",
           "vn_fit: %s \"%s\" has no value for \"%s\"; give a starting value on the network",
           q.kind, q.uname, q.var);
  endif
  lo = kind.lo(q.slot + 1);
  hi = kind.hi(q.slot + 1);
  uom = kind.units{q.slot + 1};
  p.type = "unit";
  p.q = q;
  p.value = v;
  p.lo = lo;
  p.hi = hi;
  if (lo > 0 || (lo == 0 && ! any (strcmp (uom, {"m", "m3", "degC", "conc"}))))
    p.space = "log";
    if (! (v > 0))
      error ("Octave:invalid-input-arg",
             "vn_fit: %s: starting value %g is not positive; vn_fit fits this parameter as a logarithm",
             p.name, v);
    endif
    ## starts within a factor of 10 either side
    p.slo = v / 10;
    p.shi = v * 10;
  else
    ## levels, elevations, temperatures: from zero (or the start less its
    ## size) to twice the start
    p.space = "linear";
    w = max (abs (v), 1);
    p.slo = ifelse (v > 0, 0, v - w);
    p.shi = ifelse (v > 0, 2 * v, v + w);
  endif
endfunction

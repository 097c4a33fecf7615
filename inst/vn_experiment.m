## -*- texinfo -*-
## @deftypefn  {} {@var{ex} =} vn_experiment (@var{t}, @var{name}, @var{data}, @dots{})
## @deftypefnx {} {@var{ex} =} vn_experiment (@dots{}, @var{option}, @var{value}, @dots{})
## Record one plant test (a step test, a bump test) for @code{vn_fit}.
##
## @var{t} holds the sample times (s), increasing; sampling may be uneven.
## Each quantity @var{name} (@qcode{"UNIT.VARIABLE"}) is followed by its
## samples @var{data}, one per time:
##
## @example
## ex = vn_experiment (t, "F1.flow", u, "T2.level", y)
## ex = vn_experiment (log.t, "F1.flow", log.FT101, "T2.level", log.LT101, ...
##                     "span", @{"T2.level", [0 3]@}, "range", @{"T2.level", [0 3]@})
## @end example
##
## Whether a quantity is an input that drove the test (@qcode{"F1.flow"},
## @qcode{"LV1.opening"}) or a measured output (@qcode{"T2.level"},
## @qcode{"O1.flow"}) is decided by @code{vn_fit} against the network: an
## input parameter of its unit is an input, anything else must be an
## output of its unit.  NaN readings (gaps, @qcode{"Bad"} entries of a
## historian export) take no part in a fit.  A NaN in an input is filled
## from its neighbours by the input's intersample rule (below) and counted
## in the fit's report.  @var{t} may hold no NaN.
##
## Options:
## @table @asis
## @item @qcode{"span"}
## @code{@{QUANTITY, [LOW HIGH], @dots{}@}}: the data of QUANTITY are
## fractions (0..1) of a transmitter span from LOW to HIGH in SI units
## (e.g. @code{@{"T2.level", [0 3]@}} for a level transmitter of 0..3 m
## whose readings are 0..100 %, read as 0..1); they are converted to
## LOW + fraction * (HIGH - LOW).
## @item @qcode{"range"}
## @code{@{QUANTITY, [LOW HIGH], @dots{}@}}: the limits a sensor can read
## (SI units, after any span).  Readings at or past a limit (within 1e-9 of
## the range) are censored: they stay in @code{ex.data} and are marked in
## @code{ex.censored} and on plots, but take no part in a fit, since a
## saturated transmitter says only that the value lies beyond its limit.
## Use -Inf or Inf for a side without a limit.  Only measured outputs may
## be censored.
## @item @qcode{"hold"}
## how inputs vary between samples: @qcode{"auto"} (default), @code{true}
## (each input holds its value until the next sample) or @code{false}
## (inputs vary linearly between samples).  @qcode{"auto"} decides per
## input: it is held when its sample-to-sample changes are isolated, that
## is when no two consecutive changes go the same way (a step test, or a
## bump or pulse test, whose value jumps and then stays; a one-sample pulse
## goes up and then down), and interpolated linearly otherwise (a ramp, or
## a measured, noisy signal, moves the same way at consecutive samples).
## Changes below 1e-9 of the input's largest magnitude do not count; a
## constant input is held.  @code{vn_fit} reports the rule each input
## used.
## @item @qcode{"sigma"}
## standard deviation of the measurement noise, one per measured output in
## the order given (a scalar applies to all); residuals are divided by it.
## @item @qcode{"weights"}
## instead of @qcode{"sigma"}: a weight per output (weight = 1/sigma^2).
## @item @qcode{"start"}
## the state the test starts from: @qcode{"steady"} (default; the model's
## steady state at the first input values), @qcode{"measured"} (tank levels
## from the first measured level of each tank, other tanks as declared; a
## tank whose first reading is NaN or censored starts as declared) or
## @qcode{"declared"} (the levels declared on the network; fit them as
## unknown starting levels with @code{vn_fit}).
## @item @qcode{"name"}
## a label for plots and reports.
## @end table
##
## The result has fields @code{t} (column), @code{names} (cellstr),
## @code{data} (times x names, SI), @code{censored} (logical, times x
## names), @code{span} and @code{range} (names x 2, NaN and [-Inf Inf]
## where none is given), @code{sigma}, @code{weights}, @code{hold},
## @code{start} and @code{name}.  Several tests form a struct array
## @code{[ex1, ex2]}.
##
## A test recorded on a plant describes the plant only as well as its
## instruments: check transmitter ranges and zero errors before a fitted
## model is used to judge a plant or tune a live loop.
## @seealso{vn_fit, vn_validate, vn_fopdt, vn_plot}
## @end deftypefn

function ex = vn_experiment (t, varargin)
  if (nargin < 3)
    print_usage ();
  endif
  if (! (isnumeric (t) && isreal (t) && isvector (t)))
    error ("Octave:invalid-input-arg",
           "vn_experiment: T must be a real vector of sample times (s)");
  endif
  t = double (t(:));
  if (any (! isfinite (t)))
    error ("Octave:invalid-input-arg",
           "vn_experiment: T holds %d NaN or Inf value(s); every sample needs a finite time",
           sum (! isfinite (t)));
  endif
  if (numel (t) < 2 || any (diff (t) <= 0))
    error ("Octave:invalid-input-arg",
           "vn_experiment: T must hold two or more strictly increasing times");
  endif
  nt = numel (t);
  ex = struct ("t", t, "names", {{}}, "data", zeros (nt, 0),
               "censored", false (nt, 0), "span", zeros (0, 2),
               "range", zeros (0, 2), "sigma", [], "weights", [],
               "hold", "auto", "start", "steady", "name", "");
  pending = struct ("span", {{}}, "range", {{}});
  args = varargin;
  if (mod (numel (args), 2) != 0)
    error ("Octave:invalid-input-arg",
           "vn_experiment: quantities and options come in name/value pairs");
  endif
  for i = 1:2:numel (args)
    name = args{i};
    val = args{i+1};
    if (! (ischar (name) && isrow (name)))
      error ("Octave:invalid-input-arg",
             "vn_experiment: argument %d must be a quantity \"UNIT.VARIABLE\" or an option name",
             i + 1);
    endif
    if (any (name == "."))
      ex = add_quantity (ex, name, val);
    else
      [ex, pending] = set_option (ex, pending, name, val);
    endif
  endfor
  if (isempty (ex.names))
    error ("Octave:invalid-input-arg",
           "vn_experiment: no quantity given; name the inputs and outputs, e.g. vn_experiment (t, \"F1.flow\", u, \"T2.level\", y)");
  endif
  nq = numel (ex.names);
  ex.span = NaN (nq, 2);
  ex.range = repmat ([-Inf, Inf], nq, 1);
  ## spans first: a range is given in engineering units
  for i = 1:2:numel (pending.span)
    j = column (ex, pending.span{i}, "span");
    lh = pending.span{i+1};
    ex.span(j, :) = lh;
    ex.data(:, j) = lh(1) + ex.data(:, j) * (lh(2) - lh(1));
  endfor
  ex.censored = false (nt, nq);
  for i = 1:2:numel (pending.range)
    j = column (ex, pending.range{i}, "range");
    lh = pending.range{i+1};
    ex.range(j, :) = lh;
    fin = abs (lh(isfinite (lh)));
    tol = 1e-9 * max ([fin, diff(lh)(isfinite (diff (lh))), realmin]);
    y = ex.data(:, j);
    ex.censored(:, j) = ! isnan (y) & (y <= lh(1) + tol | y >= lh(2) - tol);
  endfor
endfunction

## Column of a quantity named by a "span" or "range" option.
function j = column (ex, name, opt)
  j = find (strcmp (ex.names, name), 1);
  if (isempty (j))
    error ("Octave:invalid-input-arg",
           "vn_experiment: option \"%s\" names \"%s\", which the test does not record; recorded: %s",
           opt, name, strjoin (ex.names, ", "));
  endif
endfunction

## Check a {QUANTITY, [LOW HIGH], ...} list of "span" or "range".
function c = limits_list (val, opt)
  ok = iscell (val) && ! isempty (val) && mod (numel (val), 2) == 0;
  if (ok)
    c = val(:).';
    for i = 1:2:numel (c)
      lh = c{i+1};
      ok = (ok && ischar (c{i}) && any (c{i} == ".") && isnumeric (lh)
            && isreal (lh) && numel (lh) == 2 && ! any (isnan (lh)));
      if (ok)
        lh = double (lh(:).');
        ok = lh(1) < lh(2);
        if (strcmp (opt, "span"))
          ok = ok && all (isfinite (lh));
        endif
        c{i+1} = lh;
      endif
    endfor
  endif
  if (! ok)
    if (strcmp (opt, "span"))
      what = "finite LOW < HIGH";
    else
      what = "LOW < HIGH (-Inf or Inf for no limit)";
    endif
    error ("Octave:invalid-input-arg",
           "vn_experiment: option \"%s\" must be {QUANTITY, [LOW HIGH], ...} with %s, e.g. {\"T2.level\", [0 3]}",
           opt, what);
  endif
endfunction

function ex = add_quantity (ex, name, val)
  nt = numel (ex.t);
  if (any (strcmp (ex.names, name)))
    error ("Octave:invalid-input-arg",
           "vn_experiment: quantity \"%s\" is given twice", name);
  endif
  if (! (isnumeric (val) && isreal (val) && isvector (val)))
    error ("Octave:invalid-input-arg",
           "vn_experiment: data of \"%s\" must be a real vector", name);
  endif
  if (numel (val) != nt)
    error ("Octave:invalid-input-arg",
           "vn_experiment: \"%s\" has %d samples but T has %d times",
           name, numel (val), nt);
  endif
  if (all (isnan (val)))
    error ("Octave:invalid-input-arg",
           "vn_experiment: \"%s\" holds only NaN; give at least one sample",
           name);
  endif
  if (any (isinf (val)))
    error ("Octave:invalid-input-arg",
           "vn_experiment: \"%s\" holds Inf; only finite values or NaN (a gap) are allowed",
           name);
  endif
  ex.names{end+1} = name;
  ex.data(:, end+1) = double (val(:));
endfunction

function [ex, pending] = set_option (ex, pending, name, val)
  switch (lower (name))
    case {"span", "range"}
      c = limits_list (val, lower (name));
      pending.(lower (name)) = [pending.(lower (name)), c];
    case {"sigma", "weights"}
      if (! (isnumeric (val) && isreal (val) && isvector (val)
             && all (val > 0) && all (isfinite (val))))
        error ("Octave:invalid-input-arg",
               "vn_experiment: option \"%s\" must be positive finite numbers, one per measured output",
               lower (name));
      endif
      ex.(lower (name)) = double (val(:).');
      if (! isempty (ex.sigma) && ! isempty (ex.weights))
        error ("Octave:invalid-input-arg",
               "vn_experiment: give either \"sigma\" or \"weights\", not both");
      endif
    case "hold"
      if (ischar (val) && strcmpi (val, "auto"))
        ex.hold = "auto";
      elseif (isscalar (val) && (islogical (val) || isnumeric (val))
              && any (val == [0 1]))
        ex.hold = logical (val);
      else
        error ("Octave:invalid-input-arg",
               "vn_experiment: option \"hold\" must be \"auto\", true or false");
      endif
    case "start"
      allowed = {"steady", "measured", "declared"};
      if (! (ischar (val) && any (strcmpi (allowed, val))))
        error ("Octave:invalid-input-arg",
               "vn_experiment: option \"start\" must be \"steady\", \"measured\" or \"declared\", got %s",
               shown (val));
      endif
      ex.start = lower (val);
    case "name"
      if (! ischar (val))
        error ("Octave:invalid-input-arg",
               "vn_experiment: option \"name\" must be a string");
      endif
      ex.name = val;
    otherwise
      error ("Octave:invalid-input-arg",
             "vn_experiment: unknown option \"%s\"; allowed: span, range, hold, sigma, weights, start, name, or a quantity \"UNIT.VARIABLE\"",
             name);
  endswitch
endfunction

function s = shown (v)
  if (ischar (v))
    s = ["\"" v "\""];
  elseif (isnumeric (v) && isscalar (v))
    s = num2str (v);
  else
    s = sprintf ("a %s", class (v));
  endif
endfunction

%!demo
%! ## Invented data: a feed step recorded at uneven times, one sample lost
%! t = [0 30 55 90 120 160 200 260 330 400];
%! u = [4 4 4 6 6 6 6 6 6 6] * 1e-3;        # m3/s, stepped at 90 s
%! y = [1.00 1.00 1.01 1.02 NaN 1.08 1.12 1.17 1.22 1.26];
%! ex = vn_experiment (t, "F1.flow", u, "T1.level", y, "hold", true,
%!                     "sigma", 0.005, "name", "feed step (invented)")
%! ## a second test joins the first as a struct array for vn_fit
%! both = [ex, vn_experiment(t, "F1.flow", u, "T1.level", y)];
%! size (both)

%!test
%! t = (0:10:100).';
%! ex = vn_experiment (t, "F1.flow", 0.01 * ones (11, 1), "T2.level",
%!                     [1; NaN; (1.1:0.1:1.9).'], "sigma", 0.005,
%!                     "name", "step 1");
%! assert (ex.names, {"F1.flow", "T2.level"});
%! assert (size (ex.data), [11 2]);
%! assert (ex.data(3, 2), 1.1, 1e-12);
%! assert (isnan (ex.data(2, 2)));
%! assert (ex.sigma, 0.005);
%! assert (ex.hold, "auto");
%! assert (ex.start, "steady");
%! assert (ex.censored, false (11, 2));
%! assert (ex.name, "step 1");

%!test
%! ## uneven sampling, row vectors, hold and start
%! ex = vn_experiment ([0 1 3 7], "F1.flow", [1 1 2 2], "T1.level",
%!                     [0.5 0.6 0.8 1.1], "hold", true, "start", "Measured");
%! assert (ex.t, [0; 1; 3; 7]);
%! assert (ex.data(:, 1), [1; 1; 2; 2]);
%! assert (ex.hold, true);
%! assert (ex.start, "measured");

%!test
%! ## two tests form a struct array
%! a = vn_experiment (0:2, "F1.flow", [1 1 1], "T1.level", [1 2 3]);
%! b = vn_experiment (0:3, "F1.flow", [1 1 1 1], "T1.level", [1 2 3 4]);
%! ex = [a, b];
%! assert (numel (ex), 2);
%! assert (numel (ex(2).t), 4);

%!error <3 samples but T has 4> vn_experiment (0:3, "F1.flow", [1 2 3])
%!error <T holds 1 NaN> vn_experiment ([0 NaN 2], "F1.flow", [1 2 3])
%!error <strictly increasing> vn_experiment ([0 2 1], "F1.flow", [1 2 3])
%!error <holds only NaN> vn_experiment (0:2, "T1.level", NaN (1, 3))
%!error <given twice> vn_experiment (0:2, "T1.level", 1:3, "T1.level", 1:3)
%!error <unknown option "sigmas"> vn_experiment (0:2, "T1.level", 1:3, "sigmas", 1)
%!error <"start" must be> vn_experiment (0:2, "T1.level", 1:3, "start", "cold")
%!error <either "sigma" or "weights"> vn_experiment (0:2, "T1.level", 1:3, "sigma", 1, "weights", 1)
%!error <no quantity given> vn_experiment (0:2, "hold", true)
%!error <Invalid call> vn_experiment (0:2)

%!test
%! ## weights instead of sigma, kept per output; integer data converted
%! ex = vn_experiment ([0 5 10], "F1.flow", int8 ([1 1 2]), "T1.level",
%!                     [1 2 3], "T2.level", [4 5 6], "weights", [4 1]);
%! assert (ex.weights, [4 1]);
%! assert (isempty (ex.sigma));
%! assert (class (ex.data), "double");
%! assert (ex.data(:, 1), [1; 1; 2]);
%! assert (ex.data(:, 3), [4; 5; 6]);

%!error <T must be a real vector of sample times \(s\)> vn_experiment ("abc", "T1.level", 1:3)
%!error <T must hold two or more> vn_experiment (5, "T1.level", 1)
%!error <data of "T1.level" must be a real vector> vn_experiment (0:2, "T1.level", {1, 2, 3})
%!error <"T1.level" holds Inf> vn_experiment (0:2, "T1.level", [1 Inf 3])
%!error <option "sigma" must be positive finite> vn_experiment (0:2, "T1.level", 1:3, "sigma", -1)
%!error <option "hold" must be "auto", true or false> vn_experiment (0:2, "T1.level", 1:3, "hold", "yes")
%!error <option "hold" must be "auto", true or false> vn_experiment (0:2, "T1.level", 1:3, "hold", 2)
%!error <option "name" must be a string> vn_experiment (0:2, "T1.level", 1:3, "name", 7)
%!error <name/value pairs> vn_experiment (0:2, "T1.level", 1:3, "hold")
%!error <argument 4 must be a quantity> vn_experiment (0:2, "T1.level", 1:3, 5, 1)

%!test
%! ## span: fractions of a 0..3 m transmitter become metres; range: the
%! ## readings at 3 m (a transmitter stuck at 100 %) and past 0 m are
%! ## censored but kept; options may come before the quantities
%! f = [0.10 0.50 0.99 1.00 1.00 NaN 0 -0.01];
%! ex = vn_experiment (0:7, "range", {"T2.level", [0 3]}, "F1.flow",
%!                     ones (1, 8), "T2.level", f, "span", {"T2.level", [0 3]});
%! assert (ex.data(:, 2).', [0.3 1.5 2.97 3 3 NaN 0 -0.03], 1e-12);
%! assert (ex.censored(:, 2).', logical ([0 0 0 1 1 0 1 1]));
%! assert (! any (ex.censored(:, 1)));
%! assert (ex.span, [NaN NaN; 0 3]);
%! assert (ex.range, [-Inf Inf; 0 3]);

%!test
%! ## a one-sided range, a span with an offset zero, two quantities
%! ex = vn_experiment (0:3, "T1.level", [0.2 0.4 0.6 0.8], "T2.level",
%!                     [1 2 5 9], "span", {"T1.level", [0.5 2.5]},
%!                     "range", {"T2.level", [-Inf 5], "T1.level", [1 Inf]});
%! assert (ex.data(:, 1).', [0.9 1.3 1.7 2.1], 1e-12);
%! assert (ex.censored.', logical ([1 0 0 0; 0 0 1 1]));

%!error <option "span" names "T3.level", which the test does not record> vn_experiment (0:2, "T1.level", 1:3, "span", {"T3.level", [0 1]})
%!error <option "span" must be \{QUANTITY, \[LOW HIGH\], ...\} with finite LOW < HIGH> vn_experiment (0:2, "T1.level", 1:3, "span", {"T1.level", [3 0]})
%!error <option "span" must be> vn_experiment (0:2, "T1.level", 1:3, "span", {"T1.level", [0 Inf]})
%!error <option "range" must be \{QUANTITY, \[LOW HIGH\], ...\} with LOW < HIGH> vn_experiment (0:2, "T1.level", 1:3, "range", {"T1.level"})
%!error <option "range" must be> vn_experiment (0:2, "T1.level", 1:3, "range", [0 3])

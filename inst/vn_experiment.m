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
## @end example
##
## Whether a quantity is an input that drove the test (@qcode{"F1.flow"},
## @qcode{"LV1.opening"}) or a measured output (@qcode{"T2.level"},
## @qcode{"O1.flow"}) is decided by @code{vn_fit} against the network: an
## input parameter of its unit is an input, anything else must be an
## output of its unit.  Measured outputs may hold NaN (gaps, dropped
## samples); inputs may not, and neither may @var{t}.
##
## Options:
## @table @asis
## @item @qcode{"sigma"}
## standard deviation of the measurement noise, one per measured output in
## the order given (a scalar applies to all); residuals are divided by it.
## @item @qcode{"weights"}
## instead of @qcode{"sigma"}: a weight per output (weight = 1/sigma^2).
## @item @qcode{"hold"}
## @code{true}: each input holds its value until the next sample (a stepped
## input); @code{false} (default): inputs vary linearly between samples.
## @item @qcode{"start"}
## the state the test starts from: @qcode{"steady"} (default; the model's
## steady state at the first input values), @qcode{"measured"} (tank levels
## from the first measured level of each tank, other tanks as declared) or
## @qcode{"declared"} (the levels declared on the network).
## @item @qcode{"name"}
## a label for plots and reports.
## @end table
##
## The result has fields @code{t} (column), @code{names} (cellstr),
## @code{data} (times x names), @code{sigma}, @code{weights}, @code{hold},
## @code{start} and @code{name}.  Several tests form a struct array
## @code{[ex1, ex2]}.
## @seealso{vn_fit, vn_fopdt, vn_plot}
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
  ex = struct ("t", t, "names", {{}}, "data", zeros (nt, 0), "sigma", [],
               "weights", [], "hold", false, "start", "steady", "name", "");
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
      ex = set_option (ex, name, val);
    endif
  endfor
  if (isempty (ex.names))
    error ("Octave:invalid-input-arg",
           "vn_experiment: no quantity given; name the inputs and outputs, e.g. vn_experiment (t, \"F1.flow\", u, \"T2.level\", y)");
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

function ex = set_option (ex, name, val)
  switch (lower (name))
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
      if (! (isscalar (val) && (islogical (val) || isnumeric (val))))
        error ("Octave:invalid-input-arg",
               "vn_experiment: option \"hold\" must be true or false");
      endif
      ex.hold = logical (val);
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
             "vn_experiment: unknown option \"%s\"; allowed: sigma, weights, hold, start, name, or a quantity \"UNIT.VARIABLE\"",
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
%! assert (ex.hold, false);
%! assert (ex.start, "steady");
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
%!error <option "hold" must be true or false> vn_experiment (0:2, "T1.level", 1:3, "hold", "yes")
%!error <option "name" must be a string> vn_experiment (0:2, "T1.level", 1:3, "name", 7)
%!error <name/value pairs> vn_experiment (0:2, "T1.level", 1:3, "hold")
%!error <argument 4 must be a quantity> vn_experiment (0:2, "T1.level", 1:3, 5, 1)

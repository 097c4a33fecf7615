## -*- texinfo -*-
## @deftypefn  {} {} vn_plot (@var{res})
## @deftypefnx {} {} vn_plot (@var{res}, @var{names})
## @deftypefnx {} {} vn_plot (@var{sr})
## @deftypefnx {} {} vn_plot (@var{fr})
## @deftypefnx {} {} vn_plot (@var{est})
## @deftypefnx {} {} vn_plot (@dots{}, @var{name}, @var{value}, @dots{})
## @deftypefnx {} {@var{h} =} vn_plot (@dots{})
## Plot trends, step responses, frequency responses or a fit against data.
##
## What is drawn follows from the fields of the first argument:
##
## @table @asis
## @item a simulation result @var{res} (@code{vn_simulate})
## trends of the quantities @var{names} (a cellstr or one string of
## @qcode{"UNIT.VARIABLE"} names, e.g. @code{@{"T1.level", "T2.level"@}};
## default: every tank level) against time.  Quantities with the same
## unit of measure share an axes; the axes are stacked over one time axis,
## each labelled with its variable and unit (@qcode{"level (m)"};
## dimensionless quantities @qcode{"opening (fraction)"}).  A controller's
## set point is drawn over the quantity it measures.
## @item a step response @var{sr} (@code{vn_stepresponse}: fields @code{t},
## @code{nonlinear}, @code{linear}, @code{outputs}, @code{input},
## @code{size}, @code{metrics})
## one axes per output (the change, with its unit): the nonlinear response
## solid, the linear one dashed, the point at 63.2 % of the final change
## and the settling time marked by small triangles; beside the axes a
## table of the metrics (final change, dead time, t63, settling time,
## overshoot) in the axis's time unit.  A response that does not settle
## away from zero (@code{metrics.settles} false) says so, without times.
## @item a frequency response @var{fr} (@code{vn_frequency}) or a linear
## model (drawn through @code{vn_frequency})
## one pair: magnitude on log-log axes over phase (deg); several pairs: a
## grid of small panels, a column per input and a row per output, with
## the same scales in every panel; with a controller (@code{fr.loop}) the
## open loop L with its gain and phase margins marked and labelled.
## @item a fit against data @var{est} (field @code{fit}) or a validation
## (@code{vn_validate})
## per experiment @var{k} a column, in it per output a panel of the
## measured values (markers) and the model (line), censored readings as
## large rings, and below it the residuals (measured - predicted) as a
## line against time.  Contract: @code{est.fit(k).t} (times, s),
## @code{.names} (cellstr of ny quantities), @code{.measured} and
## @code{.predicted} (nt x ny), optional @code{.censored} (logical nt x
## ny), @code{.units} (cellstr) and @code{.name} (label).
## @item an ensemble (@code{vn_ensemble})
## per quantity the median, the 5 % and 95 % percentiles and the mean.
## @end table
##
## Legends, and the tables of metrics or margins, sit beside the axes,
## outside the data.  Values are shown in the units the network's
## @qcode{"display"} option asks for (the network of the result, or
## option @qcode{"net"}).
##
## Lines are black and told apart by line style (solid, dashed, dotted,
## dash-dot) and by markers at about ten points, so that a figure reads
## printed in black and white.
##
## Options:
## @table @asis
## @item @qcode{"file"}
## write the figure to this PNG file.  A figure that was created
## invisible (no display) is closed once written.
## @item @qcode{"size"}
## [width height] of the PNG in pixels, default [900 600].
## @item @qcode{"title"}
## title over the top axes.
## @item @qcode{"figure"}
## handle of a figure to clear and draw on instead of a new one.
## @item @qcode{"time"}
## time axis unit: @qcode{"s"}, @qcode{"min"}, @qcode{"h"}, or
## @qcode{"auto"} (default: s up to 20 min, min up to 5 h, h beyond).
## @item @qcode{"color"}
## true to draw the lines in colour as well (default false).
## @item @qcode{"net"}
## the network whose display units to use, for results that do not carry
## it.
## @end table
##
## Without a display (the DISPLAY variable empty, as under octave-cli in
## scripts) figures are drawn invisibly with gnuplot, so @qcode{"file"}
## works in batch runs.  @var{h} is the figure handle.
##
## A plot shows a model's prediction: validate the model against plant data
## before it is used to judge a real plant or to tune a live loop.
## @seealso{vn_simulate, vn_stepresponse, vn_frequency, vn_fit}
## @end deftypefn

function h = vn_plot (s, varargin)
  if (nargin < 1)
    print_usage ();
  endif
  if (isstruct (s) && all (isfield (s, {"measured", "predicted", "r2"})))
    kind = "validate";                  # vn_validate, drawn by plot_validate
  else
    kind = plot_kind (s);
  endif
  names = {};
  args = varargin;
  ## Options come in pairs, so an odd count starts with the quantity list.
  if (! isempty (args) && (iscell (args{1}) || mod (numel (args), 2) == 1))
    if (! strcmp (kind, "result"))
      error ("Octave:invalid-input-arg",
             "vn_plot: a list of quantities applies to simulation results only, not to a %s struct",
             kind);
    endif
    names = args{1};
    if (ischar (names) && rows (names) == 1)
      names = {names};
    endif
    if (! iscellstr (names) || isempty (names))
      error ("Octave:invalid-input-arg",
             "vn_plot: NAMES must be a cellstr of quantities like {\"T1.level\", \"O1.flow\"}");
    endif
    args(1) = [];
  endif
  opt = plot_options (args);

  warning ("off", "Octave:gnuplot-graphics", "local");
  [hf, hidden] = plot_figure (opt.figure);
  try
    switch (kind)
      case "result"
        ax = plot_trends (hf, s, names, opt);
        deftitle = "";
        if (isfield (s, "net") && isstruct (s.net) && isfield (s.net, "name"))
          deftitle = s.net.name;
        endif
      case "step"
        ax = plot_step (hf, s, opt);
        deftitle = step_title (s);
      case {"frequency", "linear"}
        if (strcmp (kind, "linear"))
          s = vn_frequency (s);
        endif
        ax = plot_freq (hf, s, opt);
        deftitle = "";
        if (numel (s.magnitude(1,:)) == 1 && ! isfield (s, "loop"))
          deftitle = "frequency response";
        endif
      case "ensemble"
        ax = plot_ensemble (hf, s, opt);
        deftitle = "";
      case "fit"
        if (isempty (opt.net) && isfield (s, "net") && isstruct (s.net)
            && isfield (s.net, "units"))
          opt.net = s.net;
        endif
        if (isfield (s.fit, "censored")
            && any (cellfun (@(c) any (c(:)), {s.fit.censored})))
          ax = plot_validate (hf, s.fit, opt);   # censored readings ringed
        else
          ax = plot_fit (hf, s, opt);
        endif
        deftitle = "";
      case "validate"
        ax = plot_validate (hf, s, opt);
        deftitle = "";
    endswitch
    top = ax(1);
    if (! isempty (opt.title))
      old = get (get (top, "title"), "string");
      if (! isempty (old))
        opt.title = [opt.title ", " old];
      endif
      title (top, opt.title, "interpreter", "none");
    elseif (! isempty (deftitle))
      title (top, deftitle, "interpreter", "none");
    endif
    if (! isempty (opt.file))
      plot_save (hf, opt.file, opt.size);
    endif
  catch err
    ## A half-drawn invisible figure would linger unseen.
    if (hidden && isfigure (hf))
      close (hf);
    endif
    rethrow (err);
  end_try_catch
  if (hidden && ! isempty (opt.file))
    close (hf);
  endif
  if (nargout > 0)
    h = hf;
  endif
endfunction

function s = step_title (sr)
  s = "step response (changes from the operating point)";
  if (isfield (sr, "input") && ischar (sr.input))
    s = ["change after a step in " sr.input];
    if (isfield (sr, "size") && isscalar (sr.size) && isnumeric (sr.size))
      s = sprintf ("%s of %g", s, sr.size);
    endif
  endif
endfunction

%!demo
%! ## Invented: a 2 m2 holding tank with an orifice outlet filling from
%! ## 1 m to its steady level under a constant feed (trends in minutes).
%! t = (0:10:3600)';
%! res.t = t;
%! res.T1.level = 1.44 - 0.44 * exp (-t / 480);
%! res.O1.flow = 0.01 * sqrt (res.T1.level);
%! res.F1.flow = 0.012 * ones (size (t));
%! res.units = struct ("T1", struct ("level", "m"),
%!                     "O1", struct ("flow", "m3/s"), "F1", struct ("flow", "m3/s"));
%! vn_plot (res, {"T1.level", "O1.flow", "F1.flow"}, "title", "invented holding tank");

%!demo
%! ## Invented: step of a feed into a tank, nonlinear against linear.
%! t = (0:10:2400)';
%! yl = 0.4 * (1 - exp (-t / 480));
%! sr = struct ("t", t, "nonlinear", 1.05 * yl, "linear", yl,
%!              "outputs", {{"T1.level"}}, "input", "F1.flow", "size", 0.002,
%!              "metrics", struct ("gain", 210, "final", 0.42, "t63", 480,
%!                                 "rise", 1055, "settle", 1878, "overshoot", 0));
%! vn_plot (sr);

## ---- trends ----------------------------------------------------------

%!shared res, t, dax
%! ## Data axes of a figure (a legend is an axes too, holding copies).
%! dax = @(h) findobj (h, "type", "axes", "-not", "tag", "vn_legend");
%! ## Fake result of an hour: two levels (m) and one flow (m3/s).
%! t = (0:10:3600)';
%! res.t = t;
%! res.T1.level = 1.44 - 0.44 * exp (-t / 480);
%! res.T2.level = 0.5 + t / 7200;
%! res.O1.flow = 0.01 * sqrt (res.T1.level);
%! res.units = struct ("T1", struct ("level", "m"), "T2", struct ("level", "m"),
%!                     "O1", struct ("flow", "m3/s"));

%!test
%! ## Quantities sharing a unit share an axes: 2 units -> 2 axes.
%! h = vn_plot (res, {"T1.level", "O1.flow", "T2.level"});
%! ax = findobj (h, "type", "axes", "-not", "tag", "vn_legend");
%! assert (numel (ax), 2);
%! labels = sort (cellfun (@(a) get (get (a, "ylabel"), "string"), num2cell (ax),
%!                         "uniformoutput", false));
%! assert (labels, sort ({"level (m)"; "flow (m3/s)"}));
%! ## A run of 3600 s is shown in minutes: the curves end at 60.
%! kids = findobj (dax (h), "type", "line");
%! xmax = max (cellfun (@(k) max ([get(k, "xdata"), -Inf]), num2cell (kids)));
%! assert (xmax, 60, 1e-12);
%! xl = get (get (ax(end), "xlabel"), "string");
%! xl = [xl, get(get (ax(1), "xlabel"), "string")];
%! assert (xl, "time (min)");
%! ## The level curve is the data, divided by nothing but the time factor.
%! full = findobj (dax (h), "type", "line", "marker", "none", "linestyle", "-");
%! y = cellfun (@(k) numel (get (k, "ydata")), num2cell (full));
%! assert (any (y == numel (t)));
%! close (h);

%!test
%! ## Black lines told apart by style; every one of them black.
%! h = vn_plot (res, {"T1.level", "T2.level"});
%! kids = findobj (dax (h), "type", "line");
%! c = cell2mat (get (kids, "color"));
%! assert (c, zeros (size (c)));
%! styles = get (findobj (dax (h), "type", "line", "marker", "none"), "linestyle");
%! assert (sort (unique (styles)), sort ({"-"; "--"}));
%! ## Sparse markers: about ten per curve, not one per sample (361).
%! mk = findobj (dax (h), "type", "line", "linestyle", "none");
%! n = cellfun (@(k) numel (get (k, "xdata")), num2cell (mk));
%! assert (all (n >= 8 & n <= 11));
%! close (h);

%!test
%! ## With colour the two curves differ in colour too.
%! h = vn_plot (res, {"T1.level", "T2.level"}, "color", true);
%! full = findobj (dax (h), "type", "line", "marker", "none");
%! c = unique (cell2mat (get (full, "color")), "rows");
%! assert (rows (c), 2);
%! close (h);

%!test
%! ## Time unit: auto picks s for 10 min, h for 10 h; "time" overrides.
%! r = res;
%! r.t = t / 6;
%! h = vn_plot (r, "T1.level");
%! ax = findobj (h, "type", "axes", "-not", "tag", "vn_legend");
%! assert (get (get (ax(1), "xlabel"), "string"), "time (s)");
%! assert (get (ax(1), "xlim"), [0 600], 1e-12);
%! r.t = t * 10;
%! vn_plot (r, "T1.level", "figure", h);
%! ax = findobj (h, "type", "axes", "-not", "tag", "vn_legend");
%! assert (get (get (ax(1), "xlabel"), "string"), "time (h)");
%! assert (get (ax(1), "xlim"), [0 10], 1e-12);
%! h2 = vn_plot (r, "T1.level", "figure", h, "time", "s");
%! assert (h2, h);
%! ax = findobj (h, "type", "axes", "-not", "tag", "vn_legend");
%! assert (get (ax(1), "xlim"), [0 36000], 1e-9);
%! close (h);

%!test
%! ## Legend lists the quantity names.
%! h = vn_plot (res, {"T1.level", "T2.level"});
%! lg = findobj (h, "type", "axes", "tag", "vn_legend");
%! assert (get (lg, "userdata"), {"T1.level", "T2.level"});
%! ## outside the data: right of the axes it belongs to
%! pa = get (dax (h), "position");
%! pl = get (lg, "position");
%! assert (pl(1) >= pa(1) + pa(3));
%! close (h);

%!test
%! ## PNG written at the size asked: PNG signature and IHDR width and
%! ## height, big-endian at bytes 17-24 (PNG specification, ISO/IEC 15948).
%! f = [tempname() ".png"];
%! vn_plot (res, {"T1.level"}, "file", f, "size", [640 480]);
%! fid = fopen (f, "r");
%! b = fread (fid, 24, "uint8")';
%! fclose (fid);
%! unlink (f);
%! assert (b(1:8), [137 80 78 71 13 10 26 10]);
%! assert (b(17:20) * 256 .^ (3:-1:0)', 640);
%! assert (b(21:24) * 256 .^ (3:-1:0)', 480);

## ---- step response ---------------------------------------------------

%!test
%! ## First-order lag K/(tau s + 1), step du: 63.2 % = 1 - 1/e at t = tau;
%! ## within 2 % from tau ln 50 on (analytic).  Markers sit there.
%! K = 2;  tau = 300;  du = 0.002;
%! tt = (0:10:1800)';
%! y = K * du * (1 - exp (-tt / tau));
%! m = struct ("gain", K, "t63", tau, "rise", tau * log (9),
%!             "settle", tau * log (50), "overshoot", 0);
%! sr = struct ("t", tt, "nonlinear", y, "linear", y, "outputs", {{"T1.level"}},
%!              "input", "F1.flow", "size", du, "metrics", m);
%! h = vn_plot (sr, "time", "s");
%! up = findobj (dax (h), "type", "line", "marker", "^");
%! assert (get (up, "xdata"), 300, 1e-12);
%! assert (get (up, "ydata"), 0.004 * (1 - exp (-1)), 1e-12);
%! dn = findobj (dax (h), "type", "line", "marker", "v");
%! assert (get (dn, "xdata"), 300 * log (50), 1e-9);
%! assert (get (dn, "ydata"), 0.004 * 0.98, 1e-7);
%! ## Nonlinear solid, linear dashed.
%! full = findobj (dax (h), "type", "line", "marker", "none");
%! assert (sort (get (full, "linestyle")), sort ({"-"; "--"}));
%! ## metrics beside the axes, times in the axis's unit
%! note = get (findobj (h, "tag", "metrics"), "string");
%! assert (any (strcmp (note, "t63       300 s")));
%! assert (any (strcmp (note, "settled   1174 s")));
%! assert (any (strcmp (note, "final     0.004")));
%! ## in minutes on an axis in minutes
%! vn_plot (sr, "time", "min", "figure", h);
%! note = get (findobj (h, "tag", "metrics"), "string");
%! assert (any (strcmp (note, "t63       5 min")));
%! close (h);

%!test
%! ## Two outputs: two stacked axes; unsettled response says so.
%! tt = (0:10:600)';
%! y = [tt / 600, 1 - exp(-tt / 100)];
%! m = struct ("gain", {1, 1}, "t63", {NaN, 100}, "rise", {NaN, 220},
%!             "settle", {NaN, 391}, "overshoot", {0, 0});
%! sr = struct ("t", tt, "nonlinear", y, "linear", [], "outputs", {{"T1.level", "T2.level"}},
%!              "input", "F1.flow", "size", 1, "metrics", m);
%! h = vn_plot (sr);
%! ax = findobj (h, "type", "axes", "-not", "tag", "vn_legend");
%! assert (numel (ax), 2);
%! txt = get (findobj (h, "tag", "metrics"), "string");
%! assert (any (strcmp (txt, "not settled")));
%! close (h);

## ---- frequency response ----------------------------------------------

%!test
%! ## Lag 2/(300 s + 1): |G| = 2/sqrt(1 + (300 w)^2), phase -atan(300 w) (analytic).
%! w = logspace (-4, -1, 61)';
%! G = 2 ./ (1i * w * 300 + 1);
%! fr = struct ("w", w, "response", G, "magnitude", abs (G),
%!              "phase", angle (G) * 180 / pi, "inputs", {{"F1.flow"}},
%!              "outputs", {{"T1.level"}});
%! h = vn_plot (fr);
%! ax = findobj (h, "type", "axes", "-not", "tag", "vn_legend");
%! assert (numel (ax), 2);
%! assert (get (ax, "xscale"), {"log"; "log"});
%! assert (sort (get (ax, "yscale")), {"linear"; "log"});
%! full = findobj (dax (h), "type", "line", "marker", "none");
%! y = get (full, "ydata");
%! mag = y{cellfun (@(v) all (v > 0), y)};
%! assert (mag(:), 2 ./ sqrt (1 + (300 * w) .^ 2), 1e-12);
%! ph = y{cellfun (@(v) any (v < 0), y)};
%! assert (ph(:), -atand (300 * w), 1e-10);
%! ## Phase 0 to -88 deg: ticks every 45 deg from -90 to 0.
%! pa = ax(strcmp (get (ax, "yscale"), "linear"));
%! assert (get (pa, "ytick"), [-90 -45 0]);
%! lg = findobj (h, "type", "axes", "tag", "vn_legend");
%! assert (get (lg, "userdata"), {"F1.flow to T1.level"});
%! close (h);

## ---- fit against data ------------------------------------------------

%!test
%! ## Two experiments: a model and a residual axes each; residuals are
%! ## measured - predicted.
%! tt = (0:20:1200)';
%! yp = 1 + 0.3 * (1 - exp (-tt / 200));
%! ym = yp + 0.01 * sin (tt / 37);
%! est.fit = struct ("t", {tt, tt}, "names", {{"T1.level"}, {"T1.level"}},
%!                   "measured", {ym, 2 - ym}, "predicted", {yp, 2 - yp},
%!                   "units", {{"m"}, {"m"}});
%! h = vn_plot (est, "title", "check");
%! ax = findobj (h, "type", "axes", "-not", "tag", "vn_legend");
%! assert (numel (ax), 4);
%! ## residuals as a line against time
%! r = findobj (dax (h), "tag", "residual");
%! assert (get (r, "linestyle"), {"-"; "-"});
%! res2 = sort (cell2mat (get (r, "ydata")), 1);
%! assert (res2, sort ([0.01 * sin(tt' / 37); -0.01 * sin(tt' / 37)], 1), 1e-12);
%! ## Data as markers without line.
%! d = findobj (dax (h), "type", "line", "markersize", 4);
%! assert (get (d, "linestyle"), {"none"; "none"});
%! ## units on the axes
%! yl = cellfun (@(a) get (get (a, "ylabel"), "string"), num2cell (dax (h)), "uniformoutput", false);
%! assert (sum (strcmp (yl, "T1.level (m)")), 2);
%! assert (sum (strcmp (yl, "residual (m)")), 2);
%! close (h);

## ---- setpoints, dimensionless axes, display units ----------------------

%!test
%! ## A set point is drawn over the level its controller measures; an
%! ## opening is labelled "fraction"; levels in mm as the network asks.
%! net = vn_network ("sp", "display", {"level", "mm"});
%! net = vn_tank (net, "T1", "area", 2, "level", 1);
%! net = vn_feed (net, "F1", "T1", "flow", 0.01);
%! net = vn_valve (net, "LV1", "T1", "", "kv", 60, "opening", 0.5);
%! net = vn_controller (net, "LC1", "measure", "T1.level", "manipulate", ...
%!                      "LV1.opening", "setpoint", 1, "gain", 1, "reset", 300, ...
%!                      "limits", [0 1]);
%! r = vn_simulate (net, [0 600], [], "dt", 10);
%! h = vn_plot (r, {"T1.level", "LV1.opening"});
%! ax = dax (h);
%! yl = cellfun (@(a) get (get (a, "ylabel"), "string"), num2cell (ax), "uniformoutput", false);
%! assert (sort (yl), sort ({"level (mm)"; "opening (fraction)"}));
%! lev = ax(strcmp (yl, "level (mm)"));
%! lg = findobj (h, "tag", "vn_legend");
%! names = get (lg, "userdata");
%! assert (any (cellfun (@(c) isequal (c, {"T1.level", "LC1.setpoint"}), names)));
%! y = get (findobj (lev, "type", "line", "marker", "none", "linestyle", "--"), "ydata");
%! assert (y, 1000 * ones (size (y)), 1e-9);
%! close (h);

## ---- frequency grid and loop --------------------------------------------

%!test
%! ## 2 inputs x 2 outputs: a grid of magnitude and phase panels with the
%! ## same scales everywhere
%! w = logspace (-3, 0, 31)';
%! G = zeros (31, 2, 2);
%! G(:,1,1) = 1 ./ (1i * w * 10 + 1);   G(:,2,1) = 5 ./ (1i * w * 100 + 1);
%! G(:,1,2) = 0.1 ./ (1i * w + 1);      G(:,2,2) = 2 ./ (1i * w * 30 + 1) .^ 2;
%! fr = struct ("w", w, "response", G, "magnitude", abs (G),
%!              "phase", unwrap (angle (G)) * 180 / pi,
%!              "inputs", {{"F1.flow", "LV1.opening"}}, "outputs", {{"T1.level", "T2.level"}});
%! h = vn_plot (fr);
%! ax = findobj (h, "type", "axes", "-not", "tag", "vn_legend", "-not", "tag", "note");
%! assert (numel (ax), 8);
%! mag = ax(strcmp (get (ax, "yscale"), "log"));
%! assert (numel (mag), 4);
%! assert (size (unique (cell2mat (get (mag, "ylim")), "rows"), 1), 1);
%! ph = ax(strcmp (get (ax, "yscale"), "linear"));
%! assert (size (unique (cell2mat (get (ph, "ylim")), "rows"), 1), 1);
%! t = cellfun (@(a) get (get (a, "title"), "string"), num2cell (ax), "uniformoutput", false);
%! assert (sort (t(! cellfun (@isempty, t))), {"from F1.flow"; "from LV1.opening"});
%! close (h);

%!test
%! ## The loop L of a lag 2/(10 s + 1)^3 under P control Kc = 2: phase
%! ## crossover where atan (10 w) = 60 deg, w = sqrt (3)/10; |L| there
%! ## = 4/8, gain margin 2 (analytic); both margins marked and labelled.
%! lin = struct ("A", [-0.1 0 0; 0.1 -0.1 0; 0 0.1 -0.1], "B", [0.2; 0; 0],
%!               "C", [0 0 1], "D", 0, "inputs", {{"F1.flow"}}, "outputs", {{"T1.level"}});
%! fr = vn_frequency (lin, "controller", struct ("Kc", 2, "Ti", Inf));
%! assert (fr.loop.gain_margin, 2, 1e-9);
%! h = vn_plot (fr);
%! gm = findobj (h, "type", "line", "tag", "gain margin");
%! assert (get (gm, "xdata"), [1 1] * sqrt (3) / 10, 1e-9);
%! assert (get (gm, "ydata"), [0.5 1], 1e-9);
%! pm = findobj (h, "type", "line", "tag", "phase margin");
%! assert (get (pm, "xdata"), [1 1] * fr.loop.gain_crossover, 1e-12);
%! txt = get (findobj (h, "type", "text", "tag", "gain margin"), "string");
%! assert (strtrim (txt), "GM 6.0 dB");
%! txt = get (findobj (h, "type", "text", "tag", "phase margin"), "string");
%! assert (strtrim (txt), sprintf ("PM %.1f deg", fr.loop.phase_margin));
%! close (h);

## ---- censored readings, ensembles ------------------------------------------

%!test
%! tt = (0:10:100)';
%! est.fit = struct ("t", tt, "names", {{"T1.level", "T2.level"}},
%!                   "measured", [tt / 100, 3 - tt / 100], "predicted", [tt / 100, 3 - tt / 100],
%!                   "censored", [tt > 85, false(11, 1)], "units", {{"m", "m"}});
%! h = vn_plot (est);
%! assert (numel (dax (h)), 4);
%! ring = findobj (dax (h), "tag", "censored");
%! assert (get (ring, "xdata"), [90 100]);
%! r = get (findobj (dax (h), "tag", "residual"), "ydata");
%! assert (sum (cellfun (@(v) sum (isnan (v)), r)), 2);
%! close (h);

%!test
%! t = (0:60:600)';
%! y = reshape (1 + t / 600 * linspace (0.9, 1.1, 9), [11 1 9]);
%! q = prctile (y, [5 50 95], 3);
%! ens = struct ("t", t, "names", {{"T1.level"}}, "units", {{"m"}}, "y", y,
%!               "params", (1:9)', "failed", struct ("run", {}, "message", {}),
%!               "mean", mean (y, 3), "p05", q(:,:,1), "p50", q(:,:,2), "p95", q(:,:,3));
%! h = vn_plot (ens);
%! ax = dax (h);
%! assert (numel (ax), 1);
%! assert (get (get (ax, "ylabel"), "string"), "T1.level (m)");
%! assert (get (findobj (h, "tag", "vn_legend"), "userdata"), {"median", "5 % and 95 %", "mean"});
%! close (h);

## ---- errors ----------------------------------------------------------

%!error <Invalid call> vn_plot ()
%!error <no quantity "T9.level"; it has T1.level, T2.level, O1.flow> vn_plot (res, {"T9.level"})
%!error <no quantity "T1.lvl"> vn_plot (res, "T1.lvl")
%!error <cannot tell what to draw from a struct with fields a, b> vn_plot (struct ("a", 1, "b", 2))
%!error <first argument must be> vn_plot (3)
%!error <folder ".*no_such_folder_vn" does not exist> vn_plot (res, "T1.level", "file", "/no_such_folder_vn/x.png")
%!error <option "time" must be "s", "min", "h" or "auto", got "days"> vn_plot (res, "T1.level", "time", "days")
%!error <unknown option "colour"> vn_plot (res, {"T1.level"}, "colour", true)
%!error <option "figure" must be the handle> vn_plot (res, {"T1.level"}, "figure", -17)
%!error <applies to simulation results only> vn_plot (struct ("w", 1, "magnitude", 1, "phase", 0), {"T1.level"})
%!error <EST.fit\(1\) measured \[2 1\] and predicted \[3 1\] must be 3 x 1> vn_plot (struct ("fit", struct ("t", [0;1;2], "names", {{"T1.level"}}, "measured", [1;2], "predicted", [1;2;3])))
%!error <step response field "nonlinear" must be 3 x 1> vn_plot (struct ("t", [0;1;2], "nonlinear", [1;2], "linear", [], "outputs", {{"T1.level"}}))

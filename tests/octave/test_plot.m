## Integration tests of vn_plot on results of the compiled core: trends of
## a simulated tank, a step response and a frequency response, written to
## PNG files without a display.
##
## Run from the top of the checkout:
##   octave-cli --eval 'addpath inst; addpath build/oct; test ("tests/octave/test_plot.m")'

%!shared net, res, dax, pngsize
%! ## One 2 m2 tank from 1 m, orifice F = 0.01 sqrt (h) to atmosphere,
%! ## constant feed 0.012 m3/s (invented).
%! net.type = "vesselnet.network";
%! net.name = "plot check";
%! net.options = struct ("gravity", 9.80665, "density", 998.2, "cp", 4181.3,
%!                       "ambient", 15, "thermal", false, "species", {{}},
%!                       "decay", [], "smooth", 1e-3);
%! net.units = struct ("name", {"T1", "O1", "F1"},
%!                     "kind", {"tank", "orifice", "feed"},
%!                     "from", {"", "T1", ""}, "to", {"", "", "T1"},
%!                     "par", {struct("area", 2, "level", 1), ...
%!                             struct("coeff", 0.01), struct("flow", 0.012)},
%!                     "table", {[], [], []},
%!                     "aux", {struct(), struct(), struct()});
%! net.index = struct ("T1", 1, "O1", 2, "F1", 3);
%! res = vn_simulate (net, [0 3600], "dt", 10);
%! dax = @(h) findobj (h, "type", "axes", "-not", "tag", "vn_legend");
%! ## Width and height from the IHDR chunk, big-endian at bytes 17-24
%! ## (PNG specification, ISO/IEC 15948).
%! pngsize = @(b) [b(17:20) * 256 .^ (3:-1:0)', b(21:24) * 256 .^ (3:-1:0)'];

%!test
%! ## Default: every tank level, here T1 alone, drawn in minutes.  The
%! ## level tends to (F/coeff)^2 = (0.012/0.01)^2 = 1.44 m (orifice law
%! ## F = coeff sqrt (h), DESIGN section 3); linearised time constant
%! ## 2 A sqrt (h) / coeff = 480 s, so after 3600 s it is within 1e-3 m.
%! h = vn_plot (res);
%! ax = dax (h);
%! assert (numel (ax), 1);
%! assert (get (get (ax, "ylabel"), "string"), "level (m)");
%! full = findobj (ax, "type", "line", "marker", "none");
%! assert (get (full, "xdata")(end), 60, 1e-12);
%! y = get (full, "ydata");
%! assert (y(:), res.T1.level, 0);
%! assert (y(1), 1, 1e-9);
%! assert (y(end), 1.44, 1e-3);
%! assert (get (get (ax, "title"), "string"), "plot check");
%! close (h);

%!test
%! ## Level and two flows: two axes; flows agree at the end (steady state).
%! f = [tempname() ".png"];
%! h = vn_plot (res, {"T1.level", "O1.flow", "F1.flow"}, "file", f,
%!              "size", [1000 700], "title", "invented tank");
%! assert (! isfigure (h));
%! fid = fopen (f, "r");
%! b = fread (fid, Inf, "uint8")';
%! fclose (fid);
%! unlink (f);
%! assert (b(1:8), [137 80 78 71 13 10 26 10]);
%! assert (pngsize (b), [1000 700]);
%! assert (numel (b) > 5000);
%! assert (res.O1.flow(end), 0.012, 1e-5);

%!test
%! ## Step response of the compiled core: the 63.2 % marker lies on
%! ## 0.632 of the final change, at the time step_metrics found.
%! op = struct ("x", 2 * 1.44, "net", net, "states", {{"T1.volume"}});
%! sr = vn_stepresponse (net, op, "F1.flow", 0.0002);
%! h = vn_plot (sr, "time", "s");
%! up = findobj (dax (h), "type", "line", "marker", "^");
%! assert (get (up, "xdata"), sr.metrics(1).t63, 1e-9);
%! assert (get (up, "ydata"), (1 - exp (-1)) * sr.metrics(1).final, 1e-12);
%! ## A small step: t63 near the linear time constant 2 A sqrt (h) / coeff
%! ## = 480 s (first-order lag, analytic); the nonlinear run differs a little.
%! assert (sr.metrics(1).t63, 480, 15);
%! close (h);

%!test
%! ## Frequency response of the linearised tank: magnitude of the lag
%! ## K / (tau s + 1) with K = 2 sqrt (h) / coeff = 240 m per m3/s and
%! ## tau = 480 s (linearised orifice law, analytic).
%! op = struct ("x", 2 * 1.44, "net", net, "states", {{"T1.volume"}});
%! lin = vn_linearize (net, op, {"F1.flow"}, {"T1.level"});
%! w = logspace (-5, -1, 41)';
%! fr = vn_frequency (lin, w);
%! f = [tempname() ".png"];
%! h = vn_plot (fr, "file", f);
%! info = dir (f);
%! unlink (f);
%! assert (info.bytes > 5000);
%! assert (fr.magnitude(:), 240 ./ sqrt (1 + (480 * w) .^ 2), 1e-6 * 240);

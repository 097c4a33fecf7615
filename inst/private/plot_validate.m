## -*- texinfo -*-
## @deftypefn {} {@var{ax} =} plot_validate (@var{h}, @var{val}, @var{opt})
## Draw a validation (vn_validate), or the @code{fit} of a fit whose
## tests have censored readings, in figure @var{h}: the layout of a fit
## against data (plot_fit: measured markers, model lines, residuals
## below, censored readings as large open rings without residuals: they
## take no part), one column per test.  A validation's columns are titled
## with the r2 of each output.  Return the axes handles as plot_fit does.
## @end deftypefn

function ax = plot_validate (h, val, opt)
  ## plot_fit draws the censored readings as rings, without residuals
  fit = rmfield (val, intersect (fieldnames (val), {"residuals", "rmse", "r2"}));
  ax = plot_fit (h, struct ("fit", fit), opt);
  for k = 1:numel (val)
    v = val(k);
    c = v.censored;
    ## one line: gnuplot cannot stack a two-line title over these axes
    note = sprintf ("experiment %d", k);
    if (isfield (v, "name") && ischar (v.name) && ! isempty (v.name))
      note = v.name;
    endif
    if (isfield (v, "r2"))
      fig = arrayfun (@(j) sprintf ("%s %.3f", v.names{j}, v.r2(j)),
                      1:numel (v.names), "uniformoutput", false);
      note = sprintf ("%s: r2 %s", note, strjoin (fig, ", "));
    endif
    if (any (c(:)))
      note = sprintf ("%s; %d censored (rings)", note, nnz (c));
    endif
    title (ax(1,k), note, "interpreter", "none");
  endfor
endfunction

%!test
%! ## invented validation: a ring per censored reading, figures in the title
%! t = (0:10:100).';
%! val = struct ("t", t, "names", {{"T1.level", "T2.level"}},
%!               "measured", [t/100, 2*t/100], "predicted", [t/100+0.01, 2*t/100],
%!               "residuals", zeros (11, 2), "censored", [false(11, 1), t > 80],
%!               "units", {{"m", "m"}}, "name", "unseen", "rmse", [0.01 0],
%!               "r2", [0.99 1]);
%! h = figure ("visible", "off");
%! unwind_protect
%!   ax = plot_validate (h, val, struct ("time", "s", "color", false));
%!   ring = findobj (ax(:,1), "tag", "censored");
%!   assert (get (ring, "xdata"), [90 100]);
%!   assert (get (ring, "ydata"), [1.8 2]);
%!   s = get (get (ax(1), "title"), "string");
%!   assert (s, "unseen: r2 T1.level 0.990, T2.level 1.000; 2 censored (rings)");
%! unwind_protect_cleanup
%!   close (h);
%! end_unwind_protect

%!test
%! ## the fit of a test with censored readings: rings, no r2
%! t = (0:10:100).';
%! fit = struct ("t", t, "names", {{"T2.level"}}, "measured", 2 * t / 100,
%!               "predicted", 2 * t / 100, "censored", t > 80, "units", {{"m"}},
%!               "name", "step test");
%! h = figure ("visible", "off");
%! unwind_protect
%!   ax = plot_validate (h, fit, struct ("time", "s", "color", false));
%!   assert (get (findobj (ax(1), "tag", "censored"), "xdata"), [90 100]);
%!   assert (get (get (ax(1), "title"), "string"), "step test; 2 censored (rings)");
%! unwind_protect_cleanup
%!   close (h);
%! end_unwind_protect

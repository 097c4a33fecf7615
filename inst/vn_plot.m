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
## each labelled with its unit of measure and with a legend of the names.
## @item a step response @var{sr} (@code{vn_stepresponse}: fields @code{t},
## @code{nonlinear}, @code{linear}, @code{outputs}, @code{input},
## @code{size}, @code{metrics})
## one axes per output: the nonlinear response solid, the linear one
## dashed, the point at 63.2 % of the final change and the settling time
## (from @code{metrics}, fields @code{t63} and @code{settle}, times from the
## step) marked by small triangles and written in a note.
## @item a frequency response @var{fr} (@code{vn_frequency}: fields
## @code{w}, @code{magnitude}, @code{phase})
## magnitude on log-log axes over phase (deg) on semilog axes, one line
## per input/output pair, against frequency in rad/s.
## @item a fit against data @var{est} (field @code{fit})
## per experiment @var{k} a column: measured values as markers and the
## model as lines, the residuals (measured - predicted) in a small axes
## below.  Contract: @code{est.fit(k).t} (times, s), @code{.names}
## (cellstr of ny quantities), @code{.measured} and @code{.predicted}
## (nt x ny), optional @code{.units} (cellstr) and @code{.name} (label).
## @end table
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
  kind = plot_kind (s);
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
      case "frequency"
        ax = plot_freq (hf, s, opt);
        deftitle = "frequency response";
      case "fit"
        ax = plot_fit (hf, s, opt);
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

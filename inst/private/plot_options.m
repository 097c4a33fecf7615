## -*- texinfo -*-
## @deftypefn {} {@var{opt} =} plot_options (@var{args})
## Parse the name/value options of @code{vn_plot} into @var{opt} with
## fields @code{file}, @code{title}, @code{figure}, @code{time},
## @code{color}, @code{size} and @code{net} (the network whose display
## units to use); check each value.
## @end deftypefn

function opt = plot_options (args)
  opt = struct ("file", "", "title", [], "figure", [], "time", "auto",
                "color", false, "size", [900 600], "net", []);
  [names, vals] = vn_option_pairs (args, "vn_plot");
  for i = 1:numel (names)
    name = names{i};
    val = vals{i};
    switch (lower (name))
      case "file"
        if (! ischar (val) || isempty (val) || rows (val) != 1)
          error ("Octave:invalid-input-arg",
                 "vn_plot: option \"file\" must be a file name, e.g. \"trend.png\"");
        endif
        opt.file = val;
      case "title"
        if (! ischar (val) || rows (val) > 1)
          error ("Octave:invalid-input-arg",
                 "vn_plot: option \"title\" must be a string");
        endif
        opt.title = val;
      case "figure"
        if (! (isscalar (val) && isfigure (val)))
          error ("Octave:invalid-input-arg",
                 "vn_plot: option \"figure\" must be the handle of an open figure");
        endif
        opt.figure = val;
      case "time"
        allowed = {"s", "min", "h", "auto"};
        if (! ischar (val) || ! any (strcmp (allowed, val)))
          error ("Octave:invalid-input-arg",
                 "vn_plot: option \"time\" must be \"s\", \"min\", \"h\" or \"auto\", got %s",
                 disp_value (val));
        endif
        opt.time = val;
      case "color"
        if (! (isscalar (val) && (islogical (val) || isnumeric (val))))
          error ("Octave:invalid-input-arg",
                 "vn_plot: option \"color\" must be true or false");
        endif
        opt.color = logical (val);
      case "size"
        if (! (isnumeric (val) && numel (val) == 2 && all (val >= 100)
               && all (val <= 10000) && all (val == fix (val))))
          error ("Octave:invalid-input-arg",
                 "vn_plot: option \"size\" must be [width height] in pixels, 100 to 10000");
        endif
        opt.size = val(:).';
      case "net"
        if (! (isstruct (val) && isfield (val, "units") && isfield (val, "options")))
          error ("Octave:invalid-input-arg",
                 "vn_plot: option \"net\" must be a network made by vn_network");
        endif
        opt.net = val;
      otherwise
        error ("Octave:invalid-input-arg",
               "vn_plot: unknown option \"%s\"; allowed: file, title, figure, time, color, size, net",
               name);
    endswitch
  endfor
endfunction

function s = disp_value (v)
  if (ischar (v))
    s = ["\"" v "\""];
  elseif (isnumeric (v) || islogical (v))
    s = mat2str (v);
  else
    s = class (v);
  endif
endfunction

## -*- texinfo -*-
## @deftypefn {} {[@var{h}, @var{hidden}] =} plot_figure (@var{reuse})
## Return a cleared figure to draw on: @var{reuse} when it is a handle,
## else a new one.  @var{hidden} is true when the figure was created
## invisible here, so the caller may close it after writing a file.
##
## Without a display (no DISPLAY variable, as under octave-cli in tests
## and builds) the new figure is invisible and drawn by gnuplot, the one
## toolkit that renders to a file without a window.
## @end deftypefn

function [h, hidden] = plot_figure (reuse)
  hidden = false;
  if (! isempty (reuse))
    h = reuse;
    clf (h);
    return;
  endif
  nodisplay = isempty (getenv ("DISPLAY"));
  toolkit = graphics_toolkit ();
  avail = available_graphics_toolkits ();
  props = {};
  if ((nodisplay || ! any (strcmp (avail, toolkit)))
      && any (strcmp (avail, "gnuplot")))
    props = {"__graphics_toolkit__", "gnuplot"};
  endif
  if (nodisplay || strcmp (get (0, "defaultfigurevisible"), "off"))
    hidden = true;
    props(end+1:end+2) = {"visible", "off"};
  endif
  h = figure (props{:});
endfunction

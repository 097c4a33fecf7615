## -*- texinfo -*-
## @deftypefn {} {} plot_save (@var{h}, @var{file}, @var{size})
## Write figure @var{h} to @var{file} as a PNG of @var{size} = [width
## height] pixels; error when the file cannot be written.
## @end deftypefn

function plot_save (h, file, size)
  d = fileparts (file);
  if (! isempty (d) && ! isfolder (d))
    error ("Octave:invalid-input-arg",
           "vn_plot: cannot write \"%s\": folder \"%s\" does not exist",
           file, d);
  endif
  if (isfolder (file))
    error ("Octave:invalid-input-arg",
           "vn_plot: cannot write \"%s\": it is a folder", file);
  endif
  ## A stale file must not pass for a fresh one.
  if (exist (file, "file"))
    unlink (file);
  endif
  try
    print (h, "-dpng", sprintf ("-S%d,%d", size(1), size(2)), file);
  catch err
    error ("vesselnet:plot-file", "vn_plot: cannot write \"%s\": %s",
           file, err.message);
  end_try_catch
  info = dir (file);
  if (isempty (info) || info(1).bytes == 0)
    error ("vesselnet:plot-file",
           "vn_plot: cannot write \"%s\": no image came out", file);
  endif
endfunction

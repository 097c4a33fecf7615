## -*- texinfo -*-
## @deftypefn {} {@var{dir} =} demo_outdir (@var{preferred})
## Return a writable folder for the demo's pictures.
##
## Uses @var{preferred} (created if missing) when files can be written
## there, else a folder under the system's temporary directory, so that
## the demo also runs from a read-only installation.  The environment
## variable VN_DEMO_OUT, when set, is tried first.
## @end deftypefn

function dir = demo_outdir (preferred)
  candidates = {getenv("VN_DEMO_OUT"), preferred, ...
                fullfile(tempdir (), "vesselnet-demo")};
  for i = 1:numel (candidates)
    dir = candidates{i};
    if (! isempty (dir) && writable (dir))
      return;
    endif
  endfor
  error ("demo_outdir: no writable folder for the pictures (tried %s)",
         strjoin (candidates(! cellfun ("isempty", candidates)), ", "));
endfunction

## A folder is writable when it exists (or can be made) and a file can
## be created in it.
function ok = writable (dir)
  ok = false;
  if (! isfolder (dir))
    [made, ~] = mkdir (dir);
    if (! made)
      return;
    endif
  endif
  probe = fullfile (dir, ".write-probe");
  fid = fopen (probe, "w");
  if (fid < 0)
    return;
  endif
  fclose (fid);
  delete (probe);
  ok = true;
endfunction

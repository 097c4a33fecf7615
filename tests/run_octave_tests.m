## Run Octave's test () on the given files and record one result per file.
##
## Usage (from the top of the checkout, normally through
## tests/run_octave_tests.sh, which runs one file per process):
##
##   octave-cli --norc -q tests/run_octave_tests.m RESULTDIR FILE...
##
## FILE is an inst/*.m command, an inst/private/*.m helper or a
## tests/octave/*.m file of %!test blocks.  For each FILE this writes
## RESULTDIR/<name>.log (the failing blocks, from test's log output) and
## RESULTDIR/<name>.res, one line "PASSED FAILED SKIPPED FILE LOG NOTE"
## that tools/sum_results.sh adds up.  <name> is FILE with "/" -> "__".
## The path gets inst/, the oct-files from $VN_OCTDIR (default build/oct)
## and, last, tests/octave/ for shared fixtures.

1;

## Path and graphics set-up shared by every file: no display is needed.
function vn_test_setup (root)
  more off;
  page_screen_output (false);
  addpath (fullfile (root, "inst"));
  ## Shared fixtures of the integration tests, if any, live beside them.
  addpath (fullfile (root, "tests", "octave"), "-end");
  octdir = getenv ("VN_OCTDIR");
  if (isempty (octdir))
    octdir = fullfile (root, "build", "oct");
  endif
  if (isfolder (octdir))
    addpath (octdir);
  endif
  warning ("off", "Octave:gnuplot-graphics");
  if (any (strcmp (available_graphics_toolkits (), "gnuplot")))
    graphics_toolkit ("gnuplot");
  endif
  set (0, "defaultfigurevisible", "off");
endfunction

## Run the tests of one file; return the counts and a short note.
function [npass, nfail, nskip, note] = vn_test_file (file, logfile)
  npass = 0;
  nfail = 0;
  nskip = 0;
  note = "";
  fid = fopen (logfile, "w");
  if (fid < 0)
    error ("run_octave_tests: cannot write %s", logfile);
  endif
  here = pwd ();
  try
    [d, stem] = fileparts (file);
    [~, dname] = fileparts (d);
    if (strcmp (dname, "private"))
      ## Private functions are only visible from their own directory.
      cd (d);
      target = stem;
    else
      target = file;
    endif
    [n, nmax, nxfail, nbug, nsk, nrtsk] = test (target, "quiet", fid);
    cd (here);
    npass = n;
    ## Known failures and known bugs (%!xtest) do not count as failures;
    ## regressions do.
    nfail = nmax - n - nxfail - nbug;
    nskip = nsk + nrtsk;
    if (nxfail + nbug > 0)
      note = sprintf ("%d known failure(s)", nxfail + nbug);
    endif
    if (nmax == 0 && nskip == 0)
      nfail = 1;
      note = "test blocks found but none ran";
      fprintf (fid, "run_octave_tests: %s: %s\n", file, note);
    endif
  catch err
    cd (here);
    nfail = max (nfail, 1);
    note = "test () raised an error";
    fprintf (fid, "run_octave_tests: %s: test () raised: %s\n", file, ...
             err.message);
  end_try_catch
  fclose (fid);
  close all force;
endfunction

args = argv ();
if (numel (args) < 2)
  error ("usage: octave-cli tests/run_octave_tests.m RESULTDIR FILE...");
endif
root = fileparts (fileparts (mfilename ("fullpath")));
resdir = args{1};
if (! isfolder (resdir))
  mkdir (resdir);
endif
vn_test_setup (root);

for i = 2:numel (args)
  rel = args{i};
  file = make_absolute_filename (rel);
  name = strrep (rel, "/", "__");
  logfile = fullfile (resdir, [name ".log"]);
  [npass, nfail, nskip, note] = vn_test_file (file, logfile);
  fid = fopen (fullfile (resdir, [name ".res"]), "w");
  fprintf (fid, "%d %d %d %s %s %s\n", npass, nfail, nskip, rel, ...
           logfile, note);
  fclose (fid);
  if (nfail > 0)
    status = "FAIL";
  else
    status = "ok  ";
  endif
  printf ("  %s %-40s %3d passed, %d failed, %d skipped %s\n", status, ...
          rel, npass, nfail, nskip, note);
endfor

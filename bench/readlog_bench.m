## Speed of vn_readlog on a year of 10 s samples of 20 tags (3 153 600
## rows, about 0.5 GB of text), against the bare cost of Octave's own
## scanner on the same text (fileread + one sscanf with the row format,
## no checks, no unreadable entries) in this one process.  The file is an
## invented historian export written to a temporary directory and removed
## afterwards: ISO time stamps, comma delimited, values with three
## decimals, one tag with a "Bad" reading every 1000 rows.
## Environment: VN_BENCH_READLOG_ROWS (rows, default 3153600).
## A benchmark, not a test: nothing here asserts.

1;

## Write N rows in blocks: time stamps from datevec, values as a fixed-
## width character matrix, so writing costs little beside the reading.
function bytes = readlog_write (file, n, ntag, bad)
  fid = fopen (file, "w");
  hdr = ["time", sprintf(",FT%03d (m3/h)", 1:ntag/2), ...
         sprintf(",LT%03d [%%]", 1:ntag/2), "\n"];
  fwrite (fid, hdr);
  bytes = numel (hdr);
  t0 = datenum (2026, 1, 1);
  blk = 100000;
  rand ("seed", 1);
  for i0 = 0:blk:n-1
    k = (i0:min (i0 + blk, n) - 1).';
    dv = datevec (t0 + k * 10 / 86400);
    dv(:,6) = round (dv(:,6));
    ts = sprintf ("%04d-%02d-%02d %02d:%02d:%02d\n", dv.');
    ts = reshape (ts, 20, []).'(:,1:19);
    v = 50 + 10 * sin (k / 5000 + (1:ntag)) + rand (numel (k), ntag);
    vt = reshape (sprintf (",%7.3f", v.'), 8 * ntag, []).';
    if (bad)
      r = find (mod (k, 1000) == 999);
      vt(r,2:8) = repmat ("    Bad", numel (r), 1);
    endif
    txt = [ts, vt, repmat("\n", numel (k), 1)].';
    fwrite (fid, txt(:));
    bytes += numel (txt);
  endfor
  fclose (fid);
endfunction

n = str2double (getenv ("VN_BENCH_READLOG_ROWS"));
if (isnan (n))
  n = 3153600;
endif
ntag = 20;
dirn = tempname ();
mkdir (dirn);
unwind_protect
  printf ("\n10. Plant records: vn_readlog on %d rows x %d tags\n\n", n, ntag);
  fclean = fullfile (dirn, "clean.csv");
  fbad = fullfile (dirn, "bad.csv");
  tic; mb = readlog_write (fclean, n, ntag, false) / 2^20; tw = toc;
  readlog_write (fbad, n, ntag, true);
  printf ("written: %.0f MB per file in %.1f s\n\n", mb, tw);

  tic;
  s = fileread (fclean);
  s = s(find (s == "\n", 1) + 1:end);
  [v, cnt] = sscanf (s, ["%d-%d-%d %d:%d:%f", repmat(",%f", 1, ntag)]);
  base = toc;
  clear s v;
  tic; L = vn_readlog (fclean); tclean = toc;
  nrow = numel (L.t);
  clear L;
  tic; L = vn_readlog (fbad); tbad = toc;
  nbad = sum (L.bad);
  clear L;

  printf ("| case                          | rows    | s      | rows/s  | MB/s  | ratio to bare sscanf |\n");
  printf ("|-------------------------------|---------|--------|---------|-------|----------------------|\n");
  printf ("| bare fileread + sscanf        | %-7d | %-6.2f | %-7.3g | %-5.1f | 1                    |\n",
          cnt / (6 + ntag), base, cnt / (6 + ntag) / base, mb / base);
  printf ("| vn_readlog, clean             | %-7d | %-6.2f | %-7.3g | %-5.1f | %-20.2f |\n",
          nrow, tclean, nrow / tclean, mb / tclean, tclean / base);
  printf ("| vn_readlog, %-5d Bad entries | %-7d | %-6.2f | %-7.3g | %-5.1f | %-20.2f |\n",
          nbad, nrow, tbad, nrow / tbad, mb / tbad, tbad / base);
unwind_protect_cleanup
  delete (fullfile (dirn, "*.csv"));
  rmdir (dirn);
end_unwind_protect

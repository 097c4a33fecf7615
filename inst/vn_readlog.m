## -*- texinfo -*-
## @deftypefn  {} {@var{log} =} vn_readlog (@var{file})
## Read a plant record: a historian export of time-stamped readings.
##
## The file is delimited text.  Its first non-empty line is the header:
## the time column, then one tag per column, each with its unit after it
## in brackets or parentheses, e.g.
##
## @example
## time,FT101 (m3/h),LT101 [%],TT101 [degC]
## 2026-03-04 06:00:00,36.2,41.5,12.1
## 2026-03-04 06:00:10,36.4,Bad,12.1
## @end example
##
## @table @asis
## @item Delimiter
## "," ";" or a tab, detected from the header (tab before ";" before
## ",").  With ";" or tabs a decimal comma is accepted ("36,2").  Double
## quotes around fields are dropped.  A delimiter at the end of every line
## is allowed.  The text is UTF-8 (a byte order mark is skipped) or
## Latin-1; UTF-16 ("Unicode text" of spreadsheets) is refused.
## @item Time stamps
## ISO 8601 with a space or "T" between date and time and optional
## fractional seconds ("2026-03-04 06:00:00", "2026-03-04T06:00:00.250",
## a final "Z" allowed), day first ("04.03.2026 06:00:00"), or plain
## seconds ("0", "10.5").  Seconds may be left out ("06:00").  Every row
## must use the form of the first.  Dates are handled by the calendar
## (across midnight, month and year ends, 29 February in leap years);
## time zones and daylight saving are not: export in UTC or standard time,
## because the hour repeated when clocks go back would be refused.
## @item Readings
## Empty fields, "NaN", "Bad", "#N/A" and any other text that is not a
## number read as NaN and are counted per tag.
## @end table
##
## Times that go backwards or repeat are an error that names the line.
## Rows with more or fewer fields than the header, and time stamps that
## cannot be read, are errors that name the line too.
##
## Fields of @var{log}:
## @table @code
## @item t
## seconds from the first sample (a column)
## @item start
## the first time stamp as written ("" when times are plain seconds)
## @item names
## the tags in file order (time column excluded), as written without the
## unit
## @item units
## the units as written ("" if none)
## @item data
## samples x tags, converted to SI by @code{vn_units} (temperatures to
## degC; "%" becomes a fraction 0..1).  A tag whose unit
## @code{vn_units} does not know is kept as read, with a warning
## (@code{vesselnet:unknown-unit}).
## @item si
## the unit of each column of @code{data} (the SI unit, or the unit as
## written for a tag left unconverted)
## @item bad
## the count of unreadable entries per tag (a row)
## @item fields
## the field name under which each tag's column is stored
## @item @var{tag}
## each tag's column (as in @code{data}), under a valid field name: every
## character other than a letter, digit or underscore becomes "_", a name
## that does not start with a letter gets "x" in front ("101-FT" is
## @code{x101_FT}), names are cut to 63 characters, a name equal to one of
## the fields above gets "_" appended, and repeats get "_2", "_3", @dots{}
## @end table
##
## The file is read in blocks with Octave's vectorised text routines (no
## loop per line): a year of 10 s samples of 20 tags takes seconds, see
## @file{bench/readlog_bench.m}.
##
## Plant records feed @code{vn_experiment} and @code{vn_fit}; models fitted
## to them must be validated on tests they were not fitted to before they
## are used to operate a plant.
##
## @seealso{vn_units, vn_experiment, vn_fit}
## @end deftypefn

function log = vn_readlog (file)
  if (nargin != 1)
    print_usage ();
  endif
  fn = "vn_readlog";
  if (! (ischar (file) && rows (file) == 1 && ! isempty (file)))
    error ("Octave:invalid-input-arg",
           "%s: FILE must be a file name, got %s", fn, shown (file));
  endif
  [fid, msg] = fopen (file, "r");
  if (fid < 0)
    error ("Octave:invalid-input-arg", "%s: cannot open \"%s\": %s", fn,
           file, msg);
  endif
  where = sprintf ("%s: \"%s\"", fn, file);
  unwind_protect
    log = read_all (fid, where);
  unwind_protect_cleanup
    fclose (fid);
  end_unwind_protect
endfunction

## Read the header, then the data in blocks of whole lines.
function log = read_all (fid, where)
  blk = 8 * 2^20;
  rest = "";
  line0 = 0;          # lines of the file before REST
  hdr = [];
  pieces = {};
  first = true;
  last = [];          # time and line of the last row read
  cr = false;         # lines end in a carriage return alone
  while (true)
    [b, n] = fread (fid, blk, "*char");
    atend = n < blk;
    c = [rest, b.'];
    if (first && isempty (strfind (c, "\n")) && ! isempty (strfind (c, "\r")))
      cr = true;
    endif
    if (cr)
      c(c == "\r") = "\n";
    endif
    if (first)
      if (numel (c) >= 3 && all (double (c(1:3)) == [239 187 191]))
        c(1:3) = [];  # UTF-8 byte order mark
      elseif (numel (c) >= 2 && (all (double (c(1:2)) == [255 254])
                                 || all (double (c(1:2)) == [254 255])))
        error ("Octave:invalid-input-arg",
               ["%s: the file is UTF-16 text (\"Unicode text\"); save it ", ...
                "as UTF-8 or plain text (CSV) and read that"], where);
      endif
    endif
    if (atend)
      if (! isempty (c) && c(end) != "\n")
        c(end+1) = "\n";
      endif
      rest = "";
    else
      k = find (c == "\n", 1, "last");
      if (isempty (k))
        rest = c;
        continue;
      endif
      rest = c(k+1:end);
      c = c(1:k);
    endif
    nlines = sum (c == "\n");
    if (isempty (hdr))
      [hdr, c, skipped] = read_header (c, where, line0);
      line0 += skipped;
      nlines -= skipped;
      if (isempty (hdr))
        if (atend)
          error ("Octave:invalid-input-arg",
                 "%s: the file holds no header line followed by data", where);
        endif
        rest = [c rest];
        continue;
      endif
    endif
    if (! isempty (c))
      [piece, last] = parse_block (c, hdr, line0, where, last);
      pieces{end+1} = piece;
    endif
    line0 += nlines;
    first = false;
    if (atend)
      break;
    endif
  endwhile
  log = assemble (hdr, pieces, where);
endfunction

## The first non-empty line: delimiter, tags, units, and the row format
## (from the first data line).  Returns the text after the header line and
## the number of lines consumed; HDR is [] while no complete data line has
## been seen.
function [hdr, c, skipped] = read_header (c, where, line0)
  hdr = [];
  skipped = 0;
  nl = find (c == "\n");
  st = [1, nl(1:end-1) + 1];
  ## the header and the first data line: the first two lines that are not
  ## blank (a loop over the few lines before them, not over the file)
  found = [];
  for i = 1:numel (nl)
    s = c(st(i):nl(i)-1);
    if (! all (isspace (s) | s == "," | s == ";" | s == "\""))
      found(end+1) = i;
      if (numel (found) == 2)
        break;
      endif
    endif
  endfor
  if (numel (found) < 2)
    return;     # need the first data line too
  endif
  h = found(1);
  d = found(2);
  txt = {c(st(h):nl(h)-1), c(st(d):nl(d)-1)};
  txt = strrep (txt, "\r", "");
  h = 1;
  d = 2;
  line = strrep (txt{h}, "\"", "");
  if (any (line == "\t"))
    delim = "\t";
  elseif (any (line == ";"))
    delim = ";";
  elseif (any (line == ","))
    delim = ",";
  else
    error ("Octave:invalid-input-arg",
           ["%s line %d: the header \"%s\" has no delimiter; columns are ", ...
            "separated by \",\", \";\" or tabs"], where, line0 + h, line);
  endif
  f = strtrim (strsplit (line, delim, "collapsedelimiters", false));
  trailing = isempty (f{end}) && numel (f) > 2;
  if (trailing)
    f(end) = [];
  endif
  names = cell (1, numel (f) - 1);
  units = cell (1, numel (f) - 1);
  for j = 2:numel (f)
    tok = regexp (f{j}, '^(.*?)\s*[\[(]\s*([^\])]*?)\s*[\])]\s*$', "tokens", "once");
    if (isempty (tok))
      names{j-1} = f{j};
      units{j-1} = "";
    else
      names{j-1} = tok{1};
      units{j-1} = tok{2};
    endif
    if (isempty (names{j-1}))
      error ("Octave:invalid-input-arg",
             "%s line %d: column %d of the header has no tag name", where,
             line0 + found(1), j);
    endif
  endfor
  hdr.delim = delim;
  hdr.trailing = trailing;
  hdr.names = names;
  hdr.units = units;
  hdr.ntag = numel (names);
  hdr.line = line0 + found(1);
  ## time format from the first data line
  row = strrep (txt{d}, "\"", "");
  if (! strcmp (delim, ","))
    row = strrep (row, ",", ".");
  endif
  t1 = strtrim (strtok (row, delim));
  [hdr.tfmt, hdr.ntime, hdr.tchars, hdr.plain] = time_format (t1, where,
                                                              line0 + found(2));
  hdr.fmt = [hdr.tfmt, repmat(",%f", 1, hdr.ntag)];
  hdr.fmtblank = [hdr.tfmt, repmat(" ,%f", 1, hdr.ntag)];   # blanks before ","
  ## every field after the time that is not a number becomes NaN: first
  ## the empty ones (a comma before a comma or the line end; regexprep
  ## leaves empty matches alone), then the others
  hdr.nanpat = {',(?=[,\n])', ...
                ['(?<=,)(?! *[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)? *', ...
                 '(?:,|\n))[^,\n]*']};
  ## a row sscanf must read after the last one, so that a last row with
  ## fields to spare cannot end the scan quietly
  hdr.sentinel = [t1, repmat(",0", 1, hdr.ntag), "\n"];
  hdr.nper = hdr.ntime + hdr.ntag;
  skipped = found(1);
  c = c(st(found(1)+1):end);
endfunction

## The sscanf format of a time stamp, the numbers it gives, and the
## characters it may hold besides digits, "." "+" "-" and blanks.
function [fmt, n, chars, plain] = time_format (s, where, line)
  plain = false;
  chars = ":";
  [m, tok] = regexp (s, ['^\d{4}-\d{1,2}-\d{1,2}(?<sep>[ T])\d{1,2}:\d{1,2}', ...
                         '(?<sec>:\d{1,2}(?:\.\d*)?)?(?<z>Z?)$'], "start", "names");
  if (! isempty (m))
    fmt = ["%d-%d-%d" tok.sep "%d:%d"];
    chars = [":" tok.sep(tok.sep != " ") tok.z];
    if (! isempty (tok.sec))
      fmt = [fmt ":%f"];
    endif
    fmt = [fmt tok.z];
    n = 5 + ! isempty (tok.sec);
    return;
  endif
  [m, tok] = regexp (s, ['^\d{1,2}\.\d{1,2}\.\d{4} +\d{1,2}:\d{1,2}', ...
                         '(?<sec>:\d{1,2}(?:\.\d*)?)?$'], "start", "names");
  if (! isempty (m))
    fmt = "%d.%d.%d %d:%d";
    if (! isempty (tok.sec))
      fmt = [fmt ":%f"];
    endif
    n = 5 + ! isempty (tok.sec);
    return;
  endif
  if (! isempty (regexp (s, '^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$', "once")))
    fmt = "%f";
    n = 1;
    plain = true;
    chars = "";
    return;
  endif
  error ("Octave:invalid-input-arg",
         ["%s line %d: time stamp \"%s\" is not ISO 8601 (\"2026-03-04 ", ...
          "06:00:00\", \"2026-03-04T06:00:00.250\"), day first (\"04.03.2026 ", ...
          "06:00:00\") or plain seconds"], where, line, s);
endfunction

## Parse one block of whole lines: the rows as numbers (time columns, then
## tags), the file line of each row, and the last row's time.  Most blocks
## are read by one sscanf.  Where it stops (an unreadable entry, an empty
## field, blanks around a value), that line is cleaned by a regular
## expression and sscanf goes on from the next line; a block with many
## such lines is read by slow_block instead.
function [p, last] = parse_block (c, hdr, line0, where, last)
  if (! isempty (strfind (c, "\r")))
    c(c == "\r") = [];
  endif
  if (! isempty (strfind (c, "\"")))
    c(c == "\"") = [];
  endif
  if (! strcmp (hdr.delim, ","))
    c(c == ",") = ".";
    c(c == hdr.delim) = ",";
  endif
  if (hdr.trailing)
    c = strrep (c, ",\n", "\n");
  endif
  nlines = sum (c == "\n");
  nempty = numel (strfind (["\n" c], "\n\n"));
  n = nlines - nempty;
  ## sscanf reads a sign, blanks and then digits as one number ("-\n28"
  ## is -28): such a block is read carefully
  sb = sign_blank (c);
  if (isempty (sb))
    [v, cnt] = sscanf ([c hdr.sentinel], hdr.fmt);
  else
    v = [];
    cnt = -1;
  endif
  if (cnt == (n + 1) * hdr.nper)
    rows = reshape (v(1:n*hdr.nper), hdr.nper, n).';
    if (nempty == 0)
      lineno = line0 + (1:n);
    else
      nl = find (c == "\n");
      lineno = line0 + find (diff ([0 nl]) > 1);
    endif
  elseif (isempty (sb))
    [rows, lineno] = mend_block (c, hdr, line0, where, v, cnt);
  else
    [rows, lineno] = slow_block (c, hdr, line0, where);
  endif
  clear v;
  data = rows(:,hdr.ntime+1:end);
  data(isinf (data)) = NaN;
  [t, text1] = times (rows, hdr, c, line0, lineno, where);
  if (! isempty (t))
    ## times must increase, across blocks too
    if (isempty (last))
      tt = t;
      ll = lineno;
    else
      tt = [last.t; t];
      ll = [last.line, lineno];
    endif
    k = find (diff (tt) <= 0, 1);
    if (! isempty (k))
      if (tt(k+1) == tt(k))
        how = "repeats";
      else
        how = "goes backwards from";
      endif
      error ("Octave:invalid-input-arg",
             "%s line %d: time %s the time on line %d; times must increase",
             where, ll(k+1), how, ll(k));
    endif
    last.t = t(end);
    last.line = lineno(end);
  endif
  p.t = t;
  p.text1 = text1;
  p.data = data;
endfunction

## Go on from where sscanf stopped, one cleaned line at a time, at most
## 150 times per block (each costs a copy of the rest of the block); then,
## or when lines and rows do not match (a line of blanks that sscanf
## skipped), read the rest by slow_block.
function [rows, lineno] = mend_block (c, hdr, line0, where, v, cnt)
  nl = find (c == "\n");
  st = [1, nl(1:end-1) + 1];
  ne = find (nl > st);            # lines that are not empty
  m = numel (ne);
  np = hdr.nper;
  rows = zeros (m, np);
  keep = true (1, m);
  r = 1;
  for fails = 0:150
    nfull = min (floor (cnt / np), m - r + 1);
    rows(r:r+nfull-1,:) = reshape (v(1:nfull*np), np, nfull).';
    r += nfull;
    if (r > m)
      if (cnt == (nfull + 1) * np)
        break;                    # the sentinel row was read too
      endif
      r = m;                      # the last row holds more than it should
    endif
    i = ne(r);
    [x, how] = mend_line (c(st(i):nl(i)), hdr);
    switch (how)
      case "blank"
        keep(r) = false;
      case "mended"
        rows(r,:) = x;
      case "bad"
        bad_row (c, st, nl, i, 0, hdr, line0, where);
      otherwise
        ## rows and lines out of step (a line of blanks sscanf skipped, or
        ## a line before with fields to spare): the block read carefully
        [rows, lineno] = slow_block (c, hdr, line0, where);
        return;
    endswitch
    r += 1;
    if (r > m)
      break;
    elseif (fails >= 150)
      ## the rest of the block, read carefully
      done = find (keep(1:r-1));
      [rest, lrest] = slow_block (c(st(ne(r)):end), hdr, line0 + ne(r) - 1,
                                  where);
      rows = [rows(done,:); rest];
      lineno = [line0 + ne(done), lrest];
      return;
    endif
    [v, cnt] = sscanf ([c(st(ne(r)):end) hdr.sentinel], hdr.fmt);
  endfor
  rows = rows(keep,:);
  lineno = line0 + ne(keep);
endfunction

## One line sscanf stopped on: "blank" (blanks and delimiters only),
## "mended" (its fields that are not numbers set to NaN, read into X),
## "bad" (still unreadable: a time stamp or the number of fields), or
## "fine" (it reads as it is, so it was not the line that stopped sscanf).
function [x, how] = mend_line (s, hdr)
  x = [];
  if (all (s == " " | s == "," | s == "\t" | s == "\n"))
    how = "blank";
    return;
  endif
  [~, cnt] = sscanf ([s hdr.sentinel], hdr.fmt);
  if (cnt == 2 * hdr.nper)
    how = "fine";
    return;
  endif
  s = regexprep (s, hdr.nanpat, {",NaN", "NaN"});
  [x, cnt] = sscanf ([s hdr.sentinel], hdr.fmtblank);
  if (cnt == 2 * hdr.nper)
    x = x(1:hdr.nper).';
    how = "mended";
  else
    how = "bad";
  endif
endfunction

## The careful reading of a block: blank lines (blanks and delimiters
## only) skipped, lines with characters no number or time stamp holds or
## with an empty field cleaned by a regular expression (every field that
## is not a number becomes NaN), the rest read by sscanf as they are.
function [rows, lineno] = slow_block (c, hdr, line0, where)
  nl = find (c == "\n");
  st = [1, nl(1:end-1) + 1];
  content = cumsum (c > " " & c != ",");
  cnt = content(nl) - [0, content(nl(1:end-1))];
  clear content;
  keep = cnt > 0;
  lineno = line0 + find (keep);
  odd = ! ((c >= "0" & c <= "9") | c == "." | c == "," | c == "-" | c == "+"
           | c == " " | c == "\n" | c == "e" | c == "E");
  for ch = hdr.tchars
    odd = odd & c != ch;
  endfor
  odd(1:end-1) = odd(1:end-1) | (c(1:end-1) == ","
                                 & (c(2:end) == "," | c(2:end) == "\n"));
  odd(sign_blank (c)) = true;
  sus = false (1, numel (nl));
  pos = find (odd);
  clear odd;
  if (! isempty (pos))
    sus(lookup (nl, pos - 0.5) + 1) = true;
  endif
  sus &= keep;
  clean = keep & ! sus;
  hdr.fmt = hdr.fmtblank;
  rows = zeros (numel (nl), hdr.nper);
  [A, ok] = scan (c, st, nl, clean, hdr);
  if (ok)
    rows(clean,:) = A;
  else
    sus = keep;          # a malformed number among plain characters
  endif
  if (any (sus))
    s = regexprep (select (c, st, nl, sus), hdr.nanpat, {",NaN", "NaN"});
    [B, ok, nread] = scan (s, [], [], [], hdr);
    if (! ok)
      bad_row (c, st, nl, find (sus), nread, hdr, line0, where);
    endif
    rows(sus,:) = B;
  endif
  rows = rows(keep,:);
endfunction

## The text of line I of block C.
function s = line_text (c, i)
  nl = [0, find(c == "\n")];
  s = strtrim (c(nl(i)+1:nl(i+1)-1));
endfunction

## Positions of a sign followed by a blank, a tab or a line end.
function p = sign_blank (c)
  p = [strfind(c, "- "), strfind(c, "-\n"), strfind(c, "-\t"), ...
       strfind(c, "+ "), strfind(c, "+\n"), strfind(c, "+\t")];
endfunction

## The text of the lines marked in WHICH.
function s = select (c, st, nl, which)
  m = zeros (1, numel (c) + 1, "int8");
  m(st(which)) = 1;
  m(nl(which) + 1) -= 1;
  s = c(logical (cumsum (m(1:end-1))));
endfunction

## sscanf of the lines marked in WHICH (all of C when WHICH is empty).
function [A, ok, cnt] = scan (c, st, nl, which, hdr)
  if (! isempty (st))
    n = sum (which);
    if (n == 0)
      A = zeros (0, hdr.nper);
      ok = true;
      cnt = 0;
      return;
    endif
    if (n < numel (which))
      c = select (c, st, nl, which);
    endif
  else
    n = sum (c == "\n");
  endif
  [v, cnt] = sscanf ([c hdr.sentinel], hdr.fmt);
  ok = cnt == (n + 1) * hdr.nper;
  if (ok)
    A = reshape (v(1:end-hdr.nper), hdr.nper, n).';
  else
    A = [];
  endif
endfunction

## Say which line sscanf stopped on and why.
function bad_row (c, st, nl, lines, nread, hdr, line0, where)
  r = floor (nread / hdr.nper) + 1;
  r = min (r, numel (lines));
  if (r > 1)
    ## a row with fields to spare is read whole; sscanf stops on the next
    p = lines(r-1);
    if (sum (c(st(p):nl(p)-1) == ",") != hdr.ntag)
      r -= 1;
    endif
  endif
  i = lines(r);
  txt = c(st(i):nl(i)-1);
  nf = sum (txt == ",") + 1;
  if (nf != hdr.ntag + 1)
    why = sprintf ("has %d fields, the header %d", nf, hdr.ntag + 1);
  else
    why = "has a time stamp that cannot be read or is not in the form of the first row";
  endif
  if (numel (txt) > 80)
    txt = [txt(1:77) "..."];
  endif
  error ("Octave:invalid-input-arg", "%s line %d %s: \"%s\"", where,
         line0 + i, why, txt);
endfunction

## Seconds (absolute, from the calendar) of each row, checked.
function [t, text1] = times (rows, hdr, c, line0, lineno, where)
  text1 = "";
  if (isempty (rows))
    t = zeros (0, 1);
    return;
  endif
  if (! hdr.plain)
    text1 = strtrim (strtok (line_text (c, lineno(1) - line0), ","));
  endif
  if (hdr.plain)
    t = rows(:,1);
    bad = ! isfinite (t);
  else
    if (hdr.tfmt(3) == "-")
      y = rows(:,1); mo = rows(:,2); d = rows(:,3);
    else
      d = rows(:,1); mo = rows(:,2); y = rows(:,3);
    endif
    h = rows(:,4);
    mi = rows(:,5);
    if (hdr.ntime == 6)
      s = rows(:,6);
    else
      s = zeros (size (h));
    endif
    leap = mod (y, 4) == 0 & (mod (y, 100) != 0 | mod (y, 400) == 0);
    mdays = [31 28 31 30 31 30 31 31 30 31 30 31];
    okm = mo >= 1 & mo <= 12;
    dim = zeros (size (mo));
    dim(okm) = mdays(mo(okm)).' + (mo(okm) == 2 & leap(okm));
    bad = ! okm | d < 1 | d > dim | h > 23 | mi > 59 | ! (s >= 0 & s < 60);
    t = civil_days (y, mo, d) * 86400 + h * 3600 + mi * 60 + s;
  endif
  k = find (bad, 1);
  if (! isempty (k))
    error ("Octave:invalid-input-arg",
           "%s line %d: time stamp \"%s\" is not a valid date and time", where,
           lineno(k), strtrim (strtok (line_text (c, lineno(k) - line0), ",")));
  endif
endfunction

## Days since 1970-01-01 of the proleptic Gregorian calendar, by integer
## arithmetic (the days-from-civil algorithm of H. Hinnant, "chrono-
## compatible low-level date algorithms" (memory)).
function n = civil_days (y, m, d)
  y = y - (m <= 2);
  era = floor (y / 400);
  yoe = y - era * 400;
  mp = mod (m + 9, 12);
  doy = floor ((153 * mp + 2) / 5) + d - 1;
  doe = yoe * 365 + floor (yoe / 4) - floor (yoe / 100) + doy;
  n = era * 146097 + doe - 719468;
endfunction

## The blocks joined, converted to SI, and the fields of the log.
function log = assemble (hdr, pieces, where)
  t = zeros (0, 1);
  data = zeros (0, hdr.ntag);
  start = "";
  if (! isempty (pieces))
    p = [pieces{:}];
    t = vertcat (p.t);
    data = vertcat (p.data);
    start = p(1).text1;
  endif
  if (isempty (t))
    error ("Octave:invalid-input-arg", "%s: the file holds no data rows after the header",
           where);
  endif
  bad = sum (isnan (data), 1);
  si = hdr.units;
  unknown = {};
  for j = 1:hdr.ntag
    if (isempty (hdr.units{j}))
      continue;
    endif
    i = units_find (hdr.units{j});
    if (i == 0)
      unknown{end+1} = sprintf ("%s [%s]", hdr.names{j}, hdr.units{j});
      continue;
    endif
    [data(:,j), si{j}] = vn_units (data(:,j), hdr.units{j});
  endfor
  if (! isempty (unknown))
    warning ("vesselnet:unknown-unit",
             "%s: units not known to vn_units, values kept as read: %s",
             where, strjoin (unknown, ", "));
  endif
  log.t = t - t(1);
  if (hdr.plain)
    log.start = "";
  else
    log.start = start;
  endif
  log.names = hdr.names;
  log.units = hdr.units;
  log.data = data;
  log.si = si;
  log.bad = bad;
  log.fields = field_names (hdr.names);
  for j = 1:hdr.ntag
    log.(log.fields{j}) = data(:,j);
  endfor
endfunction

## Tags as valid, distinct field names that do not hide the log's own.
function f = field_names (names)
  own = {"t", "start", "names", "units", "data", "si", "bad", "fields"};
  f = regexprep (names, '[^A-Za-z0-9_]', "_");
  for j = 1:numel (f)
    if (isempty (regexp (f{j}, '^[A-Za-z]', "once")))
      f{j} = ["x" f{j}];
    endif
    f{j} = f{j}(1:min (end, namelengthmax ()));
    if (any (strcmp (f{j}, own)))
      f{j} = [f{j} "_"];
    endif
    base = f{j};
    k = 1;
    while (any (strcmp (f{j}, [f(1:j-1), own])))
      k += 1;
      f{j} = sprintf ("%s_%d", base, k);
    endwhile
  endfor
endfunction

function s = shown (v)
  if (ischar (v))
    s = ["\"" v(:).' "\""];
  else
    s = sprintf ("a %s", class (v));
  endif
endfunction

%!shared dir
%! dir = tempname ();
%! mkdir (dir);

%!function f = put (dir, name, txt)
%! f = fullfile (dir, name);
%! fid = fopen (f, "w");
%! fwrite (fid, txt);
%! fclose (fid);
%!endfunction

%!test
%! f = put (dir, "a.csv", ["time,FT101 (m3/h),LT101 [%],TT101 [degC]\n", ...
%!                         "2026-03-04 06:00:00,36,41.5,12.1\n", ...
%!                         "2026-03-04 06:00:10,72,Bad,12.2\n"]);
%! log = vn_readlog (f);
%! assert (log.t, [0; 10]);
%! assert (log.start, "2026-03-04 06:00:00");
%! assert (log.names, {"FT101", "LT101", "TT101"});
%! assert (log.units, {"m3/h", "%", "degC"});
%! assert (log.data, [0.01 0.415 12.1; 0.02 NaN 12.2], 1e-15);
%! assert (log.bad, [0 1 0]);
%! assert (log.FT101, [0.01; 0.02], 1e-15);
%! assert (log.si, {"m3/s", "1", "degC"});

%!error <vn_readlog: cannot open> vn_readlog (fullfile (tempdir (), "no such file.csv"))
%!error <Invalid call> vn_readlog ()

## vn_readlog on small historian exports written here, one per supported
## form: delimiters, decimal comma, time stamp forms, calendar edges,
## unreadable entries, and the errors for rows and times that are wrong.
## Expected values are worked by hand from the calendar: 2026 is not a
## leap year, 2028 is; a day has 86400 s (no leap seconds in UTC exports
## of this kind (memory)).

%!shared dir
%! dir = tempname ();
%! mkdir (dir);

%!function f = put (dir, name, txt)
%! f = fullfile (dir, name);
%! fid = fopen (f, "w");
%! fwrite (fid, txt);
%! fclose (fid);
%!endfunction

## ---- delimiters and decimal separators -------------------------------
%!test
%! ## comma, ISO with a space, units in () and []
%! f = put (dir, "comma.csv", ["Time,FT101 (m3/h),LT101 [%],PT101 [kPa]\n", ...
%!                             "2026-03-04 06:00:00,36,50,101.325\n", ...
%!                             "2026-03-04 06:00:10,18,25.5,200\n", ...
%!                             "2026-03-04 06:00:20,0,100,0\n"]);
%! log = vn_readlog (f);
%! assert (log.t, [0; 10; 20]);
%! assert (log.start, "2026-03-04 06:00:00");
%! assert (log.names, {"FT101", "LT101", "PT101"});
%! assert (log.units, {"m3/h", "%", "kPa"});
%! assert (log.si, {"m3/s", "1", "Pa"});
%! ## 36 m3/h = 0.01 m3/s (1 h = 3600 s, NIST SP 811 B.8); % -> fraction
%! assert (log.data, [0.01 0.5 101325; 0.005 0.255 2e5; 0 1 0], 1e-12);
%! assert (log.bad, [0 0 0]);
%! assert (log.FT101, log.data(:,1));
%! assert (log.PT101, log.data(:,3));

%!test
%! ## semicolon with a decimal comma, day-first time stamps, CRLF lines
%! f = put (dir, "semi.csv", ["Zeit;FT101 [m3/h];LT101 [%]\r\n", ...
%!                            "04.03.2026 06:00:00;36,5;41,25\r\n", ...
%!                            "04.03.2026 06:00:10,5;1,5e1;0,5\r\n"]);
%! log = vn_readlog (f);
%! assert (log.t, [0; 10.5], 1e-12);
%! assert (log.start, "04.03.2026 06:00:00");
%! assert (log.data, [36.5/3600 0.4125; 15/3600 0.005], 1e-15);

%!test
%! ## tab with a decimal comma, ISO with T and fractional seconds, final Z
%! f = put (dir, "tab.txt", ["time\tTT101 [degF]\tQ (L/s)\n", ...
%!                           "2026-03-04T06:00:00.250Z\t212\t1,5\n", ...
%!                           "2026-03-04T06:00:00.750Z\t32\t2\n", ...
%!                           "2026-03-04T06:00:01.000Z\t-40\t2,25\n"]);
%! log = vn_readlog (f);
%! assert (log.t, [0; 0.5; 0.75], 1e-12);
%! assert (log.start, "2026-03-04T06:00:00.250Z");
%! ## 212 degF = 100 degC, 32 degF = 0 degC, -40 degF = -40 degC (NIST SP 811 B.9)
%! assert (log.data(:,1), [100; 0; -40], 1e-12);
%! assert (log.data(:,2), [1.5e-3; 2e-3; 2.25e-3], 1e-15);

%!test
%! ## plain seconds, quoted fields, a trailing delimiter, blank lines and
%! ## a byte order mark
%! f = put (dir, "plain.csv", [char([239 187 191]), "\n\n", ...
%!                             "\"t\",\"F1\",\"L1 [mm]\",\n", ...
%!                             "0,1.5,1200,\n", "\n", "5.5,2.5,1300,\n", ...
%!                             ",,,\n", "12,3.5,,\n"]);
%! log = vn_readlog (f);
%! assert (log.t, [0; 5.5; 12]);
%! assert (log.start, "");
%! assert (log.names, {"F1", "L1"});
%! assert (log.units, {"", "mm"});
%! assert (log.data, [1.5 1.2; 2.5 1.3; 3.5 NaN], 1e-15);
%! assert (log.bad, [0 1]);

%!test
%! ## lines ended by a carriage return alone
%! log = vn_readlog (put (dir, "cr.csv", "t,x [mm]\r0,1\r5,2\r"));
%! assert ([log.t, log.x], [0 1e-3; 5 2e-3]);

## ---- calendar -------------------------------------------------------
%!test
%! ## across midnight, the end of February (2026: 28 days) and a year end
%! f = put (dir, "cal.csv", ["time,x\n", ...
%!                           "2026-02-28 23:59:50,1\n", ...
%!                           "2026-03-01 00:00:10,2\n", ...
%!                           "2026-12-31 23:59:59,3\n", ...
%!                           "2027-01-01 00:00:01,4\n"]);
%! log = vn_readlog (f);
%! ## 2026-03-01 is day 59 of 2026 (31 + 28), 2026-12-31 day 364, so the
%! ## year end is 364 - 58 days after 2026-02-28
%! assert (log.t, [0; 20; (364 - 58) * 86400 + 9; (364 - 58) * 86400 + 11]);

%!test
%! ## leap year: 2028-02-29 exists; day-first across a month end
%! f = put (dir, "leap.csv", ["time;x\n", ...
%!                            "28.02.2028 12:00:00;1\n", ...
%!                            "29.02.2028 12:00:00;2\n", ...
%!                            "01.03.2028 12:00:00;3\n", ...
%!                            "1.4.2028 12:00:00;4\n"]);
%! log = vn_readlog (f);
%! ## March has 31 days: 1 April is 31 days after 1 March
%! assert (log.t, [0; 1; 2; 33] * 86400);

%!test
%! ## seconds left out on every row
%! f = put (dir, "nosec.csv", "time,x\n2026-03-04 23:59,1\n2026-03-05 00:01,2\n");
%! log = vn_readlog (f);
%! assert (log.t, [0; 120]);

%!test
%! ## against Octave's datenum on random stamps over several years
%! rand ("seed", 3);
%! d0 = datenum (2023, 1, 1);
%! dn = sort (d0 + rand (200, 1) * 2000);
%! dn = unique (round (dn * 86400)) / 86400;
%! s = datestr (dn, "yyyy-mm-dd HH:MM:SS");
%! txt = [s, repmat(",1", rows (s), 1), repmat("\n", rows (s), 1)].';
%! f = put (dir, "rand.csv", ["time,x\n", txt(:).']);
%! log = vn_readlog (f);
%! assert (log.t, round ((dn - dn(1)) * 86400), 1e-6);
%! assert (numel (log.t), numel (dn));

## ---- unreadable entries ---------------------------------------------
%!test
%! f = put (dir, "bad.csv", ["time,A [m],B [m],C [m]\n", ...
%!                           "0,1,Bad,#N/A\n", ...
%!                           "10,NaN,,2\n", ...
%!                           "20,Comm Fail,1.2.3,3\n", ...
%!                           "30, 4 ,-,1e-3\n", ...
%!                           "40,Inf,5,x\n"]);
%! log = vn_readlog (f);
%! assert (log.bad, [3 4 2]);
%! assert (log.data(:,1), [1; NaN; NaN; 4; NaN]);
%! assert (log.data(:,2), [NaN; NaN; NaN; NaN; 5]);
%! assert (log.data(:,3), [NaN; 2; 3; 1e-3; NaN]);

%!test
%! ## field names made valid, distinct, and not hiding the log's own fields
%! f = put (dir, "names.csv", ["time,FT-101 (m3/h),101.PV,t,FT_101,data\n", ...
%!                             "0,1,2,3,4,5\n"]);
%! log = vn_readlog (f);
%! assert (log.fields, {"FT_101", "x101_PV", "t_", "FT_101_2", "data_"});
%! assert (log.t, 0);
%! assert (log.t_, 3);
%! assert (log.x101_PV, 2);
%! assert (log.FT_101_2, 4);
%! assert (log.data_, 5);

%!warning <units not known to vn_units, values kept as read: pH \[pH\]> vn_readlog (put (dir, "u.csv", "time,pH [pH],F [m3/h]\n0,7.1,36\n"));

## ---- errors ---------------------------------------------------------
%!error <vn_readlog: ".*back.csv" line 4: time goes backwards from the time on line 3; times must increase> vn_readlog (put (dir, "back.csv", "time,x\n\n2026-03-04 06:00:10,1\n2026-03-04 06:00:00,2\n"))
%!error <vn_readlog: ".*rep.csv" line 3: time repeats the time on line 2> vn_readlog (put (dir, "rep.csv", "t;x\n0;1\n0;2\n"))
%!error <vn_readlog: ".*rep2.csv" line 4: time repeats the time on line 3> vn_readlog (put (dir, "rep2.csv", "t,x\n0,1\n5,Bad\n5,2\n"))
%!error <vn_readlog: ".*fields.csv" line 3 has 2 fields, the header 3: "10,1"> vn_readlog (put (dir, "fields.csv", "t,x,y\n0,1,2\n10,1\n"))
%!error <vn_readlog: ".*fields2.csv" line 3 has 4 fields, the header 3> vn_readlog (put (dir, "fields2.csv", "t,x,y\n0,1,2\n10,1,2,3\n"))
%!error <vn_readlog: ".*date.csv" line 3: time stamp "2026-02-30 00:00:00" is not a valid date and time> vn_readlog (put (dir, "date.csv", "t,x\n2026-02-28 00:00:00,1\n2026-02-30 00:00:00,2\n"))
%!error <vn_readlog: ".*mixed.csv" line 3 has a time stamp that cannot be read> vn_readlog (put (dir, "mixed.csv", "t,x\n2026-02-28 00:00:00,1\n2026-02-28T00:00:10,2\n"))
%!error <vn_readlog: ".*us.csv" line 2: time stamp "03/04/2026 06:00" is not ISO 8601> vn_readlog (put (dir, "us.csv", "t,x\n03/04/2026 06:00,1\n"))
%!error <vn_readlog: ".*nodelim.csv" line 1: the header "time" has no delimiter> vn_readlog (put (dir, "nodelim.csv", "time\n0\n"))
%!error <vn_readlog: ".*empty.csv": the file holds no header line followed by data> vn_readlog (put (dir, "empty.csv", "\n\ntime,x\n"))
%!error <vn_readlog: ".*noname.csv" line 1: column 2 of the header has no tag name> vn_readlog (put (dir, "noname.csv", "time,,x\n0,1,2\n"))
%!error <vn_readlog: FILE must be a file name, got a double> vn_readlog (3)
%!error <vn_readlog: ".*u16.txt": the file is UTF-16 text> vn_readlog (put (dir, "u16.txt", [char([255 254]), "t", char(0), ",", char(0)]))
%!error <vn_readlog: ".*mid.csv" line 3 has 4 fields, the header 3: "10,1,2,3"> vn_readlog (put (dir, "mid.csv", "t,x,y\n0,1,2\n10,1,2,3\n20,1,2\n30,1,2\n"))
%!error <vn_readlog: ".*mid2.csv" line 4 has 2 fields, the header 3: "20,1"> vn_readlog (put (dir, "mid2.csv", "t,x,y\n0,1,2\n10,Bad,2\n20,1\n30,1,2\n"))

%!test
%! ## more unreadable entries in one block than the line-by-line mending
%! ## takes, and blanks around a value; then a line of blanks
%! for n = [600, 40]
%!   x = (1:n).';
%!   v = arrayfun (@(k) sprintf ("%d", k), x, "uniformoutput", false);
%!   v(3:3:end) = {"Bad"};
%!   v(5) = {" 5 "};
%!   txt = strjoin (cellfun (@(k, s) sprintf ("%d,%s,1\n", 10 * k, s), num2cell (x), v,
%!                           "uniformoutput", false), "");
%!   if (n == 40)
%!     txt = strrep (txt, "100,", "   \n100,");
%!   endif
%!   log = vn_readlog (put (dir, "many.csv", ["t,a,b\n", txt]));
%!   want = x;
%!   want(3:3:end) = NaN;
%!   assert (log.t, 10 * (x - 1));
%!   assert (log.a, want);
%!   assert (log.bad, [floor(n / 3), 0]);
%! endfor

%!test
%! ## random exports against a reader written here line by line (strsplit
%! ## and a strict number pattern per field): delimiters, decimal commas,
%! ## time stamp forms, and a mix of numbers, text and empty fields that
%! ## sends blocks down every path of vn_readlog
%! rand ("seed", 5);
%! forms = {"- 5", "+", "-\t", "1e", "e5", "inf", "nan", "Infinity", "1d3", "0x1A", "12.5", "-3", "1e3", ".5", "7.", "+2.25", "Bad", "", "#N/A", ...
%!          " 4 ", "1.2.3", "NaN", "-", "Comm Fail", "0", "-0.001"};
%! for trial = 1:15
%!   d = {",", ";", "\t"}{mod (trial, 3) + 1};
%!   n = 20 + floor (rand () * 300);
%!   ntag = 1 + floor (rand () * 5);
%!   pbad = rand () ^ 3;
%!   t = cumsum (1 + floor (rand (n, 1) * 30));
%!   lines = cell (n, 1);
%!   want = zeros (n, ntag);
%!   for i = 1:n
%!     f = cell (1, ntag);
%!     for j = 1:ntag
%!       if (rand () < pbad)
%!         f{j} = forms{1 + floor (rand () * numel (forms))};
%!         if (strcmp (d, "\t"))
%!           f{j} = strrep (f{j}, "\t", " ");
%!         endif
%!       else
%!         f{j} = sprintf ("%.4g", (rand () - 0.5) * 10 ^ floor (rand () * 6 - 2));
%!       endif
%!       s = strtrim (f{j});
%!       if (isempty (regexp (s, '^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$', "once")))
%!         want(i,j) = NaN;
%!       else
%!         want(i,j) = str2double (s);
%!       endif
%!       if (! strcmp (d, ","))
%!         f{j} = strrep (f{j}, ".", ",");
%!       endif
%!     endfor
%!     if (mod (trial, 5) == 0)
%!       ts = sprintf ("%g", t(i) + 0.5);
%!     elseif (mod (trial, 2))
%!       ts = datestr (datenum (2026, 12, 31, 23, 0, 0) + t(i) / 86400, "yyyy-mm-dd HH:MM:SS");
%!     else
%!       ts = datestr (datenum (2026, 2, 28, 23, 0, 0) + t(i) / 86400, "dd.mm.yyyy HH:MM:SS");
%!     endif
%!     lines{i} = strjoin ([{ts}, f], d);
%!   endfor
%!   hdr = strjoin ([{"time"}, arrayfun(@(j) sprintf ("X%d [m]", j), 1:ntag, "uniformoutput", false)], d);
%!   log = vn_readlog (put (dir, sprintf ("r%d.csv", trial), [hdr "\n" strjoin(lines, "\n") "\n"]));
%!   assert (log.t, t - t(1));
%!   assert (log.data, want, 1e-12);
%!   assert (log.bad, sum (isnan (want), 1));
%! endfor

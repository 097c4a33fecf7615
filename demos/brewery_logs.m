## -*- texinfo -*-
## @deftypefn {} {} brewery_logs (@var{dir})
## Write the two invented historian exports that @file{plant_record.m}
## reads: @file{brewery_step.csv} and @file{brewery_check.csv}.
##
## INVENTED scenario and data, no real plant: in an invented brewery the
## hot liquor tank HLT (0.8 m2, spill weir 1.9 m above its floor,
## overflow to drain) drains through a fixed orifice O1 (1.1e-3 m2.5/s)
## into the mash water tank MWT (0.5 m2), which drains through the
## linear valve LV1 (Kv 20, 60 % open).  The feed is a flow controller's
## set point FIC101 (m3/h), stepped by hand.  The level transmitters:
## LT101 on HLT, 0..2.5 m, reads 0.04 m high (a zero error of 1.6 % of span),
## and lost some readings ("Bad"); LT102 on MWT, 0..0.9 m, sticks at
## 100 % above 0.9 m.  Readings are in % of span with 0.2 % noise,
## rounded to 0.01 %.
##
## The step test starts from levels nobody wrote down (0.95 and 0.55 m,
## not steady) and overflows HLT; the check test, a week later, starts
## steady.  The step test is exported with ";" and decimal commas and
## day-first time stamps, the check test with "," and ISO time stamps.
## @end deftypefn

function brewery_logs (dir)
  truth = brewery_truth ();
  randn ("state", 2026);
  ## step test: 90 min at 10 s, feed 2.4 -> 5.0 (10 min) -> 3.0 m3/h (50 min)
  t = (0:10:5400).';
  sp = 2.4 + 2.6 * (t >= 600) - 2.0 * (t >= 3000);
  y = run (truth, t, sp, [0.95 0.55]);
  lt101 = pct (y(:, 1) + 0.04, 2.5);
  lt101([123 124 400 477]) = NaN;       # the historian's "Bad"
  lt102 = min (pct (y(:, 2), 0.9), 100);
  write_log (fullfile (dir, "brewery_step.csv"), ";", "dmy",
             datenum (2026, 3, 4, 23, 30, 0), t, [sp, lt101, lt102]);
  ## check test: a week later, steady at 3.6 m3/h, down to 2.2 at 15 min
  t = (0:10:3600).';
  sp = 3.6 - 1.4 * (t >= 900);
  y = run (truth, t, sp, []);
  lt101 = pct (y(:, 1) + 0.04, 2.5);
  lt102 = min (pct (y(:, 2), 0.9), 100);
  write_log (fullfile (dir, "brewery_check.csv"), ",", "iso",
             datenum (2026, 3, 11, 6, 0, 0), t, [sp, lt101, lt102]);
endfunction

function net = brewery_truth ()
  net = vn_network ("invented brewery, true plant");
  net = vn_tank (net, "HLT", "area", 0.8, "rim", 1.9, "level", 0.95);
  net = vn_tank (net, "MWT", "area", 0.5, "level", 0.55);
  net = vn_feed (net, "FIC101", "HLT", "flow", 2.4 / 3600);
  net = vn_orifice (net, "O1", "HLT", "MWT", "coeff", 1.1e-3);
  net = vn_valve (net, "LV1", "MWT", "", "kv", 20, "opening", 0.6);
endfunction

## Levels of HLT and MWT, the set point (m3/h) held between samples;
## from the declared levels l0 or, when empty, steady.
function y = run (net, t, sp, l0)
  u = struct ("quantity", "FIC101.flow", "t", t, "v", sp / 3600,
              "hold", true, "kind", "table");
  if (isempty (l0))
    net.units(net.index.FIC101).par.flow = sp(1) / 3600;
    res = vn_simulate (net, t, u, "initial", vn_steady (net));
  else
    net.units(net.index.HLT).par.level = l0(1);
    net.units(net.index.MWT).par.level = l0(2);
    res = vn_simulate (net, t, u);
  endif
  y = [res.HLT.level, res.MWT.level];
endfunction

## % of a 0..span transmitter with 0.2 % noise, rounded to 0.01 %.
function p = pct (level, span)
  p = 100 * level / span + 0.2 * randn (size (level));
  p = round (p * 100) / 100;
endfunction

function write_log (file, sep, form, t0, t, v)
  fid = fopen (file, "w");
  if (fid < 0)
    error ("brewery_logs: cannot write %s", file);
  endif
  fprintf (fid, "time%sFIC101_SP (m3/h)%sLT101 [%%]%sLT102 [%%]\n", sep, sep, sep);
  for i = 1:numel (t)
    if (strcmp (form, "iso"))
      ts = datestr (t0 + t(i) / 86400, "yyyy-mm-dd HH:MM:SS");
    else
      ts = datestr (t0 + t(i) / 86400, "dd.mm.yyyy HH:MM:SS");
    endif
    f = cell (1, 3);
    for j = 1:3
      if (isnan (v(i, j)))
        f{j} = "Bad";
      else
        f{j} = sprintf ("%.2f", v(i, j));
        if (strcmp (sep, ";"))
          f{j} = strrep (f{j}, ".", ",");
        endif
      endif
    endfor
    fprintf (fid, "%s%s%s%s%s%s%s\n", ts, sep, f{1}, sep, f{2}, sep, f{3});
  endfor
  fclose (fid);
endfunction

/* Writes the seed corpus of the fuzzer (tests/fuzz/corpus): a few small
 * networks encoded as fuzz_run.h decodes them, so fuzzing starts from
 * networks that build and run, and the regression inputs of defects
 * found (tests/fuzz/regress).  Usage: seeds [CORPUS [REGRESS]].  Parameter slots and
 * kind codes come from the core's schema, so the seeds follow it. */
#include <stdint.h>
#include <stdio.h>
#include <string.h>
#define FZ_VERBOSE 1
#include "fuzz_run.h"

typedef struct fz_w {
  uint8_t b[4096];
  size_t n;
} fz_w;

static void put (fz_w *w, int byte) { w->b[w->n++] = (uint8_t) byte; }

/* a value as the raw-double form: 240, any byte, 8 bytes */
static void put_value (fz_w *w, double v)
{
  uint8_t raw[8];
  memcpy (raw, &v, sizeof raw);
  put (w, 240);
  put (w, 0);
  for (int i = 0; i < 8; i++)
    put (w, raw[i]);
}

static int slot_of (int kind, const char *name)
{
  for (int j = 0; j < vn_kind_npar (kind); j++)
    if (strcmp (vn_kind_param (kind, j)->name, name) == 0)
      return j;
  fprintf (stderr, "seeds: kind %s has no parameter %s\n",
           vn_kind_name (kind), name);
  exit (2);
}

static int out_of (const char *kind, const char *name)
{
  int k = vn_kind_find (kind);
  for (int j = 0; j < vn_kind_nout (k); j++)
    if (strcmp (vn_kind_out_name (k, j), name) == 0)
      return j;
  fprintf (stderr, "seeds: kind %s has no output %s\n", kind, name);
  exit (2);
}

/* A unit: kind, references as unit indices (-1 none) or, with idx set,
 * as raw indices; then NULL-terminated (name, value) pairs. */
typedef struct fz_par { const char *name; double v; } fz_par;

static void put_unit (fz_w *w, const char *kind, const int ref[4],
                      const int idx[4], const fz_par *p, int table_rows)
{
  int k = vn_kind_find (kind);
  put (w, k);
  for (int j = 0; j < 4; j++)
    put (w, idx[j] ? 0x80 + ref[j] + 1 : ref[j] + 1);
  uint32_t mask = 0;
  double val[32];
  for (int i = 0; p[i].name; i++)
    {
      int s = slot_of (k, p[i].name);
      mask |= 1u << s;
      val[s] = p[i].v;
    }
  for (int j = 0; j < 4; j++)
    put (w, (int) (mask >> (8 * j)) & 0xFF);
  for (int j = 0; j < 32; j++)
    if (mask & (1u << j))
      put_value (w, val[j]);
  put (w, table_rows ? 1 | (table_rows << 1) : 0);
  for (int i = 0; i < table_rows; i++)
    {
      put (w, 16);   /* level step 1 m */
      put (w, 8 + 4 * i);   /* volume steps 2, 3, 4 ... m3 */
    }
}

/* An input the core must refuse with a message containing WANT. */
static void save_refused (const char *dir, const char *name, const fz_w *w,
                          const char *want)
{
  char path[512];
  snprintf (path, sizeof path, "%s/%s", dir, name);
  FILE *f = fopen (path, "wb");
  if (!f || fwrite (w->b, 1, w->n, f) != w->n || fclose (f))
    {
      fprintf (stderr, "seeds: cannot write %s\n", path);
      exit (1);
    }
  fz_reader r = {w->b, w->n, 0};
  static fz_case c;
  fz_decode_spec (&r, &c);
  vn_net *net = NULL;
  char msg[1024] = "";
  if (vn_net_new (&c.spec, &net, msg, sizeof msg) != VN_EARG
      || !strstr (msg, want))
    {
      fprintf (stderr, "seeds: %s is not refused with \"%s\": %s\n", name,
               want, msg);
      exit (1);
    }
  printf ("%s: %zu bytes, refused: %s\n", name, w->n, msg);
}

static void save (const char *dir, const char *name, const fz_w *w)
{
  char path[512];
  snprintf (path, sizeof path, "%s/%s", dir, name);
  FILE *f = fopen (path, "wb");
  if (!f || fwrite (w->b, 1, w->n, f) != w->n || fclose (f))
    {
      fprintf (stderr, "seeds: cannot write %s\n", path);
      exit (1);
    }
  /* each seed must build: a seed that is refused teaches the fuzzer
   * nothing about the deeper code */
  fz_reader r = {w->b, w->n, 0};
  static fz_case c;
  fz_decode_spec (&r, &c);
  vn_net *net = NULL;
  char msg[1024];
  if (vn_net_new (&c.spec, &net, msg, sizeof msg) != VN_OK)
    {
      fprintf (stderr, "seeds: %s does not build: %s\n", name, msg);
      exit (1);
    }
  vn_net_free (net);
  printf ("%s: %zu bytes\n", name, w->n);
  fz_run (w->b, w->n);
}

static const int N0[4] = {0, 0, 0, 0};

static void run_bytes (fz_w *w, int start, int horizon, int flags)
{
  put (w, start);
  put (w, horizon);
  put (w, flags);
}

int main (int argc, char **argv)
{
  const char *dir = argc > 1 ? argv[1] : "tests/fuzz/corpus";
  fz_w w;

  /* feed -> tank -> orifice; a step on the feed */
  memset (&w, 0, sizeof w);
  put (&w, 2);   /* 3 units */
  put (&w, 0);
  put_unit (&w, "tank", (int[4]) {-1, -1, -1, -1}, N0,
            (fz_par[]) {{"area", 2}, {"level", 1}, {NULL, 0}}, 0);
  put_unit (&w, "feed", (int[4]) {-1, 0, -1, -1}, N0,
            (fz_par[]) {{"flow", 0.012}, {NULL, 0}}, 0);
  put_unit (&w, "orifice", (int[4]) {0, -1, -1, -1}, N0,
            (fz_par[]) {{"coeff", 0.01}, {NULL, 0}}, 0);
  put (&w, 1);                     /* one signal */
  put (&w, 1);
  put (&w, slot_of (vn_kind_find ("feed"), "flow"));
  put (&w, 1);                     /* two points */
  put (&w, 0);
  put (&w, 50);
  put_value (&w, 0.012);
  put (&w, 0);
  put_value (&w, 0.02);
  run_bytes (&w, 0, 3, 1 | 2 | 32);
  /* parameter 21: the feed's flow (the tank has 21 slots before it) */
  put (&w, 21);   /* sensitivity to the feed flow */
  put (&w, 0);    /* of the tank level */
  put (&w, 21);   /* steady: adjust the feed flow */
  put (&w, 0);    /* so that the tank level */
  put_value (&w, 1.5);
  save (dir, "tank_orifice", &w);

  /* two tanks, valve, pump and resistance to a boundary */
  memset (&w, 0, sizeof w);
  put (&w, 5);   /* 6 units */
  put (&w, 0);
  put_unit (&w, "tank", (int[4]) {-1, -1, -1, -1}, N0,
            (fz_par[]) {{"area", 3}, {"level", 2}, {NULL, 0}}, 0);
  put_unit (&w, "tank", (int[4]) {-1, -1, -1, -1}, N0,
            (fz_par[]) {{"area", 1}, {"level", 0.5}, {NULL, 0}}, 0);
  put_unit (&w, "boundary", (int[4]) {-1, -1, -1, -1}, N0,
            (fz_par[]) {{"head", 0.2}, {NULL, 0}}, 0);
  put_unit (&w, "valve", (int[4]) {0, 1, -1, -1}, N0,
            (fz_par[]) {{"kv", 20}, {"opening", 0.4}, {"char", 1},
                        {"lag", 5}, {NULL, 0}}, 0);
  put_unit (&w, "pump", (int[4]) {1, 0, -1, -1}, N0,
            (fz_par[]) {{"shutoff", 8}, {"k", 2e4}, {"speed", 0.8},
                        {NULL, 0}}, 0);
  put_unit (&w, "resistance", (int[4]) {1, 2, -1, -1}, N0,
            (fz_par[]) {{"r", 1e5}, {NULL, 0}}, 0);
  put (&w, 0);
  run_bytes (&w, 0, 4, 4 | 32);
  save (dir, "valve_pump", &w);

  /* level controller on a valve and a high-level switch on a pump */
  memset (&w, 0, sizeof w);
  put (&w, 5);
  put (&w, 0);
  int kv = vn_kind_find ("valve"), kp = vn_kind_find ("pump");
  int lvl = out_of ("tank", "level");
  put_unit (&w, "tank", (int[4]) {-1, -1, -1, -1}, N0,
            (fz_par[]) {{"area", 2}, {"level", 1.5}, {NULL, 0}}, 0);
  put_unit (&w, "feed", (int[4]) {-1, 0, -1, -1}, N0,
            (fz_par[]) {{"flow", 0.01}, {NULL, 0}}, 0);
  put_unit (&w, "valve", (int[4]) {0, -1, -1, -1}, N0,
            (fz_par[]) {{"kv", 30}, {"opening", 0.5}, {NULL, 0}}, 0);
  put_unit (&w, "pump", (int[4]) {0, -1, -1, -1}, N0,
            (fz_par[]) {{"flow", 0.03}, {"speed", 0},
                        {NULL, 0}}, 0);
  put_unit (&w, "controller", (int[4]) {0, lvl, 2, slot_of (kv, "opening")},
            (int[4]) {0, 1, 0, 1},
            (fz_par[]) {{"setpoint", 1}, {"gain", 2}, {"reset", 100},
                        {"action", 0}, {"lo", 0}, {"hi", 1}, {NULL, 0}}, 0);
  put_unit (&w, "switch", (int[4]) {0, lvl, 3, slot_of (kp, "speed")},
            (int[4]) {0, 1, 0, 1},
            (fz_par[]) {{"on", 1.8}, {"off", 1.2}, {NULL, 0}}, 0);
  put (&w, 1);                     /* a setpoint step */
  put (&w, 4);
  put (&w, slot_of (vn_kind_find ("controller"), "setpoint"));
  put (&w, 0x81);                  /* two points, hold */
  put (&w, 1);
  put (&w, 100);
  put_value (&w, 1);
  put (&w, 0);
  put_value (&w, 1.4);
  run_bytes (&w, 0, 3, 0);
  save (dir, "controller_switch", &w);

  /* thermal network, one species: a heated tank and a feed */
  memset (&w, 0, sizeof w);
  put (&w, 3);
  put (&w, 1 | (1 << 1));
  put_value (&w, 1e-4);            /* decay of the species */
  put_unit (&w, "tank", (int[4]) {-1, -1, -1, -1}, N0,
            (fz_par[]) {{"area", 1}, {"level", 1}, {"temperature", 15},
                        {"ua", 50}, {"c1", 2}, {NULL, 0}}, 0);
  put_unit (&w, "feed", (int[4]) {-1, 0, -1, -1}, N0,
            (fz_par[]) {{"flow", 0.002}, {"temperature", 60}, {"c1", 5},
                        {NULL, 0}}, 0);
  put_unit (&w, "orifice", (int[4]) {0, -1, -1, -1}, N0,
            (fz_par[]) {{"coeff", 0.002}, {NULL, 0}}, 0);
  put_unit (&w, "heater", (int[4]) {-1, 0, -1, -1}, N0,
            (fz_par[]) {{"duty", 2e4}, {"lag", 30}, {NULL, 0}}, 0);
  put (&w, 0);
  run_bytes (&w, 0, 3, 1 | 32);
  put (&w, 0);
  put (&w, 4);
  save (dir, "thermal_species", &w);

  /* a tank with a strapping table and a spill to a second tank */
  memset (&w, 0, sizeof w);
  put (&w, 2);
  put (&w, 0);
  put_unit (&w, "tank", (int[4]) {1, -1, -1, -1}, N0,
            (fz_par[]) {{"shape", 4}, {"level", 0.5}, {"rim", 3},
                        {NULL, 0}}, 4);
  put_unit (&w, "tank", (int[4]) {-1, -1, -1, -1}, N0,
            (fz_par[]) {{"area", 1}, {"level", 0}, {NULL, 0}}, 0);
  put_unit (&w, "feed", (int[4]) {-1, 0, -1, -1}, N0,
            (fz_par[]) {{"flow", 0.05}, {NULL, 0}}, 0);
  put (&w, 0);
  run_bytes (&w, 0, 3, 8);
  save (dir, "table_spill", &w);

  /* regressions: a table whose offset lies outside the packed pairs */
  const char *reg = argc > 2 ? argv[2] : "tests/fuzz/regress";
  for (int wild = 0; wild < 2; wild++)
    {
      memset (&w, 0, sizeof w);
      put (&w, 1);
      put (&w, 0);
      put_unit (&w, "tank", (int[4]) {-1, -1, -1, -1}, N0,
                (fz_par[]) {{"shape", 4}, {"level", 0.5}, {NULL, 0}}, 3);
      w.b[w.n - 7] |= wild ? 0xC0 : 0x80;   /* the table byte */
      put_unit (&w, "orifice", (int[4]) {0, -1, -1, -1}, N0,
                (fz_par[]) {{"coeff", 0.01}, {NULL, 0}}, 0);
      save_refused (reg, wild ? "table_offset_wild" : "table_offset_past_end",
                    &w, wild ? "rows -99999999 to -99999997 lie outside"
                             : "rows 4 to 6 lie outside the 3 packed");
    }
  return 0;
}

/* Ensembles (src/core/ensemble.c): every run equals a single vn_simulate
 * of a network built with that run's parameters, bit for bit, whatever
 * the number of workers; a failed run is reported with its message and
 * never stops the others.  The network has a level controller on a valve
 * (its output moves the valve's opening, an input, during each run) and
 * a signal, so state left over from an earlier run on the same worker
 * would show. */
#define _POSIX_C_SOURCE 200809L
#include <math.h>
#include <unistd.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include "vn.h"
#include "vn_ens.h"
#include "vn_jobfile.h"
#include "vn_test.h"

enum { NT = 61, NRUN = 7 };

/* Feed -> T1 -> orifice -> T2 -> valve (level controlled) -> out. */
static void plant (vt_net *b, double coeff, double area2)
{
  vt_init (b);
  int t1 = vt_unit (b, "tank", "T1", -1, -1);
  vt_set (b, t1, "area", 2);
  vt_set (b, t1, "level", 1.5);
  int t2 = vt_unit (b, "tank", "T2", -1, -1);
  vt_set (b, t2, "area", area2);
  vt_set (b, t2, "level", 1.0);
  int f = vt_unit (b, "feed", "F1", -1, t1);
  vt_set (b, f, "flow", 0.01);
  int o = vt_unit (b, "orifice", "O1", t1, t2);
  vt_set (b, o, "coeff", coeff);
  int v = vt_unit (b, "valve", "V1", t2, -1);
  vt_set (b, v, "kv", 40);
  vt_set (b, v, "opening", 0.5);
  int c = vt_unit (b, "controller", "LC", t2, 0);    /* T2 level */
  b->ref[4 * c + 2] = v;
  b->ref[4 * c + 3] = vt_slot (b->kind[v], "opening");
  vt_set (b, c, "setpoint", 1.2);
  vt_set (b, c, "gain", -0.8);
  vt_set (b, c, "reset", 120);
  vt_set (b, c, "lo", 0);
  vt_set (b, c, "hi", 1);
}

int main (void)
{
  static double tout[NT], Y1[NT * 64], Yens[3][NT * 64 * NRUN];
  for (int k = 0; k < NT; k++)
    tout[k] = 10.0 * k;
  /* feed steps from 0.01 to 0.014 at t = 200 s */
  double sd[] = {200, 0.01, 200, 0.014};
  int su = 2, sslot, soff = 0, slen = 2, shold = 0;
  double coeff[NRUN] = {0.006, 0.01, -1, 0.014, 0.02, 0.012, 0.008};
  double area[NRUN] = {1.0, 1.5, 2.0, 2.5, 3.0, 1e12 * 10, 1.2};
  double P[2 * NRUN];
  for (int r = 0; r < NRUN; r++)
    {
      P[r] = coeff[r];
      P[NRUN + r] = area[r];
    }
  vt_net b;
  plant (&b, 0.01, 1.5);
  vn_net *net = NULL;
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "network builds (%s)", b.msg);
      return vt_done ();
    }
  sslot = vt_slot (b.kind[su], "flow");
  int pidx[2] = {vt_pidx (&b, net, 3, "coeff"), vt_pidx (&b, net, 1, "area")};
  int ny = vn_noutputs (net);
  vn_net_free (net);

  int workers[3] = {1, 2, 3};
  int status[3][NRUN];
  static char msg[3][NRUN * 256];
  for (int w = 0; w < 3; w++)
    {
      vn_ens_job job;
      memset (&job, 0, sizeof job);
      job.spec = &b.spec;
      job.nsig = 1;
      job.sig_unit = &su;
      job.sig_slot = &sslot;
      job.sig_off = &soff;
      job.sig_len = &slen;
      job.sig_hold = &shold;
      job.sig_data = sd;
      job.nt = NT;
      job.tout = tout;
      job.nvar = 2;
      job.pidx = pidx;
      job.nrun = NRUN;
      job.P = P;
      job.workers = workers[w];
      vn_ens_out out;
      memset (&out, 0, sizeof out);
      out.Y = Yens[w];
      out.status = status[w];
      out.msg = msg[w];
      out.msglen = 256;
      char err[256];
      int st = vn_ensemble (&job, &out, err, sizeof err);
      VT_CHECK (st == VN_OK, "%d workers: ensemble runs (%s)", workers[w],
                err);
      VT_CHECK (out.done == NRUN, "%d workers: %ld of %d runs done",
                workers[w], out.done, NRUN);
    }
  for (int r = 0; r < NRUN; r++)
    {
      vt_net br;
      plant (&br, coeff[r], area[r]);
      vn_net *n1 = NULL;
      int st = vt_build (&br, &n1);
      double x0[16];
      if (!st)
        st = vn_set_signals (n1, 1, &su, &sslot, &soff, &slen, &shold, sd);
      if (!st)
        st = vn_initial_state (n1, x0);
      vn_sim_stats stats;
      if (!st)
        st = vn_simulate (n1, x0, NT, tout, NULL, Y1, NULL, &stats);
      for (int w = 0; w < 3; w++)
        {
          VT_CHECK ((st != VN_OK) == (status[w][r] != VN_OK),
                    "run %d, %d workers: fails (%d) as the single run (%d)",
                    r + 1, workers[w], status[w][r], st);
          if (st)
            {
              VT_CHECK (strstr (msg[w] + 256 * r, r == 2 ? "coeff" : "area")
                        != NULL, "run %d: message names the parameter: %s",
                        r + 1, msg[w] + 256 * r);
              VT_CHECK (isnan (Yens[w][(long) NT * ny * r]),
                        "run %d: a failed run's record is NaN", r + 1);
              continue;
            }
          int same = 1;     /* NaN (an output a network lacks) on both */
          for (long i = 0; i < (long) NT * ny; i++)
            {
              double a = Yens[w][(long) NT * ny * r + i], c = Y1[i];
              same &= a == c || (isnan (a) && isnan (c));
            }
          VT_CHECK (same, "run %d, %d workers: equals the single run bit "
                    "for bit", r + 1, workers[w]);
        }
      vn_net_free (n1);
    }
  /* the job through a file, as the MPI program reads it: the same
   * records; a damaged file (cut short anywhere, bytes changed) is
   * refused or read, never a crash */
  {
    vn_ens_job job;
    memset (&job, 0, sizeof job);
    job.spec = &b.spec;
    job.nsig = 1;
    job.sig_unit = &su;
    job.sig_slot = &sslot;
    job.sig_off = &soff;
    job.sig_len = &slen;
    job.sig_hold = &shold;
    job.sig_data = sd;
    job.nt = NT;
    job.tout = tout;
    job.nvar = 2;
    job.pidx = pidx;
    job.nrun = NRUN;
    job.P = P;
    job.workers = 2;
    char path[] = "/tmp/vn_test_jobXXXXXX";
    int fd = mkstemp (path);
    char err[512];
    VT_CHECK (fd >= 0 && vn_job_write (path, &job, err, sizeof err) == VN_OK,
              "job written (%s)", err);
    unsigned char *buf = NULL;
    size_t len = 0;
    VT_CHECK (vn_file_read (path, &buf, &len, err, sizeof err) == VN_OK
              && len > 100, "job read back, %zu bytes", len);
    vn_job_store js;
    int st = vn_job_parse (buf, len, &js, err, sizeof err);
    VT_CHECK (st == VN_OK, "job parsed (%s)", err);
    if (st == VN_OK)
      {
        static double Yf[NT * 64 * NRUN];
        int sf[NRUN];
        vn_ens_out out;
        memset (&out, 0, sizeof out);
        out.Y = Yf;
        out.status = sf;
        st = vn_ensemble (&js.job, &out, err, sizeof err);
        int same = st == VN_OK;
        for (long i = 0; same && i < (long) NT * ny * NRUN; i++)
          same = Yf[i] == Yens[0][i] || (isnan (Yf[i]) && isnan (Yens[0][i]));
        VT_CHECK (same, "the job from the file gives the same records");
        vn_job_free (&js);
      }
    int refused = 0;
    for (size_t cut = 0; cut < len; cut++)
      if (vn_job_parse (buf, cut, &js, err, sizeof err) != VN_OK)
        refused++;
      else
        vn_job_free (&js);
    VT_CHECK (refused == (int) len, "a job cut short is refused at every "
              "length (%d of %zu)", refused, len);
    unsigned seed = 12345;
    for (int trial = 0; trial < 2000; trial++)
      {
        unsigned char *c = malloc (len);
        memcpy (c, buf, len);
        for (int k = 0; k < 3; k++)
          {
            seed = seed * 1103515245u + 12345u;
            c[(seed >> 8) % len] ^= (unsigned char) (1u << ((seed >> 4) & 7));
          }
        if (vn_job_parse (c, len, &js, err, sizeof err) == VN_OK)
          {
            /* what parses is a network the core checks when it builds */
            vn_net *n2 = NULL;
            vn_net_new (js.job.spec, &n2, err, sizeof err);
            vn_net_free (n2);
            vn_job_free (&js);
          }
        free (c);
      }
    VT_CHECK (1, "2000 damaged jobs parsed or refused without a crash");
    free (buf);
    if (fd >= 0)
      {
        close (fd);
        unlink (path);
      }
  }

  /* the controller moved the valve: the runs differ from one another */
  VT_CHECK (Yens[0][NT * ny * 0 + NT - 1] != Yens[0][NT * ny * 1 + NT - 1],
            "runs with different parameters differ");
  return vt_done ();
}

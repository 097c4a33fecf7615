#define _POSIX_C_SOURCE 200112L
/* vn_cluster: the runs of an ensemble spread over MPI ranks.
 *
 *   mpirun -np 8 [--hostfile hosts] vn_cluster JOB RESULTS [PROGRESS]
 *
 * JOB is a job file written by vn_ensemble (..., "cluster", ...) through
 * the core's vn_job_write (src/core/vn_jobfile.h): the compiled network,
 * its signals, the output times and the table of parameter sets.  Rank 0
 * reads it and sends it to every rank, so only rank 0 needs to see the
 * file.  Rank k takes runs k, k + size, k + 2 size, ... and runs them
 * with the core's ensemble driver (threads per rank: the job's workers,
 * or VN_WORKERS); the records come back to rank 0, which writes RESULTS.
 * Each rank writes the count of its finished runs to PROGRESS.k as it
 * goes.  A failed run is in the results with its message; a job that
 * cannot run at all ends the program with status 1 and the reason on
 * stderr. */
#include <mpi.h>
#include <limits.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include "vn_jobfile.h"

enum { MSGLEN = 512, TAG = 7 };

static void progress (const char *base, int rank, long done)
{
  if (!base)
    return;
  char path[4096], tmp[4200];
  snprintf (path, sizeof path, "%s.%d", base, rank);
  snprintf (tmp, sizeof tmp, "%s.tmp", path);
  FILE *f = fopen (tmp, "w");
  if (!f)
    return;
  fprintf (f, "%ld\n", done);
  if (fclose (f) == 0)
    rename (tmp, path);
}

/* Send n doubles (or bytes) in pieces an int count can hold. */
static void send_big (const void *p, size_t n, MPI_Datatype t, size_t size)
{
  const char *c = p;
  while (n > 0)
    {
      int k = n > INT_MAX / 2 ? INT_MAX / 2 : (int) n;
      MPI_Send ((void *) c, k, t, 0, TAG, MPI_COMM_WORLD);
      c += (size_t) k * size;
      n -= (size_t) k;
    }
}

static void recv_big (void *p, size_t n, MPI_Datatype t, size_t size, int from)
{
  char *c = p;
  while (n > 0)
    {
      int k = n > INT_MAX / 2 ? INT_MAX / 2 : (int) n;
      MPI_Recv (c, k, t, from, TAG, MPI_COMM_WORLD, MPI_STATUS_IGNORE);
      c += (size_t) k * size;
      n -= (size_t) k;
    }
}

static int fail (int rank, const char *msg)
{
  if (rank == 0)
    fprintf (stderr, "vn_cluster: %s\n", msg);
  MPI_Finalize ();
  return 1;
}

int main (int argc, char **argv)
{
  MPI_Init (&argc, &argv);
  int rank, size;
  MPI_Comm_rank (MPI_COMM_WORLD, &rank);
  MPI_Comm_size (MPI_COMM_WORLD, &size);
  if (argc < 3 || argc > 4)
    return fail (rank, "usage: vn_cluster JOB RESULTS [PROGRESS]");
  const char *prog = argc == 4 ? argv[3] : NULL;
  double t0 = MPI_Wtime ();

  /* the job, read by rank 0 and sent to all */
  unsigned char *buf = NULL;
  size_t len = 0;
  char err[1024] = "";
  long blen = 0;
  if (rank == 0)
    blen = vn_file_read (argv[1], &buf, &len, err, sizeof err) == VN_OK
           ? (long) len : -1;
  MPI_Bcast (&blen, 1, MPI_LONG, 0, MPI_COMM_WORLD);
  if (blen < 0)
    return fail (rank, err);
  if (rank != 0 && !(buf = malloc ((size_t) blen + 1)))
    return fail (rank, "out of memory for the job");
  for (long off = 0; off < blen; off += INT_MAX / 2)
    MPI_Bcast (buf + off, (int) (blen - off < INT_MAX / 2 ? blen - off
                                 : INT_MAX / 2), MPI_BYTE, 0, MPI_COMM_WORLD);
  vn_job_store js;
  int st = vn_job_parse (buf, (size_t) blen, &js, err, sizeof err);
  free (buf);
  if (st)
    return fail (rank, err);
  vn_ens_job *job = &js.job;
  const char *w = getenv ("VN_WORKERS");
  if (w && atoi (w) > 0)
    job->workers = atoi (w);
  if (job->workers < 1)
    job->workers = 1;

  /* the size of one run's record */
  vn_net *net = NULL;
  if (vn_net_new (job->spec, &net, err, sizeof err) != VN_OK)
    {
      vn_job_free (&js);
      return fail (rank, err);
    }
  long ny = job->sim.nyrec > 0 ? job->sim.nyrec : vn_noutputs (net);
  vn_net_free (net);
  long cell = (long) job->nt * ny;

  /* my runs: rank, rank + size, ... in chunks, for progress */
  long nrun = job->nrun, mine = nrun > rank ? (nrun - rank + size - 1) / size
                                              : 0;
  double *P = malloc ((size_t) (mine * job->nvar + 1) * sizeof *P);
  double *Y = malloc ((size_t) (mine * cell + 1) * sizeof *Y);
  int *status = malloc ((size_t) (mine + 1) * sizeof *status);
  long *steps = malloc ((size_t) (mine + 1) * sizeof *steps);
  char *msg = calloc ((size_t) mine + 1, MSGLEN);
  if (!P || !Y || !status || !steps || !msg)
    {
      vn_job_free (&js);
      return fail (rank, "out of memory for the records");
    }
  for (long i = 0; i < mine; i++)
    for (int j = 0; j < job->nvar; j++)
      P[i + mine * j] = job->P[(rank + i * size) + nrun * j];
  long chunk = mine / 20 > 0 ? mine / 20 : 1;
  int whole = VN_OK;
  char whymsg[1024] = "";
  for (long a = 0; a < mine && whole == VN_OK; a += chunk)
    {
      long n = mine - a < chunk ? mine - a : chunk;
      vn_ens_job sub = *job;
      double *Ps = malloc ((size_t) (n * job->nvar + 1) * sizeof *Ps);
      if (!Ps)
        {
          whole = VN_ENOMEM;
          snprintf (whymsg, sizeof whymsg, "out of memory");
          break;
        }
      for (long i = 0; i < n; i++)
        for (int j = 0; j < job->nvar; j++)
          Ps[i + n * j] = P[(a + i) + mine * j];
      sub.P = Ps;
      sub.nrun = n;
      vn_ens_out out;
      memset (&out, 0, sizeof out);
      out.Y = Y + a * cell;
      out.status = status + a;
      out.steps = steps + a;
      out.msg = msg + a * MSGLEN;
      out.msglen = MSGLEN;
      whole = vn_ensemble (&sub, &out, whymsg, sizeof whymsg);
      free (Ps);
      progress (prog, rank, a + n);
    }
  /* a failure of the whole job on any rank ends it everywhere */
  int worst = whole, any;
  MPI_Allreduce (&worst, &any, 1, MPI_INT, MPI_MIN, MPI_COMM_WORLD);
  if (any != VN_OK)
    {
      if (whole != VN_OK)
        fprintf (stderr, "vn_cluster: rank %d: %s\n", rank, whymsg);
      vn_job_free (&js);
      MPI_Finalize ();
      return 1;
    }

  /* records to rank 0, in run order */
  if (rank != 0)
    {
      send_big (Y, (size_t) (mine * cell), MPI_DOUBLE, sizeof (double));
      send_big (status, (size_t) mine, MPI_INT, sizeof (int));
      send_big (steps, (size_t) mine, MPI_LONG, sizeof (long));
      send_big (msg, (size_t) mine * MSGLEN, MPI_CHAR, 1);
    }
  else
    {
      double *YA = malloc ((size_t) (nrun * cell + 1) * sizeof *YA);
      int *SA = malloc ((size_t) (nrun + 1) * sizeof *SA);
      long *KA = malloc ((size_t) (nrun + 1) * sizeof *KA);
      char *MA = calloc ((size_t) nrun + 1, MSGLEN);
      if (!YA || !SA || !KA || !MA)
        {
          fprintf (stderr, "vn_cluster: out of memory for all records\n");
          MPI_Abort (MPI_COMM_WORLD, 1);
        }
      for (int src = 0; src < size; src++)
        {
          long m = nrun > src ? (nrun - src + size - 1) / size : 0;
          double *y = Y;
          int *s = status;
          long *k = steps;
          char *g = msg;
          if (src != 0)
            {
              y = malloc ((size_t) (m * cell + 1) * sizeof *y);
              s = malloc ((size_t) (m + 1) * sizeof *s);
              k = malloc ((size_t) (m + 1) * sizeof *k);
              g = malloc ((size_t) (m + 1) * MSGLEN);
              if (!y || !s || !k || !g)
                {
                  fprintf (stderr, "vn_cluster: out of memory\n");
                  MPI_Abort (MPI_COMM_WORLD, 1);
                }
              recv_big (y, (size_t) (m * cell), MPI_DOUBLE, sizeof (double),
                        src);
              recv_big (s, (size_t) m, MPI_INT, sizeof (int), src);
              recv_big (k, (size_t) m, MPI_LONG, sizeof (long), src);
              recv_big (g, (size_t) m * MSGLEN, MPI_CHAR, 1, src);
            }
          for (long i = 0; i < m; i++)
            {
              long r = src + i * size;
              memcpy (YA + r * cell, y + i * cell, (size_t) cell * sizeof *y);
              SA[r] = s[i];
              KA[r] = k[i];
              memcpy (MA + r * MSGLEN, g + i * MSGLEN, MSGLEN);
            }
          if (src != 0)
            {
              free (y);
              free (s);
              free (k);
              free (g);
            }
        }
      st = vn_res_write (argv[2], nrun, job->nt, ny, YA, SA, KA, MA, MSGLEN,
                         MPI_Wtime () - t0, err, sizeof err);
      if (st)
        fprintf (stderr, "vn_cluster: %s\n", err);
      free (YA);
      free (SA);
      free (KA);
      free (MA);
    }
  free (P);
  free (Y);
  free (status);
  free (steps);
  free (msg);
  vn_job_free (&js);
  MPI_Bcast (&st, 1, MPI_INT, 0, MPI_COMM_WORLD);
  MPI_Finalize ();
  return st ? 1 : 0;
}

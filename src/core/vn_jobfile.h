/* vesselnet core: an ensemble job and its results as files, for running
 * the runs elsewhere (the MPI program src/cluster/vn_cluster.c).
 *
 * Our own binary format, native byte order (checked on reading), laid
 * out in doc/internals.md section "Cluster job files":
 *   job:     "VNJOB001", sizes, options, the network spec, signals,
 *            output times, start, varied parameters and their table,
 *            recorded outputs;
 *   results: "VNRES001", sizes, Y (nt x ny x nrun), status, steps and
 *            a message per run, the wall time. */
#ifndef VN_JOBFILE_H
#define VN_JOBFILE_H

#include <stddef.h>
#include "vn_ens.h"

#ifdef __cplusplus
extern "C" {
#endif

/* A job read back: the job and every array it points into. */
typedef struct vn_job_store {
  vn_ens_job job;
  vn_spec spec;
  void *mem[32];        /* the arrays, freed by vn_job_free */
  int nmem;
} vn_job_store;

/* Write JOB to PATH.  VN_OK, or VN_EARG / VN_ENOMEM with err set. */
int vn_job_write (const char *path, const vn_ens_job *job, char *err,
                  size_t errlen);

/* Parse a job from the LEN bytes at BUF (a file read whole). */
int vn_job_parse (const unsigned char *buf, size_t len, vn_job_store *s,
                  char *err, size_t errlen);
void vn_job_free (vn_job_store *s);

/* Read a whole file into a malloc'd buffer (*buf, *len). */
int vn_file_read (const char *path, unsigned char **buf, size_t *len,
                  char *err, size_t errlen);

/* Results of NRUN runs: Y nt x ny x nrun, status, steps, messages
 * (msglen bytes each), wall time. */
int vn_res_write (const char *path, long nrun, int nt, long ny,
                  const double *Y, const int *status, const long *steps,
                  const char *msg, size_t msglen, double wall, char *err,
                  size_t errlen);

typedef struct vn_res {
  long nrun, ny;
  int nt;
  double *Y;
  int *status;
  long *steps;
  char *msg;            /* nrun x msglen */
  size_t msglen;
  double wall;
} vn_res;

int vn_res_read (const char *path, vn_res *r, char *err, size_t errlen);
void vn_res_free (vn_res *r);

#ifdef __cplusplus
}
#endif
#endif

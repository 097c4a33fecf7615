/* Ensemble jobs and results as files (vn_jobfile.h): our own simple
 * binary format, native byte order, checked on reading (a 1 as int32 and
 * as double follow the magic).  Every size read is checked against the
 * bytes left, so a damaged file is an error, never a crash. */
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include "vn_jobfile.h"

static const char JOBMAGIC[8] = {'V', 'N', 'J', 'O', 'B', '0', '0', '1'};
static const char RESMAGIC[8] = {'V', 'N', 'R', 'E', 'S', '0', '0', '1'};

static int put (FILE *f, const void *p, size_t size, size_t n)
{
  return n == 0 || fwrite (p, size, n, f) == n;
}

static int put_i32 (FILE *f, long v)
{
  int32_t x = (int32_t) v;
  return put (f, &x, sizeof x, 1);
}

static int put_i64 (FILE *f, long v)
{
  int64_t x = v;
  return put (f, &x, sizeof x, 1);
}

static int put_ints (FILE *f, const int *v, long n)
{
  int ok = 1;
  for (long i = 0; i < n && ok; i++)
    ok = put_i32 (f, v[i]);
  return ok;
}

static void say (char *err, size_t len, const char *msg, const char *path)
{
  if (err && len)
    snprintf (err, len, "%s %s", msg, path ? path : "");
}

int vn_job_write (const char *path, const vn_ens_job *job, char *err,
                  size_t errlen)
{
  const vn_spec *s = job->spec;
  int npmax = vn_npmax ();
  long ntab = 0, nsigdata = 0;
  for (int i = 0; i < s->nunit; i++)
    if (s->tablen[i] > 0 && s->taboff[i] + s->tablen[i] > ntab)
      ntab = s->taboff[i] + s->tablen[i];
  for (int i = 0; i < job->nsig; i++)
    if (2L * (job->sig_off[i] + job->sig_len[i]) > nsigdata)
      nsigdata = 2L * (job->sig_off[i] + job->sig_len[i]);
  int nx0 = 0;
  if (job->x0)
    {
      vn_net *net = NULL;
      char msg[256];
      if (vn_net_new (s, &net, msg, sizeof msg) != VN_OK)
        {
          say (err, errlen, msg, "");
          return VN_EARG;
        }
      nx0 = vn_nstates (net);
      vn_net_free (net);
    }
  FILE *f = fopen (path, "wb");
  if (!f)
    {
      say (err, errlen, "cannot write the job file", path);
      return VN_EARG;
    }
  double one = 1.0;
  int ok = put (f, JOBMAGIC, 1, 8) && put_i32 (f, 1) && put (f, &one, 8, 1)
    && put_i32 (f, s->nunit) && put_i32 (f, npmax)
    && put_i32 (f, s->nspecies) && put_i32 (f, s->thermal)
    && put_i32 (f, ntab) && put_i32 (f, job->nsig) && put_i32 (f, nsigdata)
    && put_i32 (f, job->nt) && put_i32 (f, nx0) && put_i32 (f, job->nvar)
    && put_i32 (f, job->sim.nyrec) && put_i32 (f, job->sim.solver)
    && put_i32 (f, job->workers) && put_i64 (f, job->nrun)
    && put_i64 (f, job->sim.maxsteps);
  double d[8] = {s->gravity, s->density, s->cp, s->ambient, s->smooth,
                 job->sim.rtol, job->sim.atol, job->sim.hmax};
  ok = ok && put (f, d, sizeof (double), 8)
    && put (f, s->decay, sizeof (double), s->nspecies)
    && put_ints (f, s->kind, s->nunit);
  for (int i = 0; i < s->nunit && ok; i++)
    {
      long n = (long) strlen (s->name[i]);
      ok = put_i32 (f, n) && put (f, s->name[i], 1, n);
    }
  ok = ok && put_ints (f, s->ref, 4L * s->nunit)
    && put (f, s->par, sizeof (double), (size_t) npmax * s->nunit)
    && put (f, s->given, 1, (size_t) npmax * s->nunit)
    && put_ints (f, s->taboff, s->nunit) && put_ints (f, s->tablen, s->nunit)
    && put (f, s->tab, sizeof (double), 2 * ntab)
    && put_ints (f, job->sig_unit, job->nsig)
    && put_ints (f, job->sig_slot, job->nsig)
    && put_ints (f, job->sig_off, job->nsig)
    && put_ints (f, job->sig_len, job->nsig)
    && put_ints (f, job->sig_hold, job->nsig)
    && put (f, job->sig_data, sizeof (double), nsigdata)
    && put (f, job->tout, sizeof (double), job->nt)
    && put (f, job->x0, sizeof (double), nx0)
    && put_ints (f, job->pidx, job->nvar)
    && put (f, job->P, sizeof (double), (size_t) job->nrun * job->nvar)
    && put_ints (f, job->sim.yrec, job->sim.nyrec);
  if (fclose (f) != 0 || !ok)
    {
      say (err, errlen, "writing the job file failed:", path);
      return VN_EARG;
    }
  return VN_OK;
}

/* A cursor over a buffer: every take is checked against what is left. */
typedef struct cur {
  const unsigned char *p;
  size_t left;
  int bad;
} cur;

static void take (cur *c, void *out, size_t size, size_t n)
{
  if (c->bad || (size && n > c->left / size))
    {
      c->bad = 1;
      return;
    }
  if (out && size * n > 0)
    memcpy (out, c->p, size * n);
  c->p += size * n;
  c->left -= size * n;
}

static long take_i32 (cur *c)
{
  int32_t x = 0;
  take (c, &x, sizeof x, 1);
  return c->bad ? 0 : x;
}

static long take_i64 (cur *c)
{
  int64_t x = 0;
  take (c, &x, sizeof x, 1);
  return c->bad ? 0 : (long) x;
}

/* An array of n elements of size bytes, owned by the store. */
static void *arr (vn_job_store *s, cur *c, size_t size, long n)
{
  /* sizes beyond the bytes left are damage: no allocation is tried */
  if (c->bad || n < 0 || s->nmem >= 32 || (size_t) n > c->left / size)
    {
      c->bad = 1;
      return NULL;
    }
  void *p = malloc (size * (size_t) n + 1);
  if (!p)
    {
      c->bad = 1;
      return NULL;
    }
  s->mem[s->nmem++] = p;
  take (c, p, size, (size_t) n);
  return p;
}

static int *ints (vn_job_store *s, cur *c, long n)
{
  /* stored as int32: as many bytes as int on this platform, checked */
  if (c->bad || n < 0 || s->nmem >= 32 || (size_t) n > c->left / 4)
    {
      c->bad = 1;
      return NULL;
    }
  int *v = malloc ((size_t) n * sizeof *v + 1);
  if (!v)
    {
      c->bad = 1;
      return NULL;
    }
  s->mem[s->nmem++] = v;
  for (long i = 0; i < n; i++)
    v[i] = (int) take_i32 (c);
  return v;
}

int vn_job_parse (const unsigned char *buf, size_t len, vn_job_store *s,
                  char *err, size_t errlen)
{
  memset (s, 0, sizeof *s);
  cur c = {buf, len, 0};
  char magic[8];
  double one = 0;
  take (&c, magic, 1, 8);
  long i1 = take_i32 (&c);
  take (&c, &one, 8, 1);
  if (c.bad || memcmp (magic, JOBMAGIC, 8) != 0 || i1 != 1 || one != 1.0)
    {
      say (err, errlen, "not a vesselnet job file of this machine's byte "
           "order", "");
      return VN_EARG;
    }
  vn_spec *sp = &s->spec;
  vn_ens_job *j = &s->job;
  sp->nunit = (int) take_i32 (&c);
  long npmax = take_i32 (&c);
  sp->nspecies = (int) take_i32 (&c);
  sp->thermal = (int) take_i32 (&c);
  long ntab = take_i32 (&c);
  j->nsig = (int) take_i32 (&c);
  long nsigdata = take_i32 (&c);
  j->nt = (int) take_i32 (&c);
  long nx0 = take_i32 (&c);
  j->nvar = (int) take_i32 (&c);
  j->sim.nyrec = (int) take_i32 (&c);
  j->sim.solver = (int) take_i32 (&c);
  j->workers = (int) take_i32 (&c);
  j->nrun = take_i64 (&c);
  j->sim.maxsteps = take_i64 (&c);
  double d[8];
  take (&c, d, sizeof (double), 8);
  if (c.bad || npmax != vn_npmax () || sp->nunit < 1 || sp->nspecies < 0
      || ntab < 0 || j->nsig < 0 || nsigdata < 0 || j->nt < 1 || nx0 < 0
      || j->nvar < 0 || j->sim.nyrec < 0 || j->nrun < 0)
    {
      say (err, errlen, "the job file's sizes are damaged or from another "
           "build (parameter slots differ)", "");
      return VN_EARG;
    }
  sp->gravity = d[0];
  sp->density = d[1];
  sp->cp = d[2];
  sp->ambient = d[3];
  sp->smooth = d[4];
  j->sim.rtol = d[5];
  j->sim.atol = d[6];
  j->sim.hmax = d[7];
  sp->decay = arr (s, &c, sizeof (double), sp->nspecies);
  sp->kind = ints (s, &c, sp->nunit);
  char **nm = malloc ((size_t) sp->nunit * sizeof *nm + 1);
  if (nm && s->nmem < 32)
    s->mem[s->nmem++] = nm;
  else
    {
      free (nm);
      nm = NULL;
      c.bad = 1;
    }
  for (int i = 0; nm && i < sp->nunit && !c.bad; i++)
    {
      long n = take_i32 (&c);
      if (n < 0 || (size_t) n > c.left)
        {
          c.bad = 1;
          break;
        }
      nm[i] = NULL;
      if (s->nmem < 32 && (nm[i] = malloc ((size_t) n + 1)))
        {
          s->mem[s->nmem++] = nm[i];
          take (&c, nm[i], 1, (size_t) n);
          nm[i][n] = 0;
        }
      else
        c.bad = 1;
    }
  sp->name = (const char *const *) nm;
  sp->ref = ints (s, &c, 4L * sp->nunit);
  sp->par = arr (s, &c, sizeof (double), npmax * sp->nunit);
  sp->given = arr (s, &c, 1, npmax * sp->nunit);
  sp->taboff = ints (s, &c, sp->nunit);
  sp->tablen = ints (s, &c, sp->nunit);
  sp->tab = arr (s, &c, sizeof (double), 2 * ntab);
  sp->ntab = ntab;
  j->sig_unit = ints (s, &c, j->nsig);
  j->sig_slot = ints (s, &c, j->nsig);
  j->sig_off = ints (s, &c, j->nsig);
  j->sig_len = ints (s, &c, j->nsig);
  j->sig_hold = ints (s, &c, j->nsig);
  j->sig_data = arr (s, &c, sizeof (double), nsigdata);
  j->tout = arr (s, &c, sizeof (double), j->nt);
  j->x0 = nx0 ? arr (s, &c, sizeof (double), nx0) : NULL;
  j->pidx = ints (s, &c, j->nvar);
  j->P = arr (s, &c, sizeof (double), j->nrun * (long) j->nvar);
  j->sim.yrec = ints (s, &c, j->sim.nyrec);
  if (c.bad)
    {
      vn_job_free (s);
      say (err, errlen, "the job file is damaged (it ends early or holds "
           "impossible sizes)", "");
      return VN_EARG;
    }
  for (int i = 0; i < sp->nunit; i++)
    if (sp->tablen[i] > 0
        && (sp->taboff[i] < 0 || sp->taboff[i] + (long) sp->tablen[i] > ntab))
      {
        vn_job_free (s);
        say (err, errlen, "the job file's tables run past their data", "");
        return VN_EARG;
      }
  for (int i = 0; i < j->nsig; i++)
    if (j->sig_off[i] < 0 || j->sig_len[i] < 0
        || 2L * (j->sig_off[i] + j->sig_len[i]) > nsigdata)
      {
        vn_job_free (s);
        say (err, errlen, "the job file's signals run past their data", "");
        return VN_EARG;
      }
  j->spec = sp;
  return VN_OK;
}

void vn_job_free (vn_job_store *s)
{
  for (int i = 0; i < s->nmem; i++)
    free (s->mem[i]);
  s->nmem = 0;
}

int vn_file_read (const char *path, unsigned char **buf, size_t *len,
                  char *err, size_t errlen)
{
  *buf = NULL;
  *len = 0;
  FILE *f = fopen (path, "rb");
  if (!f)
    {
      say (err, errlen, "cannot open", path);
      return VN_EARG;
    }
  size_t cap = 1 << 16, n = 0;
  unsigned char *b = malloc (cap);
  while (b)
    {
      n += fread (b + n, 1, cap - n, f);
      if (n < cap)
        break;
      unsigned char *nb = realloc (b, 2 * cap);
      if (!nb)
        {
          free (b);
          b = NULL;
          break;
        }
      b = nb;
      cap *= 2;
    }
  int bad = ferror (f);
  fclose (f);
  if (!b || bad)
    {
      free (b);
      say (err, errlen, "cannot read", path);
      return b ? VN_EARG : VN_ENOMEM;
    }
  *buf = b;
  *len = n;
  return VN_OK;
}

int vn_res_write (const char *path, long nrun, int nt, long ny,
                  const double *Y, const int *status, const long *steps,
                  const char *msg, size_t msglen, double wall, char *err,
                  size_t errlen)
{
  FILE *f = fopen (path, "wb");
  if (!f)
    {
      say (err, errlen, "cannot write the results file", path);
      return VN_EARG;
    }
  double one = 1.0;
  int ok = put (f, RESMAGIC, 1, 8) && put_i32 (f, 1) && put (f, &one, 8, 1)
    && put_i64 (f, nrun) && put_i32 (f, nt) && put_i64 (f, ny)
    && put_i64 (f, (long) msglen) && put (f, &wall, 8, 1)
    && put (f, Y, sizeof (double), (size_t) nt * ny * nrun)
    && put_ints (f, status, nrun);
  for (long r = 0; r < nrun && ok; r++)
    ok = put_i64 (f, steps[r]);
  ok = ok && put (f, msg, 1, msglen * nrun);
  if (fclose (f) != 0 || !ok)
    {
      say (err, errlen, "writing the results file failed:", path);
      return VN_EARG;
    }
  return VN_OK;
}

int vn_res_read (const char *path, vn_res *r, char *err, size_t errlen)
{
  memset (r, 0, sizeof *r);
  unsigned char *buf;
  size_t len;
  int st = vn_file_read (path, &buf, &len, err, errlen);
  if (st)
    return st;
  cur c = {buf, len, 0};
  char magic[8];
  double one = 0;
  take (&c, magic, 1, 8);
  long i1 = take_i32 (&c);
  take (&c, &one, 8, 1);
  r->nrun = take_i64 (&c);
  r->nt = (int) take_i32 (&c);
  r->ny = take_i64 (&c);
  long ml = take_i64 (&c);
  take (&c, &r->wall, 8, 1);
  if (c.bad || memcmp (magic, RESMAGIC, 8) != 0 || i1 != 1 || one != 1.0
      || r->nrun < 0 || r->nt < 1 || r->ny < 0 || ml < 1 || ml > 65536
      || (double) r->nt * r->ny * r->nrun * 8 > (double) c.left)
    {
      free (buf);
      say (err, errlen, "not a complete vesselnet results file:", path);
      return VN_EARG;
    }
  r->msglen = (size_t) ml;
  size_t ncell = (size_t) r->nt * r->ny * r->nrun;
  r->Y = malloc (ncell * sizeof (double) + 1);
  r->status = malloc ((size_t) r->nrun * sizeof (int) + 1);
  r->steps = malloc ((size_t) r->nrun * sizeof (long) + 1);
  r->msg = malloc ((size_t) r->nrun * r->msglen + 1);
  if (!r->Y || !r->status || !r->steps || !r->msg)
    {
      free (buf);
      vn_res_free (r);
      say (err, errlen, "out of memory reading", path);
      return VN_ENOMEM;
    }
  take (&c, r->Y, sizeof (double), ncell);
  for (long i = 0; i < r->nrun; i++)
    r->status[i] = (int) take_i32 (&c);
  for (long i = 0; i < r->nrun; i++)
    r->steps[i] = take_i64 (&c);
  take (&c, r->msg, 1, (size_t) r->nrun * r->msglen);
  free (buf);
  if (c.bad)
    {
      vn_res_free (r);
      say (err, errlen, "the results file ends early:", path);
      return VN_EARG;
    }
  for (long i = 0; i < r->nrun; i++)
    r->msg[(i + 1) * r->msglen - 1] = 0;
  return VN_OK;
}

void vn_res_free (vn_res *r)
{
  free (r->Y);
  free (r->status);
  free (r->steps);
  free (r->msg);
  memset (r, 0, sizeof *r);
}

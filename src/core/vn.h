/* vesselnet core: public C API.
 *
 * A network is built once from flat arrays (vn_spec), validated, then
 * evaluated, integrated, linearised.  Every call returns a status code
 * (VN_OK or a negative VN_E*); vn_errmsg () gives the detailed message,
 * which names the unit, the field, the value and what is allowed.
 * No globals, no hidden state: everything lives in the vn_net handle. */
#ifndef VN_H
#define VN_H

#include <stddef.h>

#ifdef __cplusplus
extern "C" {
#endif

typedef struct vn_net vn_net;

enum {
  VN_OK = 0,
  VN_EARG = -1,       /* invalid input: message names unit and field */
  VN_ENOMEM = -2,
  VN_ESOLVER = -3,    /* integrator or Newton failure: message diagnoses */
  VN_EINTR = -4,      /* stopped by the caller's stop callback (Ctrl-C) */
  VN_ENOSTEADY = -5   /* no steady state: message says why */
};

const char *vn_status_str (int status);

/* ---- schema: kinds, their parameters and outputs ---- */
enum { VN_P_INPUT = 1, VN_P_CODE = 2, VN_P_INF = 4 };

typedef struct vn_param_info {
  const char *name;
  double def;          /* default; NaN = none (required or derived) */
  double lo, hi;       /* allowed closed range for given values */
  const char *unit;    /* unit of measure, for messages and tables */
  int flags;           /* VN_P_INPUT: may be driven by a signal;
                          VN_P_CODE: integer code; VN_P_INF: Inf allowed */
} vn_param_info;

int vn_kind_count (void);
const char *vn_kind_name (int kind);
int vn_kind_find (const char *name);       /* -1 if unknown */
int vn_kind_npar (int kind);
const vn_param_info *vn_kind_param (int kind, int slot);
int vn_kind_nout (int kind);
const char *vn_kind_out_name (int kind, int i);
const char *vn_kind_out_unit (int kind, int i);
int vn_npmax (void);                        /* rows of vn_spec.par */
/* A unit of this kind reports the first base outputs of its list plus
 * per_species for each species the network declares. */
void vn_kind_nout_rule (int kind, int *base, int *per_species);

/* ---- building ---- */
typedef struct vn_spec {
  int nunit;
  const int *kind;            /* nunit kind codes */
  const char *const *name;    /* nunit names */
  const int *ref;             /* 4 per unit, 0-based, -1 = none */
  const double *par;          /* npmax per unit, column per unit */
  const unsigned char *given; /* same layout: 1 where the user gave it */
  const double *tab;          /* all tables, (level, volume) pairs */
  long ntab;                  /* pairs in tab: every table lies inside */
  const int *taboff;          /* nunit offsets in pairs */
  const int *tablen;          /* nunit pair counts (0 = no table) */
  double gravity, density, cp, ambient, smooth;
  int thermal;
  int nspecies;
  const double *decay;        /* nspecies, 1/s */
} vn_spec;

int vn_net_new (const vn_spec *spec, vn_net **out, char *msg, size_t msglen);
void vn_net_free (vn_net *net);             /* accepts NULL */
const char *vn_errmsg (const vn_net *net);

int vn_nstates (const vn_net *net);
int vn_noutputs (const vn_net *net);
int vn_nparams (const vn_net *net);
int vn_nunits (const vn_net *net);
int vn_state_unit (const vn_net *net, int i);       /* owning unit */
const char *vn_state_var (const vn_net *net, int i); /* "volume", ... */
const char *vn_unit_name (const vn_net *net, int u);
int vn_param_index (const vn_net *net, int unit, int slot);  /* -1 if none */
int vn_output_index (const vn_net *net, int unit, int out);  /* -1 if none */
int vn_param_is_input (const vn_net *net, int index);

/* Current parameter values (nominal inputs included).  Setting one
 * re-validates that unit's value range. */
double vn_param_get (const vn_net *net, int index);
int vn_param_set (vn_net *net, int index, double value);

/* Initial state from the declared levels (and temperatures ...). */
int vn_initial_state (vn_net *net, double *x0);

/* ---- signals: piecewise tables on input parameters ---- */
int vn_set_signals (vn_net *net, int nsig, const int *unit, const int *slot,
                    const int *off, const int *len, const int *hold,
                    const double *data);

/* ---- evaluation at (t, x) with signals applied ---- */
int vn_rhs (vn_net *net, double t, const double *x, double *f);
int vn_outputs (vn_net *net, double t, const double *x, double *y);
int vn_jac_dense (vn_net *net, double t, const double *x, double *J);

/* Linearisation: A (nx x nx), B (nx x nin), C (nout x nx), D (nout x nin),
 * dense, column-major; inputs are parameter indices, outputs output
 * indices.  Any pointer may be NULL to skip that block. */
int vn_linearize_dense (vn_net *net, double t, const double *x,
                        int nin, const int *pin, int nout, const int *yout,
                        double *A, double *B, double *C, double *D);

/* Sparse A in compressed-column form; *nnz is the capacity on entry
 * (call with colptr == NULL to get the count needed). */
int vn_jac_csc (vn_net *net, double t, const double *x, long *nnz,
                long *colptr, long *rowind, double *val);

/* ---- simulation ---- */
enum { VN_SOLVER_AUTO = 0, VN_SOLVER_DENSE = 1, VN_SOLVER_KLU = 2 };

typedef struct vn_sim_opts {
  double rtol, atol;       /* rtol default 1e-6; atol <= 0: per state,
                              scaled to capacity (simulate.c) */
  int solver;              /* VN_SOLVER_* */
  long maxsteps;           /* per output interval, default 100000 */
  double hmax;             /* 0 = no limit */
  int (*stop) (void *);    /* polled; non-zero stops the run */
  void *stop_data;
  int nyrec;               /* > 0: record only these outputs, Y is nt x nyrec */
  const int *yrec;         /* output indices */
} vn_sim_opts;

typedef struct vn_sim_stats {
  long steps, rhs, jac, setups, errfails, convfails, restarts;
  double wall;             /* seconds, integration only */
  int solver;              /* VN_SOLVER_DENSE or VN_SOLVER_KLU */
  double t_reached;
} vn_sim_stats;

/* Integrate from x0 at tout[0] and store states X (nt x nx) and outputs
 * Y (nt x ny), column-major with time running down the rows. */
int vn_simulate (vn_net *net, const double *x0, int nt, const double *tout,
                 double *X, double *Y, const vn_sim_opts *opts,
                 vn_sim_stats *stats);

/* ---- steady state (operating point) ---- */
typedef struct vn_steady_opts {
  int maxiter;             /* Newton iterations per attempt, default 60 */
  double tol;              /* relative residual tolerance, default 1e-10 */
  int solver;              /* VN_SOLVER_*: dense LU or KLU */
  int simulate;            /* < 0: no simulation fallback on failure */
  /* inverse problem: adjust nadj inputs (parameter indices) so that
   * outputs yout (output indices) reach target; nadj must equal ntgt */
  int nadj;
  const int *padj;
  int ntgt;
  const int *ytgt;
  const double *target;
  int (*stop) (void *);    /* polled; non-zero stops the search */
  void *stop_data;
} vn_steady_opts;

typedef struct vn_steady_info {
  int iterations;          /* Newton iterations, all attempts */
  int simulated;           /* 1 if the answer came after a simulation */
  double t_sim;            /* simulated time before the final Newton (s) */
  double residual;         /* max |f| at the answer (m3/s, ...) */
  double relres;           /* residual over the network's flow scale */
  int solver;              /* VN_SOLVER_DENSE or VN_SOLVER_KLU */
} vn_steady_info;

/* Solve f(x, u) = 0 (and output = target) from the state x (in: start,
 * out: answer); the adjusted inputs start from and end at the network's
 * values (vn_param_get).  VN_ENOSTEADY when no steady state exists, with
 * the reason in engineering terms in vn_errmsg (). */
int vn_steady (vn_net *net, double *x, const vn_steady_opts *opts,
               vn_steady_info *info);

/* Forward sensitivities of chosen outputs to chosen parameters (CVODES,
 * analytic df/dx and df/dp): YS is nt x ny x np, column-major, time
 * running fastest; x0 (nx x np) is the initial state's sensitivity. */
typedef struct vn_sens {
  int np;
  const int *pidx;     /* parameter indices */
  const double *x0;    /* nx x np */
  int ny;
  const int *yout;     /* output indices */
  double *YS;          /* out: nt x ny x np */
  int *yrow;           /* internal */
} vn_sens;

int vn_simulate_sens (vn_net *net, const double *x0, int nt,
                      const double *tout, double *X, double *Y,
                      const vn_sim_opts *opts, vn_sim_stats *stats,
                      vn_sens *sens);

/* Switching log of the last simulation: time, unit, new output. */
long vn_nevents (const vn_net *net);
int vn_event_get (const vn_net *net, long i, double *t, int *unit,
                  double *value);

#ifdef __cplusplus
}
#endif
#endif

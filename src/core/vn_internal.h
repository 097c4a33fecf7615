/* vesselnet core: internal structures shared by the unit kinds and the
 * evaluation framework.  Not installed; not part of the public API. */
#ifndef VN_INTERNAL_H
#define VN_INTERNAL_H

#include "vn.h"

#define VN_PI 3.14159265358979323846

#define VN_NPMAX 32       /* parameter slots per unit */
#define VN_NSP 8          /* species a network may carry */
#define VN_NOUTMAX 16     /* outputs of one unit */
#define VN_LF 24          /* entries of one derivative linear form */
#define VN_NAMELEN 64

/* The derivative of one scalar with respect to states (x) and parameters
 * (p), kept as a short list.  Entries are structural: a branch that makes
 * a derivative zero still adds the entry (with 0), so the Jacobian
 * pattern depends only on the topology. */
typedef struct vn_lf {
  int n;
  int col[VN_LF];
  unsigned char isp[VN_LF];  /* 1: column is a parameter index */
  double v[VN_LF];
} vn_lf;

/* Every operation accepts d == NULL (derivatives not wanted) and is then
 * free, so the kinds write one code path for values and derivatives. */
void vn_lf_add (vn_lf *d, int col, int isp, double v);
void vn_lf_axpy_ (vn_lf *d, double a, const vn_lf *s);
static inline void vn_lf_zero (vn_lf *d) { if (d) d->n = 0; }
static inline void vn_lf_x (vn_lf *d, int col, double v)
{ if (d) vn_lf_add (d, col, 0, v); }
static inline void vn_lf_p (vn_lf *d, int col, double v)
{ if (d) vn_lf_add (d, col, 1, v); }
static inline void vn_lf_axpy (vn_lf *d, double a, const vn_lf *s)
{ if (d && s) vn_lf_axpy_ (d, a, s); }   /* d += a s */
static inline void vn_lf_scale (vn_lf *d, double a)
{ if (d) for (int i = 0; i < d->n; i++) d->v[i] *= a; }

/* Triplet buffer for Jacobian emission. */
typedef struct vn_trip {
  long n, cap;
  int *r, *c;
  double *v;
} vn_trip;

/* What a node (tank or boundary) offers to the elements joined to it. */
typedef struct vn_node {
  int istank;
  double H;       /* head: base + level (m) */
  double level;   /* level above base (tank) */
  double base;    /* base elevation */
  double V;       /* volume (tank) */
  double area;    /* dV/dlevel, floored (tank) */
  int pc_base;    /* parameter column of the base elevation, -1 if none */
  /* carried properties: temperature and concentrations.  A tank's come
   * from its states, T = E / V, c = M / V (E, M the conserved contents);
   * a boundary's from its parameters (pcol >= 0). */
  int xV;         /* volume state of a tank, -1 otherwise */
  double T, dTdV, dTdE;
  int xE, pcT;    /* energy state (tank) or temperature parameter, -1 none */
  double c[VN_NSP], dcdV[VN_NSP], dcdM[VN_NSP];
  int xM0, pcc0;  /* first species state (tank) or parameter, -1 none */
  vn_lf dH;       /* derivative of the head */
} vn_node;

typedef struct vn_unit vn_unit;
typedef struct vn_kind vn_kind;

enum { VN_ROLE_NODE = 1, VN_ROLE_LINK = 2, VN_ROLE_OTHER = 3, VN_ROLE_HEAT = 4 };

struct vn_unit {
  int kind;
  const vn_kind *k;
  char name[VN_NAMELEN];
  int ref[4];
  int poff;               /* first parameter in net->p */
  int xoff, nx;           /* owned states */
  int yoff;               /* first output */
  int nout;               /* outputs in this network (<= kind's list) */
  const double *tab;      /* table pairs (owned by net) */
  int ntab;
  double d[12];           /* derived constants set by the kind's check */
  /* evaluation scratch */
  double q;               /* flow of a link, spill of a tank */
  vn_lf dq;
};

struct vn_kind {
  const char *name;
  int role;
  int npar;
  const vn_param_info *par;
  int nout;
  const char *const *out;
  const char *const *ounit;
  /* outputs a network carries: the first nout_base of out[] plus
   * nout_species per declared species (0, 0: all of out[]) */
  int nout_base, nout_species;
  /* kind rules beyond the generic range checks; sets derived constants */
  int (*check) (vn_net *net, vn_unit *u);
  int (*nstates) (const vn_net *net, const vn_unit *u);
  const char *(*state_var) (const vn_unit *u, int i);
  int (*init) (vn_net *net, vn_unit *u, double *x);
  /* node role: head and level from the states */
  void (*node) (vn_net *net, vn_unit *u, const double *x, vn_node *nd);
  /* link role: flow from src node to dst node (either may be NULL) */
  double (*flow) (vn_net *net, vn_unit *u, const vn_node *s,
                  const vn_node *d, const double *x, vn_lf *dq);
  /* own state derivatives (actuator lags, ...); rows u->xoff.. */
  void (*own) (vn_net *net, vn_unit *u, const double *x, double *f,
               vn_lf *df);
  /* controllers and switches: set the manipulated input after the nodes
   * are known, before any flow is computed */
  void (*pre) (vn_net *net, vn_unit *u, const double *x);
  /* heat role: heat flow (W) into the tank ref[1] */
  double (*heat) (vn_net *net, vn_unit *u, const vn_node *d, const double *x,
                  vn_lf *dQ);
  /* outputs, after nodes and flows are known */
  void (*outputs) (vn_net *net, vn_unit *u, const vn_node *nd,
                   const double *x, double *y, vn_lf *dy);
};

/* Switching log */
typedef struct vn_event {
  double t;
  int unit;
  double value;
} vn_event;

typedef struct vn_signal {
  int pidx, off, len, hold;
} vn_signal;

struct vn_net {
  int nu;
  vn_unit *u;
  int nx, ny, np;
  double *p;        /* parameters at the current time (inputs applied) */
  double *p0;       /* nominal parameters */
  unsigned char *given;
  unsigned char *isinput;
  double *tab;
  double g, rho, cp, ambient, smooth;
  int thermal, nspecies;
  double *decay;
  /* signals */
  int nsig;
  vn_signal *sig;
  double *sigdata;
  double seg_end;   /* signals take their left limit at t >= seg_end */
  /* evaluation workspace */
  vn_node *nd;      /* per unit (nodes only) */
  vn_lf *dy;        /* per output */
  double *y;        /* per output */
  vn_trip jx, jp, yx, yp;
  int want_d;       /* this evaluation wants derivatives */
  int nloop;        /* controllers and switches (units with a pre pass) */
  int *loop_order;  /* those nloop units, each cascade's outer one first */
  int hold_loops;   /* controllers output their bias (vn_initial_state) */
  double *fwork;    /* nx: balances when the caller wants outputs only */
  /* sparse pattern of df/dx */
  long nnz;
  long *colptr, *rowind, *map;
  long nmap;
  /* inputs set by a controller or switch: that unit, else -1 */
  int *override;
  int nsw;              /* switches */
  vn_event *ev;
  long nev, capev;
  /* caller's stop flag */
  int (*stop) (void *);
  void *stop_data;
  char msg[1024];
};

/* The unit owning output i (-1 if none), by bisection. */
int vn_output_unit (const vn_net *net, int i);

/* kinds */
extern const vn_kind vn_kind_tank, vn_kind_boundary, vn_kind_feed,
  vn_kind_orifice, vn_kind_resistance, vn_kind_valve, vn_kind_pump,
  vn_kind_controller, vn_kind_switch, vn_kind_heater;

/* Properties carried by a flow out of a feed (its own parameters). */
void vn_feed_props (const vn_net *net, const vn_unit *u, vn_node *nd);

/* Measured quantity of a controller or switch: ref[0] unit, ref[1] its
 * output; the value and its derivative (NULL: not wanted). */
double vn_measure (vn_net *net, const vn_unit *u, const double *x,
                   vn_lf *dm);
/* Check the measure/manipulate references and claim the manipulated
 * input (net->override) for unit u. */
int vn_check_loop_refs (vn_net *net, vn_unit *u);
/* Order the units with a pre pass so that a controller or switch that
 * drives another's setpoint acts before it (net->loop_order). */
int vn_loop_order (vn_net *net);
void vn_controller_settle (vn_net *net, vn_unit *u, double *x);
double vn_switch_root (vn_net *net, vn_unit *u, const double *x);
void vn_switch_flip (vn_net *net, vn_unit *u);
void vn_switch_start (vn_net *net, vn_unit *u, const double *x);



/* messages */
int vn_fail (vn_net *net, int status, const char *fmt, ...)
#if defined(__GNUC__)
  __attribute__ ((format (printf, 3, 4)))
#endif
  ;
int vn_fail_unit (vn_net *net, const vn_unit *u, const char *fmt, ...)
#if defined(__GNUC__)
  __attribute__ ((format (printf, 3, 4)))
#endif
  ;

/* parameter access for kinds */
static inline double vn_par (const vn_net *net, const vn_unit *u, int slot)
{ return net->p[u->poff + slot]; }
static inline int vn_pcol (const vn_unit *u, int slot)
{ return u->poff + slot; }
static inline int vn_given (const vn_net *net, const vn_unit *u, int slot)
{ return net->given[u->poff + slot]; }

/* evaluation framework */
int vn_eval (vn_net *net, double t, const double *x, double *f, double *y,
             int want_jx, int want_jp, int want_yx, int want_yp);
void vn_apply_signals (vn_net *net, double t);
int vn_trip_add (vn_trip *T, int r, int c, double v);
void vn_trip_free (vn_trip *T);
void vn_emit (vn_net *net, int row, double sign, const vn_lf *d,
              vn_trip *tx, vn_trip *tp);

/* the two-ended element geometry shared by orifices, resistances,
 * valves: head difference by the nozzle rule and the liquid gate */
double vn_link_dh (const vn_unit *u, const vn_node *s, const vn_node *d,
                   double outlet, double inlet, int pc_outlet, int pc_inlet,
                   vn_lf *ddh);
double vn_link_gate (const vn_net *net, const vn_node *s, const vn_node *d,
                     double dh, double outlet, double inlet, int pc_outlet,
                     int pc_inlet, double band, vn_lf *dg);
/* liquid above a nozzle at level z of a tank, as an equivalent level
 * (tank.c), with its derivative; *dry (may be NULL) set below empty */
double vn_tank_above (const vn_net *net, const vn_node *nd, double z,
                      int pc_z, vn_lf *de, int *dry);
/* the largest plan area of a tank (m2), the scale of its volume */
double vn_tank_area_ref (const vn_net *net, const vn_unit *u);
double vn_link_dry (const vn_node *s, const vn_node *d, vn_lf *dq);
int vn_link_check_ends (vn_net *net, vn_unit *u);
void vn_link_flow_output (vn_net *net, vn_unit *u, const vn_node *nd,
                          const double *x, double *y, vn_lf *dy);

#endif

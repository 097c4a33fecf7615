/* The caller's stop flag (Ctrl-C in Octave) ends a run cleanly: status
 * VN_EINTR, a message with the time reached, the handle reusable. */
#include <math.h>
#include <stdio.h>
#include <string.h>
#include "vn.h"
#include "vn_test.h"

static int calls;

/* stops on its 40th poll, as a user's Ctrl-C part-way through */
static int stop_after (void *data)
{
  (void) data;
  return ++calls >= 40;
}

int main (void)
{
  vt_net b;
  vn_net *net = NULL;
  vt_init (&b);
  int t = vt_unit (&b, "tank", "T1", -1, -1);
  vt_set (&b, t, "area", 2);
  vt_set (&b, t, "level", 1);
  int o = vt_unit (&b, "orifice", "O1", t, -1);
  vt_set (&b, o, "coeff", 0.01);
  int f = vt_unit (&b, "feed", "F1", -1, t);
  vt_set (&b, f, "flow", 0.012);
  if (vt_build (&b, &net) != VN_OK)
    {
      VT_CHECK (0, "network builds (%s)", b.msg);
      return vt_done ();
    }
  enum { NT = 2001 };
  static double tout[NT], X[NT], Y[NT * 16];
  for (int k = 0; k < NT; k++)
    tout[k] = 10.0 * k;
  double x0[1];
  vn_initial_state (net, x0);
  vn_sim_opts op = {0};
  op.stop = stop_after;
  vn_sim_stats s;
  calls = 0;
  int st = vn_simulate (net, x0, NT, tout, X, Y, &op, &s);
  VT_CHECK (st == VN_EINTR, "stop flag ends the run with VN_EINTR (got %d)",
            st);
  VT_CHECK (strstr (vn_errmsg (net), "interrupted at t =") != NULL,
            "message says where it stopped (%s)", vn_errmsg (net));
  VT_CHECK (s.t_reached > 0 && s.t_reached < tout[NT - 1],
            "stopped part-way (t %g s of %g)", s.t_reached, tout[NT - 1]);
  /* the same handle runs to the end once the flag is clear */
  op.stop = NULL;
  st = vn_simulate (net, x0, NT, tout, X, Y, &op, &s);
  VT_CHECK (st == VN_OK, "the handle runs again after an interrupt (%d)", st);
  /* Torricelli steady state h = (F/c)^2 = 1.44 m after 20000 s */
  int yl = vt_yidx (&b, net, t, "level");
  VT_NEAR (Y[(long) yl * NT + NT - 1], 1.44, 1e-3, "level after the rerun (m)");
  vn_net_free (net);
  return vt_done ();
}

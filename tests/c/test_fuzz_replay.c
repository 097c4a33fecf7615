/* Replays the fuzzer's inputs through the same round of work the fuzzer
 * does (tests/fuzz/fuzz_run.h): the committed seed corpus and every input
 * that once crashed the core (tests/fuzz/regress, one file per crash,
 * named for what it broke).  A crash here kills the program, which the
 * runner counts as a failure; under "make sanitize" the sanitizers watch
 * the whole round.  Run from the top of the checkout (as make check
 * does), or give the two directories as arguments. */
#include <dirent.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include "../fuzz/fuzz_run.h"
#include "vn_test.h"

static int replay_dir (const char *dir)
{
  DIR *d = opendir (dir);
  if (!d)
    return -1;
  int n = 0;
  struct dirent *e;
  while ((e = readdir (d)) != NULL)
    {
      size_t nl = strlen (e->d_name);
      if (e->d_name[0] == '.' || (nl > 3 && !strcmp (e->d_name + nl - 3, ".md")))
        continue;
      char path[1024];
      snprintf (path, sizeof path, "%s/%s", dir, e->d_name);
      FILE *f = fopen (path, "rb");
      if (!f)
        continue;
      static uint8_t buf[1 << 16];
      size_t len = fread (buf, 1, sizeof buf, f);
      fclose (f);
      fflush (stdout);
      fz_run (buf, len);
      VT_CHECK (1, "replayed %s (%zu bytes) without a crash", path, len);
      n++;
    }
  closedir (d);
  return n;
}

int main (int argc, char **argv)
{
  const char *corpus = argc > 1 ? argv[1] : "tests/fuzz/corpus";
  const char *regress = argc > 2 ? argv[2] : "tests/fuzz/regress";
  int n = replay_dir (corpus);
  VT_CHECK (n >= 5, "seed corpus %s has at least 5 inputs (found %d)",
            corpus, n);
  n = replay_dir (regress);
  VT_CHECK (n >= 2, "regression inputs in %s (found %d)", regress, n);
  return vt_done ();
}

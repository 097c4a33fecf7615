/* libFuzzer entry point: each input becomes a network, signals and a round
 * of construction, evaluation, Jacobians, linearisation, a bounded
 * simulation and a steady solve (fuzz_run.h says how).  Built by
 * "make fuzz" with clang -fsanitize=fuzzer,address,undefined. */
#include <stddef.h>
#include <stdint.h>
#include "fuzz_run.h"

int LLVMFuzzerTestOneInput (const uint8_t *data, size_t size);

int LLVMFuzzerTestOneInput (const uint8_t *data, size_t size)
{
  return fz_run (data, size);
}

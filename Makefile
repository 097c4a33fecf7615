## vesselnet developer entry points.
##   make            build build/libvncore.a and build/oct/*.oct
##   make check      install missing Debian packages (as root), build, run
##                   the C tests (also under the sanitizers) and the Octave
##                   tests; last line "N passed, N failed"
##   make sanitize   core and C tests built with gcc -fsanitize=address,
##                   undefined into build/sanitize and run; any report fails
##   make fuzz       libFuzzer harness tests/fuzz (clang-14), a short run
##   make stress     fuzz for STRESS_SECONDS, then the property suite with
##                   VN_PROP_CASES=3000
##   make memcheck   valgrind over a few Octave calls; reports inside
##                   vesselnet fail
##   make demo       run demos/run_demo.m
##   make bench      run bench/run_bench.sh or bench/run_bench.m
##   make dist       write vesselnet-VERSION.tar.gz for "pkg install"
##   make distcheck  pkg install the tarball in a scratch prefix and load it
##   make install    pkg install the tarball
##   make clean
## The compile rules live in src/Makefile, which "pkg install" also uses.

SHELL       := /bin/bash
.SHELLFLAGS := -o pipefail -c

VERSION := $(shell sed -n 's/^Version:[[:space:]]*//p' DESCRIPTION)
PKGDIR  := vesselnet-$(VERSION)
TARBALL := $(PKGDIR).tar.gz

BUILD     := $(CURDIR)/build
OCTDIR    := $(BUILD)/oct
LIB       := $(BUILD)/libvncore.a
CTEST_DIR := $(BUILD)/tests/c
RESULTS   := $(BUILD)/test-results

MKOCTFILE ?= mkoctfile
VN_CC     := gcc
CORE_CFLAGS := -std=c99 -O2 -fPIC -Wall -Wextra -Werror
SUITESPARSE_INC := /usr/include/suitesparse
VN_LIBS = -lsundials_cvodes -lsundials_kinsol -lsundials_nvecserial \
          -lsundials_sunmatrixdense -lsundials_sunlinsoldense \
          -lsundials_sunmatrixsparse -lsundials_sunlinsolklu \
          -lklu -llapack -lblas -lm

SUBMAKE = $(MAKE) --no-print-directory -C src OUT=$(BUILD) OCTDIR=$(OCTDIR) \
          VN_CC=$(VN_CC) MKOCTFILE=$(MKOCTFILE)

CTEST_SRC := $(sort $(wildcard tests/c/*.c))
CTEST_BIN := $(patsubst tests/c/%.c,$(CTEST_DIR)/%,$(CTEST_SRC))

## Octave without a display: plots go to invisible gnuplot figures.
OCTAVE_ENV = env -u DISPLAY QT_QPA_PLATFORM=offscreen \
             OCTAVE_PATH=$(CURDIR)/inst:$(OCTDIR) VN_ROOT=$(CURDIR) \
             VN_OCTDIR=$(OCTDIR)
OCTAVE_RUN = $(OCTAVE_ENV) octave-cli --no-gui --norc --no-history -q
OCTAVE_SETUP = more off; warning ('off', 'Octave:gnuplot-graphics'); \
               set (0, 'defaultfigurevisible', 'off');

.DELETE_ON_ERROR:
.PHONY: all deps check ctests demo bench dist distcheck install clean FORCE \
        sanitize sanitize-build fuzz fuzz-build fuzz-seeds stress memcheck

all: $(LIB)
	@$(SUBMAKE) oct
	@$(if $(MPICC),$(MAKE) --no-print-directory $(CLUSTER),true)

## The MPI program of vn_ensemble (..., "cluster", ...): built only where
## mpicc exists (Debian: openmpi-bin, libopenmpi-dev).
MPICC   := $(shell command -v mpicc 2>/dev/null)
CLUSTER := $(BUILD)/bin/vn_cluster

$(CLUSTER): src/cluster/vn_cluster.c $(wildcard src/core/*.h) $(LIB)
	@mkdir -p $(dir $@)
	$(MPICC) $(CORE_CFLAGS) -Isrc/core -I$(SUITESPARSE_INC) $< $(LIB) \
	  $(VN_LIBS) -o $@

## src/Makefile knows the core's dependencies; asking it every time is cheap.
$(LIB): FORCE
	@$(SUBMAKE) lib

deps:
	@bash tools/deps.sh

## ---- tests ------------------------------------------------------------

ctests: $(CTEST_BIN)

$(CTEST_DIR):
	mkdir -p $@

## The old binary goes first: a test that no longer compiles must not run.
$(CTEST_DIR)/%: tests/c/%.c $(wildcard tests/c/*.h tests/fuzz/*.h) $(wildcard src/core/*.h) \
                $(LIB) | $(CTEST_DIR)
	@rm -f $@
	$(VN_CC) $(CORE_CFLAGS) -Isrc/core -Itests/c -I$(SUITESPARSE_INC) \
	  $< $(LIB) $(VN_LIBS) -o $@ 2>&1 | tee $@.build.log

## ---- sanitizers: the core and every C test again, with AddressSanitizer
## (leaks included) and UndefinedBehaviorSanitizer, in build/sanitize.
## gcc's runtimes come with build-essential; nothing else is needed.  A
## report stops the program (-fno-sanitize-recover) and fails its file.
SAN_DIR    := $(BUILD)/sanitize
SAN_LIB    := $(SAN_DIR)/libvncore.a
SAN_FLAGS  := -fsanitize=address,undefined,float-cast-overflow \
              -fno-sanitize-recover=all -fno-omit-frame-pointer -g
SAN_CFLAGS := -std=c99 -O1 -fPIC -Wall -Wextra -Werror $(SAN_FLAGS)
SAN_BIN    := $(patsubst tests/c/%.c,$(SAN_DIR)/tests/c/%,$(CTEST_SRC))
SAN_ENV    := ASAN_OPTIONS=detect_leaks=1:halt_on_error=1:exitcode=23 \
              UBSAN_OPTIONS=print_stacktrace=1:halt_on_error=1

$(SAN_LIB): FORCE
	@$(MAKE) --no-print-directory -C src OUT=$(SAN_DIR) VN_CC=$(VN_CC) \
	  CORE_CFLAGS="$(SAN_CFLAGS)" lib

$(SAN_DIR)/tests/c:
	mkdir -p $@

$(SAN_DIR)/tests/c/%: tests/c/%.c $(wildcard tests/c/*.h tests/fuzz/*.h) \
                      $(wildcard src/core/*.h) $(SAN_LIB) | $(SAN_DIR)/tests/c
	@rm -f $@
	$(VN_CC) $(SAN_CFLAGS) -Isrc/core -Itests/c -I$(SUITESPARSE_INC) \
	  $< $(SAN_LIB) $(VN_LIBS) -o $@ 2>&1 | tee $@.build.log

sanitize-build: $(SAN_BIN)

sanitize:
	@$(MAKE) --no-print-directory -k sanitize-build || true
	@rm -rf $(SAN_DIR)/results && mkdir -p $(SAN_DIR)/results
	@$(SAN_ENV) bash tests/run_c_tests.sh $(SAN_DIR)/tests/c \
	  $(SAN_DIR)/results sanitize
	@bash tools/sum_results.sh $(SAN_DIR)/results

## ---- fuzzing: tests/fuzz/fuzz_core.c under libFuzzer (clang-14), with the
## core compiled in, AddressSanitizer and UBSan on.  Optional: without
## clang or its fuzzer runtime the targets say so and do nothing; make
## check never needs clang (tests/c/test_fuzz_replay.c replays the seeds
## and every crash input with gcc).
FUZZ_CC        ?= clang-14
FUZZ_DIR       := $(BUILD)/fuzz
FUZZ_BIN       := $(FUZZ_DIR)/fuzz_core
FUZZ_SECONDS   ?= 30
STRESS_SECONDS ?= 120
FUZZ_CFLAGS := -std=c99 -g -O1 -Wall -Wextra \
               -fsanitize=fuzzer,address,undefined,float-cast-overflow \
               -fno-sanitize-recover=all -Isrc/core -I$(SUITESPARSE_INC)
FUZZ_SRC := tests/fuzz/fuzz_core.c $(wildcard tests/fuzz/*.h) \
            $(wildcard src/core/*.c src/core/*.h)
FUZZ_PROBE = printf 'int LLVMFuzzerTestOneInput (const char *d, long n)\n{ (void) d; (void) n; return 0; }\n' \
             | $(FUZZ_CC) -fsanitize=fuzzer -x c - -o /dev/null >/dev/null 2>&1
FUZZ_OK = command -v $(FUZZ_CC) >/dev/null && $(FUZZ_PROBE)

$(FUZZ_BIN): $(FUZZ_SRC)
	@mkdir -p $(FUZZ_DIR)
	$(FUZZ_CC) $(FUZZ_CFLAGS) tests/fuzz/fuzz_core.c src/core/*.c \
	  $(VN_LIBS) -lpthread -o $@

fuzz-build:
	@if $(FUZZ_OK); then \
	  $(MAKE) --no-print-directory $(FUZZ_BIN); \
	else \
	  echo "fuzz: skipped: $(FUZZ_CC) with libFuzzer (-fsanitize=fuzzer) is" \
	       "not installed (Debian: clang-14 libclang-rt-14-dev)"; \
	fi

## Writes the committed seed corpus from tests/fuzz/seeds.c (run it after
## a schema change; the seeds must still build).
fuzz-seeds: $(LIB)
	@mkdir -p $(FUZZ_DIR)
	$(VN_CC) $(CORE_CFLAGS) -Isrc/core -I$(SUITESPARSE_INC) tests/fuzz/seeds.c \
	  $(LIB) $(VN_LIBS) -lpthread -o $(FUZZ_DIR)/seeds
	$(FUZZ_DIR)/seeds tests/fuzz/corpus tests/fuzz/regress

fuzz: fuzz-build
	@if $(FUZZ_OK); then \
	  bash tests/fuzz/run_fuzz.sh $(FUZZ_BIN) $(FUZZ_DIR) $(FUZZ_SECONDS); fi

## The fuzzer for STRESS_SECONDS, then the random-network property suite
## with 3000 cases when it exists.
stress: fuzz-build all
	@if $(FUZZ_OK); then \
	  bash tests/fuzz/run_fuzz.sh $(FUZZ_BIN) $(FUZZ_DIR) $(STRESS_SECONDS); fi
	@if [ -f tests/octave/test_properties.m ]; then \
	  echo "stress: tests/octave/test_properties.m with VN_PROP_CASES=3000"; \
	  rm -rf $(BUILD)/stress-results; \
	  VN_PROP_CASES=3000 VN_OCTDIR=$(OCTDIR) bash tests/run_octave_tests.sh \
	    $(BUILD)/stress-results tests/octave/test_properties.m; \
	  bash tools/sum_results.sh $(BUILD)/stress-results; \
	else \
	  echo "stress: tests/octave/test_properties.m not found, property suite skipped"; \
	fi

## ---- valgrind over a few Octave calls; only reports with a frame inside
## vesselnet count (tests/memcheck/run_memcheck.sh).  Takes minutes.
memcheck: deps all
	@bash tests/memcheck/run_memcheck.sh $(OCTDIR) $(BUILD)/memcheck

## A failed build is recorded as a failure and the tests still run, so one
## broken file does not hide the state of everything else.  Oct-files are
## removed then, so no test runs against a stale build.
check: deps
	@rm -rf $(RESULTS) && mkdir -p $(RESULTS)
	@echo "== build"
	@$(MAKE) --no-print-directory -k all 2>&1 | tee $(RESULTS)/build.log \
	  || { rm -rf $(OCTDIR); \
	       echo "0 1 0 build $(RESULTS)/build.log make all failed, oct-files removed" \
	         > $(RESULTS)/build.res; }
	@$(MAKE) --no-print-directory -k ctests || true
	@echo "== C tests"
	@bash tests/run_c_tests.sh $(CTEST_DIR) $(RESULTS)
	@echo "== C tests under the sanitizers (gcc -fsanitize=address,undefined)"
	@$(MAKE) --no-print-directory -k sanitize-build \
	  > $(RESULTS)/sanitize-build.log 2>&1 \
	  || echo "0 1 0 sanitize-build $(RESULTS)/sanitize-build.log" \
	       "make sanitize-build failed" > $(RESULTS)/sanitize-build.res
	@$(SAN_ENV) bash tests/run_c_tests.sh $(SAN_DIR)/tests/c $(RESULTS) sanitize
	@echo "== Octave tests"
	@VN_OCTDIR=$(OCTDIR) bash tests/run_octave_tests.sh $(RESULTS)
	@bash tools/sum_results.sh $(RESULTS)

## ---- demo and benchmarks --------------------------------------------

demo: deps all
	@test -f demos/run_demo.m \
	  || { echo "demo: demos/run_demo.m not found" >&2; exit 1; }
	$(OCTAVE_RUN) --eval "$(OCTAVE_SETUP) run ('$(CURDIR)/demos/run_demo.m');"

bench: deps all
	@if [ -f bench/run_bench.sh ]; then \
	  $(OCTAVE_ENV) bash bench/run_bench.sh; \
	elif [ -f bench/run_bench.m ]; then \
	  $(OCTAVE_RUN) --eval "$(OCTAVE_SETUP) run ('$(CURDIR)/bench/run_bench.m');"; \
	else \
	  echo "bench: neither bench/run_bench.sh nor bench/run_bench.m exists" >&2; \
	  exit 1; \
	fi

## ---- packaging --------------------------------------------------------

DIST_FILES = DESCRIPTION COPYING NEWS INDEX $(wildcard README.md) \
             $(wildcard inst doc demos) src/Makefile \
             $(wildcard src/core src/gateway src/cluster)

dist:
	@rm -f $(TARBALL)
	tar --exclude='*.o' --exclude='*.oct' --exclude='*.a' --exclude='*~' \
	  --exclude='.*' --exclude='*-tst' --exclude='octave-workspace' \
	  --sort=name --owner=0 --group=0 --numeric-owner \
	  --transform='s,^,$(PKGDIR)/,' -czf $(TARBALL) $(DIST_FILES)
	@echo "wrote $(TARBALL)"

distcheck: dist
	@bash tools/check_dist.sh $(TARBALL)

install: dist
	octave-cli --no-gui --norc --no-history -q --eval "pkg install $(TARBALL)"

clean:
	rm -rf $(BUILD) vesselnet-*.tar.gz
	@$(MAKE) --no-print-directory -C src clean

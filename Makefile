## vesselnet developer entry points.
##   make            build build/libvncore.a and build/oct/*.oct
##   make check      install missing Debian packages (as root), build, run
##                   the C and Octave tests; last line "N passed, N failed"
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
OCTAVE_RUN = $(OCTAVE_ENV) octave-cli --no-gui --norc -q
OCTAVE_SETUP = more off; warning ('off', 'Octave:gnuplot-graphics'); \
               set (0, 'defaultfigurevisible', 'off');

.DELETE_ON_ERROR:
.PHONY: all deps check ctests demo bench dist distcheck install clean FORCE

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
$(CTEST_DIR)/%: tests/c/%.c $(wildcard tests/c/*.h) $(wildcard src/core/*.h) \
                $(LIB) | $(CTEST_DIR)
	@rm -f $@
	$(VN_CC) $(CORE_CFLAGS) -Isrc/core -Itests/c -I$(SUITESPARSE_INC) \
	  $< $(LIB) $(VN_LIBS) -o $@ 2>&1 | tee $@.build.log

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
	octave-cli --no-gui --norc -q --eval "pkg install $(TARBALL)"

clean:
	rm -rf $(BUILD) vesselnet-*.tar.gz
	@$(MAKE) --no-print-directory -C src clean

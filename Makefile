# SPDX-License-Identifier: GPL-3.0-or-later
# holent: top-level targets.  See README.md and DEVELOPERS.md.
# make check TESTS="name ..." runs only the BIST/cross-check files and C
# unit tests whose names contain one of the words.
SHELL := /bin/bash
.SHELLFLAGS := -o pipefail -c

# The version is DESCRIPTION's, the one place it is written.
VERSION := $(shell sed -n 's/^Version: *//p' DESCRIPTION)
PKG := holent-$(VERSION)
# BUILD and TARBALL may be overridden (parallel work trees, CI).
BUILD ?= $(CURDIR)/build
TARBALL ?= $(CURDIR)/$(PKG).tar.gz
PREFIX := $(BUILD)/prefix
OCTAVE ?= octave-cli
OCT := $(OCTAVE) --norc --no-history --quiet
# Debian's Octave 7 prints a harmless message at exit; drop it.
FILTER := sed -u '/ignoring const execution_exception/d'
PKGSETUP := pkg ("prefix", "$(PREFIX)", "$(PREFIX)"); pkg ("local_list", "$(PREFIX)/octave_packages");

DIST_SRC := $(shell find inst src doc -type f ! -name '*.o' ! -name '*.mex' ! -name '*.oct' 2>/dev/null)

all: dist

dist: $(TARBALL)

# Reproducible: the same sources give the same bytes (names sorted, one
# mtime for every entry, owner 0:0 numeric, modes from the permission bits
# alone, gzip without name or time stamp).  The mtime is SOURCE_DATE_EPOCH
# when set, else the last commit's time, else DESCRIPTION's Date.
DIST_EPOCH := $(or $(SOURCE_DATE_EPOCH),$(shell git log -1 --format=%ct 2>/dev/null),$(shell date -u -d "$$(sed -n 's/^Date: *//p' DESCRIPTION)" +%s))
TAR_REPRO := --sort=name --format=gnu --mtime=@$(DIST_EPOCH) --owner=0 \
  --group=0 --numeric-owner --mode=u+rw,go=u-w

$(TARBALL): $(DIST_SRC) DESCRIPTION INDEX LICENSE Makefile
	rm -rf $(BUILD)/dist && mkdir -p $(BUILD)/dist/$(PKG)/src/core
	cp -r DESCRIPTION INDEX inst doc $(BUILD)/dist/$(PKG)/
	cp LICENSE $(BUILD)/dist/$(PKG)/COPYING
	cp src/Makefile src/*.c src/*.cc src/*.h $(BUILD)/dist/$(PKG)/src/
	cp src/core/*.c src/core/*.h $(BUILD)/dist/$(PKG)/src/core/
	mkdir -p $(dir $@)
	LC_ALL=C tar -C $(BUILD)/dist $(TAR_REPRO) -cf - $(PKG) | gzip -n -9 > $@.tmp
	mv $@.tmp $@
	@echo "built $@"

# Two builds of the tarball into throwaway paths must agree byte for byte
# (run by make check under TESTS containing "dist"); one epoch for both, so
# a commit made meanwhile does not count as a difference.
dist-check:
	@d=$$(mktemp -d) && trap 'rm -rf "$$d"' EXIT && \
	for k in 1 2; do \
	  $(MAKE) -s --no-print-directory BUILD=$$d/b$$k TARBALL=$$d/t$$k.tar.gz \
	    SOURCE_DATE_EPOCH=$(DIST_EPOCH) $$d/t$$k.tar.gz > /dev/null || exit 1; \
	  sleep 1; \
	done && \
	if cmp -s $$d/t1.tar.gz $$d/t2.tar.gz; then \
	  echo "dist: reproducible ($(PKG).tar.gz, $$(wc -c < $$d/t1.tar.gz) bytes, sha256 $$(sha256sum < $$d/t1.tar.gz | cut -c1-16))"; \
	else \
	  echo "FAIL dist: two builds of $(PKG).tar.gz differ"; exit 1; \
	fi

deps:
	@bash tests/ensure_deps.sh

# Into the user's own package prefix: no root needed.
install: $(TARBALL)
	$(OCT) --eval 'pkg ("install", "-local", "$(TARBALL)")' 2>&1 | $(FILTER)

# Into a throwaway prefix under build/, never the user's.
throwaway-install: deps $(TARBALL)
	rm -rf $(PREFIX) && mkdir -p $(PREFIX)
	$(OCT) --eval '$(PKGSETUP) pkg ("install", "-local", "$(TARBALL)");' 2>&1 | $(FILTER)

check: throwaway-install
	BUILD="$(BUILD)" TESTS="$(TESTS)" bash tests/run_all.sh "$(PREFIX)"

demo: throwaway-install
	$(OCT) --eval '$(PKGSETUP) pkg load holent; holent_demo ();' 2>&1 | $(FILTER)
	$(OCT) --eval '$(PKGSETUP) pkg load holent; addpath ("$(CURDIR)/doc/gallery"); f = render_gallery ("$(BUILD)/gallery"); printf ("%s\n", f{:});' 2>&1 | $(FILTER)

# The committed images of the README gallery (doc/gallery/*.png).
gallery: throwaway-install
	$(OCT) --eval '$(PKGSETUP) pkg load holent; addpath ("$(CURDIR)/doc/gallery"); render_gallery ("$(CURDIR)/doc/gallery");' 2>&1 | $(FILTER)

bench: throwaway-install
	$(OCT) --eval '$(PKGSETUP) pkg load holent; addpath ("$(CURDIR)/bench"); run_benchmarks ();' 2>&1 | $(FILTER)

# libFuzzer harnesses of the core (fuzz/), FUZZ_TIME seconds each; needs
# clang.  make check runs them briefly (a fixed number of inputs).
FUZZ_TIME ?= 60
fuzz:
	bash fuzz/run.sh "$(BUILD)/fuzz" $(FUZZ_TIME)

clean:
	rm -rf $(BUILD) $(TARBALL)
	$(MAKE) -C src clean

.PHONY: all dist dist-check deps install throwaway-install check demo gallery bench clean fuzz

# holent: top-level targets.  See README.md and DEVELOPERS.md.
# make check TESTS="name ..." runs only the BIST/cross-check files and C
# unit tests whose names contain one of the words.
SHELL := /bin/bash
.SHELLFLAGS := -o pipefail -c

VERSION := 0.1.0
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

$(TARBALL): $(DIST_SRC) DESCRIPTION INDEX LICENSE Makefile
	rm -rf $(BUILD)/dist && mkdir -p $(BUILD)/dist/$(PKG)/src/core
	cp -r DESCRIPTION INDEX inst doc $(BUILD)/dist/$(PKG)/
	cp LICENSE $(BUILD)/dist/$(PKG)/COPYING
	cp src/Makefile src/*.c src/*.cc src/*.h $(BUILD)/dist/$(PKG)/src/
	cp src/core/*.c src/core/*.h $(BUILD)/dist/$(PKG)/src/core/
	tar -C $(BUILD)/dist -czf $@ $(PKG)
	@echo "built $@"

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

.PHONY: all dist deps install throwaway-install check demo gallery bench clean fuzz

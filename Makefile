# Tubewright build and checks. `make run` opens the app, `make test` runs
# everything CI runs. Both install the Debian/Ubuntu packages they need when
# they run as root, and otherwise print the exact apt-get command.

SHELL := /bin/bash
GO ?= go
VERSION ?= $(shell git describe --always --dirty 2>/dev/null || echo dev)
LDFLAGS := -X tubewright/ui.Version=$(VERSION)
# The browser build does not inline calls in the screens (ui), the sheet
# glue, Gio and go-text: code without inlined copies packs much better
# (measured: xz form 2.95 -> 2.71 MB, raw 16.9 -> 16.5 MB) and the first
# frame was no slower in headless Chromium. The numeric packages (calc/...)
# and Go's own keep inlining, where it is worth its bytes; so does
# gioui.org/text, whose line iterator would otherwise move to the heap and
# allocate on every frame (BenchmarkScreenFrame built with these flags:
# gas idle 201 allocations with it not inlined, 21 inlined).
WASM_GCFLAGS := -gcflags=tubewright/ui/...=-l -gcflags=tubewright/calc/sheet=-l \
	-gcflags=gioui.org/...=-l -gcflags=gioui.org/text= -gcflags=github.com/go-text/...=-l

# Gio's desktop build (cgo headers) and Mesa's software renderer, which the
# headless screenshot tests use (see DEVELOPERS.md).
DEB_PKGS := gcc pkg-config libwayland-dev libx11-dev libx11-xcb-dev \
	libxkbcommon-x11-dev libgles2-mesa-dev libegl1-mesa-dev libffi-dev \
	libxcursor-dev libvulkan-dev libegl1 libegl-mesa0 libgl1-mesa-dri libgles2

FUZZTIME ?= 20s

# The browser build and its test: Debian's chromium driven by playwright-core
# from npm (no browser download), installed under build/npm.
WEB_DIR := build/web
NPM_DIR := build/npm
PLAYWRIGHT_VERSION := 1.65.2
BROWSER_PKGS := chromium fonts-dejavu-core
# The store's tests built for the browser run under node, with IndexedDB from
# fake-indexeddb, installed in a folder of its own under build/npm.
FAKE_IDB_VERSION := 6.2.8
STORE_NPM_DIR := $(NPM_DIR)/store
# The page unpacks the xz form of the app with xz-decompress (xz-embedded
# built to WebAssembly, MIT and public domain), pinned, in a folder of its own;
# pack copies its script into the build as unxz.js. xz-utils compresses.
UNXZ_VERSION := 0.2.3
WEB_NPM_DIR := $(NPM_DIR)/web
UNXZ_JS := $(WEB_NPM_DIR)/node_modules/xz-decompress/dist/package/xz-decompress.min.js
SERVE_ADDR ?= 127.0.0.1:8080

# apt_install checks that the Debian packages $(1) are installed; as root it
# installs the missing ones, otherwise it prints the command and fails.
define apt_install
	@missing=""; \
	for p in $(1); do \
		dpkg-query -W -f='$${Status}' $$p 2>/dev/null | grep -q 'install ok installed' || missing="$$missing $$p"; \
	done; \
	if [ -n "$$missing" ]; then \
		if [ "$$(id -u)" = 0 ] && command -v apt-get >/dev/null; then \
			echo "installing system packages:$$missing"; \
			apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends $$missing >/dev/null; \
		else \
			echo "missing system packages; run:"; \
			echo "  sudo apt-get install -y --no-install-recommends$$missing"; \
			exit 1; \
		fi; \
	fi
endef

# npm_install checks that npm is on PATH; as root it installs Debian's
# nodejs and npm, otherwise it prints the command and fails.
define npm_install
	@command -v npm >/dev/null || { \
		if [ "$$(id -u)" = 0 ] && command -v apt-get >/dev/null; then \
			echo "installing system packages: nodejs npm"; \
			apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends nodejs npm >/dev/null; \
		else \
			echo "npm is missing; run:"; echo "  sudo apt-get install -y --no-install-recommends nodejs npm"; exit 1; \
		fi; }
endef

.PHONY: all run test deps check-go fmt-check vet lint unit idle-allocs build-twcalc build-wasm \
	web web-deps serve-web web-size browser-deps browser-test store-wasm-deps store-wasm-test apk shots fonts bench fuzz clean

all: test

## run: build and open the app in a desktop window
run: deps
	$(GO) run -ldflags "$(LDFLAGS)" ./cmd/tubewright

## test: everything CI checks
test: deps fmt-check vet lint unit idle-allocs store-wasm-test build-twcalc build-wasm browser-test
	@echo "make test: all checks passed"

check-go:
	@command -v $(GO) >/dev/null || { echo "Go is missing: install Go 1.26 or newer (https://go.dev/doc/install) and put it on PATH"; exit 1; }

deps: check-go
	$(call apt_install,$(DEB_PKGS))

fmt-check:
	@out=$$(gofmt -l $$(git ls-files '*.go' 2>/dev/null || find . -name '*.go')); \
	if [ -n "$$out" ]; then echo "gofmt would change:"; echo "$$out"; exit 1; fi

vet:
	$(GO) vet ./...
	GOOS=js GOARCH=wasm $(GO) vet ./cmd/tubewright/ ./ui/...

lint:
	$(GO) tool staticcheck ./...

unit:
	$(GO) test -race -count=1 ./...

build-twcalc:
	CGO_ENABLED=0 $(GO) build -o /dev/null ./cmd/twcalc

## idle-allocs: the steady-frame allocation test, which the -race run skips
## (the race detector allocates on its own), built as usual and again with
## the browser build's WASM_GCFLAGS (a package left without inlining can
## make a frame allocate that does not natively)
idle-allocs:
	$(GO) test -count=1 -run 'TestIdleLayoutAllocatesNothing' ./ui
	$(GO) test -count=1 -run 'TestIdleLayoutAllocatesNothing' $(WASM_GCFLAGS) ./ui

build-wasm:
	GOOS=js GOARCH=wasm $(GO) build -o /dev/null ./cmd/tubewright

## web: the WebAssembly build with its page shell in build/web: the app
## xz-compressed (with its decoder), gzip-compressed and raw, and a service
## worker that lists exactly these files
web: check-go web-deps
	rm -rf $(WEB_DIR) && mkdir -p build
	GOOS=js GOARCH=wasm $(GO) build -trimpath $(WASM_GCFLAGS) -ldflags "-s -w $(LDFLAGS)" -o build/tubewright.wasm ./cmd/tubewright
	$(GO) run ./assets/web/pack -wasm build/tubewright.wasm -unxz $(UNXZ_JS) -out $(WEB_DIR)

web-deps:
	$(call apt_install,xz-utils)
	$(call npm_install)
	@test -f $(UNXZ_JS) || \
		npm install --prefix $(WEB_NPM_DIR) --no-save --no-audit --no-fund xz-decompress@$(UNXZ_VERSION)

## serve-web: build, then serve build/web on http://$(SERVE_ADDR)/ to try it here
serve-web: web
	$(GO) run ./assets/web/pack -serve $(WEB_DIR) -addr $(SERVE_ADDR)

## web-size: a table of the app's raw and compressed sizes, the bytes of a cold
## visit and the first-frame time in headless Chromium at phone size
web-size: web browser-deps
	NODE_PATH=$(CURDIR)/$(NPM_DIR)/node_modules node assets/web/browsertest/run.js size $(WEB_DIR)

browser-deps:
	$(call apt_install,$(BROWSER_PKGS))
	$(call npm_install)
	@test -f $(NPM_DIR)/node_modules/playwright-core/package.json || \
		npm install --prefix $(NPM_DIR) --no-save --no-audit --no-fund playwright-core@$(PLAYWRIGHT_VERSION)

## browser-test: the built folder in headless Chromium at phone size with touch
browser-test: web browser-deps
	$(GO) run ./assets/web/pack -check $(WEB_DIR)
	NODE_PATH=$(CURDIR)/$(NPM_DIR)/node_modules node assets/web/browsertest/run.js test $(WEB_DIR)

store-wasm-deps: check-go
	$(call npm_install)
	@test -f $(STORE_NPM_DIR)/node_modules/fake-indexeddb/package.json || \
		npm install --prefix $(STORE_NPM_DIR) --no-save --no-audit --no-fund fake-indexeddb@$(FAKE_IDB_VERSION)

## store-wasm-test: the store's tests built for the browser (GOOS=js) and run
## under node, so the browser back end passes the same checks as the others
store-wasm-test: store-wasm-deps
	NODE_PATH=$(CURDIR)/$(STORE_NPM_DIR)/node_modules NODE_OPTIONS="--require fake-indexeddb/auto" \
		GOOS=js GOARCH=wasm $(GO) test -count=1 -exec="$$($(GO) env GOROOT)/lib/wasm/go_js_wasm_exec" ./ui/store

## apk: the Android package in build/tubewright.apk with Gio's gogio (pinned),
## where an Android SDK, NDK and JDK are installed; otherwise says what to install
apk: check-go
	$(GO) run ./assets/android -count "$$(git rev-list --count HEAD 2>/dev/null || echo 1)" \
		-stamp "$(VERSION)" -o build/tubewright.apk

## shots: screenshots of every screen at phone, tablet and desktop sizes (both ways up), bright and dark, in build/shots
shots: deps
	mkdir -p build/shots
	SHOT_DIR=$(CURDIR)/build/shots $(GO) test -count=1 -run 'TestScreenshot' ./ui/

## fonts: rewrite ui/fonts (the app's bold face) from golang.org/x/image's Go
## Bold, with its TrueType hinting left out (Gio never runs it), with
## Debian's fonttools; TestAppFacesDrawAsGoFonts checks the result
GOFONT_TTFS = $(shell $(GO) list -m -f '{{.Dir}}' golang.org/x/image)/font/gofont/ttfs
fonts: check-go
	$(call apt_install,python3-fonttools)
	for f in Bold; do \
		/usr/bin/python3 -m fontTools.subset $(GOFONT_TTFS)/Go-$$f.ttf --unicodes='*' --glyphs='*' \
			--no-hinting --layout-features='*' --name-IDs='*' --name-languages='*' --name-legacy \
			--notdef-glyph --notdef-outline --output-file=ui/fonts/Go-$$f.ttf || exit 1; \
	done
	cp $(GOFONT_TTFS)/README ui/fonts/LICENSE && chmod 644 ui/fonts/LICENSE

## bench: the benchmarks behind the speed and memory claims
bench: check-go
	$(GO) test -run '^$$' -bench . -benchmem ./...

## fuzz: each fuzz target for FUZZTIME (default 20s)
fuzz: check-go
	@for pkg in $$($(GO) list ./...); do \
		for f in $$($(GO) test -list '^Fuzz' $$pkg 2>/dev/null | grep '^Fuzz'); do \
			echo "== $$pkg $$f"; \
			$(GO) test -run '^$$' -fuzz "^$$f$$" -fuzztime $(FUZZTIME) $$pkg || exit 1; \
		done; \
	done

clean:
	rm -rf build

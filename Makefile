# nodelife — `make run` serves the app; `make test` runs every test.
GO      ?= go
ADDR    ?= 127.0.0.1:8080
GOROOT  := $(shell $(GO) env GOROOT)
WASMEXEC:= $(firstword $(wildcard $(GOROOT)/lib/wasm/wasm_exec.js $(GOROOT)/misc/wasm/wasm_exec.js))
SOURCES := $(shell find engine ui wasm -name '*.go' 2>/dev/null) go.mod go.sum
# Debian packages the tests need: Chromium for the browser tests, X/GL headers
# and a virtual display for the ebiten ui package's native tests.
TESTPKGS:= chromium xvfb xauth gcc libc6-dev libgl1-mesa-dev libx11-dev libxrandr-dev \
           libxcursor-dev libxinerama-dev libxi-dev libxxf86vm-dev

.PHONY: run build wasm test test-deps bench schema clean

## run: build the WebAssembly app and serve it on $(ADDR) (needs only Go)
run: build
	./bin/nodelife serve --addr $(ADDR)

## build: the native command, with the app embedded, no cgo
build: wasm
	CGO_ENABLED=0 $(GO) build -trimpath -o bin/nodelife .

## wasm: the browser app in static/
wasm: static/nodelife.wasm static/wasm_exec.js

static/nodelife.wasm: $(SOURCES)
	GOOS=js GOARCH=wasm $(GO) build -trimpath -ldflags="-s -w" -o $@ ./wasm
	gzip -9 -k -f $@

static/wasm_exec.js: $(WASMEXEC)
	cp $< $@

## test: install what the tests need (Debian, as root) and run every test
test: test-deps build
	$(GO) vet ./...
	GOOS=js GOARCH=wasm $(GO) vet ./engine/... ./ui/... ./wasm/...
	CGO_ENABLED=0 $(GO) build -o /dev/null .
	xvfb-run -a $(GO) test -count=1 ./...

test-deps:
	@missing=""; \
	command -v chromium >/dev/null || missing="$$missing chromium"; \
	command -v xvfb-run >/dev/null || missing="$$missing xvfb xauth"; \
	[ -f /usr/include/GL/gl.h ] && [ -f /usr/include/X11/extensions/Xrandr.h ] && \
	  [ -f /usr/include/X11/Xcursor/Xcursor.h ] && [ -f /usr/include/X11/extensions/Xinerama.h ] && \
	  [ -f /usr/include/X11/extensions/XInput2.h ] && [ -f /usr/include/X11/extensions/xf86vmode.h ] || \
	  missing="$$missing headers"; \
	command -v gcc >/dev/null || missing="$$missing gcc"; \
	if [ -n "$$missing" ]; then \
	  echo "installing test dependencies (missing:$$missing)"; \
	  if [ "$$(id -u)" != 0 ]; then echo "run as root, or: sudo apt-get install -y $(TESTPKGS)"; exit 1; fi; \
	  apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq $(TESTPKGS) >/dev/null; \
	fi

## bench: engine benchmarks, then the app's in headless Chromium (make test's packages)
bench: test-deps wasm
	$(GO) test -run '^$$' -bench . -benchmem ./engine/...
	$(GO) test -run '^$$' -bench . -benchtime 3x ./wasm/

## schema: rewrite the published JSON Schema from the field table
schema:
	$(GO) run . schema > engine/scenario/schema.json

clean:
	rm -rf bin static/nodelife.wasm static/nodelife.wasm.gz static/wasm_exec.js test-output

# helipol — the two commands a fresh machine needs: `make run` and `make test`.
SHELL := /bin/bash
DOTNET ?= dotnet
CONFIG ?= Release
CLI_DLL := src/Helipol.Cli/bin/$(CONFIG)/net10.0/helipol.dll
DESIGNS := $(sort $(wildcard designs/*.yaml))
# Outside readers the tests use (Debian packages): ezdxf for DXF, admesh for STL, poppler for PDF pages,
# nec2c (NEC-2) as an independent field solver for the engine.
APT_PACKAGES := python3-ezdxf admesh poppler-utils nec2c

.PHONY: all build run test bench deps clean schema

all: build

deps:
	@bash .ci/deps.sh $(APT_PACKAGES)

build:
	$(DOTNET) build Helipol.sln -c $(CONFIG) -nologo -v quiet

run: build
	@mkdir -p output
	$(DOTNET) $(CLI_DLL) build $(DESIGNS) -o output

test: deps
	@bash .ci/test.sh $(CONFIG)

schema: build
	$(DOTNET) $(CLI_DLL) schema -o designs/helipol.schema.json

bench:
	$(DOTNET) run --project tests/Helipol.Bench -c Release -- $(BENCH_ARGS)

clean:
	$(DOTNET) clean Helipol.sln -nologo -v quiet
	find output -mindepth 1 ! -name README.md -exec rm -rf {} +

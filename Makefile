# helipol — the two commands a fresh machine needs: `make run` and `make test`.
SHELL := /bin/bash
DOTNET ?= dotnet
CONFIG ?= Release
CLI_DLL := src/Helipol.Cli/bin/$(CONFIG)/net10.0/helipol.dll
DESIGNS := $(sort $(wildcard designs/*.yaml))
# Outside readers the tests use (Debian packages): ezdxf for DXF, admesh for STL, poppler for PDF pages,
# nec2c (NEC-2) as an independent field solver for the engine.
APT_PACKAGES := python3-ezdxf admesh poppler-utils nec2c
# `make install` packs helipol as a .NET tool into this folder and installs it from there.
TOOL_DIR := .tools
VERSION := $(shell sed -n 's:.*<Version>\(.*\)</Version>.*:\1:p' Directory.Build.props)

.PHONY: all build run test bench deps clean schema install validate validate-smoke

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

# Packs the tool into $(TOOL_DIR)/ and (re)installs it for this user as the command `helipol`
# (in ~/.dotnet/tools, which must be on PATH). Only the package registries are contacted.
install:
	@rm -f $(TOOL_DIR)/helipol.*.nupkg
	$(DOTNET) pack src/Helipol.Cli/Helipol.Cli.csproj -c $(CONFIG) -nologo -v quiet -o $(TOOL_DIR)
	@if $(DOTNET) tool list --global | grep -q '^helipol '; then $(DOTNET) tool uninstall --global helipol; fi
	$(DOTNET) tool install --global --add-source $(TOOL_DIR) helipol --version $(VERSION)
	@case ":$$PATH:" in *":$$HOME/.dotnet/tools:"*) ;; *) echo "add ~/.dotnet/tools to PATH to run helipol: export PATH=\"\$$PATH:\$$HOME/.dotnet/tools\"";; esac

# Full-wave reference tables in docs/fullwave/ (openEMS FDTD; slow, about an hour on two cores;
# not part of `make test`, whose tests read the committed tables).  See validate/README.md.
VALIDATE_PACKAGES := openems python3-openems nec2c
VALIDATE_PY := /usr/bin/python3

validate:
	@bash .ci/deps.sh $(VALIDATE_PACKAGES)
	$(VALIDATE_PY) validate/loading.py
	$(VALIDATE_PY) validate/element.py
	$(VALIDATE_PY) validate/dipoles.py
	$(VALIDATE_PY) validate/nec_check.py d24.0x0.5 d22.5x0.8

# The same scripts end to end on the coarsest mesh and a few cases (about ten minutes on two cores),
# into a scratch folder: proves the openEMS set-up works without touching the committed tables.
SMOKE_TABLES ?= /tmp/helipol-fullwave-smoke
validate-smoke:
	@bash .ci/deps.sh $(VALIDATE_PACKAGES)
	@mkdir -p $(SMOKE_TABLES)
	FULLWAVE_TABLES=$(SMOKE_TABLES) LOADING_CASES=bare,tape-hug LOADING_CELLS=0.1 $(VALIDATE_PY) validate/loading.py
	FULLWAVE_TABLES=$(SMOKE_TABLES) ELEMENT_CELLS=0.2,0.1 $(VALIDATE_PY) validate/element.py
	FULLWAVE_TABLES=$(SMOKE_TABLES) DIPOLES_CASES=d22.5x0.8 DIPOLES_CELLS=0.2,0.1 $(VALIDATE_PY) validate/dipoles.py
	@cat $(SMOKE_TABLES)/*.csv

bench:
	$(DOTNET) run --project tests/Helipol.Bench -c Release -- $(BENCH_ARGS)

clean:
	$(DOTNET) clean Helipol.sln -nologo -v quiet
	find output -mindepth 1 ! -name README.md -exec rm -rf {} +

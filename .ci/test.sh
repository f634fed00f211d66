#!/usr/bin/env bash
# Runs every test, printing each result as it finishes, and closes with one plain line:
# "N passed, N failed, N skipped" (CI reads it).
set -uo pipefail
config="${1:-Release}"
results="$(mktemp -d)"
# The console logger at normal verbosity prints each test's result as it finishes, so a long run
# shows its progress; the trx file gives the closing counts.
dotnet test Helipol.sln -c "$config" -nologo --logger "console;verbosity=normal" --logger "trx;LogFileName=results.trx" --results-directory "$results"
code=$?
passed=0; failed=0; skipped=0
for trx in "$results"/*.trx; do
  [ -f "$trx" ] || continue
  counters=$(grep -o '<Counters [^>]*>' "$trx" | head -1)
  p=$(sed -n 's/.* passed="\([0-9]*\)".*/\1/p' <<<"$counters")
  f=$(sed -n 's/.* failed="\([0-9]*\)".*/\1/p' <<<"$counters")
  t=$(sed -n 's/.* total="\([0-9]*\)".*/\1/p' <<<"$counters")
  e=$(sed -n 's/.* executed="\([0-9]*\)".*/\1/p' <<<"$counters")
  passed=$((passed + ${p:-0})); failed=$((failed + ${f:-0})); skipped=$((skipped + ${t:-0} - ${e:-0}))
done
rm -rf "$results"
echo "${passed} passed, ${failed} failed, ${skipped} skipped"
if [ "$code" -eq 0 ] && [ "$passed" -eq 0 ]; then echo "no test ran" >&2; exit 1; fi
exit "$code"

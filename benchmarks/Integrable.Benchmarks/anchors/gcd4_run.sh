#!/usr/bin/env bash
# Runs the Gcd workload in C#, FLINT and Singular one after the other (same machine, same inputs) and
# prints one RESULT line each. Usage: bash gcd4_run.sh [ROUNDS]   (from any directory)
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
repo="$(cd "$here/../../.." && pwd)"
rounds="${1:-1}"
bin="$(mktemp -d)"
gcc -O2 "$here/gcd4_flint.c" -o "$bin/gcd4_flint" -lflint -lgmp
dotnet build "$repo/benchmarks/Integrable.Benchmarks" -c Release -v q >/dev/null
for ((k = 0; k < rounds; k++)); do
  echo "RESULT tool=integrable workload=Gcd $(dotnet "$repo/benchmarks/Integrable.Benchmarks/bin/Release/net10.0/Integrable.Benchmarks.dll" Gcd)"
  (cd "$here" && "$bin/gcd4_flint" gcd4_input.txt)
  (cd "$here" && Singular -q --no-rc gcd4.sing)
done

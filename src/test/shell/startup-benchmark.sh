#!/usr/bin/env bash
# Start-up benchmark: the wall time of short lotgate commands against a bare hello-world jar built in
# the same run on the same JVM. hyperfine (Debian's package) times rounds of every command in turn, so
# that a load from elsewhere falls on all of them alike; the medians over all rounds give the ratios.
#
#   bash src/test/shell/startup-benchmark.sh            # after 'mvn -DskipTests package'
#   LOTGATE='java -jar target/lotgate.jar' bash src/test/shell/startup-benchmark.sh
#   ROUNDS=5 RUNS=3 ...                                  # rounds x runs per command (default 5 x 3)
#   BEFORE='java -jar old/lotgate.jar' ...               # an older build timed in the same rounds
#
# Targets (issue 11): --version at most 2x the bare JVM, design at most 3x, sentence of a csv lot and
# supplier on the demo store at most 5x.
set -euo pipefail
cd "$(dirname "$0")/../../.."
project=$PWD
lotgate=${LOTGATE:-$project/target/lotgate}
rounds=${ROUNDS:-5}
runs=${RUNS:-3}
command -v hyperfine >/dev/null || { echo "startup-benchmark: needs hyperfine (apt-get install hyperfine)" >&2; exit 2; }

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

# The baseline: a jar whose main method prints one line, run by the same java.
mkdir -p "$work/hello/src" "$work/hello/classes"
cat > "$work/hello/src/Hello.java" <<'JAVA'
public final class Hello {
    public static void main(String[] args) {
        System.out.println("hello");
    }
}
JAVA
javac --release 17 -d "$work/hello/classes" "$work/hello/src/Hello.java"
jar --create --file "$work/hello.jar" --main-class Hello -C "$work/hello/classes" .

# The demo store: the invented year of past lots.
$lotgate import demo-data/lots-2025.csv --store "$work/history.sqlite" --create-store > /dev/null

names=(bare version design sentence supplier)
commands=("java -jar $work/hello.jar")
cases=(
  "--version"
  "design --aql 1% --ltpd 5%"
  "sentence plans/mirelle-ms-22.json demo-data/mirelle-ms1130.csv --no-record"
  "supplier 'Arnwick Fasteners (invented)' --store $work/history.sqlite"
)
for c in "${cases[@]}"; do
  commands+=("$lotgate $c")
done
# BEFORE='java -jar old/lotgate.jar' times an older build in the same rounds, for a before/after table.
if [ -n "${BEFORE:-}" ]; then
  # The older build gets a store of its own making (its schema may be older).
  mkdir "$work/before"
  $BEFORE import demo-data/lots-2025.csv --store "$work/before/history.sqlite" --create-store > /dev/null 2>&1 \
      || $BEFORE import demo-data/lots-2025.csv --store "$work/before/history.sqlite" > /dev/null
  names+=(before-version before-design before-sentence before-supplier)
  for c in "${cases[@]}"; do
    commands+=("$BEFORE ${c//$work\/history.sqlite/$work/before/history.sqlite}")
  done
fi
for c in "${commands[@]}"; do
  bash -c "$c" > /dev/null || { echo "startup-benchmark: failed: $c" >&2; exit 1; }
done

for round in $(seq 1 "$rounds"); do
  hyperfine --style none --warmup 1 --runs "$runs" --export-json "$work/round-$round.json" \
      "${commands[@]}" > /dev/null 2>> "$work/hyperfine.log"
done

/usr/bin/env python3 - "$work" "$rounds" "${names[@]}" <<'PY'
import json, statistics, sys
work, rounds, names = sys.argv[1], int(sys.argv[2]), sys.argv[3:]
wall = {name: [] for name in names}
cpu = {name: [] for name in names}
for r in range(1, rounds + 1):
    with open(f"{work}/round-{r}.json") as f:
        for name, result in zip(names, json.load(f)["results"]):
            wall[name].extend(result["times"])
            cpu[name].append(result["user"] + result["system"])
bare, bare_cpu = statistics.median(wall["bare"]), statistics.median(cpu["bare"])
target = {"version": 2, "design": 3, "sentence": 5, "supplier": 5}
print(f"Start-up: wall-time medians of {len(wall['bare'])} runs each, and CPU (user + system) as a second view;")
print(f"ratios to a bare hello-world jar on the same JVM ({bare * 1000:.0f} ms wall, {bare_cpu * 1000:.0f} ms CPU)")
print(f"  {'command':10s} {'wall':>8s} {'ratio':>6s} {'CPU':>8s} {'ratio':>6s}  target")
for name in names:
    m, c = statistics.median(wall[name]), statistics.median(cpu[name])
    line = f"  {name:10s} {m * 1000:6.0f}ms {m / bare:5.2f}x {c * 1000:6.0f}ms {c / bare_cpu:5.2f}x"
    if name in target:
        line += f"  {target[name]}x {'met' if m / bare <= target[name] else 'NOT met'}"
    print(line)
PY

#!/usr/bin/env bash
# Whole-run benchmark of the check goal on yeast-GEM (BENCHMARKS.md, "Genome-scale pictures, containment
# and warm runs"): each run a fresh mvn JVM as a user runs it, timed by /usr/bin/time, results appended
# to results.txt in the working folder. Needs the plugin installed (mvn -B -q install -DskipTests
# -Dinvoker.skip) and ../shared/data beside the project. Usage, from an empty folder:
#   <project>/bench/yeast-whole-run.sh [extra mvn arguments, e.g. -Dmaven.repo.local=...]
set -u
here=$(cd "$(dirname "$0")/.." && pwd)
data="$here/../shared/data"
[ -f "$data/yeast-GEM.xml.gz" ] || { echo "no $data/yeast-GEM.xml.gz: nothing to measure"; exit 0; }
extra=("$@")
goal="io.github.atomledger:atomledger-maven-plugin:0.1.0-SNAPSHOT:check"
inputs=(-Datomledger.models="$data/yeast-GEM.xml.gz" -Datomledger.structures="$data/yeast-GEM.structures.tsv")
run() {
  local name=$1 keep=$2; shift 2
  [ "$keep" = keep ] || rm -rf target
  /usr/bin/time -f "%e s wall, %U s user, %S s sys, %M kB maxrss" -o "$name.time" \
    mvn -B -o "${extra[@]}" "$goal" "${inputs[@]}" "$@" > "$name.log" 2>&1
  echo "$name $(tail -1 "$name.time") load $(cut -d' ' -f1 /proc/loadavg)" >> results.txt
}
rm -rf cj ca
echo "--- $(date -u +%H:%M) $(git -C "$here" rev-parse --short HEAD)" >> results.txt
run cold-json new -Datomledger.cacheDirectory="$PWD/cj" -Datomledger.formats=json
MAVEN_OPTS="-Xmx1g" run cold-all new -Datomledger.cacheDirectory="$PWD/ca"
run warm-all new -Datomledger.cacheDirectory="$PWD/ca"
run warm-all-kept keep -Datomledger.cacheDirectory="$PWD/ca"
run warm-all-again new -Datomledger.cacheDirectory="$PWD/ca"
run warm-all-recomputed new -Datomledger.cacheDirectory="$PWD/ca" -Datomledger.reuseUnchanged=false
run warm-json new -Datomledger.cacheDirectory="$PWD/ca" -Datomledger.formats=json
echo "--- done $(date -u +%H:%M)" >> results.txt
cat results.txt

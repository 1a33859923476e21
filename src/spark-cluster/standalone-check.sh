#!/usr/bin/env bash
# A sweep on a Spark standalone cluster on this machine, against the same sweep in process (docs/sweeps.md):
#   src/spark-cluster/standalone-check.sh [SWEEP.yaml]
# Builds a Spark home from the jars Maven resolved for the build (target/spark.classpath, plus the
# libraries Spark shares with nullpath), starts a master and a worker (two cores) on 127.0.0.1, submits
# nullpath's jar with org.apache.spark.deploy.SparkSubmit (what spark-submit runs) in client mode, and
# compares sweep.csv and sweep-summary.json byte for byte with `nullpath sweep` in process. Master, worker
# and executors are separate JVMs talking over the network, as on a cluster. Needs: mvn -DskipTests package.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
root="$(cd "$here/../.." && pwd)"
sweep="${1:-$root/link-scenarios/thrust-dispersion-sweep.yaml}"
jar="$root/target/nullpath.jar"
[ -f "$root/target/spark.classpath" ] || { echo "target/spark.classpath is missing: mvn -DskipTests package" >&2; exit 2; }
work="$(mktemp -d)"
pids=()
cleanup() { for p in "${pids[@]}"; do kill "$p" 2>/dev/null || true; done; rm -rf "$work"; }
trap cleanup EXIT
[ -z "${KEEP:-}" ] || { trap - EXIT; echo "work: $work" >&2; }

# a Spark home: jars/ (Spark's own and the libraries it shares with nullpath) and a RELEASE file
home="$work/spark-home"
mkdir -p "$home/jars"
{ tr ':' '\n' < "$root/target/spark.classpath"; echo
  (cd "$root" && mvn -B -q -o dependency:build-classpath -Dmdep.includeScope=compile -Dmdep.outputFile="$work/cp" > /dev/null)
  tr ':' '\n' < "$work/cp" | grep -E '/(jackson-[a-z]+|commons-io|commons-codec)-[0-9.]+\.jar$'
} | while read -r j; do ln -sf "$j" "$home/jars/"; done
echo "Spark 4 (jars from Maven Central)" > "$home/RELEASE"
export SPARK_HOME="$home" SPARK_SCALA_VERSION=2.13 SPARK_LOCAL_IP=127.0.0.1
# the module openings Spark 4 needs on Java 17: the list pom.xml gives as spark.jvm.options
read -r -a opens <<< "$(sed -n 's:.*<spark.jvm.options>\(.*\)</spark.jvm.options>.*:\1:p' "$root/pom.xml")"
port=$((17000 + RANDOM % 1000))
master="spark://127.0.0.1:$port"
java "${opens[@]}" -cp "$home/jars/*" org.apache.spark.deploy.master.Master --host 127.0.0.1 --port "$port" \
    --webui-port 0 > "$work/master.log" 2>&1 &
pids+=($!)
for _ in $(seq 60); do grep -q "New state: ALIVE" "$work/master.log" && break; sleep 1; done
java "${opens[@]}" -cp "$home/jars/*" org.apache.spark.deploy.worker.Worker "$master" --host 127.0.0.1 \
    --cores 2 --memory 2g --webui-port 0 --work-dir "$work/worker" > "$work/worker.log" 2>&1 &
pids+=($!)
for _ in $(seq 60); do grep -q "Successfully registered with master" "$work/worker.log" && break; sleep 1; done

start=$(date +%s.%N)
java "${opens[@]}" -cp "$home/jars/*" org.apache.spark.deploy.SparkSubmit --class org.nullpath.cli.Main \
    --master "$master" --deploy-mode client "$jar" \
    sweep "$sweep" --out "$work/cluster" --quiet --spark "$master" > "$work/submit.log" 2>&1 \
    || { tail -n 30 "$work/submit.log" >&2; exit 1; }
end=$(date +%s.%N)
java -jar "$jar" sweep "$sweep" --out "$work/in-process" --quiet > /dev/null
for f in sweep.csv sweep-summary.json; do
  cmp "$work/in-process/$f" "$work/cluster/$f"
done
printf 'cluster sweep (%s): %.1f s wall for the submission; sweep.csv and sweep-summary.json byte-identical to the in-process run\n' \
    "$(tail -n 1 "$work/submit.log")" "$(echo "$end - $start" | bc)"

#!/usr/bin/env bash
# Side-by-side wall and CPU times of nullpath and the numpy script (docs/performance.md):
#   src/bench/side-by-side.sh [PAIRS]
# Runs PAIRS alternating pairs (default 5) of
#   nullpath plan million-online.yaml --no-report   (1,000,000 uplink messages, station on the line)
#   python3 uplink_schedule.py                       (the same columns with numpy, %.17g)
# then PAIRS runs of the off-line scenario, each with JVM start and a 256 MB heap, and prints each run
# and the medians. Needs the jar (mvn -DskipTests package) and python3 with numpy.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
root="$(cd "$here/../.." && pwd)"
jar="$root/target/nullpath.jar"
pairs="${1:-5}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
jsa="$root/target/nullpath.jsa"
cds=()
[ -f "$jsa" ] && cds=(-Xlog:cds=off -Xlog:cds+dynamic=off -XX:SharedArchiveFile="$jsa")
measure() { # label command...: prints "label wall user+sys"
  local label="$1"; shift
  /usr/bin/time -f "$label %e %U %S" -o "$work/t" "$@" >/dev/null 2>&1
  awk '{printf "%s %.2f %.2f\n", $1, $2, $3 + $4}' "$work/t"
}
median() { sort -n | awk '{a[NR]=$1} END {print (NR % 2 ? a[(NR+1)/2] : (a[NR/2] + a[NR/2+1]) / 2)}'; }
: > "$work/runs"
for i in $(seq "$pairs"); do
  rm -rf "$work/out-on" "$work/np.csv"
  measure tool-online java "${cds[@]}" -Xmx256m -jar "$jar" plan "$here/scenarios/million-online.yaml" \
      --out "$work/out-on" --no-report | tee -a "$work/runs"
  measure numpy python3 "$here/numpy/uplink_schedule.py" "$work/np.csv" | tee -a "$work/runs"
done
for i in $(seq "$pairs"); do
  rm -rf "$work/out-off"
  measure tool-offline java "${cds[@]}" -Xmx256m -jar "$jar" plan "$here/scenarios/million-offline.yaml" \
      --out "$work/out-off" --no-report | tee -a "$work/runs"
done
echo "medians (wall s, cpu s):"
for l in tool-online numpy tool-offline; do
  w=$(awk -v l=$l '$1==l {print $2}' "$work/runs" | median)
  c=$(awk -v l=$l '$1==l {print $3}' "$work/runs" | median)
  echo "  $l $w $c"
done

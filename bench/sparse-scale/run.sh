#!/bin/sh
# End-to-end figures on an N x N square lattice (inputs on the first column, outputs on the last):
# flowcert solve --json --out (parse, solve, write seconds as the command reports them), then flowcheck
# on the certificate; wall time, CPU time and peak resident memory from /usr/bin/time -v.
# Usage (from the repository root): bench/sparse-scale/run.sh SIZE FIELD... [--keep]
#   e.g. bench/sparse-scale/run.sh 1000 2 3 Q
set -eu
size=$1; shift
work=${WORK:-/tmp/flowcert-sparse-scale}
mkdir -p "$work"
dotnet build -v q -c Release src/FlowCert.Cli >/dev/null
dotnet build -v q -c Release checker/FlowCheck >/dev/null
cli=src/FlowCert.Cli/bin/Release/net10.0/FlowCert.Cli.dll
check=checker/FlowCheck/bin/Release/net10.0/flowcheck.dll
graph="$work/sq$size.ograph"
[ -f "$graph" ] || dotnet "$cli" generate square --size "${size}x$size" --out "$graph" >/dev/null 2>&1 \
  || python3 bench/sparse-scale/lattice.py "$size" "$graph"   # beyond the generator's 4,000,000 nodes
echo "nproc $(nproc); load average $(cut -d' ' -f1-3 /proc/loadavg); graph $(wc -c < "$graph") bytes"
echo "| size | field | program | parse s | solve s | write s | wall s | CPU s (user+sys) | peak RSS MB | output MB |"
echo "| --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |"
row() { # program field timefile [json]
  wall=$(grep 'Elapsed (wall' "$3" | awk '{print $NF}' | awk -F: '{ if (NF==3) print $1*3600+$2*60+$3; else print $1*60+$2 }')
  cpu=$(awk '/User time|System time/ {s+=$NF} END {print s}' "$3")
  rss=$(awk '/Maximum resident/ {printf "%d", $NF/1024}' "$3")
  echo "$wall $cpu $rss"
}
for field in "$@"; do
  cert="$work/sq$size-$field.json"
  /usr/bin/time -v dotnet "$cli" solve "$graph" --field "$field" --json --out "$cert" > "$work/solve.out" 2> "$work/solve.time"
  set -- $(row solve "$field" "$work/solve.time")
  secs=$(sed 's/.*"parse":\([0-9.]*\),"solve":\([0-9.]*\),"write":\([0-9.]*\).*/\1 \2 \3/' "$work/solve.out")
  p=$(echo $secs | cut -d' ' -f1); s=$(echo $secs | cut -d' ' -f2); w=$(echo $secs | cut -d' ' -f3)
  mb=$(( $(wc -c < "$cert") / 1000000 ))
  echo "| $size | $field | flowcert solve | $p | $s | $w | $1 | $2 | $3 | $mb |"
  /usr/bin/time -v dotnet "$check" "$cert" > "$work/check.out" 2> "$work/check.time"
  head -c 60 "$work/check.out" | grep -q '^valid:' || { echo "flowcheck did not accept $cert:"; cat "$work/check.out"; exit 1; }
  set -- $(row check "$field" "$work/check.time")
  echo "| $size | $field | flowcheck | | | | $1 | $2 | $3 | |"
  rm -f "$cert"
done

#!/bin/sh
# Measures "terminus survey" on synthetic collections from testdata/gen:
# wall time, records per second, CPU time and peak resident memory
# (/usr/bin/time -v) for each size, input format and mode:
#
#   check       the survey as shipped (--format jsonl, output to /dev/null)
#   parse-only  reading and decoding every record, no reasoning: the floor
#
# Under each checking row, the generator's tally of what it wrote and the
# survey's accounting of every line (they must agree: lines, blank lines,
# records, and as many errors as malformed records).
#
# Usage: testdata/bench-survey.sh [SIZES...]   (default: 10000 100000 1000000)
# Environment: FORMATS (default "jsonl csv"), BAD (share of malformed
# records, default 0.02), OUT (where the collections go, default a
# temporary folder that is removed at the end).
set -eu
cd "$(dirname "$0")/.."
sizes=${*:-10000 100000 1000000}
formats=${FORMATS:-jsonl csv}
bad=${BAD:-0.02}
work=${OUT:-$(mktemp -d)}
[ -n "${OUT:-}" ] || trap 'rm -rf "$work"' EXIT
go build -o "$work/terminus" ./cmd/terminus
go build -o "$work/gen" ./testdata/gen
echo "cores: $(nproc); $(go version | cut -d' ' -f3); load before: $(cut -d' ' -f1-3 /proc/loadavg)"
printf '%-8s %-6s %-11s %9s %10s %9s %9s\n' records input mode wall_s records/s cpu_s rss_MiB
for n in $sizes; do
	for f in $formats; do
		"$work/gen" -n "$n" -bad "$bad" -format "$f" -seed 1 -tell > "$work/c.$f" 2> "$work/tally.txt"
		for mode in check parse-only; do
			flag=""
			[ "$mode" = parse-only ] && flag="--parse-only"
			# Exit status 1 is expected: the collection holds malformed records.
			/usr/bin/time -v -o "$work/time.txt" "$work/terminus" survey $flag "$work/c.$f" > /dev/null 2> "$work/counts.txt" || [ $? -eq 1 ]
			awk -v n="$n" -v f="$f" -v m="$mode" '
				/Elapsed \(wall clock\)/ { split($NF, t, ":"); wall = (length(t) == 3) ? t[1]*3600 + t[2]*60 + t[3] : t[1]*60 + t[2] }
				/User time/ { u = $NF } /System time/ { s = $NF }
				/Maximum resident/ { rss = $NF / 1024 }
				END { printf "%-8d %-6s %-11s %9.2f %10.0f %9.2f %9.1f\n", n, f, m, wall, n / wall, u + s, rss }' "$work/time.txt"
			if [ "$mode" = check ]; then
				sed 's/^/#   /' "$work/tally.txt"
				grep ' = ' "$work/counts.txt" | sed 's/^/#   /'
			fi
		done
	done
done

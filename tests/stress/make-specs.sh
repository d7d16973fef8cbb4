#!/bin/sh
# Writes the stress specs into a folder (default: ./stress-specs):
#   wide-200x2000.motion   200 frames (each a child of one of the first ten, so depth stays small),
#                          10 points in each frame (2000 points), a report for every tenth frame
#   chain-N.motion         N frames below a root, each inside the previous one, turned about z by a coord
#                          and moved out along x; one point on the last frame and one report of it
#                          (N = 100, 500 and 3000 by default; 500 is exactly the frame tree depth limit)
# Usage: tests/stress/make-specs.sh [FOLDER] [CHAIN_LENGTH...]
set -eu
out=${1:-stress-specs}
[ $# -gt 0 ] && shift
lengths=${*:-100 500 3000}
mkdir -p "$out"

awk 'BEGIN {
    print "title \"Stress: 200 frames, 2000 points\""
    print "param r = 0.5 m"
    print "coord q : angle"
    print "frame f0"
    split("x y z", axis, " ")
    for (i = 1; i < 200; i++) {
        printf "frame f%d in f%d {\n    rotate about %s by q + %d * 0.01\n    origin at [r, 0, 0]\n}\n", i, int((i - 1) / 10), axis[i % 3 + 1], i
    }
    for (i = 0; i < 200; i++)
        for (j = 0; j < 10; j++)
            printf "point p%d_%d in f%d at [%d * 0.1 m, r, 0]\n", i, j, i, j
    for (i = 0; i < 200; i += 10)
        printf "report p%d_1 in f0\n", i
}' > "$out/wide-200x2000.motion"

for n in $lengths; do
    awk -v n="$n" 'BEGIN {
        printf "title \"Stress: a chain of %d links\"\n", n
        print "param a = 0.25 m"
        print "coord q : angle"
        print "frame link0"
        for (i = 1; i <= n; i++)
            printf "frame link%d in link%d {\n    rotate about z by q\n    origin at [a, 0, 0]\n}\n", i, i - 1
        printf "point tip in link%d at [a, 0, 0]\n", n
        print "report tip in link0 as tipInBase"
    }' > "$out/chain-$n.motion"
done

#!/usr/bin/env python3
"""Where a run's time goes, from a flight recording (docs/performance.md, "Where the time goes").

    java -Xmx256m "-XX:StartFlightRecording=filename=plan.jfr,settings=profile,jdk.ExecutionSample#period=1ms" \
        -jar target/nullpath.jar plan src/bench/scenarios/million-online.yaml --out /tmp/out --no-report
    jfr print --events jdk.ExecutionSample plan.jfr > samples.txt
    python3 src/bench/profile/jfr_top.py samples.txt

Prints the share of CPU samples by thread, by the method on top of the stack (self), and by the
groups of methods below (inclusive: a sample counts once for every group it passes through).
"""
import collections
import re
import sys

GROUPS = [  # (label, a frame that marks it); first match on the stack, from the top, wins for "self" groups
    ("numbers into text (ShortestDecimal, integer digits)", ("ShortestDecimal.", "RowBytes.count")),
    ("rows into bytes (Table, Column, RowBytes)", ("report.Table.", "report.Column", "report.RowBytes")),
    ("light cone and craft motion (lightcone, worldline, spacetime)", ("org.nullpath.lightcone.", "org.nullpath.worldline.", "org.nullpath.spacetime.")),
    ("Doppler, budget, pointing (link)", ("org.nullpath.link.",)),
    ("schedule (chunks, tallies)", ("org.nullpath.schedule.",)),
    ("SHA-256 of the files", ("sun.security.provider.",)),
    ("writing (streams, channels)", ("java.io.", "sun.nio.", "java.nio.channels")),
    ("java.lang.Math (sinh, log1p, ...)", ("java.lang.Math.", "java.lang.StrictMath.")),
]


def main(path):
    text = open(path).read()
    threads = collections.Counter()
    self_group = collections.Counter()
    top = collections.Counter()
    n = 0
    for event in text.split("jdk.ExecutionSample")[1:]:
        frames = re.findall(r"^\s+([\w.$<>]+)\(", event, re.M)
        if not frames:
            continue
        n += 1
        m = re.search(r'sampledThread = "([^"]+)"', event)
        threads[m.group(1) if m else "?"] += 1
        top[frames[0]] += 1
        label = "other (JDK, class loading, YAML, start-up)"
        for f in frames:
            hit = next((g for g, marks in GROUPS if any(k in f for k in marks)), None)
            if hit:
                label = hit
                break
        self_group[label] += 1
    print(f"{n} samples")
    for t, c in threads.most_common():
        print(f"  thread {t}: {100 * c / n:.0f} %")
    print("by the first nullpath or JDK group on the stack:")
    for g, c in self_group.most_common():
        print(f"  {100 * c / n:5.1f} %  {g}")
    print("top methods (self):")
    for f, c in top.most_common(12):
        print(f"  {100 * c / n:5.1f} %  {f}")


if __name__ == "__main__":
    main(sys.argv[1])

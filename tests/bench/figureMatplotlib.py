"""Plain matplotlib drawings to PDF, for the timing ratios of the benchmarks (not part of
Passline). Two uses:
  python3 figureMatplotlib.py OUT.pdf
      the figure bench's invented zig-zag profiles, 10 pathways x 50 points (figureBench.ts);
  python3 figureMatplotlib.py OUT.pdf POINTS.csv
      the profile of a points table (header pathway,label,kind,G [kcal/mol],...; the CSV
      that cliBench.mjs also gives `passline render`): levels, dashed connectors, labels
      with energies, axis titles and a legend.
Prints the time from the start of the script to the written file, in ms."""
import csv
import math
import sys
import time

t0 = time.perf_counter()
import matplotlib
matplotlib.use("pdf")
import matplotlib.pyplot as plt


def zigzag(ax):
    for p in range(10):
        ys = [(15 if i % 2 else -2) + 6 * math.sin(i * 0.7 + p) + p * 0.3 for i in range(50)]
        for i, y in enumerate(ys):
            ax.plot([i - 0.3, i + 0.3], [y, y], lw=1.6, color=f"C{p}")
            ax.annotate(f"{'TS' if i % 2 else 'I'}{i}\n{y:+.1f}", (i, y), fontsize=6, ha="center")
            if i:
                ax.plot([i - 0.7, i - 0.3], [ys[i - 1], y], ls="--", lw=1, color=f"C{p}")


def table(ax, path):
    pathways = {}
    with open(path, newline="", encoding="utf-8") as f:
        for row in csv.DictReader(f):
            pathways.setdefault(row["pathway"], []).append((row["label"], float(row["G [kcal/mol]"])))
    for p, (name, points) in enumerate(pathways.items()):
        colour = f"C{p}"
        for i, (label, g) in enumerate(points):
            ax.plot([i - 0.3, i + 0.3], [g, g], lw=1.6, color=colour, label=name if i == 0 else None)
            ax.annotate(f"{label}\n{g:+.1f}", (i, g), xytext=(0, 3), textcoords="offset points", fontsize=7, ha="center")
            if i:
                ax.plot([i - 0.7, i - 0.3], [points[i - 1][1], g], ls="--", lw=1, color=colour)
    ax.set_xticks([])
    ax.set_xlabel("Reaction coordinate")
    ax.set_ylabel("ΔG / kcal mol⁻¹")
    ax.legend(frameon=False, fontsize=7)


fig, ax = plt.subplots(figsize=(175 / 25.4, 96 / 25.4))
if len(sys.argv) > 2:
    table(ax, sys.argv[2])
else:
    zigzag(ax)
fig.savefig(sys.argv[1] if len(sys.argv) > 1 else "/tmp/figure-matplotlib.pdf")
print(f"{(time.perf_counter() - t0) * 1000:.1f}")

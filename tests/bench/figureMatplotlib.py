"""Plain matplotlib drawing of the figure bench's levels and connectors to PDF (for the
timing ratio printed by figureBench.ts). Same invented zig-zag profiles: 10 pathways x 50
points. Usage: python3 figureMatplotlib.py OUT.pdf; prints the drawing time in ms."""
import math
import sys
import time

t0 = time.perf_counter()
import matplotlib
matplotlib.use("pdf")
import matplotlib.pyplot as plt

fig, ax = plt.subplots(figsize=(175 / 25.4, 96 / 25.4))
for p in range(10):
    ys = [(15 if i % 2 else -2) + 6 * math.sin(i * 0.7 + p) + p * 0.3 for i in range(50)]
    for i, y in enumerate(ys):
        ax.plot([i - 0.3, i + 0.3], [y, y], lw=1.6, color=f"C{p}")
        ax.annotate(f"{'TS' if i % 2 else 'I'}{i}\n{y:+.1f}", (i, y), fontsize=6, ha="center")
        if i:
            ax.plot([i - 0.7, i - 0.3], [ys[i - 1], y], ls="--", lw=1, color=f"C{p}")
fig.savefig(sys.argv[1] if len(sys.argv) > 1 else "/tmp/figure-matplotlib.pdf")
print(f"{(time.perf_counter() - t0) * 1000:.1f}")

#!/usr/bin/env python3
"""Times SciPy solve_ivp (Radau, analytic Jacobian) on the stiff 10-step cycle of
tests/fixtures/scipy/microkinetics.json; prints one JSON line. Called by microkineticsBench.ts."""
import json
import os
import statistics
import sys
import time

import numpy as np
import scipy
from scipy.integrate import solve_ivp

ROOT = os.path.dirname(os.path.dirname(os.path.dirname(os.path.abspath(__file__))))
sys.path.insert(0, os.path.join(ROOT, "tests", "fixtures", "scipy"))
from makeMicrokineticsFixture import mass_action  # noqa: E402

rtol, atol, runs = float(sys.argv[1]), float(sys.argv[2]), int(sys.argv[3])
fixture = json.load(open(os.path.join(ROOT, "tests", "fixtures", "scipy", "microkinetics.json")))
problem = fixture["problems"]["stiffCycle"]
reactions = [(r["reactants"], r["products"], r["kf"], r["kr"]) for r in problem["reactions"]]
rhs, jac = mass_action(problem["species"][:-1], reactions, problem["turnoverReaction"])
times, last = [], None
for _ in range(runs):
    start = time.perf_counter()
    sol = solve_ivp(rhs, (0.0, problem["times"][-1]), problem["initial"], method="Radau", rtol=rtol, atol=atol, jac=jac)
    times.append((time.perf_counter() - start) * 1000)
    last = sol
print(json.dumps({"scipy": scipy.__version__, "medianMs": statistics.median(times), "steps": int(last.t.size - 1),
                  "final": last.y[:, -1].tolist(), "success": bool(last.success)}))

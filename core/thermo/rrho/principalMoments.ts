/** A point mass: mass in u, position in ångström. */
export interface PointMass { mass: number; x: number; y: number; z: number }

/**
 * Principal moments of inertia (u Å², ascending) of point masses about their centre of mass:
 * eigenvalues of the inertia tensor by cyclic Jacobi rotations (Golub & Van Loan, Matrix
 * Computations, §8.5), exact to rounding for a 3 × 3 symmetric matrix.
 */
export function principalMoments(points: readonly PointMass[]): [number, number, number] {
  const total = points.reduce((s, p) => s + p.mass, 0);
  const cx = points.reduce((s, p) => s + p.mass * p.x, 0) / total;
  const cy = points.reduce((s, p) => s + p.mass * p.y, 0) / total;
  const cz = points.reduce((s, p) => s + p.mass * p.z, 0) / total;
  const a = [[0, 0, 0], [0, 0, 0], [0, 0, 0]];
  for (const p of points) {
    const x = p.x - cx, y = p.y - cy, z = p.z - cz;
    a[0]![0]! += p.mass * (y * y + z * z);
    a[1]![1]! += p.mass * (x * x + z * z);
    a[2]![2]! += p.mass * (x * x + y * y);
    a[0]![1]! -= p.mass * x * y;
    a[0]![2]! -= p.mass * x * z;
    a[1]![2]! -= p.mass * y * z;
  }
  a[1]![0] = a[0]![1]!; a[2]![0] = a[0]![2]!; a[2]![1] = a[1]![2]!;
  for (let sweep = 0; sweep < 50; sweep++) {
    const off = a[0]![1]! ** 2 + a[0]![2]! ** 2 + a[1]![2]! ** 2;
    if (off <= 1e-30 * (a[0]![0]! ** 2 + a[1]![1]! ** 2 + a[2]![2]! ** 2) || off === 0) break;
    for (const [p, q] of [[0, 1], [0, 2], [1, 2]] as const) {
      const apq = a[p]![q]!;
      if (apq === 0) continue;
      const theta = (a[q]![q]! - a[p]![p]!) / (2 * apq);
      const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
      const c = 1 / Math.sqrt(t * t + 1), s = t * c;
      for (let k = 0; k < 3; k++) {
        const akp = a[k]![p]!, akq = a[k]![q]!;
        a[k]![p] = c * akp - s * akq;
        a[k]![q] = s * akp + c * akq;
      }
      for (let k = 0; k < 3; k++) {
        const apk = a[p]![k]!, aqk = a[q]![k]!;
        a[p]![k] = c * apk - s * aqk;
        a[q]![k] = s * apk + c * aqk;
      }
    }
  }
  const moments = [a[0]![0]!, a[1]![1]!, a[2]![2]!].map((v) => Math.max(0, v)).sort((x, y) => x - y);
  return moments as [number, number, number];
}

// The 2-form a CR3BP monodromy preserves in rotating-frame position–velocity coordinates (r, v).
//
// The flow is Hamiltonian in canonical (q, p) with p = v + S r, S r = (−y, x, 0)
// (H = |p|²/2 + y p_x − x p_y − (1−μ)/r₁ − μ/r₂; Szebehely 1967, ch. 1), so Φ_qp preserves
// J = [[0, I], [−I, 0]]. With T = [[I, 0], [S, I]] (w = (r, v) ↦ (q, p)), Φ_rv = T⁻¹ Φ_qp T preserves
// Tᵀ J T = [[S − Sᵀ, I], [−I, 0]] = [[2S, I], [−I, 0]]  (Meyer, Hall & Offin, Introduction to Hamiltonian
// Dynamical Systems, ch. 2, for the change of symplectic form under a linear change of variables).
// The plain J is NOT preserved by Φ_rv; the tests show that too, so the check cannot pass by accident.

export type Matrix6 = number[][];

export function rotatingFrameForm(): Matrix6 {
  const f = Array.from({ length: 6 }, () => new Array<number>(6).fill(0));
  f[0][1] = -2; // 2S: S[0][1] = −1
  f[1][0] = 2; //       S[1][0] = +1
  for (let i = 0; i < 3; i++) {
    f[i][3 + i] = 1;
    f[3 + i][i] = -1;
  }
  return f;
}

export function canonicalForm(): Matrix6 {
  const f = Array.from({ length: 6 }, () => new Array<number>(6).fill(0));
  for (let i = 0; i < 3; i++) {
    f[i][3 + i] = 1;
    f[3 + i][i] = -1;
  }
  return f;
}

export function rowMajorToMatrix(values: ArrayLike<number>, n = 6): Matrix6 {
  return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => values[n * i + j]));
}

/** max |(Mᵀ F M − F)_ij| for the form F. */
export function symplecticDefect(m: Matrix6, form: Matrix6): number {
  const n = m.length;
  let worst = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let sum = 0;
      for (let k = 0; k < n; k++) {
        if (m[k][i] === 0) continue;
        for (let l = 0; l < n; l++) sum += m[k][i] * form[k][l] * m[l][j];
      }
      worst = Math.max(worst, Math.abs(sum - form[i][j]));
    }
  }
  return worst;
}

export function maxAbs(m: Matrix6): number {
  return Math.max(...m.flat().map(Math.abs));
}

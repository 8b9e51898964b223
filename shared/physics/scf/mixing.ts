/**
 * Density mixing by D. G. Anderson's method (J. ACM 12, 547, 1965), in the form written out by
 * V. Eyert, J. Comput. Phys. 124, 271 (1996): from the last few input vectors x_j and residuals
 * F_j = g(x_j) − x_j, find the combination of differences that minimises the residual in the least-
 * squares sense and take a damped step β·F from it. With no history it is plain linear mixing.
 */

export interface Mixer {
  /** The next input vector, given the input x and the map's output g(x); records both. */
  next(x: Float64Array, gx: Float64Array): Float64Array
  /** Forget the history (after a step that made things worse). */
  reset(): void
}

/** An Anderson mixer for vectors of the given length with inner-product weights w. */
export function andersonMixer(weights: Float64Array, beta: number, depth: number): Mixer {
  const length = weights.length
  const prevX = new Float64Array(length)
  let prevF = new Float64Array(length)
  let f = new Float64Array(length)
  let started = false
  // difference vectors live in a pool so a long run allocates nothing per step
  const pool: Array<{ dx: Float64Array; df: Float64Array }> = []
  let history: Array<{ dx: Float64Array; df: Float64Array }> = []
  // ⟨dF_i, dF_j⟩, kept across steps so each step adds one row instead of recomputing them all
  let gram: number[][] = []

  const dot = (a: Float64Array, b: Float64Array) => {
    let s = 0
    for (let i = 0; i < length; i++) s += weights[i] * a[i] * b[i]
    return s
  }

  return {
    reset() {
      started = false
      pool.push(...history)
      history = []
      gram = []
    },
    next(x, gx) {
      for (let i = 0; i < length; i++) f[i] = gx[i] - x[i]
      if (started) {
        const slot =
          history.length >= depth
            ? history.shift()!
            : (pool.pop() ?? { dx: new Float64Array(length), df: new Float64Array(length) })
        if (gram.length >= depth) {
          gram.shift()
          for (const g of gram) g.shift()
        }
        const { dx, df } = slot
        for (let i = 0; i < length; i++) {
          dx[i] = x[i] - prevX[i]
          df[i] = f[i] - prevF[i]
        }
        history.push(slot)
        const row = history.map((h) => dot(h.df, df))
        gram.forEach((g, i) => g.push(row[i]))
        gram.push(row)
      }
      started = true
      prevX.set(x)
      const m = history.length
      const gamma = m > 0 ? leastSquares(gram, history.map((h) => dot(h.df, f))) : []
      const out = new Float64Array(length)
      for (let i = 0; i < length; i++) out[i] = x[i] + beta * f[i]
      for (let j = 0; j < m; j++) {
        const { dx, df } = history[j]
        const gj = gamma[j]
        for (let i = 0; i < length; i++) out[i] -= gj * (dx[i] + beta * df[i])
      }
      const t = prevF
      prevF = f
      f = t
      return out
    },
  }
}

/** γ minimising |f − Σ γ_j dF_j| from the normal equations (Gram matrix, ⟨dF_i, f⟩), lightly regularised. */
function leastSquares(gram: number[][], rhs: number[]): number[] {
  const m = rhs.length
  const a = gram.map((row) => row.slice())
  for (let i = 0; i < m; i++) a[i][i] *= 1 + 1e-10
  // Gaussian elimination with partial pivoting on the small m×m system
  for (let k = 0; k < m; k++) {
    let piv = k
    for (let i = k + 1; i < m; i++) if (Math.abs(a[i][k]) > Math.abs(a[piv][k])) piv = i
    ;[a[k], a[piv]] = [a[piv], a[k]]
    ;[rhs[k], rhs[piv]] = [rhs[piv], rhs[k]]
    if (a[k][k] === 0) return new Array(m).fill(0)
    for (let i = k + 1; i < m; i++) {
      const q = a[i][k] / a[k][k]
      for (let j = k; j < m; j++) a[i][j] -= q * a[k][j]
      rhs[i] -= q * rhs[k]
    }
  }
  const gamma = new Array<number>(m).fill(0)
  for (let i = m - 1; i >= 0; i--) {
    let s = rhs[i]
    for (let j = i + 1; j < m; j++) s -= a[i][j] * gamma[j]
    gamma[i] = s / a[i][i]
  }
  return gamma
}

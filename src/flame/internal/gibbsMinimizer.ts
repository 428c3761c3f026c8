/**
 * Private numerical core of the equilibrium solvers in src/flame/: Gibbs-energy minimisation of an
 * ideal-gas mixture plus optional pure condensed species, by the element-potential (Lagrange
 * multiplier) method, written against plain arrays so it can be tested with synthetic data.
 *
 * Method. Minimise G/RT = Σ_gas n_j (μ°_j + ln(n_j/N) + ln(P/P°)) + Σ_cond n_k μ°_k subject to the
 * element balances Σ_j a_ij n_j = b_i (μ°_j = g°_j(T)/RT at P° = 1 bar). The stationarity
 * conditions μ_j = Σ_i a_ij π_i (π_i: element potential divided by RT) are linearised in ln n_j
 * (gases), n_k (condensed) and ln N; eliminating Δln n_j leaves a dense system of size
 * (elements + 1 + active condensed) in the unknowns π_i, Δln N and Δn_k, solved by Gaussian
 * elimination with partial pivoting after symmetric diagonal scaling (so an element at 1e-12 of
 * the feed keeps its digits), for the change of the element potentials (a direction the matrix
 * cannot resolve at round-off is left unchanged, and the equation set aside for it is the one that
 * has become dependent, never the ln N row). Steps are damped so that no major species
 * rises by more than a factor e² per iteration and no trace species jumps above mole fraction
 * 1e-4 in one step — the damping rules of Gordon and McBride (NASA RP-1311, 1994) — and no major
 * species falls by more than a factor e^20 (ours); trace species
 * stay in ln-space, so amounts down to ~1e-300 mol are represented without clipping.
 * Convergence is judged species by species on the share each holds of the total or of any
 * element (relative to that element's own amount), so the carriers of a trace element converge
 * as tightly as the majors; a step that stops shrinking below 1e-6 (the round-off floor of a
 * direction the feed's rounding leaves uncertain) also ends the iteration once every element
 * balances to the tolerance. Condensed species enter when their driving force μ°_k − Σ a_ik π_i is negative and
 * leave when their amount would turn negative. At fixed volume the ln(P/P°) and ln N terms are
 * replaced by ln(n_j R T / (V P°)), and the ln N unknown disappears.
 *
 * The same matrix, with a different right-hand side, gives the temperature derivatives of the
 * equilibrium amounts, hence the equilibrium heat capacity used by the Newton step of the
 * enthalpy- (or energy-) balance outer loop.
 *
 * References: W. B. White, S. M. Johnson, G. B. Dantzig, "Chemical equilibrium in complex
 * mixtures", J. Chem. Phys. 28 (1958) 751–755; W. R. Smith, R. W. Missen, Chemical Reaction
 * Equilibrium Analysis: Theory and Algorithms, Wiley (1982), ch. 6 (element-potential methods);
 * S. Gordon, B. J. McBride, Computer Program for Calculation of Complex Chemical Equilibrium
 * Compositions and Applications, Part I: Analysis, NASA Reference Publication 1311 (1994)
 * (step-size control: the e² cap on major species and the 1e-4 cap on trace species).
 *
 * @internal
 * @module
 */

/** A prepared minimisation problem: element matrix, phase flags and element amounts. */
export interface GibbsProblem {
  /** Number of (independent) element rows. */
  readonly m: number;
  /** Number of species. */
  readonly ns: number;
  /** Element matrix, row-major: a[i * ns + j] = atoms of element i in species j. */
  readonly a: Float64Array;
  /** 1 for an ideal-gas species, 0 for a pure condensed species. */
  readonly gas: Uint8Array;
  /** Element amounts, mol (length m). */
  readonly b: Float64Array;
}

/** Iteration state; kept between calls for warm starts. */
export interface GibbsState {
  /** ln n_j (mol) of each gas species (unused entries for condensed species). */
  lnn: Float64Array;
  /** Amount (mol) of each condensed species; 0 when inactive. */
  nc: Float64Array;
  /** 1 when the condensed species is in the active phase set. */
  active: Uint8Array;
  /** ln of the gas-phase total, mol (isobaric problems). */
  lnN: number;
  /** Element potentials divided by RT (length m). */
  pi: Float64Array;
  /** True once the state holds a converged solution (usable for warm starts). */
  warm: boolean;
  /** Scratch arrays reused by every iteration (no allocation on the hot path). */
  readonly work: GibbsWork;
}

/** Scratch arrays of one problem size. */
export interface GibbsWork {
  readonly M: Float64Array;
  readonly r: Float64Array;
  readonly mu: Float64Array;
  readonly n: Float64Array;
  readonly dln: Float64Array;
  readonly dmu: Float64Array;
  readonly cond: Int32Array;
  /** Row scale factors of the dense solve. */
  readonly scale: Float64Array;
}

/** Conditions of one solve. */
export interface GibbsConditions {
  /** g°_j(T)/(R T) at P° for every species. */
  readonly mu0: Float64Array;
  /** "P": fixed T and P (lnP = ln(P/P°)); "V": fixed T and V (lnP = ln(R T/(V P°)) per mol). */
  readonly kind: "P" | "V";
  /** ln(P/P°) for kind "P"; ln(R·T/(V·P°)) (1/mol) for kind "V". */
  readonly lnP: number;
}

/** Outcome of one solve. */
export interface GibbsOutcome {
  converged: boolean;
  iterations: number;
  /** max_i |Σ_j a_ij n_j − b_i| / b_i. */
  elementResidual: number;
  /** Why the solve failed, when it did. */
  reason?: string;
}

/** Limits of one solve. */
export interface GibbsLimits {
  maxIterations: number;
  /** Required relative element residual. */
  elementTolerance: number;
}

/** ln of the mole fraction below which a gas species counts as a trace species. */
const TRACE_LN_X = /* @__PURE__ */ Math.log(1e-8);
/** A trace species may rise to at most this ln mole fraction in one step. */
const TRACE_CAP_LN_X = /* @__PURE__ */ Math.log(1e-4);
/** Largest change of ln n of a major species per step. */
const MAX_LN_STEP = 2;
/** A falling major species may change ln n by FALL_RATIO times MAX_LN_STEP per step. */
const FALL_RATIO = 10;
/** Condensed amount, relative to the element total, below which a shrinking species leaves. */
const NEGLIGIBLE_CONDENSED = 1e-12;
/** A full step that has not halved for this many iterations has reached the round-off floor. */
const FLOOR_ITERATIONS = 4;
/** Largest step measure accepted at the round-off floor (elements must still balance). */
const FLOOR_STEP = 1e-6;
/** Smallest pivot of an element-potential column in the scaled dense solve (smaller: dropped). */
const PIVOT_FLOOR = 1e-15;
/** Step-size tolerance on ln n of the species that matter. */
const STEP_TOLERANCE = 1e-10;

/** Fresh (cold) state for a problem. */
export function createGibbsState(p: GibbsProblem): GibbsState {
  const s: GibbsState = {
    lnn: new Float64Array(p.ns),
    nc: new Float64Array(p.ns),
    active: new Uint8Array(p.ns),
    lnN: 0,
    pi: new Float64Array(p.m),
    warm: false,
    work: createWork(p),
  };
  coldStart(p, s);
  return s;
}

function createWork(p: GibbsProblem): GibbsWork {
  // the dense system has a row per element, one for ln N and one per condensed species only
  let condensed = 0;
  for (let j = 0; j < p.ns; j++) if (!p.gas[j]) condensed++;
  const size = p.m + 1 + condensed;
  return {
    M: new Float64Array(size * size),
    r: new Float64Array(size),
    mu: new Float64Array(p.ns),
    n: new Float64Array(p.ns),
    dln: new Float64Array(p.ns),
    dmu: new Float64Array(p.ns),
    cond: new Int32Array(p.ns),
    scale: new Float64Array(size),
  };
}

/** Reset a state to the cold initial estimate: equal amounts of every gas species. */
export function coldStart(p: GibbsProblem, s: GibbsState): void {
  let bSum = 0;
  for (let i = 0; i < p.m; i++) bSum += p.b[i]!;
  let ngas = 0;
  let atoms = 0;
  for (let j = 0; j < p.ns; j++) {
    if (!p.gas[j]) continue;
    ngas++;
    for (let i = 0; i < p.m; i++) atoms += p.a[i * p.ns + j]!;
  }
  const meanAtoms = ngas > 0 && atoms > 0 ? atoms / ngas : 1;
  const total = bSum / meanAtoms;
  const each = total / Math.max(ngas, 1);
  // no gas species starts with more of an element than its share of that element's amount, so
  // the carriers of an element present at 1e-12 of the feed start at that level, not at ~1/ns
  // gas carriers of each element
  const carriers = new Int32Array(p.m);
  for (let i = 0; i < p.m; i++) for (let l = 0; l < p.ns; l++) if (p.gas[l] && p.a[i * p.ns + l]! > 0) carriers[i] = carriers[i]! + 1;
  let sum = 0;
  for (let j = 0; j < p.ns; j++) {
    s.nc[j] = 0;
    s.active[j] = 0;
    if (!p.gas[j]) {
      s.lnn[j] = 0;
      continue;
    }
    let nj = each;
    for (let i = 0; i < p.m; i++) {
      const aij = p.a[i * p.ns + j]!;
      if (aij <= 0) continue;
      nj = Math.min(nj, p.b[i]! / (aij * carriers[i]!));
    }
    s.lnn[j] = Math.log(nj);
    sum += nj;
  }
  s.lnN = Math.log(sum > 0 ? sum : total);
  s.pi.fill(0);
  s.warm = false;
  // an element held by no gas species must start with a condensed carrier
  for (let i = 0; i < p.m; i++) {
    let inGas = false;
    for (let j = 0; j < p.ns; j++) if (p.gas[j] && p.a[i * p.ns + j]! > 0) inGas = true;
    if (inGas) continue;
    for (let j = 0; j < p.ns; j++) {
      if (!p.gas[j] && p.a[i * p.ns + j]! > 0) {
        s.active[j] = 1;
        s.nc[j] = p.b[i]! / p.a[i * p.ns + j]! / 2;
        break;
      }
    }
  }
}

/** Relative element residual of a state. */
export function elementResidual(p: GibbsProblem, s: GibbsState): number {
  let worst = 0;
  for (let i = 0; i < p.m; i++) {
    let sum = 0;
    for (let j = 0; j < p.ns; j++) {
      const aij = p.a[i * p.ns + j]!;
      if (aij === 0) continue;
      sum += aij * (p.gas[j] ? Math.exp(s.lnn[j]!) : s.nc[j]!);
    }
    const bi = p.b[i]!;
    const r = Math.abs(sum - bi) / bi;
    if (r > worst) worst = r;
  }
  return worst;
}

/**
 * Solve the equilibrium at fixed T and P (or T and V) from the given state (warm or cold).
 * On success the state holds the equilibrium amounts and element potentials.
 */
export function solveGibbs(p: GibbsProblem, c: GibbsConditions, s: GibbsState, lim: GibbsLimits): GibbsOutcome {
  const { m, ns, a, gas, b } = p;
  const isP = c.kind === "P";
  const { mu, n, dln, M, r, cond } = s.work;
  let bScale = 0;
  for (let i = 0; i < m; i++) bScale += b[i]!;
  let iterations = 0;
  let phaseChanges = 0;
  // round-off floor: the smallest full step seen, and the iterations since it last halved
  let bestStep = Infinity;
  let sinceBest = 0;
  const maxPhaseChanges = 2 * ns + 4;
  while (iterations < lim.maxIterations) {
    iterations++;
    // active condensed species, in order
    let nc = 0;
    for (let j = 0; j < ns; j++) if (!gas[j] && s.active[j]) cond[nc++] = j;
    const size = m + (isP ? 1 : 0) + nc;
    M.fill(0, 0, size * size);
    r.fill(0, 0, size);
    let nGas = 0;
    let sumNmu = 0;
    for (let j = 0; j < ns; j++) {
      if (!gas[j]) continue;
      const nj = Math.exp(s.lnn[j]!);
      n[j] = nj;
      const muj = isP ? c.mu0[j]! + c.lnP + s.lnn[j]! - s.lnN : c.mu0[j]! + c.lnP + s.lnn[j]!;
      mu[j] = muj;
      nGas += nj;
      sumNmu += nj * muj;
    }
    const Nt = Math.exp(s.lnN);
    // element rows
    for (let i = 0; i < m; i++) {
      let bc = 0;
      let rhs = 0;
      let si = 0;
      for (let j = 0; j < ns; j++) {
        const aij = a[i * ns + j]!;
        if (aij === 0) continue;
        if (gas[j]) {
          const w = aij * n[j]!;
          bc += w;
          rhs += w * mu[j]!;
          si += w;
          for (let l = 0; l <= i; l++) {
            const alj = a[l * ns + j]!;
            if (alj !== 0) M[i * size + l] = M[i * size + l]! + w * alj;
          }
        } else if (s.active[j]) {
          bc += aij * s.nc[j]!;
        }
      }
      for (let l = 0; l < i; l++) M[l * size + i] = M[i * size + l]!;
      r[i] = b[i]! - bc + rhs;
      fillBorder(M, a, cond, i, si, size, m, ns, nc, isP);
    }
    if (isP) {
      M[m * size + m] = nGas - Nt;
      r[m] = Nt - nGas + sumNmu;
    }
    for (let k = 0; k < nc; k++) r[m + (isP ? 1 : 0) + k] = c.mu0[cond[k]!]!;
    // solve for the change of the element potentials (so a dropped direction keeps its value)
    for (let row = 0; row < size; row++) {
      let sum = 0;
      for (let l = 0; l < m; l++) sum += M[row * size + l]! * s.pi[l]!;
      r[row] = r[row]! - sum;
    }
    if (solveDense(M, r, size, s.work.scale, m) < 0) {
      return { converged: false, iterations, elementResidual: elementResidual(p, s), reason: "singular element-potential matrix" };
    }
    for (let i = 0; i < m; i++) s.pi[i] = s.pi[i]! + r[i]!;
    const dlnN = isP ? r[m]! : 0;
    // species updates and step limiting
    let lambda = 1;
    let bigMajor = isP ? 5 * Math.abs(dlnN) : 0;
    let stepMeasure = isP ? Math.abs(dlnN) : 0;
    const lnTotal = isP ? s.lnN : Math.log(Math.max(nGas, 1e-300));
    for (let j = 0; j < ns; j++) {
      if (!gas[j]) continue;
      let sumA = 0;
      for (let i = 0; i < m; i++) {
        const aij = a[i * ns + j]!;
        if (aij !== 0) sumA += aij * s.pi[i]!;
      }
      const d = -mu[j]! + sumA + dlnN;
      dln[j] = d;
      const lnx = s.lnn[j]! - lnTotal;
      if (lnx > TRACE_LN_X) {
        // a rising major species is held to a factor e² per step; a falling one to e^20 (a
        // cap of ours: from a cold start with many species the exotic ones must fall by ~50 in
        // ln n, and holding them to e² as well took two dozen steps)
        if (d > bigMajor) bigMajor = d;
        else if (-d / FALL_RATIO > bigMajor) bigMajor = -d / FALL_RATIO;
      } else if (d - dlnN > 0) {
        const cap = (TRACE_CAP_LN_X - lnx) / (d - dlnN);
        if (cap < lambda) lambda = Math.max(cap, 0);
      }
      // a species matters by its share of the total or of any element it holds (relative to
      // that element's own amount): the carriers of a trace element must converge too
      let share = Math.exp(lnx);
      for (let i = 0; i < m; i++) {
        const aij = a[i * ns + j]!;
        if (aij !== 0) share = Math.max(share, (aij * n[j]!) / b[i]!);
      }
      const weight = Math.min(share, 1) * Math.max(Math.abs(d), d * d);
      if (weight > stepMeasure) stepMeasure = weight;
    }
    if (bigMajor > MAX_LN_STEP) lambda = Math.min(lambda, MAX_LN_STEP / bigMajor);
    // a condensed species whose amount the step would drive below a tenth of its value is only
    // reduced tenfold (a projected step); once negligible and still falling, it leaves the phase set
    let removed = -1;
    for (let k = 0; k < nc; k++) {
      const j = cond[k]!;
      const dn = r[m + (isP ? 1 : 0) + k]!;
      const rel = Math.abs(dn) / Math.max(nGas, 1e-300);
      if (rel > stepMeasure) stepMeasure = rel;
      if (dn < 0 && s.nc[j]! + dn < 0 && s.nc[j]! < NEGLIGIBLE_CONDENSED * bScale) removed = j;
    }
    if (removed >= 0 && phaseChanges < maxPhaseChanges) {
      phaseChanges++;
      s.active[removed] = 0;
      s.nc[removed] = 0;
      continue;
    }
    if (lambda < 1e-12) lambda = 1e-12;
    for (let j = 0; j < ns; j++) if (gas[j]) s.lnn[j] = s.lnn[j]! + lambda * dln[j]!;
    for (let k = 0; k < nc; k++) {
      const j = cond[k]!;
      s.nc[j] = Math.max(s.nc[j]! / 10, s.nc[j]! + lambda * r[m + (isP ? 1 : 0) + k]!);
    }
    if (isP) s.lnN += lambda * dlnN;
    if (!Number.isFinite(s.lnN) || !finiteAll(s.lnn)) {
      return { converged: false, iterations, elementResidual: Number.NaN, reason: "non-finite iterate" };
    }
    if (lambda === 1) {
      if (stepMeasure < 0.5 * bestStep) {
        bestStep = stepMeasure;
        sinceBest = 0;
      } else sinceBest++;
    }
    // converged: a full step below the tolerance, or a full step that has stopped shrinking at a
    // small value (the round-off floor of a direction the feed's rounding leaves uncertain, e.g.
    // the excess of O over C when both are 1e8 times that excess)
    const floor = lambda === 1 && sinceBest >= FLOOR_ITERATIONS && stepMeasure < FLOOR_STEP;
    if (lambda === 1 && (stepMeasure < STEP_TOLERANCE || floor)) {
      const res = elementResidual(p, s);
      if (res <= lim.elementTolerance) {
        // phase test: a condensed species with negative driving force enters
        let best = -1;
        let bestForce = -1e-9;
        for (let j = 0; j < ns; j++) {
          if (gas[j] || s.active[j]) continue;
          let sumA = 0;
          for (let i = 0; i < m; i++) sumA += a[i * ns + j]! * s.pi[i]!;
          const force = c.mu0[j]! - sumA;
          if (force < bestForce) {
            bestForce = force;
            best = j;
          }
        }
        if (best >= 0 && phaseChanges < maxPhaseChanges) {
          phaseChanges++;
          s.active[best] = 1;
          s.nc[best] = 0;
          continue;
        }
        s.warm = true;
        return { converged: true, iterations, elementResidual: res };
      }
    }
  }
  return { converged: false, iterations, elementResidual: elementResidual(p, s), reason: "iteration limit" };
}

/**
 * Temperature derivatives at a converged equilibrium: d ln n_j/dT (gases), dn_k/dT (active
 * condensed), written into `dlnGas` and `dnCond`. `hRT[j]` is h_j/(R T) of every species.
 * Returns false when the matrix is singular.
 */
export function equilibriumDerivatives(
  p: GibbsProblem,
  c: GibbsConditions,
  s: GibbsState,
  T: number,
  hRT: Float64Array,
  dlnGas: Float64Array,
  dnCond: Float64Array,
): boolean {
  const { m, ns, a, gas } = p;
  const isP = c.kind === "P";
  const { M, r, cond, dmu } = s.work;
  let nc = 0;
  for (let j = 0; j < ns; j++) if (!gas[j] && s.active[j]) cond[nc++] = j;
  const size = m + (isP ? 1 : 0) + nc;
  M.fill(0, 0, size * size);
  r.fill(0, 0, size);
  // d mu0_j/dT = −h_j/(R T²); at fixed V the ln(RT/V) term adds 1/T for gases
  for (let j = 0; j < ns; j++) dmu[j] = -hRT[j]! / T + (gas[j] && !isP ? 1 / T : 0);
  let nGas = 0;
  let rhsN = 0;
  for (let j = 0; j < ns; j++) {
    if (!gas[j]) continue;
    const nj = Math.exp(s.lnn[j]!);
    nGas += nj;
    rhsN += nj * dmu[j]!;
  }
  const Nt = isP ? Math.exp(s.lnN) : nGas;
  for (let i = 0; i < m; i++) {
    let si = 0;
    let rhs = 0;
    for (let j = 0; j < ns; j++) {
      const aij = a[i * ns + j]!;
      if (aij === 0 || !gas[j]) continue;
      const w = aij * Math.exp(s.lnn[j]!);
      si += w;
      rhs += w * dmu[j]!;
      for (let l = 0; l < m; l++) {
        const alj = a[l * ns + j]!;
        if (alj !== 0) M[i * size + l] = M[i * size + l]! + w * alj;
      }
    }
    r[i] = rhs;
    fillBorder(M, a, cond, i, si, size, m, ns, nc, isP);
  }
  if (isP) {
    M[m * size + m] = nGas - Nt;
    r[m] = rhsN;
  }
  for (let k = 0; k < nc; k++) r[m + (isP ? 1 : 0) + k] = dmu[cond[k]!]!;
  if (solveDense(M, r, size, s.work.scale, m) < 0) return false;
  const dlnN = isP ? r[m]! : 0;
  for (let j = 0; j < ns; j++) {
    if (gas[j]) {
      let sumA = 0;
      for (let i = 0; i < m; i++) sumA += a[i * ns + j]! * r[i]!;
      dlnGas[j] = sumA - dmu[j]! + dlnN;
    } else {
      dlnGas[j] = 0;
      dnCond[j] = 0;
    }
  }
  for (let k = 0; k < nc; k++) dnCond[cond[k]!] = r[m + (isP ? 1 : 0) + k]!;
  return true;
}

/**
 * Solve M x = r in place (x returned in r; returns the number of dropped directions, −1 when
 * singular) for the symmetric element-potential matrix, by
 * Gaussian elimination with partial pivoting after symmetric diagonal scaling: row and column k
 * are divided by √(max_l |M_kl|). The rows of an element present at 1e-12 of the feed are
 * 1e-12 the size of the others; unscaled, pivoting would pick a large row to eliminate a tiny
 * column and the trace element's balance would drown in round-off. `scaleWork` (length ≥ size)
 * holds the scale factors.
 */
export function solveDense(
  M: Float64Array, r: Float64Array, size: number,
  scaleWork: Float64Array = new Float64Array(size), floorColumns = 0,
): number {
  const d = scaleWork;
  let floored = 0;
  for (let row = 0; row < size; row++) {
    let big = 0;
    for (let k = 0; k < size; k++) {
      const v = Math.abs(M[row * size + k]!);
      if (v > big) big = v;
    }
    if (!(big > 0) || !Number.isFinite(big)) return -1;
    d[row] = 1 / Math.sqrt(big);
  }
  for (let row = 0; row < size; row++) {
    const dr = d[row]!;
    for (let k = 0; k < size; k++) M[row * size + k] = M[row * size + k]! * dr * d[k]!;
    r[row] = r[row]! * dr;
  }
  let scale = 0;
  for (let q = 0; q < size * size; q++) scale = Math.max(scale, Math.abs(M[q]!));
  const tiny = scale * 1e-300;
  for (let col = 0; col < size; col++) {
    let piv = col;
    let best = Math.abs(M[col * size + col]!);
    for (let row = col + 1; row < size; row++) {
      const v = Math.abs(M[row * size + col]!);
      if (v > best) {
        best = v;
        piv = row;
      }
    }
    if (!Number.isFinite(best)) return -1;
    if (col < floorColumns && !(best > PIVOT_FLOOR)) {
      // an element-potential direction the matrix cannot resolve (after scaling, its pivot is
      // at round-off): two element rows told apart only by species at ~1e-16 of them, e.g.
      // O and C in CH3OH when only traces of O2 and C2H6 differ. Drop the equation that has
      // become dependent — the remaining row nearest to zero, not the one with the largest
      // round-off in this column (that may be the ln N row, whose loss leaves the total wrong) —
      // and set the unknown to 0, so the direction is left as it is instead of taking a step of
      // pure noise.
      let flat = Infinity;
      for (let row = col; row < size; row++) {
        let rowMax = 0;
        for (let k = col; k < size; k++) rowMax = Math.max(rowMax, Math.abs(M[row * size + k]!));
        if (rowMax < flat) {
          flat = rowMax;
          piv = row;
        }
      }
      for (let k = col; k < size; k++) M[piv * size + k] = 0;
      M[piv * size + col] = 1;
      r[piv] = 0;
      floored++;
    } else if (!(best > tiny)) return -1;
    if (piv !== col) {
      for (let k = 0; k < size; k++) {
        const t = M[col * size + k]!;
        M[col * size + k] = M[piv * size + k]!;
        M[piv * size + k] = t;
      }
      const t = r[col]!;
      r[col] = r[piv]!;
      r[piv] = t;
    }
    const dd = M[col * size + col]!;
    for (let row = col + 1; row < size; row++) {
      const f = M[row * size + col]! / dd;
      if (f === 0) continue;
      for (let k = col; k < size; k++) M[row * size + k] = M[row * size + k]! - f * M[col * size + k]!;
      r[row] = r[row]! - f * r[col]!;
    }
  }
  for (let row = size - 1; row >= 0; row--) {
    let sum = r[row]!;
    for (let k = row + 1; k < size; k++) sum -= M[row * size + k]! * r[k]!;
    r[row] = sum / M[row * size + row]!;
  }
  for (let row = 0; row < size; row++) r[row] = r[row]! * d[row]!;
  return floored;
}

function finiteAll(x: Float64Array): boolean {
  for (let j = 0; j < x.length; j++) if (!Number.isFinite(x[j]!)) return false;
  return true;
}

/**
 * {@link solveGibbs} with restarts: when the solve from the given state fails and the problem
 * has condensed species, retry from a cold start with each condensed species active in turn
 * (a feed whose elements the gas phase alone cannot hold, e.g. carbon beyond the oxygen, needs
 * its condensed carrier from the first iteration), then with all of them active.
 */
export function solveGibbsRobust(p: GibbsProblem, c: GibbsConditions, s: GibbsState, lim: GibbsLimits): GibbsOutcome {
  let out = solveGibbs(p, c, s, lim);
  if (out.converged) return out;
  let total = out.iterations;
  const tryFrom = (activate: (j: number) => boolean): GibbsOutcome => {
    coldStart(p, s);
    let bMin = Infinity;
    for (let i = 0; i < p.m; i++) bMin = Math.min(bMin, p.b[i]!);
    for (let j = 0; j < p.ns; j++) {
      if (!p.gas[j] && activate(j)) {
        s.active[j] = 1;
        s.nc[j] = Math.max(s.nc[j]!, bMin / 4);
      }
    }
    const o = solveGibbs(p, c, s, lim);
    total += o.iterations;
    return o;
  };
  if (s.warm) {
    // a warm start that failed: retry cold first
    out = tryFrom(() => false);
    if (out.converged) return { ...out, iterations: total };
  }
  const condensed: number[] = [];
  for (let j = 0; j < p.ns; j++) if (!p.gas[j]) condensed.push(j);
  for (const k of condensed) {
    out = tryFrom((j) => j === k);
    if (out.converged) return { ...out, iterations: total };
  }
  if (condensed.length > 1) {
    out = tryFrom(() => true);
    if (out.converged) return { ...out, iterations: total };
  }
  return { ...out, iterations: total };
}

/**
 * Fill the border of element row `i` of the symmetric element-potential matrix: the ln N column
 * (Σⱼ aᵢⱼ nⱼ, at constant pressure only) and one column per active condensed species (aᵢₖ).
 * Shared by the Newton step and the temperature-sensitivity solve, which use the same matrix.
 */
function fillBorder(
  M: Float64Array, a: Float64Array, cond: ArrayLike<number>, i: number, si: number,
  size: number, m: number, ns: number, nc: number, isP: boolean,
): void {
  if (isP) {
    M[i * size + m] = si;
    M[m * size + i] = si;
  }
  for (let k = 0; k < nc; k++) {
    const aik = a[i * ns + cond[k]!]!;
    const col = m + (isP ? 1 : 0) + k;
    M[i * size + col] = aik;
    M[col * size + i] = aik;
  }
}

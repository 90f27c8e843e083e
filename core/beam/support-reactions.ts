import type { BeamModel } from "./beam-model.js";
import { coupleEndForces, lineLoadEndForces, noEndForces, pointLoadEndForces, type EndForces } from "./fixed-end-actions.js";
import type { LoadSet, Reaction } from "./member-actions.js";
import { rigidityAt, type RigidityStep } from "./rigidity.js";

/**
 * Support reactions of a prismatic member on any supports, by the stiffness method: one element per
 * span, two degrees of freedom per span end (deflection v upward, rotation θ counter-clockwise),
 * loads brought to the ends as fixed-end actions, K·d = −Σ fixed-end forces over the free degrees of
 * freedom, then each element's end forces k·d + fixed-end forces summed at the supports. EI is the
 * same along the member, so it cancels from the reactions and is taken as 1; a member whose EI steps
 * (a cover plate over part of the span) is split at each step into prismatic elements, each with its EI.
 * Reactions are in member-actions' convention: R upward, M clockwise on the member.
 */
export function supportReactions(model: BeamModel, loads: LoadSet, rigidity: RigidityStep[] | null = null): Reaction[] {
  const { nodes, ends, n, stiffnesses, free, dof, solve } = stiffnessOf(model, rigidity);
  const fixedEnd: EndForces[] = Array.from({ length: n }, noEndForces);
  const add = (e: number, f: EndForces) => {
    const t = fixedEnd[e]!;
    t.F1 += f.F1;
    t.M1 += f.M1;
    t.F2 += f.F2;
    t.M2 += f.M2;
  };
  const elementAt = (x: number) => {
    for (let e = 0; e < n; e++) if (x <= nodes[e + 1]!) return e;
    return n - 1;
  };
  for (const p of loads.points) {
    const e = elementAt(p.x);
    add(e, pointLoadEndForces(p.P, p.x - nodes[e]!, nodes[e + 1]! - nodes[e]!));
  }
  for (const c of loads.moments) {
    const e = elementAt(c.x);
    add(e, coupleEndForces(c.M, c.x - nodes[e]!, nodes[e + 1]! - nodes[e]!));
  }
  for (const w of loads.lines) {
    if (!(w.x1 > w.x0)) continue;
    const slope = (w.w1 - w.w0) / (w.x1 - w.x0);
    for (let e = 0; e < n; e++) {
      const a = Math.max(w.x0, nodes[e]!);
      const b = Math.min(w.x1, nodes[e + 1]!);
      if (!(b > a)) continue;
      add(e, lineLoadEndForces(a - nodes[e]!, b - nodes[e]!, w.w0 + slope * (a - w.x0), w.w0 + slope * (b - w.x0), nodes[e + 1]! - nodes[e]!));
    }
  }

  const F = new Float64Array(dof);
  for (let e = 0; e < n; e++) {
    const d = elementDofs(e);
    const f = fixedEnd[e]!;
    const fe = [f.F1, f.M1, f.F2, f.M2];
    for (let i = 0; i < 4; i++) F[d[i]!]! -= fe[i]!;
  }
  const solved = solve(free.map((i) => F[i]!));
  const d = new Float64Array(dof);
  free.forEach((i, k) => (d[i] = solved[k]!));

  // End forces on each element, summed at each node: what the node (its support) gives the member.
  const atNode = new Float64Array(dof);
  for (let e = 0; e < n; e++) {
    const k = stiffnesses[e]!;
    const dofs = elementDofs(e);
    const f = fixedEnd[e]!;
    const fe = [f.F1, f.M1, f.F2, f.M2];
    for (let i = 0; i < 4; i++) {
      let s = fe[i]!;
      for (let j = 0; j < 4; j++) s += k[i]![j]! * d[dofs[j]!]!;
      atNode[dofs[i]!]! += s;
    }
  }
  return ends.flatMap((c, i) => (c === "free" ? [] : [{ x: nodes[i]!, R: atNode[2 * i]!, M: c === "fixed" ? -atNode[2 * i + 1]! : 0 }]));
}

const elementDofs = (e: number) => [2 * e, 2 * e + 1, 2 * e + 2, 2 * e + 3];

interface Stiffness {
  nodes: number[];
  ends: BeamModel["ends"][number][];
  /** Elements. */
  n: number;
  /** Each element's stiffness matrix. */
  stiffnesses: number[][][];
  /** The degrees of freedom not restrained, in order. */
  free: number[];
  dof: number;
  /** K_free·d = b, by the elimination worked out once for every load on the member. */
  solve: (b: number[]) => number[];
}

/** The member's stiffness, the same for every load case: assembled and eliminated once per model (and E·I steps). */
const stiffnessByModel = new WeakMap<BeamModel, { rigidity: RigidityStep[] | null; stiffness: Stiffness }>();

function stiffnessOf(model: BeamModel, rigidity: RigidityStep[] | null): Stiffness {
  const known = stiffnessByModel.get(model);
  if (known && known.rigidity === rigidity) return known.stiffness;
  // A member whose section changes along it is split at each change into prismatic elements with free nodes between.
  const inner = (rigidity ?? []).map((r) => r.x0).filter((x) => x > 0 && !model.nodes.some((n) => Math.abs(n - x) <= 1e-9 * model.length));
  const nodes = [...model.nodes, ...inner].sort((a, b) => a - b);
  const ends = nodes.map((x) => {
    const i = model.nodes.findIndex((n) => Math.abs(n - x) <= 1e-9 * model.length);
    return i >= 0 ? model.ends[i]! : ("free" as const);
  });
  const n = nodes.length - 1;
  const relative = (e: number) => (rigidity ? rigidityAt(rigidity, (nodes[e]! + nodes[e + 1]!) / 2) / rigidity[0]!.value : 1);
  const dof = 2 * (n + 1);
  const K = Array.from({ length: dof }, () => new Float64Array(dof));
  const stiffness = (L: number, ei: number) =>
    [
      [12 / L ** 3, 6 / L ** 2, -12 / L ** 3, 6 / L ** 2],
      [6 / L ** 2, 4 / L, -6 / L ** 2, 2 / L],
      [-12 / L ** 3, -6 / L ** 2, 12 / L ** 3, -6 / L ** 2],
      [6 / L ** 2, 2 / L, -6 / L ** 2, 4 / L],
    ].map((row) => row.map((v) => v * ei));
  const stiffnesses: number[][][] = [];
  for (let e = 0; e < n; e++) {
    const k = stiffness(nodes[e + 1]! - nodes[e]!, relative(e));
    stiffnesses.push(k);
    const d = elementDofs(e);
    for (let i = 0; i < 4; i++) for (let j = 0; j < 4; j++) K[d[i]!]![d[j]!]! += k[i]![j]!;
  }
  const restrained = new Set<number>();
  ends.forEach((c, i) => {
    if (c !== "free") restrained.add(2 * i);
    if (c === "fixed") restrained.add(2 * i + 1);
  });
  const free = Array.from({ length: dof }, (_, i) => i).filter((i) => !restrained.has(i));
  const made: Stiffness = { nodes, ends, n, stiffnesses, free, dof, solve: eliminated(free.map((i) => free.map((j) => K[i]![j]!))) };
  stiffnessByModel.set(model, { rigidity, stiffness: made });
  return made;
}

/**
 * Gaussian elimination with partial pivoting after symmetric diagonal scaling (rotations and deflections
 * differ in scale by a length), done on A once: the row swaps and multipliers are kept and applied to each
 * right-hand side in the order the elimination made them.
 */
function eliminated(A: number[][]): (b: number[]) => number[] {
  const m = A.length;
  const s = A.map((row, i) => 1 / Math.sqrt(Math.abs(row[i]!) || 1));
  const M = A.map((row, i) => row.map((v, j) => v * s[i]! * s[j]!));
  const steps: { pivot: number; rows: number[]; factors: number[] }[] = [];
  for (let c = 0; c < m; c++) {
    let p = c;
    for (let r = c + 1; r < m; r++) if (Math.abs(M[r]![c]!) > Math.abs(M[p]![c]!)) p = r;
    if (!(Math.abs(M[p]![c]!) > 1e-10)) throw new Error("the supports do not hold the member (singular stiffness matrix)");
    [M[c], M[p]] = [M[p]!, M[c]!];
    const step = { pivot: p, rows: [] as number[], factors: [] as number[] };
    for (let r = c + 1; r < m; r++) {
      const f = M[r]![c]! / M[c]![c]!;
      if (f === 0) continue;
      for (let k = c; k < m; k++) M[r]![k]! -= f * M[c]![k]!;
      step.rows.push(r);
      step.factors.push(f);
    }
    steps.push(step);
  }
  return (b) => {
    const y = b.map((v, i) => v * s[i]!);
    for (let c = 0; c < m; c++) {
      const { pivot: p, rows, factors } = steps[c]!;
      [y[c], y[p]] = [y[p]!, y[c]!];
      for (let q = 0; q < rows.length; q++) y[rows[q]!]! -= factors[q]! * y[c]!;
    }
    const x = new Array<number>(m).fill(0);
    for (let r = m - 1; r >= 0; r--) {
      let t = y[r]!;
      for (let k = r + 1; k < m; k++) t -= M[r]![k]! * x[k]!;
      x[r] = t / M[r]![r]!;
    }
    return x.map((v, i) => v * s[i]!);
  };
}

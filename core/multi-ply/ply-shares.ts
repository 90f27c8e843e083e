/**
 * Side-by-side plies (lumber, LVL, a steel flitch plate) bending together about the same axis:
 * with equal deflection every ply carries a share of the load in proportion to its bending stiffness
 * E_j·I_j [D]. A load that arrives on one face has to be passed through the connectors, across each
 * interface, into the plies beyond it. Plies are numbered from the left face; interface k lies
 * between ply k and ply k + 1. Units: MPa, mm, mm⁴; loads in N/mm (uniform) or N (concentrated):
 * the interface forces come out in the unit of the loads.
 */

export interface Ply {
  name?: string;
  /** E, MPa (a steel flitch by its own modulus). */
  modulus: number;
  /** Thickness across the member, mm. */
  thickness: number;
  /** Depth, mm. */
  depth: number;
  /** I about the bending axis, mm⁴; thickness·depth³/12 when not given. */
  secondMoment?: number;
  /** The ply reaches the top of the member, so a load on top bears on it; true when not given. */
  bearsOnTop?: boolean;
  /** The ply reaches the bottom of the member, so it bears on the supports; true when not given. */
  bearsAtBottom?: boolean;
}

/**
 * Where a load arrives: hung on the left face (ply 1), on the right face (ply n), bearing on top of the
 * plies that reach the top, or (a support's reaction, upward as a negative load) under the plies that reach the bottom.
 */
export type LoadFace = "left" | "right" | "top" | "bottom";

export interface SideLoad {
  face: LoadFace;
  /** N/mm for a uniform load, N for a concentrated one. Downward positive. */
  magnitude: number;
}

/** Bending stiffness E·I of a ply, N·mm². */
export function plyStiffness(ply: Ply): number {
  return ply.modulus * (ply.secondMoment ?? (ply.thickness * ply.depth ** 3) / 12);
}

/** Each ply's share of a load carried by the member, E_j I_j / Σ E I. */
export function plyShares(plies: Ply[]): number[] {
  if (plies.length < 2) throw new RangeError(`a multi-ply member needs two plies or more, got ${plies.length}`);
  const ei = plies.map(plyStiffness);
  if (ei.some((x) => !(x > 0))) throw new RangeError("every ply needs a positive bending stiffness");
  const total = ei.reduce((a, b) => a + b, 0);
  return ei.map((x) => x / total);
}

/**
 * How a load arrives across the plies, as fractions per ply: all on ply 1 (left face), all on ply n
 * (right face), or bearing on top of the plies that reach the top (a shallower ply, such as a flitch
 * plate set within the depth of the timber, takes none of it), in proportion to their thicknesses [CP];
 * or (a support's reaction) under the plies that reach the bottom, in proportion to their E·I.
 */
export function arrivalFractions(plies: Ply[], face: LoadFace): number[] {
  const n = plies.length;
  if (face === "left") return plies.map((_, j) => (j === 0 ? 1 : 0));
  if (face === "right") return plies.map((_, j) => (j === n - 1 ? 1 : 0));
  const bearing = (p: Ply) => (face === "top" ? p.bearsOnTop : p.bearsAtBottom) !== false;
  // At the bottom (a support), the plies that reach it each take their own share: each carries its share of the
  // load to the support, so only a ply that does not reach it hands its share to the others [D].
  const weight = face === "top" ? (p: Ply) => p.thickness : plyStiffness;
  const width = plies.filter(bearing).reduce((s, p) => s + weight(p), 0);
  if (!(width > 0)) throw new RangeError(`no ply reaches the ${face} of the member`);
  return plies.map((p) => (bearing(p) ? weight(p) / width : 0));
}

export interface InterfaceTransfer {
  /** Interface k (1-based) lies between ply k and ply k + 1. */
  interface: number;
  /** Load passed from the left plies to the right plies across this interface; negative passes leftward. */
  force: number;
}

export interface PlyLoading {
  shares: number[];
  /** Load each ply carries in the end (share × total), in the unit of the loads. */
  plyLoads: number[];
  /** Load arriving on each ply before any transfer. */
  arriving: number[];
  interfaces: InterfaceTransfer[];
}

/**
 * The force each interface must pass for loads acting together: T_k = Σ_{j ≤ k} (arriving_j − share_j·ΣP).
 * For one load on the left face, T_k is the sum of the shares beyond interface k times the load.
 * Loads that do not act together (live load on one side only) belong in separate calls.
 */
export function interfaceTransfer(plies: Ply[], loads: SideLoad[]): PlyLoading {
  const shares = plyShares(plies);
  const arriving = plies.map(() => 0);
  for (const load of loads) {
    arrivalFractions(plies, load.face).forEach((f, j) => (arriving[j]! += f * load.magnitude));
  }
  const total = arriving.reduce((a, b) => a + b, 0);
  const plyLoads = shares.map((s) => s * total);
  const interfaces: InterfaceTransfer[] = [];
  // A force within rounding of zero is none: a load that arrives on each ply in proportion to its share
  // (a member load on equal plies) passes nothing, where the sums above leave about 1e-17 of the load,
  // which showed as a required spacing of 10¹⁸ in on a stud pack under wind.
  const rounding = 1e-12 * arriving.reduce((a, b) => a + Math.abs(b), 0);
  let passed = 0;
  for (let k = 0; k < plies.length - 1; k++) {
    passed += arriving[k]! - plyLoads[k]!;
    interfaces.push({ interface: k + 1, force: Math.abs(passed) <= rounding ? 0 : passed });
  }
  return { shares, plyLoads, arriving, interfaces };
}

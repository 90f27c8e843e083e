/** E·I over one stretch of a member whose section changes along it, N·mm². */
export interface RigidityStep {
  x0: number;
  x1: number;
  value: number;
}

/** E·I at x; at a step, the stretch that starts there. */
export function rigidityAt(steps: RigidityStep[], x: number): number {
  for (const s of steps) if (x >= s.x0 && x < s.x1) return s.value;
  return steps[steps.length - 1]!.value;
}

// Failures of the engine (core/) that the fuzz tests have found and that are reported to its owner,
// each with a reproducing test in test/server/core-problems.test.ts. The fuzz tests count these apart
// instead of failing on them; any other 5xx fails them. Remove an entry once core is fixed.
export const knownCoreProblems: { id: string; answer: RegExp }[] = [
  // A part tens of metres deep (a cover plate h = 65000 in): the stiffness matrix of the beam loses its rank.
  { id: "singular-stiffness", answer: /singular stiffness matrix/ },
];

export function knownCoreProblem(message: string): string | undefined {
  return knownCoreProblems.find((p) => p.answer.test(message))?.id;
}

import fc from "fast-check";

// Property tests run from one fixed seed so that CI is repeatable; FC_SEED=<n> explores other cases.
fc.configureGlobal({ seed: Number(process.env.FC_SEED ?? 20261202) });

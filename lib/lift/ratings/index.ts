/** Rating tables, one per file, every row with its source (reference.md's [read] / [memory] / [derived]). */
export * from './source';
export * from './round-sling';
export * from './shackle';
export * from './alloy-chain';
export * from './tie-down-chain';
export * from './choke-angle';
export * from './hitch';
export * from './wire-rope-bend';
export * from './lifting-use';

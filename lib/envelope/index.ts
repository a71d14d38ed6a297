/** The reach envelope: where round the truck the load can be held within the plan's limits. Pure, no React. */
export * from './at-radius';
export * from './grid';
export * from './hold';
export * from './outline';

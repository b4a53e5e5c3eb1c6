// Types of scratch.mjs for the TypeScript tests and benchmarks.
export function freePort(): Promise<number>;
export function scratchBase(): string;

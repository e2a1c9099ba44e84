// Types of scripts/build-wasm.mjs for the TypeScript tests that import it.

export const SOURCE: string;
export const TARGET: string;
export const ASC_FLAGS: string[];
export function moduleText(bytes: Uint8Array): string;
export function compileKernel(): Uint8Array;

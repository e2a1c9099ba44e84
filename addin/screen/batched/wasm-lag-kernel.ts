/**
 * The SIMD form of the batched screen's inner products (assembly/lag-products.ts, compiled into
 * lag-products-wasm.ts by scripts/build-wasm.mjs): the same sums as lag-cross-products.ts, two
 * rows per instruction, about twice as fast (addin/bench/screen-bench.ts times both). Each
 * LagArena is one instance of the module with its own memory holding the four series buffers
 * and the two outputs of a pair, so workspaces never share memory. Where WebAssembly or its
 * SIMD is missing (an old host), wasmLagArena answers null and the screen uses the JavaScript
 * loops; either way every thread of one screen uses the same kernel, so its records do not
 * depend on the number of threads.
 */
import { LAG_PRODUCTS_WASM } from './lag-products-wasm';

interface KernelExports {
  memory: WebAssembly.Memory;
  heapBase(): number;
  crossLagProducts(di: number, dj: number, a: number, b: number, P: number, ij: number, ji: number): void;
  dot(c: number, d: number, a: number, b: number): number;
  residualSquares(y: number, x: number, beta: number, n: number): number;
}

let compiled: WebAssembly.Module | null | undefined;

/** The compiled module, once per thread; null where WebAssembly SIMD is not available. */
function kernelModule(): WebAssembly.Module | null {
  if (compiled !== undefined) return compiled;
  compiled = null;
  try {
    if (typeof WebAssembly !== 'object' || typeof atob !== 'function') return compiled;
    const text = atob(LAG_PRODUCTS_WASM);
    const bytes = new Uint8Array(text.length);
    for (let i = 0; i < text.length; i++) bytes[i] = text.charCodeAt(i);
    if (WebAssembly.validate(bytes)) compiled = new WebAssembly.Module(bytes);
  } catch {
    compiled = null;
  }
  return compiled;
}

/** The four series buffers of an arena: changes and centred level of the pair's two series. */
export const SLOT = { changesI: 0, centredI: 1, changesJ: 2, centredJ: 3 } as const;

/** Buffers of one pair in a module instance's memory: views for JavaScript, byte offsets for the kernel. */
export class LagArena {
  /** The series buffers, in SLOT order, each `rows` long. */
  readonly slots: Float64Array[];
  /** The kernel's outputs, P + 1 long. */
  readonly ij: Float64Array;
  readonly ji: Float64Array;
  private readonly kernel: KernelExports;
  private readonly offsets: number[];
  private readonly ijAt: number;
  private readonly jiAt: number;

  constructor(kernel: KernelExports, rows: number, lags: number) {
    this.kernel = kernel;
    const start = Math.ceil(kernel.heapBase() / 16) * 16;
    const series = Math.ceil(rows / 2) * 16; // bytes per series buffer, a multiple of 16
    const products = Math.ceil((lags + 1) / 2) * 16;
    this.offsets = [0, 1, 2, 3].map((slot) => start + slot * series);
    this.ijAt = start + 4 * series;
    this.jiAt = this.ijAt + products;
    const pages = Math.ceil((this.jiAt + products) / 65536) - kernel.memory.buffer.byteLength / 65536;
    if (pages > 0) kernel.memory.grow(pages);
    const view = (offset: number, length: number) => new Float64Array(kernel.memory.buffer, offset, length);
    this.slots = this.offsets.map((offset) => view(offset, rows));
    this.ij = view(this.ijAt, lags + 1);
    this.ji = view(this.jiAt, lags + 1);
  }

  /** ij[k] = sum_{t=a}^{b} di[t] dj[t-k] and ji[k] = sum dj[t] di[t-k], k = 0..P (lag-cross-products.ts), di and dj two slots. */
  crossLagProducts(di: number, dj: number, a: number, b: number, P: number): void {
    this.kernel.crossLagProducts(this.offsets[di], this.offsets[dj], a, b, P, this.ijAt, this.jiAt);
  }

  /** sum_{t=0}^{n-1} (y[t] - beta x[t])^2 of two slots (centred levels). */
  residualSquares(y: number, x: number, beta: number, n: number): number {
    return this.kernel.residualSquares(this.offsets[y], this.offsets[x], beta, n);
  }

  /** sum_{t=a}^{b} c[t] d[t] of two slots. */
  dot(c: number, d: number, a: number, b: number): number {
    return this.kernel.dot(this.offsets[c], this.offsets[d], a, b);
  }
}

/** A fresh arena for series of `rows` rows and P lags, or null where WebAssembly SIMD is not available. */
export function wasmLagArena(rows: number, lags: number): LagArena | null {
  const module = kernelModule();
  if (!module) return null;
  const instance = new WebAssembly.Instance(module, {});
  return new LagArena(instance.exports as unknown as KernelExports, rows, lags);
}

/**
 * How a run is cut into chunks. The chunk size is fixed, so chunk i always holds the same rays with the
 * same random numbers, whichever worker traces it: one thread and eight give identical ledgers.
 */

/** Rays per chunk (the last chunk may be shorter). */
export const CHUNK_SIZE = 16384;

export interface ChunkPlan {
  /** Total rays of the run. */
  rays: number;
  /** Rays per full chunk. */
  chunkSize: number;
  /** Number of chunks, ⌈rays / chunkSize⌉. */
  chunkCount: number;
}

/** The chunk plan for a run of `rays` rays (integer ≥ 0). */
export function chunkPlan(rays: number): ChunkPlan {
  return { rays, chunkSize: CHUNK_SIZE, chunkCount: Math.ceil(rays / CHUNK_SIZE) };
}

/** Rays in chunk `index` of a plan: chunkSize, except the remainder in the last chunk. */
export function raysInChunk(plan: ChunkPlan, index: number): number {
  const start = index * plan.chunkSize;
  const left = plan.rays - start;
  return left < plan.chunkSize ? (left > 0 ? left : 0) : plan.chunkSize;
}

/**
 * The (scene, chunk) units worker `w` of `count` traces when `scenes` scenes share one plan: unit k of
 * the scene-major list goes to worker k mod count, so each worker gets a share of every scene's cost.
 * @returns pairs (scene index, chunk index), flattened
 */
export function dealSceneUnits(plan: ChunkPlan, scenes: number, w: number, count: number): Int32Array {
  const units = scenes * plan.chunkCount;
  const mine = new Int32Array(2 * Math.max(0, Math.ceil((units - w) / count)));
  for (let k = w, j = 0; k < units; k += count, j += 2) {
    mine[j] = Math.floor(k / plan.chunkCount);
    mine[j + 1] = k % plan.chunkCount;
  }
  return mine;
}

/**
 * The tracer's random number generator: xoshiro128** (32-bit state words), seeded per chunk of rays
 * from (seed, chunkIndex) through splitmix64, so a chunk draws the same numbers whichever thread runs it.
 *
 * The state lives in a module-scope Int32Array, so drawing allocates nothing. (Not in module-scope
 * `let`s: where the engine keeps small integers in 31 bits — browsers with pointer compression — half
 * of all 32-bit state words would be boxed on every draw; measured 2.6× slower in Chromium.) One
 * generator per thread: `seedChunk` restarts it, and the chunk loop runs to completion before the next seed.
 *
 * Sources: D. Blackman, S. Vigna, "Scrambled linear pseudorandom number generators",
 * ACM Trans. Math. Softw. 47, 36 (2021) — xoshiro128** and the splitmix64 seeder (reference C code
 * at prng.di.unimi.it).
 */

/** xoshiro128** state words s0, s1, s2, s3. */
const s = new Int32Array(4);

const MASK64 = (1n << 64n) - 1n;

/**
 * One splitmix64 step on a 64-bit BigInt state; returns [next state, output]. Seeding only, never in
 * the ray loop (it allocates).
 */
export function splitmix64(state: bigint): [bigint, bigint] {
  // splitmix64: z = (x += 0x9e3779b97f4a7c15); z = (z ^ z>>30)·0xbf58476d1ce4e5b9; z = (z ^ z>>27)·0x94d049bb133111eb; z ^ z>>31
  const next = (state + 0x9e3779b97f4a7c15n) & MASK64;
  let z = next;
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
  return [next, z ^ (z >> 31n)];
}

/**
 * Restarts the generator for one chunk of rays. The splitmix64 state starts at seed·2³² + chunkIndex,
 * and two outputs fill the four 32-bit xoshiro words (never all zero).
 * @param seed unsigned 32-bit integer, [0, 2³² − 1]
 * @param chunkIndex chunk number, integer [0, 2³² − 1]
 */
export function seedChunk(seed: number, chunkIndex: number): void {
  let state = (BigInt(seed >>> 0) << 32n) | BigInt(chunkIndex >>> 0);
  let out: bigint;
  [state, out] = splitmix64(state);
  s[0] = Number(out & 0xffffffffn) | 0;
  s[1] = Number(out >> 32n) | 0;
  [state, out] = splitmix64(state);
  s[2] = Number(out & 0xffffffffn) | 0;
  s[3] = Number(out >> 32n) | 0;
  if ((s[0] | s[1] | s[2] | s[3]) === 0) s[0] = 1; // the all-zero state is the one fixed point
}

/**
 * Draws one uniform number in [0, 1) with 32 random bits into out[i]: u = x·2⁻³², x the xoshiro128**
 * output (smallest step 2⁻³² ≈ 2.3e−10). The ray loop draws into arrays: a number returned from a
 * call the engine does not inline is a heap object, a number written into an array is not. Small and
 * loop-free, so a loop that has spent most of its inlining budget still inlines it.
 */
export function uniformAt(out: Float64Array, i: number): void {
  // xoshiro128**: result = rotl(s1·5, 7)·9; t = s1 << 9; s2 ^= s0; s3 ^= s1; s1 ^= s2; s0 ^= s3; s2 ^= t; s3 = rotl(s3, 11)
  // (each word read once and written once: the state array is memory the engine does not keep in registers)
  const s0 = s[0];
  const s1 = s[1];
  const s2 = s[2] ^ s0;
  const s3 = s[3] ^ s1;
  const m = Math.imul(s1, 5);
  const result = Math.imul((m << 7) | (m >>> 25), 9) >>> 0;
  s[0] = s0 ^ s3;
  s[1] = s1 ^ s2;
  s[2] = s2 ^ (s1 << 9);
  s[3] = (s3 << 11) | (s3 >>> 21);
  out[i] = result * 2.3283064365386963e-10;
}

/** Draws `count` uniform numbers into out[0..count−1], in sequence (uniformAt's). */
export function uniformsInto(out: Float64Array, count: number): void {
  for (let i = 0; i < count; i++) uniformAt(out, i);
}

const one = new Float64Array(1);

/** Next uniform number in [0, 1) (uniformsInto's, one at a time; not for the ray loop: see there). */
export function nextFloat(): number {
  uniformsInto(one, 1);
  return one[0];
}

/** Next raw 32-bit output as an unsigned integer (for tests against the reference sequence). */
export function nextUint32(): number {
  return Math.round(nextFloat() * 4294967296);
}

/** Sets the four state words directly (tests: compare with the reference C sequence). */
export function setState(a: number, b: number, c: number, d: number): void {
  s[0] = a | 0;
  s[1] = b | 0;
  s[2] = c | 0;
  s[3] = d | 0;
}

/*
 * dome-trace: an independent single-thread C tracer of the benchmark packages, for timing the
 * TypeScript tracer against native code and for cross-checking its physics (scripts/bench-native.mjs).
 *
 * The package: a 1 x 1 x 0.15 mm box chip (n 2.45, absorption 0.5 /mm) standing on an endless
 * specular base plane z = 0 (reflectance 0.92), emitting isotropically from the plane z = 0.1 mm,
 * uniformly over its footprint; around it a hemispherical dome (radius 2.5 mm), a cylinder (radius
 * 2.5 mm, height 1 mm), both n 1.41 and 0.001 /mm, or nothing (the bare chip in air); outside air.
 * Units mm, z up, the chip centred on the z axis.
 *
 * Physics: unpolarised Fresnel reflectance R = (Rs + Rp)/2, reflection chosen with probability R,
 * else refraction by the vector form of Snell's law; total internal reflection beyond the critical
 * angle; the base reflects with probability 0.92, else the ray is absorbed there; bulk absorption by
 * Beer-Lambert with one optical depth per ray; a ray refracted into the air has escaped (nothing
 * outside can send it back); at 1000 events a ray is lost. One event = one straight segment that ends
 * on a surface or in absorption.
 *
 *   gcc -O2 -march=x86-64 -std=c99 -o dome-trace dome-trace.c -lm
 *   ./dome-trace RAYS SEED [dome|bare|cylinder]      -> one JSON line on stdout
 *
 * Nothing is allocated: the ray is a handful of local doubles.
 */
#include <math.h>
#include <stdint.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

#define MAX_EVENTS 1000

/* Chip: |x|, |y| <= CHIP_HALF, 0 <= z <= CHIP_H */
static const double CHIP_HALF = 0.5;
static const double CHIP_H = 0.15;
static const double CHIP_N = 2.45;
static const double CHIP_ALPHA = 0.5;
static const double EMIT_Z = 0.1;
static const double BASE_R = 0.92;
static const double AIR_N = 1.0;

enum Shape { BARE, DOME, CYLINDER };
enum Medium { CHIP, ENCAPSULANT };
enum Fate { ESCAPED, ABS_CHIP, ABS_ENCAPSULANT, ABS_BASE, LOST, FATES };

typedef struct {
  enum Shape shape;
  double n;      /* encapsulant index */
  double alpha;  /* encapsulant absorption, 1/mm */
  double radius; /* dome or cylinder radius, mm */
  double height; /* cylinder height, mm */
} Package;

/* ---- Random numbers ---------------------------------------------------------------------------- */

/* xoshiro256** and its seeding by splitmix64: D. Blackman, S. Vigna, "Scrambled linear pseudorandom
   number generators", ACM Trans. Math. Softw. 47(4), 36 (2021). */
typedef struct { uint64_t s[4]; } Rng;

static uint64_t splitmix64(uint64_t *x) {
  uint64_t z = (*x += 0x9e3779b97f4a7c15ULL);
  z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9ULL;
  z = (z ^ (z >> 27)) * 0x94d049bb133111ebULL;
  return z ^ (z >> 31);
}

static inline uint64_t rotl(uint64_t x, int k) { return (x << k) | (x >> (64 - k)); }

static inline uint64_t next_u64(Rng *r) {
  uint64_t *s = r->s;
  const uint64_t result = rotl(s[1] * 5, 7) * 9;
  const uint64_t t = s[1] << 17;
  s[2] ^= s[0];
  s[3] ^= s[1];
  s[1] ^= s[2];
  s[0] ^= s[3];
  s[2] ^= t;
  s[3] = rotl(s[3], 45);
  return result;
}

/* Uniform in [0, 1) from the top 53 bits (Blackman & Vigna, as above) */
static inline double uniform(Rng *r) { return (double)(next_u64(r) >> 11) * 0x1.0p-53; }

/* ---- Optics ------------------------------------------------------------------------------------ */

/*
 * One dielectric interface, n1 -> n2, with unit normal (nx, ny, nz) facing the incident side
 * (cos i = -d.N > 0). Replaces the direction d; returns 1 if refracted into n2, 0 if reflected.
 */
static inline int interface_event(double d[3], double nx, double ny, double nz, double n1, double n2, Rng *rng) {
  double cosi = -(d[0] * nx + d[1] * ny + d[2] * nz);
  if (cosi < 0) cosi = 0; /* a roundoff graze from the wrong side counts as grazing */
  if (cosi > 1) cosi = 1;
  const double eta = n1 / n2;
  /* Snell's law: sin t = (n1/n2) sin i (Hecht, Optics, 5th ed., §4.4) */
  const double sin2t = eta * eta * (1 - cosi * cosi);
  int reflect;
  double cost = 0;
  if (sin2t >= 1) {
    reflect = 1; /* total internal reflection (Hecht, §4.7) */
  } else {
    cost = sqrt(1 - sin2t);
    /* Fresnel amplitude coefficients, s and p (Born & Wolf, Principles of Optics, 7th ed., §1.5.2) */
    const double rs = (n1 * cosi - n2 * cost) / (n1 * cosi + n2 * cost);
    const double rp = (n2 * cosi - n1 * cost) / (n2 * cosi + n1 * cost);
    /* Unpolarised light: R = (Rs + Rp)/2; reflect with probability R (Pharr et al., PBR 3rd ed., §14.1) */
    reflect = uniform(rng) < 0.5 * (rs * rs + rp * rp);
  }
  if (reflect) {
    /* Mirror reflection r = d + 2 cos i N (Pharr et al., PBR 3rd ed., §8.2.2) */
    d[0] += 2 * cosi * nx;
    d[1] += 2 * cosi * ny;
    d[2] += 2 * cosi * nz;
    return 0;
  }
  /* Vector Snell's law t = eta d + (eta cos i - cos t) N (Pharr et al., PBR 3rd ed., §8.2.3) */
  const double k = eta * cosi - cost;
  d[0] = eta * d[0] + k * nx;
  d[1] = eta * d[1] + k * ny;
  d[2] = eta * d[2] + k * nz;
  return 1;
}

/* ---- Geometry ---------------------------------------------------------------------------------- */

/* Exit from inside the chip box by the slab method (Kay & Kajiya, SIGGRAPH 1986): the nearest face
   ahead; writes the distance, returns the axis (0, 1, 2) and the sign of the outward normal. */
static inline int box_exit(const double p[3], const double d[3], double *t_out, int *sign) {
  const double lo[3] = {-CHIP_HALF, -CHIP_HALF, 0};
  const double hi[3] = {CHIP_HALF, CHIP_HALF, CHIP_H};
  double best = INFINITY;
  int axis = -1;
  for (int k = 0; k < 3; k++) {
    double t;
    int s;
    if (d[k] > 0) { t = (hi[k] - p[k]) / d[k]; s = 1; }
    else if (d[k] < 0) { t = (lo[k] - p[k]) / d[k]; s = -1; }
    else continue;
    if (t < best) { best = t; axis = k; *sign = s; }
  }
  *t_out = best < 0 ? 0 : best;
  return axis;
}

/* Entry into the chip box from outside (slab method, as above): the distance to the face entered, or
   INFINITY if the ray misses it or moves away; axis and outward-normal sign of that face. */
static inline double box_entry(const double p[3], const double d[3], int *axis, int *sign) {
  const double lo[3] = {-CHIP_HALF, -CHIP_HALF, 0};
  const double hi[3] = {CHIP_HALF, CHIP_HALF, CHIP_H};
  double tnear = -INFINITY, tfar = INFINITY;
  for (int k = 0; k < 3; k++) {
    if (d[k] == 0) {
      if (p[k] < lo[k] || p[k] > hi[k]) return INFINITY;
      continue;
    }
    const double inv = 1 / d[k];
    double t0 = (lo[k] - p[k]) * inv, t1 = (hi[k] - p[k]) * inv;
    int s = -1; /* entering through the low face when moving up the axis */
    if (t0 > t1) { const double tmp = t0; t0 = t1; t1 = tmp; s = 1; }
    if (t0 > tnear) { tnear = t0; *axis = k; *sign = s; }
    if (t1 < tfar) tfar = t1;
  }
  return tnear > 0 && tnear <= tfar ? tnear : INFINITY;
}

/* Far root of |p + t d|^2 = R^2 for a point inside the sphere or circle: the exit distance; the
   numerically stable form of the quadratic root (Press et al., Numerical Recipes, 3rd ed., §5.6).
   b = p.d, c = |p|^2 - R^2, a = |d|^2 (of the components used). */
static inline double far_root(double a, double b, double c) {
  double disc = b * b - a * c;
  if (disc < 0) disc = 0;
  const double q = sqrt(disc);
  return b <= 0 ? (q - b) / a : (c < 0 ? -c / (b + q) : 0);
}

/* ---- The ray loop ------------------------------------------------------------------------------ */

typedef struct {
  uint64_t fates[FATES];
  uint64_t events;
} Tally;

static void trace(const Package *pkg, uint64_t rays, Rng *rng, Tally *tally) {
  const int bare = pkg->shape == BARE;
  const double n_around = bare ? AIR_N : pkg->n;
  for (uint64_t i = 0; i < rays; i++) {
    double p[3], d[3];
    /* Emission: uniform over the footprint at z = EMIT_Z */
    p[0] = (2 * uniform(rng) - 1) * CHIP_HALF;
    p[1] = (2 * uniform(rng) - 1) * CHIP_HALF;
    p[2] = EMIT_Z;
    /* Isotropic direction (G. Marsaglia, Ann. Math. Stat. 43, 645 (1972)): (a, b) uniform in the unit
       disc, s = a^2 + b^2, then (2a sqrt(1 - s), 2b sqrt(1 - s), 1 - 2s) */
    double a, b, s;
    do {
      a = 2 * uniform(rng) - 1;
      b = 2 * uniform(rng) - 1;
      s = a * a + b * b;
    } while (s >= 1);
    const double k = 2 * sqrt(1 - s);
    d[0] = k * a;
    d[1] = k * b;
    d[2] = 1 - 2 * s;
    /* Beer-Lambert with one optical depth per ray, tau ~ Exp(1), spent as alpha t along each segment:
       the same as a fresh exponential free path per segment, as the exponential is memoryless (Pharr
       et al., PBR 3rd ed., §15.2) */
    double tau = -log(1 - uniform(rng));
    enum Medium medium = CHIP;
    int events = 0;
    enum Fate fate;
    for (;;) {
      if (events == MAX_EVENTS) { fate = LOST; break; }
      events++;
      if (medium == CHIP) {
        double t;
        int sign = 0;
        const int axis = box_exit(p, d, &t, &sign);
        if (axis < 0) { fate = LOST; break; }
        const double depth = CHIP_ALPHA * t;
        if (depth >= tau) { fate = ABS_CHIP; break; }
        tau -= depth;
        p[0] += t * d[0];
        p[1] += t * d[1];
        p[2] += t * d[2];
        p[axis] = sign > 0 ? (axis == 2 ? CHIP_H : CHIP_HALF) : (axis == 2 ? 0 : -CHIP_HALF); /* on the face exactly */
        if (axis == 2 && sign < 0) {
          /* The base under the chip: specular mirror */
          if (uniform(rng) < BASE_R) { d[2] = -d[2]; continue; }
          fate = ABS_BASE;
          break;
        }
        /* A chip face, its outward normal sign * e_axis; the normal facing the ray is its opposite */
        double nrm[3] = {0, 0, 0};
        nrm[axis] = -sign;
        if (interface_event(d, nrm[0], nrm[1], nrm[2], CHIP_N, n_around, rng)) {
          if (bare) { fate = ESCAPED; break; }
          medium = ENCAPSULANT;
        }
        continue;
      }
      /* Encapsulant: the nearest of the chip (from outside), the base plane and the outer surface */
      int chip_axis = 0, chip_sign = 0;
      const double t_chip = box_entry(p, d, &chip_axis, &chip_sign);
      const double t_base = d[2] < 0 ? -p[2] / d[2] : INFINITY;
      double t_outer, t_top = INFINITY;
      if (pkg->shape == DOME) {
        t_outer = far_root(1, p[0] * d[0] + p[1] * d[1] + p[2] * d[2], p[0] * p[0] + p[1] * p[1] + p[2] * p[2] - pkg->radius * pkg->radius);
      } else {
        const double axy = d[0] * d[0] + d[1] * d[1];
        t_outer = axy > 0 ? far_root(axy, p[0] * d[0] + p[1] * d[1], p[0] * p[0] + p[1] * p[1] - pkg->radius * pkg->radius) : INFINITY;
        if (d[2] > 0) t_top = (pkg->height - p[2]) / d[2];
      }
      /* which: 0 chip, 1 base, 2 outer (dome or cylinder wall), 3 cylinder top */
      int which = 2;
      double t = t_outer;
      if (t_top < t) { t = t_top; which = 3; }
      if (t_base < t) { t = t_base; which = 1; }
      if (t_chip < t) { t = t_chip; which = 0; }
      if (!(t < INFINITY)) { fate = LOST; break; }
      if (t < 0) t = 0;
      const double depth = pkg->alpha * t;
      if (depth >= tau) { fate = ABS_ENCAPSULANT; break; }
      tau -= depth;
      p[0] += t * d[0];
      p[1] += t * d[1];
      p[2] += t * d[2];
      if (which == 0) {
        /* Into the chip through the face entered; its outward normal faces the ray */
        p[chip_axis] = chip_sign > 0 ? (chip_axis == 2 ? CHIP_H : CHIP_HALF) : (chip_axis == 2 ? 0 : -CHIP_HALF);
        double nrm[3] = {0, 0, 0};
        nrm[chip_axis] = chip_sign;
        if (interface_event(d, nrm[0], nrm[1], nrm[2], pkg->n, CHIP_N, rng)) medium = CHIP;
        continue;
      }
      if (which == 1) {
        p[2] = 0;
        if (uniform(rng) < BASE_R) { d[2] = -d[2]; continue; }
        fate = ABS_BASE;
        break;
      }
      double nx, ny, nz;
      if (which == 3) {
        nx = 0; ny = 0; nz = -1;
      } else if (pkg->shape == DOME) {
        const double r = sqrt(p[0] * p[0] + p[1] * p[1] + p[2] * p[2]);
        nx = -p[0] / r; ny = -p[1] / r; nz = -p[2] / r;
      } else {
        const double r = sqrt(p[0] * p[0] + p[1] * p[1]);
        nx = -p[0] / r; ny = -p[1] / r; nz = 0;
      }
      if (interface_event(d, nx, ny, nz, pkg->n, AIR_N, rng)) { fate = ESCAPED; break; }
    }
    tally->fates[fate]++;
    tally->events += (uint64_t)events;
  }
}

/* ---- Command line ------------------------------------------------------------------------------ */

static int fail(const char *message) {
  fprintf(stderr, "dome-trace: %s\n", message);
  return 1;
}

int main(int argc, char **argv) {
  if (argc < 3 || argc > 4) return fail("usage: dome-trace RAYS SEED [dome|bare|cylinder]");
  char *end;
  const double rays_in = strtod(argv[1], &end);
  if (*end != 0 || !(rays_in >= 1 && rays_in <= 1e10) || rays_in != floor(rays_in)) return fail("RAYS must be an integer in [1, 1e10]");
  const double seed_in = strtod(argv[2], &end);
  if (*end != 0 || !(seed_in >= 0 && seed_in <= 4294967295.0) || seed_in != floor(seed_in)) return fail("SEED must be an integer in [0, 4294967295]");
  Package pkg = {DOME, 1.41, 0.001, 2.5, 2.5};
  const char *name = argc == 4 ? argv[3] : "dome";
  if (strcmp(name, "dome") == 0) pkg.shape = DOME;
  else if (strcmp(name, "cylinder") == 0) { pkg.shape = CYLINDER; pkg.height = 1; }
  else if (strcmp(name, "bare") == 0) { pkg.shape = BARE; pkg.n = AIR_N; pkg.alpha = 0; }
  else return fail("package must be one of dome, bare, cylinder");

  const uint64_t rays = (uint64_t)rays_in;
  uint64_t x = (uint64_t)seed_in;
  Rng rng;
  for (int k = 0; k < 4; k++) rng.s[k] = splitmix64(&x);
  Tally tally;
  memset(&tally, 0, sizeof tally);

  const clock_t c0 = clock();
  trace(&pkg, rays, &rng, &tally);
  const double seconds = (double)(clock() - c0) / CLOCKS_PER_SEC;

  const double n = (double)rays;
  const double p = tally.fates[ESCAPED] / n;
  printf("{\"package\":\"%s\",\"rays\":%llu,\"seconds\":%.6f,\"extraction\":%.6f,\"stderr\":%.6f,"
         "\"absorbedChip\":%.6f,\"absorbedEncapsulant\":%.6f,\"absorbedBase\":%.6f,\"lost\":%.6f,\"eventsPerRay\":%.4f}\n",
         name, (unsigned long long)rays, seconds, p, sqrt(p * (1 - p) / n), tally.fates[ABS_CHIP] / n,
         tally.fates[ABS_ENCAPSULANT] / n, tally.fates[ABS_BASE] / n, tally.fates[LOST] / n, tally.events / n);
  return 0;
}

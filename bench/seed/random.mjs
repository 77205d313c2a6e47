// A seeded generator (mulberry32), so a given set of parameters always builds the same data.
export function rng(seed) {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    next,
    int: (min, max) => min + Math.floor(next() * (max - min + 1)),
    pick: (list) => list[Math.floor(next() * list.length)],
    chance: (p) => next() < p,
    /** Roughly normal (sum of three uniforms), mean `mean`, spread about `sd`. */
    normal: (mean, sd) => mean + sd * ((next() + next() + next() - 1.5) * 2),
  };
}

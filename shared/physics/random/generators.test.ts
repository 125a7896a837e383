import { describe, expect, it } from 'vitest';
import { jumpXoshiro128State } from './jump-xoshiro128-state';
import { nextSplitMix64 } from './next-split-mix64';
import { nextXoshiro128StarStar } from './next-xoshiro128-star-star';
import { seedXoshiro128State } from './seed-xoshiro128-state';

// Reference vectors, see tests/fixtures/spread-sources.md:
// [V1] SplitMix64 outputs for seed 1234567 and seed 0 — Vigna's splitmix64.c reference code, as
//      published on Rosetta Code "Pseudo-random numbers/Splitmix64"; Steele, Lea & Flood (2014).
// [V2] xoshiro128** states, outputs and jump states generated with the authors' C reference
//      implementation (xoshiro128starstar.c, Blackman & Vigna 2021), as listed in the public test
//      data of the edorfaus/xoshiro-6502 port (test-rom/testdata.asm).
// [V3] First output from state (1, 2, 3, 4) worked by hand from the algorithm in Blackman & Vigna
//      (2021) ACM TOMS 47(4):36: rotl(2·5, 7)·9 = 1280·9 = 11520; the second is rotl(0·5, 7)·9 = 0.

const SEED_VECTOR_STATE = [0x964d4a0c, 0xd40ab895, 0xad7fdecb, 0x3006f0f0];

describe('nextSplitMix64', () => {
  it('matches the reference outputs for seed 1234567 [V1]', () => {
    let state = 1_234_567n;
    const outputs: bigint[] = [];
    for (let i = 0; i < 5; i += 1) {
      const step = nextSplitMix64(state);
      outputs.push(step.value);
      state = step.state;
    }
    expect(outputs).toEqual([
      6457827717110365317n,
      3203168211198807973n,
      9817491932198370423n,
      4593380528125082431n,
      16408922859458223821n,
    ]);
  });

  it('matches the reference outputs for seed 0 [V1]', () => {
    const first = nextSplitMix64(0n);
    expect(first.value).toBe(0xe220a8397b1dcdafn);
    expect(nextSplitMix64(first.state).value).toBe(0x6e789e6aa1b965f4n);
  });

  it('rejects a state outside 64 bits', () => {
    expect(() => nextSplitMix64(-1n)).toThrow(/state must be in \[0, 2\^64\)/);
    expect(() => nextSplitMix64(1n << 64n)).toThrow(RangeError);
  });
});

describe('nextXoshiro128StarStar', () => {
  it('gives 11520 then 0 from the state (1, 2, 3, 4) [V3]', () => {
    const state = new Uint32Array([1, 2, 3, 4]);
    expect(nextXoshiro128StarStar(state)).toBe(11520);
    expect(nextXoshiro128StarStar(state)).toBe(0);
  });

  it('reproduces the reference outputs and states of the C implementation [V2]', () => {
    const state = new Uint32Array(SEED_VECTOR_STATE);
    const expected = [
      { out: 0xf1391922, state: [0x72410269, 0xef382c52, 0x2e43bec7, 0x62432f20] },
      { out: 0x6fe53806, state: [0xff3a011b, 0xb33a90fc, 0x2c5a18ae, 0xd81b946b] },
      { out: 0xa5be2840, state: [0x941b058c, 0x605a8949, 0xa641e1b5, 0x0824bb59] },
      { out: 0xf510ee70, state: [0xfc65379c, 0x52006d70, 0x87487639, 0xf1908343] },
    ];
    for (const step of expected) {
      expect(nextXoshiro128StarStar(state)).toBe(step.out);
      expect(Array.from(state)).toEqual(step.state);
    }
  });
});

describe('jumpXoshiro128State', () => {
  it('reproduces four successive reference jumps of the C implementation [V2]', () => {
    const state = new Uint32Array(SEED_VECTOR_STATE);
    const expected = [
      [0x2a6dd50d, 0x01177499, 0xd7eb7d01, 0xddc48284],
      [0x5efdee5a, 0x3aa13c3d, 0x8cc77479, 0xeb10a58f],
      [0x2ca76937, 0x14c9006e, 0x34097ea8, 0xfdd876ea],
      [0x01b72c9a, 0xa78174aa, 0x1cc317be, 0x888235b2],
    ];
    for (const row of expected) expect(Array.from(jumpXoshiro128State(state))).toEqual(row);
  });

  it('commutes with a single step, as any power of a linear map must', () => {
    const a = new Uint32Array(SEED_VECTOR_STATE);
    const b = new Uint32Array(SEED_VECTOR_STATE);
    jumpXoshiro128State(a);
    nextXoshiro128StarStar(a);
    nextXoshiro128StarStar(b);
    jumpXoshiro128State(b);
    expect(Array.from(a)).toEqual(Array.from(b));
  });
});

describe('seedXoshiro128State', () => {
  it('fills the state with the two SplitMix64 outputs of the seed, low word first [V1]', () => {
    // 0xe220a8397b1dcdaf and 0x6e789e6aa1b965f4 split into 32-bit halves.
    expect(Array.from(seedXoshiro128State(0))).toEqual([0x7b1dcdaf, 0xe220a839, 0xa1b965f4, 0x6e789e6a]);
  });

  it('gives the same stream for the same seed and a different one for another seed', () => {
    const draw = (seed: number) => {
      const state = seedXoshiro128State(seed);
      return Array.from({ length: 50 }, () => nextXoshiro128StarStar(state));
    };
    expect(draw(42)).toEqual(draw(42));
    expect(draw(42)).not.toEqual(draw(43));
  });

  it('rejects a negative, fractional or unsafe seed, naming the field', () => {
    expect(() => seedXoshiro128State(-1)).toThrow(/seed must be a whole number/);
    expect(() => seedXoshiro128State(1.5)).toThrow(RangeError);
    expect(() => seedXoshiro128State(2 ** 53)).toThrow(RangeError);
    expect(() => seedXoshiro128State(Number.NaN)).toThrow(RangeError);
  });
});

import { describe, expect, it } from 'vitest';
import { deflateRawSync, inflateRawSync } from 'node:zlib';
import { base64ToBytes, bytesToBase64, decodeVectors, encodeVectors } from '@/app/lib/runs/vectorCodec';
import { tagsTextField } from '@/app/lib/runs/runDetailsForm';
import { hillFormula } from '@/solver/runFile/describe';
import { compareResults } from '@/components/runs/reproduceVerdict';
import type { RunResult } from '@/solver/run/result';

describe('the stored CI-vector format', () => {
  it('is raw deflate (RFC 1951) of little-endian IEEE-754 doubles, as zlib reads it', () => {
    const encoded = encodeVectors([[1, -0.5], [0.25, 2]]);
    // Node's zlib (a reference implementation of RFC 1951) inflates what fflate wrote.
    const raw = inflateRawSync(encoded.bytes);
    // IEEE 754-2008 binary64: 1.0 is 0x3FF0000000000000, stored low byte first.
    expect([...raw.subarray(0, 8)]).toEqual([0, 0, 0, 0, 0, 0, 0xf0, 0x3f]);
    expect(raw.readDoubleLE(8)).toBe(-0.5);
    expect(raw.readDoubleLE(16)).toBe(0.25);
  });

  it('reads back what zlib deflated, root after root, exactly', () => {
    const values = Float64Array.from([0.9, -0.1, 0.3, 1e-300, -2.5e10, 0]);
    const bytes = deflateRawSync(Buffer.from(values.buffer));
    const [a, b] = decodeVectors(new Uint8Array(bytes), 2, 3);
    expect([...a, ...b]).toEqual([...values]);
  });

  it('refuses data that holds more or fewer values than stated, and non-finite values', () => {
    const encoded = encodeVectors([[1, 2, 3, 4]]);
    expect(() => decodeVectors(encoded.bytes, 1, 3)).toThrow(/more than/);
    expect(() => decodeVectors(encoded.bytes, 1, 5)).toThrow(/not the 40 bytes/);
    expect(() => decodeVectors(encodeVectors([[Number.POSITIVE_INFINITY]]).bytes, 1, 1)).toThrow(/not a finite number/);
    expect(() => decodeVectors(new Uint8Array([1, 2, 3]), 1, 1)).toThrow();
  });

  it('base64 follows RFC 4648 §10 test vectors and refuses other text', () => {
    const enc = (s: string) => bytesToBase64(new TextEncoder().encode(s));
    expect(['', 'f', 'fo', 'foo', 'foob', 'fooba', 'foobar'].map(enc)).toEqual(['', 'Zg==', 'Zm8=', 'Zm9v', 'Zm9vYg==', 'Zm9vYmE=', 'Zm9vYmFy']);
    expect(new TextDecoder().decode(base64ToBytes('Zm9vYmFy'))).toBe('foobar');
    for (const bad of ['Zm9', 'Zm9v!', 'Zg=a', '====']) expect(() => base64ToBytes(bad)).toThrow(/not base64/);
  });
});

describe('labels and tags', () => {
  it('writes formulas in Hill order (Hill, J. Am. Chem. Soc. 22, 478 (1900))', () => {
    expect(hillFormula(['H', 'O', 'H'])).toBe('H2O');
    expect(hillFormula(['H', 'C', 'H', 'H', 'H'])).toBe('CH4');
    expect(hillFormula(['O', 'C', 'Li'])).toBe('CLiO');
    expect(hillFormula(['H', 'He'], 1)).toBe('HHe+');
    expect(hillFormula(['H', 'H', 'H'], 1)).toBe('H3+');
    expect(hillFormula(['Li', 'H'], -2)).toBe('HLi2−');
  });

  it('splits the tag line, lower-cases, drops duplicates, and names the tag that breaks the rules', () => {
    expect(tagsTextField.parse(' Ladder, ring ,ladder,, ')).toEqual(['ladder', 'ring']);
    const bad = tagsTextField.safeParse('fine, #bad');
    expect(bad.success).toBe(false);
    expect(bad.error!.issues[0].message).toMatch(/^Tag 2: /);
    expect(bad.error!.issues[0].path).toEqual([]);
  });
});

describe('the reproduce verdict', () => {
  const stored = { energies: { reference: -1.1167, roots: [-1.1373, -0.5], plusQ: null } } as unknown as RunResult;
  it('says reproduced within 1e-8 and differs beyond, per number', () => {
    const close = { energies: { reference: -1.1167 + 5e-9, roots: [-1.1373, -0.5 + 2e-8], plusQ: null } } as unknown as RunResult;
    const lines = compareResults(stored, close);
    expect(lines.map((l) => l.verdict)).toEqual(['reproduced', 'reproduced', 'differs']);
    const fewer = { energies: { reference: -1.1167, roots: [-1.1373], plusQ: null } } as unknown as RunResult;
    expect(compareResults(stored, fewer).at(-1)).toMatchObject({ recomputed: null, verdict: 'differs' });
  });
});

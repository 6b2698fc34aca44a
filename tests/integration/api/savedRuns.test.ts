import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHash, randomBytes } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { parseRunFile } from '@/solver/runFile/parse';
import { runCalculation } from '@/solver/run';
import type { RunResult } from '@/solver/run/result';
import { MAX_SAVE_BODY_BYTES, MAX_VECTOR_COMPRESSED_BYTES } from '@/app/lib/runs/savedRunLimits';
import { bytesToBase64, decodeVectors, encodeVectors, VECTOR_ENCODING } from '@/app/lib/runs/vectorCodec';
import { addMember, cleanUpUsers, closeSequelize, getModels, getSequelize, makeWorkspace, signUpFresh, type TestUser } from './helpers';

// H2 at R = 1.4 bohr in STO-3G, the worked example of Szabo & Ostlund, Modern Quantum
// Chemistry: RHF −1.1167 Eh (§3.5.2) plus the FCI correlation energy −0.0206 Eh (§4.2).
const h2RunFile = {
  format: 'ketbook-run/1',
  title: 'H2 FCI, saved-run test',
  system: { type: 'molecule', units: 'bohr', atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], basis: 'STO-3G' },
  reference: 'RHF',
  ci: { space: 'FCI', roots: 2 },
};

let owner: TestUser;
let editor: TestUser;
let viewer: TestUser;
let outsider: TestUser;
let workspace: { id: number; slug: string };
let result: RunResult;
let vectors: number[][];

const runsPath = () => `/api/workspaces/${workspace.slug}/runs`;
const runCount = () => getModels().Run.count({ where: { workspaceId: workspace.id } });

function savable(res: RunResult): RunResult {
  const { vectors: _omit, ...ci } = res.ci!;
  return { ...res, ci };
}

function saveBody(overrides: Record<string, unknown> = {}) {
  const encoded = encodeVectors(vectors);
  return {
    title: 'H2 at 1.4 bohr',
    tags: ['Szabo check', 'h2'],
    runFile: h2RunFile,
    result: savable(result),
    vector: { encoding: VECTOR_ENCODING, roots: encoded.roots, length: encoded.length, data: bytesToBase64(encoded.bytes) },
    ...overrides,
  };
}

beforeAll(async () => {
  [owner, editor, viewer, outsider] = await Promise.all(['runowner', 'runeditor', 'runviewer', 'runoutsider'].map((l) => signUpFresh(l)));
  workspace = await makeWorkspace(owner, 'runs');
  await addMember(workspace.id, editor, 'editor');
  await addMember(workspace.id, viewer, 'viewer');
  result = await runCalculation(parseRunFile(h2RunFile), { includeVectors: true });
  vectors = result.ci!.vectors!;
});

afterAll(async () => {
  await cleanUpUsers([owner, editor, viewer, outsider]);
  await closeSequelize();
});

describe('saving a run', () => {
  it('an editor saves run file, result and CI vectors; reading back gives every number bit for bit', async () => {
    const before = await runCount();
    const reply = await editor.client.post(runsPath(), saveBody());
    expect(reply.status).toBe(201);
    expect(await runCount()).toBe(before + 1);
    const id: string = reply.body.run.id;
    expect(id).toMatch(/^[A-Za-z0-9_-]{16}$/);
    expect(reply.body.url).toBe(`/workspaces/${workspace.slug}/runs/${id}`);
    // Labels derived from the run file (Hill formula; common practice, no source).
    expect(reply.body.run).toMatchObject({ system: 'H2', basis: 'STO-3G', method: 'RHF · FCI, 2 roots', tags: ['h2', 'szabo check'], hasVector: true });

    const got = await viewer.client.get(`${runsPath()}/${id}`);
    expect(got.status).toBe(200);
    expect(got.body.run.runFile).toEqual(h2RunFile);
    // JSON carries doubles exactly (shortest round-trip printing, ECMA-262 Number::toString).
    expect(got.body.run.result.energies.roots).toEqual(result.energies.roots);
    expect(got.body.run.result.orbitals ?? null).toEqual(result.orbitals ?? null);
    expect(got.body.run.lowestEnergy).toBe(result.energies.roots[0]);
    // Szabo & Ostlund: −1.1167 − 0.0206 = −1.1373 Eh, to the book's printed digits.
    expect(Math.abs(got.body.run.lowestEnergy - -1.1373)).toBeLessThan(1e-4);

    const blob = await viewer.client.bytes(`${runsPath()}/${id}/vector`);
    expect(blob.status).toBe(200);
    expect(blob.headers.get('x-ketbook-encoding')).toBe(VECTOR_ENCODING);
    const back = decodeVectors(blob.bytes, Number(blob.headers.get('x-ketbook-roots')), Number(blob.headers.get('x-ketbook-length')));
    expect(back.map((v) => Array.from(v))).toEqual(vectors);
    // A CI vector from a symmetric eigensolver is normalised (common practice, no source).
    expect(back[0].reduce((s, c) => s + c * c, 0)).toBeCloseTo(1, 12);
  });

  it('a viewer may read but not save (403), and nothing is written', async () => {
    const before = await runCount();
    const reply = await viewer.client.post(runsPath(), saveBody());
    expect(reply.status).toBe(403);
    expect(await runCount()).toBe(before);
  });

  it('someone outside the workspace does not learn it exists (404)', async () => {
    expect((await outsider.client.get(runsPath())).status).toBe(404);
    expect((await outsider.client.post(runsPath(), saveBody())).status).toBe(404);
  });

  it('a run file the run-file schema refuses is a 422 naming the field, and nothing is written', async () => {
    const before = await runCount();
    const bad = { ...h2RunFile, system: { ...h2RunFile.system, multiplicity: 3 } };
    const reply = await editor.client.post(runsPath(), saveBody({ runFile: bad }));
    expect(reply.status).toBe(422);
    expect(reply.body.error.code).toBe('unprocessable:run-file');
    expect(Object.keys(reply.body.error.fields)).toContain('runFile.reference');
    expect(await runCount()).toBe(before);
  });

  it('a result that was not computed from the run file (hash differs) is refused, and nothing is written', async () => {
    const before = await runCount();
    const other = { ...h2RunFile, system: { ...h2RunFile.system, atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.5]] } };
    const reply = await editor.client.post(runsPath(), saveBody({ runFile: other }));
    expect(reply.status).toBe(422);
    expect(reply.body.error.code).toBe('unprocessable:result-mismatch');
    expect(await runCount()).toBe(before);
  });

  it('vector data of the wrong size, not deflate, or not base64 is refused beside the vector field', async () => {
    const before = await runCount();
    const encoded = encodeVectors(vectors);
    const cases = [
      { encoding: VECTOR_ENCODING, roots: 2, length: encoded.length + 1, data: bytesToBase64(encoded.bytes) },
      { encoding: VECTOR_ENCODING, roots: 1, length: encoded.length, data: bytesToBase64(encoded.bytes) },
      { encoding: VECTOR_ENCODING, roots: 2, length: encoded.length, data: bytesToBase64(randomBytes(40)) },
      { encoding: VECTOR_ENCODING, roots: 2, length: encoded.length, data: 'not base64!' },
    ];
    for (const vector of cases) {
      const reply = await editor.client.post(runsPath(), saveBody({ vector }));
      expect(reply.status, JSON.stringify(vector).slice(0, 80)).toBe(422);
      expect(reply.body.error.fields.vector).toBeDefined();
    }
    // A vector value that is not finite.
    const nan = encodeVectors([[Number.NaN, 0, 0, 0], [0, 1, 0, 0]]);
    const reply = await editor.client.post(runsPath(), saveBody({ vector: { encoding: VECTOR_ENCODING, roots: 2, length: 4, data: bytesToBase64(nan.bytes) } }));
    expect(reply.status).toBe(422);
    expect(await runCount()).toBe(before);
  });
});

describe('the size limit, end to end through the route handler and MariaDB', () => {
  // The result is the real H2 result with its determinant count raised to the synthetic vector's
  // length: this checks transport and storage at the limit, not chemistry.
  function bodyWithStoredVector(values: number) {
    const synthetic = new Float64Array(values);
    const random = randomBytes(values * 8);
    // Random bits, kept finite: force the exponent away from all-ones (IEEE 754 NaN/Inf).
    for (let i = 7; i < random.length; i += 8) random[i] &= 0xbf;
    synthetic.set(new Float64Array(random.buffer, random.byteOffset, values));
    const encoded = encodeVectors([synthetic], 0);
    return {
      bytes: encoded.bytes,
      body: saveBody({
        result: { ...savable(result), determinantCount: values },
        vector: { encoding: VECTOR_ENCODING, roots: 1, length: values, data: bytesToBase64(encoded.bytes) },
      }),
    };
  }

  /** The largest vector whose stored (level-0) deflate form fits the limit. */
  function valuesAtLimit(): number {
    let lo = 1;
    let hi = Math.floor(MAX_VECTOR_COMPRESSED_BYTES / 8);
    const size = (n: number) => encodeVectors([new Float64Array(n)], 0).bytes.byteLength;
    while (lo < hi) {
      const mid = Math.ceil((lo + hi) / 2);
      if (size(mid) <= MAX_VECTOR_COMPRESSED_BYTES) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  }

  it("MariaDB's max_allowed_packet is above the largest INSERT the limits allow", async () => {
    const [row] = await getSequelize().query<{ packet: number }>('SELECT @@max_allowed_packet AS packet', { type: QueryTypes.SELECT });
    expect(Number(row.packet)).toBeGreaterThan(MAX_SAVE_BODY_BYTES);
  });

  it('a vector exactly at the compressed limit is stored and read back byte for byte', async () => {
    const values = valuesAtLimit();
    const { bytes, body } = bodyWithStoredVector(values);
    expect(bytes.byteLength).toBeLessThanOrEqual(MAX_VECTOR_COMPRESSED_BYTES);
    expect(bytes.byteLength).toBeGreaterThan(MAX_VECTOR_COMPRESSED_BYTES - 64);
    const reply = await editor.client.postOnNewConnection(runsPath(), body);
    expect(reply.status, JSON.stringify(reply.body).slice(0, 200)).toBe(201);
    const { Run } = getModels();
    const row = await Run.findOne({ where: { publicId: reply.body.run.id } });
    expect(row!.ciVectorBytes).toBe(bytes.byteLength);
    expect(createHash('sha256').update(row!.ciVector!).digest('hex')).toBe(createHash('sha256').update(bytes).digest('hex'));
  });

  it('one block over the limit is a 413 and writes nothing', async () => {
    const before = await runCount();
    const { bytes, body } = bodyWithStoredVector(valuesAtLimit() + 8192);
    expect(bytes.byteLength).toBeGreaterThan(MAX_VECTOR_COMPRESSED_BYTES);
    const reply = await editor.client.postOnNewConnection(runsPath(), body);
    expect(reply.status).toBe(413);
    expect(reply.body.error.message).toMatch(/leading determinants/);
    expect(await runCount()).toBe(before);
  });

  it('a body over the route limit is refused before it is parsed (413), and writes nothing', async () => {
    const before = await runCount();
    const padding = 'x'.repeat(MAX_SAVE_BODY_BYTES + 1);
    const reply = await editor.client.raw('POST', runsPath(), {
      body: JSON.stringify({ title: padding }),
      headers: { 'content-type': 'application/json' },
    });
    expect(reply.status).toBe(413);
    expect(await runCount()).toBe(before);
  });
});

describe('the run table, rename, tag and delete', () => {
  let ids: string[] = [];

  beforeAll(async () => {
    ids = [];
    for (const [title, tags] of [
      ['alpha chain', ['ladder']],
      ['beta ring', ['ladder', 'ring']],
      ['gamma dimer', []],
    ] as const) {
      const reply = await owner.client.post(runsPath(), saveBody({ title, tags: [...tags], vector: undefined }));
      expect(reply.status).toBe(201);
      expect(reply.body.run.hasVector).toBe(false);
      ids.push(reply.body.run.id);
    }
  });

  it('searches titles, filters by tag, sorts both ways and pages', async () => {
    const search = await viewer.client.get(`${runsPath()}?q=ring`);
    expect(search.status).toBe(200);
    expect(search.body.runs.map((r: { title: string }) => r.title)).toEqual(['beta ring']);

    const tagged = await viewer.client.get(`${runsPath()}?tag=ladder&sort=title&dir=asc`);
    expect(tagged.body.runs.map((r: { title: string }) => r.title)).toEqual(['alpha chain', 'beta ring']);
    expect(tagged.body.tags).toEqual(expect.arrayContaining(['ladder', 'ring']));

    const desc = await viewer.client.get(`${runsPath()}?tag=ladder&sort=title&dir=desc`);
    expect(desc.body.runs.map((r: { title: string }) => r.title)).toEqual(['beta ring', 'alpha chain']);

    const all = await viewer.client.get(`${runsPath()}?pageSize=2&page=1&sort=created&dir=asc`);
    expect(all.body.runs).toHaveLength(2);
    const total: number = all.body.total;
    const lastPage = Math.ceil(total / 2);
    const last = await viewer.client.get(`${runsPath()}?pageSize=2&page=${lastPage}&sort=created&dir=asc`);
    expect(last.body.runs.at(-1).id).toBe(ids[2]);

    // A LIKE wildcard in the search is taken literally.
    expect((await viewer.client.get(`${runsPath()}?q=%25`)).body.runs).toHaveLength(0);
    const bad = await viewer.client.get(`${runsPath()}?sort=sideways`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.sort).toBeDefined();
  });

  it('an editor renames and retags; a viewer may do neither', async () => {
    const path = `${runsPath()}/${ids[0]}`;
    expect((await viewer.client.patch(path, { title: 'nope' })).status).toBe(403);
    const renamed = await editor.client.patch(path, { title: 'alpha chain (renamed)', tags: ['Final', 'final', 'ladder'] });
    expect(renamed.status).toBe(200);
    expect(renamed.body.run).toMatchObject({ title: 'alpha chain (renamed)', tags: ['final', 'ladder'] });
    const badTag = await editor.client.patch(path, { tags: ['#no'] });
    expect(badTag.status).toBe(400);
    expect(badTag.body.error.fields['tags.0']).toBeDefined();
    const again = await viewer.client.get(path);
    expect(again.body.run.tags).toEqual(['final', 'ladder']);
  });

  it('delete: viewers cannot (403); an editor can, and the tags go with it', async () => {
    const path = `${runsPath()}/${ids[1]}`;
    expect((await viewer.client.delete(path)).status).toBe(403);
    expect((await editor.client.delete(path)).status).toBe(200);
    expect((await viewer.client.get(path)).status).toBe(404);
    const { Run, RunTag } = getModels();
    expect(await Run.count({ where: { publicId: ids[1] } })).toBe(0);
    expect(await RunTag.count({ where: { tag: 'ring' } })).toBe(0);
  });

  it('a malformed run address is simply not found', async () => {
    expect((await viewer.client.get(`${runsPath()}/short`)).status).toBe(404);
    expect((await viewer.client.get(`${runsPath()}/${'A'.repeat(16)}`)).status).toBe(404);
  });
});


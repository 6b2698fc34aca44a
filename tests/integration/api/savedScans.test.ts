import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { parseRunFile } from '@/solver/runFile/parse';
import { planScan, runScanPoint, assembleScan } from '@/solver/scan';
import type { PointResult } from '@/solver/scan';
import { addMember, cleanUpUsers, closeSequelize, getModels, makeWorkspace, signUpFresh, type TestUser } from './helpers';

// A short H2 stretch in STO-3G with RHF, UHF and full CI (our own example file, shortened here).
const scanFile = (() => {
  const file = JSON.parse(readFileSync(path.resolve(__dirname, '../../solver/scan/h2-scan.json'), 'utf8'));
  return { ...file, scan: { ...file.scan, from: 1.0, to: 2.0, step: 0.5 }, methods: [{ reference: 'RHF' }, { reference: 'UHF' }, { space: 'FCI' }] };
})();

let owner: TestUser;
let editor: TestUser;
let viewer: TestUser;
let workspace: { id: number; slug: string };
let points: PointResult[];

const scansPath = () => `/api/workspaces/${workspace.slug}/scans`;
const scanCount = () => getModels().Scan.count({ where: { workspaceId: workspace.id } });

beforeAll(async () => {
  [owner, editor, viewer] = await Promise.all(['scanowner', 'scaneditor', 'scanviewer'].map((l) => signUpFresh(l)));
  workspace = await makeWorkspace(owner, 'scans');
  await addMember(workspace.id, editor, 'editor');
  await addMember(workspace.id, viewer, 'viewer');
  const plan = planScan(parseRunFile(scanFile));
  points = [];
  for (const pointRunFile of plan.pointRunFiles) points.push(await runScanPoint(pointRunFile, plan.methods));
});

afterAll(async () => {
  await cleanUpUsers([owner, editor, viewer]);
  await closeSequelize();
});

describe('saved scans', () => {
  it('an editor starts a scan; points saved one by one survive and can be resumed; the summary re-plots without recomputing', async () => {
    const created = await editor.client.post(scansPath(), { title: 'H2 stretch, three methods', scanFile });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const id: string = created.body.scan.id;
    // from 1.0 to 2.0 bohr in steps of 0.5: three points (arithmetic).
    expect(created.body.scan).toMatchObject({ pointCount: 3, pointsDone: 0, status: 'running', system: 'H2', methods: expect.stringContaining('FCI') });
    expect(created.body.url).toBe(`/workspaces/${workspace.slug}/scans/${id}`);

    // Points 0 and 2 finish; the scan is interrupted; reopening shows exactly what is left.
    expect((await editor.client.json('PUT', `${scansPath()}/${id}/points/0`, { result: points[0] })).body.pointsDone).toBe(1);
    expect((await editor.client.json('PUT', `${scansPath()}/${id}/points/2`, { result: points[2] })).body.pointsDone).toBe(2);
    const reopened = await viewer.client.get(`${scansPath()}/${id}`);
    expect(reopened.status).toBe(200);
    expect(reopened.body.scan.points.map((p: { index: number }) => p.index)).toEqual([0, 2]);
    expect(reopened.body.scan.points[1].result).toEqual(points[2]);
    expect(reopened.body.scan.scanFile).toEqual(scanFile);

    // Saving a point again replaces it rather than adding a row.
    expect((await editor.client.json('PUT', `${scansPath()}/${id}/points/2`, { result: points[2] })).body.pointsDone).toBe(2);
    expect((await editor.client.json('PUT', `${scansPath()}/${id}/points/1`, { result: points[1] })).body.pointsDone).toBe(3);

    const plan = planScan(parseRunFile(scanFile));
    const summary = await assembleScan(plan, points);
    const done = await editor.client.patch(`${scansPath()}/${id}`, { status: 'done', summary });
    expect(done.status).toBe(200);
    expect(done.body.scan).toMatchObject({ status: 'done', pointsDone: 3 });
    const stored = await viewer.client.get(`${scansPath()}/${id}`);
    expect(stored.body.scan.summary).toEqual(JSON.parse(JSON.stringify(summary)));
    // Variational order at every point (common practice, no source): FCI ≤ UHF ≤ RHF.
    const energies = (k: number) => stored.body.scan.points.map((p: { result: PointResult }) => p.result.methods[k].energies[0]);
    energies(2).forEach((fci: number, i: number) => {
      expect(fci).toBeLessThanOrEqual(energies(1)[i] + 1e-10);
      expect(energies(1)[i]).toBeLessThanOrEqual(energies(0)[i] + 1e-10);
    });

    const listed = await viewer.client.get(`${scansPath()}?q=stretch`);
    expect(listed.body.scans.map((s: { id: string }) => s.id)).toContain(id);
  });

  it('a scan file the schema or the planner refuses is a 422 naming the field, and nothing is written', async () => {
    const before = await scanCount();
    const noScan = { ...scanFile, scan: undefined, methods: undefined };
    const a = await editor.client.post(scansPath(), { title: 'no scan', scanFile: noScan });
    expect(a.status).toBe(422);
    expect(Object.keys(a.body.error.fields)).toContain('scanFile.scan');
    const negative = { ...scanFile, scan: { ...scanFile.scan, from: -1 } };
    const b = await editor.client.post(scansPath(), { title: 'negative', scanFile: negative });
    expect(b.status).toBe(422);
    expect(Object.keys(b.body.error.fields).some((f) => f.startsWith('scanFile.scan'))).toBe(true);
    expect(await scanCount()).toBe(before);
  });

  it('a point outside the scan, or a point that is not a result, is refused and stores nothing', async () => {
    const created = await editor.client.post(scansPath(), { title: 'bounds', scanFile });
    const id: string = created.body.scan.id;
    const outside = await editor.client.json('PUT', `${scansPath()}/${id}/points/3`, { result: points[0] });
    expect(outside.status).toBe(400);
    expect(outside.body.error.fields.index).toBeDefined();
    const notResult = await editor.client.json('PUT', `${scansPath()}/${id}/points/0`, { result: { value: 1 } });
    expect(notResult.status).toBe(400);
    const nan = await editor.client.json('PUT', `${scansPath()}/${id}/points/0`, { result: { ...points[0], value: 'x' } });
    expect(nan.status).toBe(400);
    const { Scan, ScanPoint } = getModels();
    const row = await Scan.findOne({ where: { publicId: id } });
    expect(await ScanPoint.count({ where: { scanId: row!.id } })).toBe(0);
  });

  it('viewers cannot start, extend, finish or delete a scan; an editor deletes it with its points', async () => {
    const created = await editor.client.post(scansPath(), { title: 'to delete', scanFile });
    const id: string = created.body.scan.id;
    expect((await viewer.client.post(scansPath(), { title: 'v', scanFile })).status).toBe(403);
    expect((await viewer.client.json('PUT', `${scansPath()}/${id}/points/0`, { result: points[0] })).status).toBe(403);
    expect((await viewer.client.patch(`${scansPath()}/${id}`, { status: 'done' })).status).toBe(403);
    expect((await viewer.client.delete(`${scansPath()}/${id}`)).status).toBe(403);
    await editor.client.json('PUT', `${scansPath()}/${id}/points/0`, { result: points[0] });
    const { Scan, ScanPoint } = getModels();
    const row = await Scan.findOne({ where: { publicId: id } });
    expect((await editor.client.delete(`${scansPath()}/${id}`)).status).toBe(200);
    expect(await ScanPoint.count({ where: { scanId: row!.id } })).toBe(0);
    expect((await viewer.client.get(`${scansPath()}/${id}`)).status).toBe(404);
  });
});

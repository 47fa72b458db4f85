import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DemandscapeApp } from '../src/app.js';
import type { ScoringRunJson } from '../src/modules/scoring/scoring.types.js';
import { SHORTLIST_CAUTION } from '../src/modules/shortlist/shortlist-caution.js';
import { ShortlistVersionSchema } from '../src/modules/shortlist/shortlist.entity.js';
import { scoredWorkspace, scoringRunFinished } from './shortlist-fixtures.js';
import { testAppCreate, testMembershipAdd, testUserSignedIn, type TestClient } from './utils.js';

describe('shortlists: versions, snapshots, org list, share by e-mail', { timeout: 120_000 }, () => {
  let ds: DemandscapeApp;
  let planner: TestClient;
  let executive: TestClient;
  let orgId: string;
  let w: Awaited<ReturnType<typeof scoredWorkspace>>;
  let run: ScoringRunJson;
  let executiveId: string;

  beforeAll(async () => {
    ds = await testAppCreate();
    planner = (await testUserSignedIn(ds, 'pia@larchloaf.example', 'Pia Planner')).client;
    orgId = (await planner.post('/api/organizations', { name: 'Larchloaf' }).expect(201)).body
      .organization.id;
    w = await scoredWorkspace(ds, planner, orgId);
    run = (await planner.get(`${w.base}/scoring-runs/${w.runId}`).expect(200)).body.run;
    const exec = await testUserSignedIn(ds, 'eve@larchloaf.example', 'Eve Executive');
    executive = exec.client;
    executiveId = exec.userId;
  });
  afterAll(() => ds.close());

  const items = (...names: string[]) =>
    names.map((n) => ({
      siteId: w.siteIds[n],
      note: n === 'Lantern Hill' ? 'Lease offer in hand' : undefined,
    }));

  it('creates version 1 with the chosen order, notes and the run’s score parts and caution', async () => {
    const res = await planner
      .post(`${w.base}/shortlists`, {
        name: 'Board pick',
        scoringRunId: w.runId,
        items: items('Lantern Hill', 'Quay corner'),
        versionNote: 'first cut',
      })
      .expect(201);
    const s = res.body.shortlist;
    expect(s).toMatchObject({
      name: 'Board pick',
      workspaceName: 'North corridor 2027',
      latestVersion: 1,
      itemCount: 2,
      sharedAt: null,
      sharedWith: [],
      caution: SHORTLIST_CAUTION,
    });
    expect(s.version).toMatchObject({
      version: 1,
      versionNote: 'first cut',
      scoringRunId: w.runId,
      scoringRunName: 'Harbour run',
      weightLabel: 'visits per year',
      candidateCount: 3,
      createdBy: { name: 'Pia Planner' },
    });
    expect(
      s.version.items.map((i: { order: number; name: string; note: string }) => [
        i.order,
        i.name,
        i.note,
      ]),
    ).toEqual([
      [1, 'Lantern Hill', 'Lease offer in hand'],
      [2, 'Quay corner', ''],
    ]);
    const scored = run.results!.candidates.find((c) => c.name === 'Lantern Hill')!;
    const { siteId: _id, name: _name, ...parts } = scored;
    expect(s.version.items[0].score).toEqual(parts);
    expect(s.version.totalDemand).toBe(run.results!.totalDemand);
    expect(s.version.ownStores.map((o: { name: string }) => o.name).sort()).toEqual([
      'Harbour Row',
      'Tidewater Market',
    ]);
    expect(s.version.competitors.map((o: { name: string }) => o.name)).toEqual(['Rival Crumb']);
    expect(s.version.surface).toMatchObject({ bandwidthM: 1500, kernel: 'quartic' });
    expect(s.versions).toEqual([
      expect.objectContaining({ version: 1, itemCount: 2, versionNote: 'first cut' }),
    ]);
  });

  it('rejects sites that are not candidates of the run, repeats, unknown runs and empty lists with the field', async () => {
    const cases: Array<[object, string, RegExp]> = [
      [
        { name: 'x', scoringRunId: w.runId, items: [{ siteId: w.siteIds['Harbour Row'] }] },
        'items.0.siteId',
        /not a candidate of the scoring run "Harbour run"/,
      ],
      [
        { name: 'x', scoringRunId: w.runId, items: items('Quay corner', 'Quay corner') },
        'items.1.siteId',
        /listed twice/,
      ],
      [
        { name: 'x', scoringRunId: 'no-such-run', items: items('Quay corner') },
        'scoringRunId',
        /no scoring run with this id/,
      ],
      [{ name: 'x', scoringRunId: w.runId, items: [] }, 'items', /at least one/],
      [
        { name: ' ', scoringRunId: w.runId, items: items('Quay corner') },
        'name',
        /must not be empty/,
      ],
    ];
    for (const [body, field, message] of cases) {
      const res = await planner.post(`${w.base}/shortlists`, body).expect(400);
      expect(res.body.error.field, JSON.stringify(body)).toBe(field);
      expect(res.body.error.message).toMatch(message);
    }
  });

  it('saves new versions, serves any version and keeps snapshots after the sites change', async () => {
    const created = (
      await planner
        .post(`${w.base}/shortlists`, {
          name: 'Versions',
          scoringRunId: w.runId,
          items: items('Quay corner'),
        })
        .expect(201)
    ).body.shortlist;
    const path = `${w.base}/shortlists/${created.id}`;
    const v2 = (
      await planner
        .post(`${path}/versions`, {
          scoringRunId: w.runId,
          items: items('=Saltmarsh Lane', 'Quay corner', 'Lantern Hill'),
          versionNote: 'all three',
        })
        .expect(201)
    ).body.shortlist;
    expect(v2).toMatchObject({ latestVersion: 2, itemCount: 3 });
    expect(v2.version).toMatchObject({ version: 2, versionNote: 'all three' });
    expect(
      v2.versions.map((v: { version: number; itemCount: number }) => [v.version, v.itemCount]),
    ).toEqual([
      [1, 1],
      [2, 3],
    ]);
    await planner
      .patch(`${w.base}/sites/${w.siteIds['Quay corner']}`, { name: 'Quay corner (renamed)' })
      .expect(200);
    const v1 = (await planner.get(`${path}?version=1`).expect(200)).body.shortlist;
    expect(v1.version.items.map((i: { name: string }) => i.name)).toEqual(['Quay corner']);
    expect(v1.latestVersion).toBe(2);
    expect((await planner.get(path).expect(200)).body.shortlist.version.version).toBe(2);
    const missing = await planner.get(`${path}?version=7`).expect(404);
    expect(missing.body.error.message).toMatch(/version 7/);
    expect((await planner.get(`${path}?version=zero`).expect(400)).body.error.field).toBe(
      'version',
    );
  });

  it('renames and deletes, and lists shortlists per workspace and across the organization', async () => {
    const created = (
      await planner
        .post(`${w.base}/shortlists`, {
          name: 'Temp',
          scoringRunId: w.runId,
          items: items('Quay corner'),
        })
        .expect(201)
    ).body.shortlist;
    const path = `${w.base}/shortlists/${created.id}`;
    expect(
      (await planner.patch(path, { name: 'Temp, renamed' }).expect(200)).body.shortlist.name,
    ).toBe('Temp, renamed');
    const org = (await planner.get(`/api/organizations/${orgId}/shortlists`).expect(200)).body
      .shortlists;
    expect(org[0]).toMatchObject({
      id: created.id,
      name: 'Temp, renamed',
      workspaceName: 'North corridor 2027',
      workspaceId: w.wsId,
    });
    expect(
      (await planner.get(`${w.base}/shortlists`).expect(200)).body.shortlists.map(
        (s: { id: string }) => s.id,
      ),
    ).toContain(created.id);
    await planner.del(path).expect(204);
    await planner.get(path).expect(404);
    const actions = (
      await planner.get(`/api/organizations/${orgId}/audit-events?limit=50`).expect(200)
    ).body.events.map((e: { action: string }) => e.action);
    expect(actions).toEqual(
      expect.arrayContaining([
        'shortlist.create',
        'shortlist.version_create',
        'shortlist.rename',
        'shortlist.delete',
      ]),
    );
  });

  it('asks to invite an executive first when the organization has none', async () => {
    const s = (await planner.get(`${w.base}/shortlists`).expect(200)).body.shortlists[0];
    const res = await planner.post(`${w.base}/shortlists/${s.id}/share`, {}).expect(400);
    expect(res.body.error.code).toBe('NO_EXECUTIVES');
    expect(res.body.error.message).toMatch(/invite an executive first/);
  });

  it('e-mails every executive a link to the read-only page and records who received it', async () => {
    await testMembershipAdd(ds, orgId, executiveId, 'executive');
    const s = (
      await planner
        .post(`${w.base}/shortlists`, {
          name: 'For the board',
          scoringRunId: w.runId,
          items: items('Lantern Hill', 'Quay corner'),
        })
        .expect(201)
    ).body.shortlist;
    const before = ds.mailbox.length;
    const res = await planner
      .post(`${w.base}/shortlists/${s.id}/share`, { message: 'For Thursday <3' })
      .expect(200);
    expect(res.body.sharedWith).toEqual([
      expect.objectContaining({
        userId: executiveId,
        name: 'Eve Executive',
        email: 'eve@larchloaf.example',
      }),
    ]);
    expect(res.body.failed).toEqual([]);
    const mails = ds.mailbox.slice(before);
    expect(mails).toHaveLength(1);
    expect(mails[0].to).toBe('eve@larchloaf.example');
    expect(mails[0].subject).toBe('Pia Planner shared the shortlist "For the board" with you');
    expect(mails[0].text).toContain(`http://localhost:3999/orgs/${orgId}/shortlists/${s.id}`);
    expect(mails[0].text).toContain('1. Lantern Hill, 2. Quay corner');
    expect(mails[0].text).toContain('For Thursday <3');
    expect(mails[0].html).toContain('For Thursday &#60;3');
    expect(mails[0].text).toContain(SHORTLIST_CAUTION);
    // The executive reads it, in the org-wide list and in full.
    const list = (await executive.get(`/api/organizations/${orgId}/shortlists`).expect(200)).body
      .shortlists;
    expect(list.find((x: { id: string }) => x.id === s.id).sharedAt).not.toBeNull();
    const read = (await executive.get(`${w.base}/shortlists/${s.id}`).expect(200)).body.shortlist;
    expect(read.sharedWith).toHaveLength(1);
    await executive.post(`${w.base}/shortlists/${s.id}/share`, {}).expect(403);
  });

  it('shares with chosen members only, and refuses users outside the organization', async () => {
    const s = (await planner.get(`${w.base}/shortlists`).expect(200)).body.shortlists[0];
    const outsider = await testUserSignedIn(ds, 'otto@elsewhere.example', 'Otto');
    const bad = await planner
      .post(`${w.base}/shortlists/${s.id}/share`, { userIds: [outsider.userId] })
      .expect(400);
    expect(bad.body.error).toMatchObject({ field: 'userIds' });
    expect(bad.body.error.message).toMatch(/not a member of this organization/);
    const before = ds.mailbox.length;
    await planner
      .post(`${w.base}/shortlists/${s.id}/share`, { userIds: [executiveId] })
      .expect(200);
    expect(ds.mailbox.slice(before).map((m) => m.to)).toEqual(['eve@larchloaf.example']);
  });
  it('keeps a version readable and exportable after its scoring run and sites are deleted', async () => {
    const other = (
      await planner
        .post(`${w.base}/scoring-runs`, { surfaceId: w.surfaceId, name: 'Short-lived run' })
        .expect(202)
    ).body.run;
    await scoringRunFinished(planner, `${w.base}/scoring-runs/${other.id}`);
    const s = (
      await planner
        .post(`${w.base}/shortlists`, {
          name: 'Survivor',
          scoringRunId: other.id,
          items: items('Lantern Hill'),
        })
        .expect(201)
    ).body.shortlist;
    const captured = s.version.items[0].score.captured;
    await planner.del(`${w.base}/scoring-runs/${other.id}`).expect(204);
    await planner.del(`${w.base}/sites/${w.siteIds['Lantern Hill']}`).expect(204);
    const read = (await executive.get(`${w.base}/shortlists/${s.id}`).expect(200)).body.shortlist;
    expect(read.version).toMatchObject({
      scoringRunId: other.id,
      scoringRunName: 'Short-lived run',
    });
    expect(read.version.items[0]).toMatchObject({ name: 'Lantern Hill', score: { captured } });
    await executive.get(`${w.base}/shortlists/${s.id}/export.xlsx`).expect(200);
    const res = await planner
      .post(`${w.base}/shortlists/${s.id}/versions`, {
        scoringRunId: other.id,
        items: [{ siteId: w.siteIds['Quay corner'] }],
      })
      .expect(400);
    expect(res.body.error.field).toBe('scoringRunId');
  });
  it('answers 409 VERSION_CONFLICT when another process saved the same version number first', async () => {
    const s = (
      await planner
        .post(`${w.base}/shortlists`, {
          name: 'Race',
          scoringRunId: w.runId,
          items: items('Quay corner'),
        })
        .expect(201)
    ).body.shortlist;
    const em = ds.orm.em.fork();
    const v1 = await em.findOneOrFail(ShortlistVersionSchema, { shortlist: s.id, version: 1 });
    // As another server process would have written it, before this one's shortlist row says so.
    em.create(ShortlistVersionSchema, {
      ...v1,
      id: crypto.randomUUID(),
      version: 2,
      createdAt: new Date(),
      updatedAt: new Date(),
    });
    await em.flush();
    const res = await planner
      .post(`${w.base}/shortlists/${s.id}/versions`, {
        scoringRunId: w.runId,
        items: items('Lantern Hill'),
      })
      .expect(409);
    expect(res.body.error.code).toBe('VERSION_CONFLICT');
  });
});

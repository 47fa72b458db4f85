import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { customerPointsLoad } from '../src/modules/customer-file/customer-points.js';
import {
  customerFileImported,
  customerFileSetup,
  customerFileUpload,
  fixture,
  type CustomerFileSetup,
} from './fixtures/customer-files/helpers.js';

// validation-reasons.csv: header (row 1), two good rows (2, 3), one row per reject reason (4–13),
// an exact copy of row 2 (row 14), 20 good rows on a 0.02° ring around the centre (15–34) and one
// customer ~700 km away (row 35).
const MAPPING = { mapping: { lon: 'lon', lat: 'lat', weight: 'spend' }, weightKind: 'spend' };
const REJECTED = {
  'missing-coordinate': 2,
  'non-numeric-coordinate': 1,
  'null-island': 1,
  'likely-swapped': 1,
  'latitude-out-of-range': 1,
  'longitude-out-of-range': 1,
  'negative-weight': 1,
  'non-numeric-weight': 2,
};

describe('customer file validation report', () => {
  let s: CustomerFileSetup;
  beforeAll(async () => {
    s = await customerFileSetup();
  });
  afterAll(() => s.close());

  it('counts every reason exactly; flagged rows are kept; nothing is silently dropped', async () => {
    const up = await customerFileUpload(
      s.owner,
      s.base,
      'reasons.csv',
      fixture('validation-reasons.csv'),
    ).expect(201);
    const f = await customerFileImported(s.owner, s.base, up.body.customerFile.id, MAPPING);
    expect(f).toMatchObject({
      status: 'imported',
      rowCount: 34,
      acceptedCount: 24,
      rejectedCount: 10,
      flaggedCount: 2,
      excludedCount: 0,
    });
    expect(f.acceptedCount + f.rejectedCount + f.excludedCount).toBe(f.rowCount);
    expect(f.report!.rejected).toEqual(REJECTED);
    expect(f.report!.flagged).toEqual({ 'duplicate-row': 1, outlier: 1 });
    expect(f.report!.examples['likely-swapped']).toEqual([
      { row: 8, lon: '30.2', lat: '120.5', weight: '10' },
    ]);
    expect(f.report!.examples['missing-coordinate']).toEqual([
      { row: 4, lon: '-38.5', lat: '', weight: '50' },
      { row: 5, lon: '', lat: '44.5', weight: '50' },
    ]);
    expect(f.report!.examples['duplicate-row']).toEqual([
      { row: 14, lon: '-38.50000', lat: '44.50000', weight: '100' },
    ]);
    expect(f.report!.examples.outlier).toEqual([{ row: 35, lon: '-30', lat: '46', weight: '10' }]);
    expect(f.report!.outlierRule).toMatchObject({
      applied: true,
      centerLon: expect.closeTo(-38.5, 1),
      centerLat: expect.closeTo(44.5, 1),
    });
    const points = await customerPointsLoad(s.ds.orm.em.fork(), f.id);
    expect(points.count).toBe(24);
  });

  it('leaves flagged rows out when asked, counting them as excluded', async () => {
    const up = await customerFileUpload(
      s.owner,
      s.base,
      'reasons.csv',
      fixture('validation-reasons.csv'),
    ).expect(201);
    const f = await customerFileImported(s.owner, s.base, up.body.customerFile.id, {
      ...MAPPING,
      excludeFlagged: true,
    });
    expect(f).toMatchObject({
      status: 'imported',
      rowCount: 34,
      acceptedCount: 22,
      rejectedCount: 10,
      flaggedCount: 2,
      excludedCount: 2,
      excludeFlagged: true,
    });
    const points = await customerPointsLoad(s.ds.orm.em.fork(), f.id);
    expect(points.count).toBe(22);
    expect(Math.max(...points.lon)).toBeLessThan(-38);
  });

  it('writes the rejected rows as CSV with only the mapped columns', async () => {
    const up = await customerFileUpload(
      s.owner,
      s.base,
      'reasons.csv',
      fixture('validation-reasons.csv'),
    ).expect(201);
    const id = up.body.customerFile.id;
    await s.owner.get(`${s.base}/${id}/rejected.csv`).expect(409);
    await customerFileImported(s.owner, s.base, id, MAPPING);
    const res = await s.owner.get(`${s.base}/${id}/rejected.csv`).expect(200);
    expect(res.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(res.headers['content-disposition']).toBe(
      'attachment; filename="reasons-rejected-rows.csv"',
    );
    expect(res.text).toBe(
      [
        'row,reason,lon,lat,spend',
        '4,missing-coordinate,-38.5,,50',
        '5,missing-coordinate,,44.5,50',
        '6,non-numeric-coordinate,-38.5,abc,50',
        '7,null-island,0,0,10',
        '8,likely-swapped,30.2,120.5,10',
        '9,latitude-out-of-range,120.0,95.0,10',
        '10,longitude-out-of-range,-190.0,44.5,10',
        '11,negative-weight,-38.5,44.5,-5',
        '12,non-numeric-weight,-38.5,44.5,lots',
        '13,non-numeric-weight,-38.5,44.5,',
        '',
      ].join('\r\n'),
    );
    expect(res.text).not.toMatch(/Cy Harbour|Ed Gull/);
    const audit = await s.owner
      .get(`/api/organizations/${s.orgId}/audit-events?action=customer_file.rejected_download`)
      .expect(200);
    expect(audit.body.events[0]).toMatchObject({
      action: 'customer_file.rejected_download',
      target: { type: 'customer_file', id },
      details: { rejectedCount: 10 },
    });
  });

  it('records upload, import and delete in the audit log', async () => {
    const up = await customerFileUpload(
      s.owner,
      s.base,
      'audit.csv',
      fixture('utf8-bom.csv'),
    ).expect(201);
    const id = up.body.customerFile.id;
    await customerFileImported(s.owner, s.base, id, {
      mapping: { lon: 'lon', lat: 'lat' },
      weightKind: 'count',
    });
    await s.owner.del(`${s.base}/${id}`).expect(204);
    const res = await s.owner
      .get(`/api/organizations/${s.orgId}/audit-events?limit=200`)
      .expect(200);
    const mine = res.body.events
      .filter((e: { target: { id: string } | null }) => e.target?.id === id)
      .map((e: { action: string }) => e.action);
    expect(mine).toEqual(['customer_file.delete', 'customer_file.import', 'customer_file.upload']);
  });
});

import { describe, expect, it } from 'vitest';
import { reportRunFixture } from '../report/report-fixture.js';
import { shortlistSnapshot } from './shortlist-snapshot.js';

describe('shortlistSnapshot', () => {
  it('keeps the planner’s order and notes with every score part and the rank range', () => {
    const run = reportRunFixture();
    const snap = shortlistSnapshot(run, [
      { siteId: 'c-mill', note: 'Lease offer in hand' },
      { siteId: 'c-quay' },
    ]);
    expect(snap.items.map((i) => [i.order, i.siteId, i.note])).toEqual([
      [1, 'c-mill', 'Lease offer in hand'],
      [2, 'c-quay', ''],
    ]);
    const mill = snap.items[0];
    expect(mill).toMatchObject({
      name: 'Mill Lane',
      lon: -38.48,
      lat: 44.53,
      attractiveness: 90,
      stability: { minRank: 1, maxRank: 2, unstable: false },
    });
    expect(mill.score).toMatchObject({
      rank: 2,
      captured: 8_000,
      cannibalization: 3_000,
      netNew: 5_000,
    });
    expect(mill.score.cannibalizedFrom).toHaveLength(2);
    expect(mill.score).not.toHaveProperty('siteId');
  });

  it('copies the run’s stores, settings, totals and surface', () => {
    const snap = shortlistSnapshot(reportRunFixture(), [{ siteId: 'c-eq' }]);
    expect(snap.ownStores.map((s) => s.name)).toEqual(['Harbour Row', 'Ferry Steps']);
    expect(snap.competitors.map((s) => s.name)).toEqual(['Tidewater Buns']);
    expect(snap).toMatchObject({
      scoringRunId: 'run-1',
      totalDemand: 40_000,
      candidateCount: 3,
      weightLabel: 'customers',
      surface: { kernel: 'quartic' },
    });
    expect(snap.settings.radiiM).toEqual([1000, 3000]);
  });

  it('names the item of a repeated site or a site that is not a candidate', () => {
    const run = reportRunFixture();
    expect(() => shortlistSnapshot(run, [{ siteId: 'c-quay' }, { siteId: 'c-quay' }])).toThrow(
      /items\.1\.siteId: site c-quay is listed twice/,
    );
    expect(() => shortlistSnapshot(run, [{ siteId: 'c-quay' }, { siteId: 'o-harbour' }])).toThrow(
      /items\.1\.siteId: site o-harbour is not a candidate of the scoring run "Harbour run"/,
    );
  });

  it('refuses a run that has not succeeded', () => {
    const run = { ...reportRunFixture(), status: 'failed' as const, results: null };
    expect(() => shortlistSnapshot(run, [{ siteId: 'c-quay' }])).toThrow(
      /is failed; only a succeeded run/,
    );
  });
});

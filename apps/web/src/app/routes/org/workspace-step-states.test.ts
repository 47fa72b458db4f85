import { describe, expect, it } from 'vitest';
import { createFinishedScoringRun, createScoringRun } from '../../../features/scoring/testing/scoring-factories';
import { createShortlistSummary } from '../../../features/shortlists/testing/shortlist-factories';
import { createSite } from '../../../features/sites/testing/site-factories';
import { shortlistState, sitesState } from './workspace-step-states';

const sites = [
  createSite({ id: 'site_1', kind: 'candidate' }),
  createSite({ id: 'site_2', kind: 'candidate' }),
  createSite({ id: 'site_3', kind: 'own' }),
  createSite({ id: 'site_4', kind: 'competitor' }),
];

describe('sitesState', () => {
  it('is not started without sites or runs', () => {
    expect(sitesState([], [])).toBeUndefined();
    expect(sitesState(undefined, undefined)).toBeUndefined();
  });

  it('counts the sites before any run', () => {
    expect(sitesState(sites, [])).toEqual({ label: '4 sites', tone: 'accent', detail: '4 sites: 2 candidates, 1 own store, 1 competitor.' });
  });

  it('cautions while there is no candidate to score', () => {
    expect(sitesState([createSite({ kind: 'own' })], [])).toMatchObject({ label: 'No candidates yet', tone: 'caution' });
  });

  it('says Scoring while a run is queued or running, and Scored once one succeeded', () => {
    expect(sitesState(sites, [createScoringRun({ status: 'running' })])).toMatchObject({ label: 'Scoring', tone: 'accent' });
    expect(sitesState(sites, [createScoringRun({ status: 'failed' }), createFinishedScoringRun()])).toEqual({
      label: 'Scored',
      tone: 'success',
      detail: '4 sites: 2 candidates, 1 own store, 1 competitor. 1 scoring run finished.',
    });
  });

  it('reads the runs alone when the viewer may not list sites', () => {
    expect(sitesState(undefined, [createFinishedScoringRun(), createFinishedScoringRun({ id: 'scr_2' })])).toEqual({
      label: 'Scored',
      tone: 'success',
      detail: '2 scoring runs finished.',
    });
  });
});

describe('shortlistState', () => {
  it('is not started without shortlists', () => {
    expect(shortlistState([])).toBeUndefined();
    expect(shortlistState(undefined)).toBeUndefined();
  });

  it('counts the shortlists until one is shared', () => {
    expect(shortlistState([createShortlistSummary(), createShortlistSummary({ id: 'shl_2' })])).toEqual({
      label: '2 shortlists',
      tone: 'accent',
      detail: '2 shortlists, not shared yet.',
    });
    expect(shortlistState([createShortlistSummary()])).toMatchObject({ label: '1 shortlist' });
  });

  it('says Shared once one was shared', () => {
    expect(shortlistState([createShortlistSummary({ sharedAt: '2026-12-02T12:00:00.000Z' }), createShortlistSummary({ id: 'shl_2' })])).toEqual({
      label: 'Shared',
      tone: 'success',
      detail: '2 shortlists, 1 shared.',
    });
  });
});

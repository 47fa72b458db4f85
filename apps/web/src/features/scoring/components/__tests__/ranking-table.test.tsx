import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createCandidateScore, createFinishedScoringRun, createScoringSettings } from '../../testing/scoring-factories';
import { RankingTable } from '../ranking-table';

function runWith(count: number) {
  const candidates = Array.from({ length: count }, (_, i) =>
    createCandidateScore({ siteId: `ste_${i + 1}`, name: `Candidate ${i + 1}`, rank: i + 1, value: 1000 - i }),
  );
  const run = createFinishedScoringRun();
  return { ...run, results: { ...run.results!, candidates } };
}

describe('RankingTable', () => {
  it('shows the first 50 of a long ranking, then all on request', async () => {
    renderWithProviders(<RankingTable run={runWith(60)} selectedId={null} onSelect={() => {}} />);
    // Counted with a selector: role queries over hundreds of cells are slow in happy-dom.
    const table = screen.getByRole('table');
    expect(table.querySelectorAll('tbody tr')).toHaveLength(50);
    expect(within(table).getByText('Candidate 50')).toBeInTheDocument();
    expect(within(table).queryByText('Candidate 51')).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Show all 60 candidates' }));
    expect(table.querySelectorAll('tbody tr')).toHaveLength(60);
    expect(screen.queryByRole('button', { name: /Show all/ })).not.toBeInTheDocument();
  }, 15_000);

  it('names a ring measure in miles in the value column and the ring columns', () => {
    const run = createFinishedScoringRun({ settings: { ...createScoringSettings({ measure: 'ring:0', radiusUnit: 'mi', radii: [1] }), radiiM: [1609.344] } });
    renderWithProviders(<RankingTable run={run} selectedId={null} onSelect={() => {}} />);
    expect(screen.getByRole('columnheader', { name: 'Demand within 1 mi customers' })).toBeInTheDocument();
    expect(screen.getByRole('columnheader', { name: 'Within 1 mi customers' })).toBeInTheDocument();
  });

  it('shows shares as percentages in the value column', () => {
    const share = createFinishedScoringRun({ settings: { ...createScoringSettings({ measure: 'shareOfTotal' }), radiiM: [1000, 3000, 5000] } });
    share.results!.candidates[0] = { ...share.results!.candidates[0]!, value: 0.052 };
    renderWithProviders(<RankingTable run={share} selectedId={null} onSelect={() => {}} />);
    expect(screen.getByRole('columnheader', { name: 'Share of all demand %' })).toBeInTheDocument();
    expect(screen.getAllByRole('row')[1]).toHaveTextContent('1Harbour Steps5.2 %2,600760');
  });
});

import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '../../../../testing/test-utils';
import { createImportedCustomerFile } from '../../testing/customer-file-factories';
import { ValidationReport } from '../validation-report';

describe('ValidationReport', () => {
  it('shows accepted, rejected, flagged and excluded counts', async () => {
    renderWithProviders(<ValidationReport orgId="org_1" workspaceId="wsp_1" file={createImportedCustomerFile()} canDownload />);
    const stat = (label: string) => (screen.getByText(label).closest('dl') as HTMLElement).textContent;
    await screen.findByText('Accepted');
    expect(stat('Accepted')).toContain('488rows');
    expect(stat('Rejected')).toContain('12rows');
    expect(stat('Flagged')).toContain('5rows');
    expect(stat('Excluded')).toContain('0rows');
  });

  it('explains each reason in plain words with its count and an example', async () => {
    renderWithProviders(<ValidationReport orgId="org_1" workspaceId="wsp_1" file={createImportedCustomerFile()} canDownload />);
    const rejected = await screen.findByRole('region', { name: 'Why rows were rejected' });
    const swapped = within(rejected).getByText('Longitude and latitude look swapped').closest('li') as HTMLElement;
    expect(swapped).toHaveTextContent('7 rows');
    expect(swapped).toHaveTextContent(/probably exchanged/);
    expect(swapped).toHaveTextContent('row 14: -38.49, 144.5, 220');
    expect(within(rejected).getByText('Placed at 0°, 0°').closest('li')).toHaveTextContent('5 rows');
    const flagged = screen.getByRole('region', { name: 'Why rows were flagged' });
    expect(within(flagged).getByText('Far from the other customers').closest('li')).toHaveTextContent('3 rows');
    expect(within(flagged).getByText('Exact duplicate of an earlier row').closest('li')).toHaveTextContent('2 rows');
  });

  it('offers the rejected rows as CSV to owners and analysts only', async () => {
    const { unmount } = renderWithProviders(
      <ValidationReport orgId="org_1" workspaceId="wsp_1" file={createImportedCustomerFile()} canDownload />,
    );
    expect(await screen.findByRole('link', { name: 'Download rejected rows (CSV)' })).toHaveAttribute(
      'href',
      '/api/organizations/org_1/workspaces/wsp_1/customer-files/cf_1/rejected.csv',
    );
    unmount();
    renderWithProviders(<ValidationReport orgId="org_1" workspaceId="wsp_1" file={createImportedCustomerFile()} canDownload={false} />);
    await screen.findByText('Accepted');
    expect(screen.queryByRole('link', { name: 'Download rejected rows (CSV)' })).not.toBeInTheDocument();
  });
});

import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ProgressBar } from '../progress-bar';

describe('ProgressBar', () => {
  it('exposes the share done as a percentage', () => {
    render(<ProgressBar value={0.304} label="Run progress" />);
    const bar = screen.getByRole('progressbar', { name: 'Run progress' });
    expect(bar).toHaveAttribute('aria-valuenow', '30');
    expect(screen.getByText('30 %')).toBeInTheDocument();
  });

  it('clamps values outside 0–1', () => {
    render(<ProgressBar value={1.7} label="Run progress" />);
    expect(screen.getByRole('progressbar')).toHaveAttribute('aria-valuenow', '100');
  });

  it('has no value while the amount is unknown', () => {
    render(<ProgressBar value={null} label="Run progress" valueText="Queued" />);
    expect(screen.getByRole('progressbar')).not.toHaveAttribute('aria-valuenow');
    expect(screen.getByText('Queued')).toBeInTheDocument();
  });
});

import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { Dialog } from '../dialog';

describe('Dialog', () => {
  it('shows its title and body only while open', () => {
    const { rerender } = render(
      <Dialog open={false} onClose={() => {}} title="New workspace">
        <p>Form goes here</p>
      </Dialog>,
    );
    expect(screen.queryByText('Form goes here')).not.toBeInTheDocument();
    rerender(
      <Dialog open onClose={() => {}} title="New workspace">
        <p>Form goes here</p>
      </Dialog>,
    );
    expect(screen.getByRole('dialog', { name: 'New workspace' })).toBeInTheDocument();
    expect(screen.getByText('Form goes here')).toBeVisible();
  });

  it('asks to close from the close button', async () => {
    const onClose = vi.fn();
    render(
      <Dialog open onClose={onClose} title="New workspace">
        <p>Body</p>
      </Dialog>,
    );
    await userEvent.click(screen.getByRole('button', { name: 'Close' }));
    expect(onClose).toHaveBeenCalledTimes(1);
  });
});

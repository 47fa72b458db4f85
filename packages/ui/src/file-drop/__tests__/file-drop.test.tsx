import { fireEvent, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { FileDrop } from '../file-drop';

describe('FileDrop', () => {
  it('hands over a file chosen with the picker', async () => {
    const onFile = vi.fn();
    render(<FileDrop onFile={onFile} title="Drop a file" pickLabel="Choose a file" accept=".csv" />);
    const file = new File(['lon,lat\n1,2\n'], 'customers.csv', { type: 'text/csv' });
    await userEvent.upload(screen.getByLabelText('Choose a file'), file);
    expect(onFile).toHaveBeenCalledWith(file);
  });

  it('hands over a dropped file', () => {
    const onFile = vi.fn();
    render(<FileDrop onFile={onFile} title="Drop a file" />);
    const file = new File(['x'], 'customers.xlsx');
    fireEvent.drop(screen.getByText('Drop a file').parentElement!, { dataTransfer: { files: [file] } });
    expect(onFile).toHaveBeenCalledWith(file);
  });

  it('ignores drops while disabled', () => {
    const onFile = vi.fn();
    render(<FileDrop onFile={onFile} title="Drop a file" disabled />);
    fireEvent.drop(screen.getByText('Drop a file').parentElement!, { dataTransfer: { files: [new File(['x'], 'a.csv')] } });
    expect(onFile).not.toHaveBeenCalled();
  });
});

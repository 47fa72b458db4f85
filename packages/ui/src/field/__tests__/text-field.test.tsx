import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { TextField } from '../text-field';

describe('TextField', () => {
  it('labels the input and links the hint', () => {
    render(<TextField label="Workspace name" hint="Up to 120 characters." />);
    const input = screen.getByLabelText('Workspace name');
    expect(input).toHaveAccessibleDescription('Up to 120 characters.');
    expect(input).not.toHaveAttribute('aria-invalid');
  });

  it('marks the input invalid and announces the error', () => {
    render(<TextField label="E-mail" error="Enter an e-mail address." />);
    expect(screen.getByLabelText('E-mail')).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByRole('alert')).toHaveTextContent('Enter an e-mail address.');
  });
});

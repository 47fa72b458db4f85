import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { Stat } from '../stat';

describe('Stat', () => {
  it('shows the label, the number and its unit', () => {
    render(<Stat label="Accepted" value="48,210" unit="rows" />);
    expect(screen.getByText('Accepted')).toBeInTheDocument();
    expect(screen.getByText('48,210')).toHaveTextContent('48,210rows');
  });
});

import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ColourLegend } from '../colour-legend';

describe('ColourLegend', () => {
  it('shows the title, the unit and every tick label', () => {
    render(
      <ColourLegend
        title="Demand"
        unit="customers per km²"
        stops={['rgb(0, 32, 81)', 'rgb(253, 234, 69)']}
        ticks={[
          { position: 0, label: '0' },
          { position: 0.5, label: '200' },
          { position: 1, label: '400' },
        ]}
      />,
    );
    expect(screen.getByText('Demand')).toBeInTheDocument();
    expect(screen.getByText('(customers per km²)')).toBeInTheDocument();
    expect(screen.getByText('200')).toHaveStyle({ left: '50%' });
    expect(screen.getByText('400')).toBeInTheDocument();
  });
});

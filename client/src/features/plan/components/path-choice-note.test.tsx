import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { PathChoiceNote } from './path-choice-note';

describe('PathChoiceNote', () => {
  it('names the path the kit takes and says why, as a note', () => {
    render(
      <PathChoiceNote
        choice={{
          path: 'pack',
          otherMassG: 615,
          savedG: 75,
          text: 'The LiFePO₄ pack path is 75 g lighter than three banks and a boost converter for this trip.',
        }}
      />,
    );
    const note = screen.getByRole('note', { name: 'Power path' });
    expect(note).toHaveTextContent('12 V pack path');
    expect(note).toHaveTextContent('75 g lighter than three banks and a boost converter');
  });
});

import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { SetupDto } from '@fuelwright/shared';
import { SetupCards, SetupsTable } from './setups-table';

const base = { kartId: 'k1', note: '', createdAt: '2026-01-01T00:00:00.000Z' };

/** Newest first, as GET /api/karts/:id/setups answers; changedFields as the server computes them. */
const SETUPS: SetupDto[] = [
  {
    ...base,
    id: 'newest',
    takenOn: '2026-11-21',
    changedFields: ['mainJet', 'airScrewTurnsOut', 'idleScrewTurns'],
    mainJet: 182.5,
    pilotJet: 37.5,
    airScrewTurnsOut: 1.75,
    idleScrew: 'set',
    idleScrewTurns: 1,
    premixRatio: 32,
  },
  {
    ...base,
    id: 'middle',
    takenOn: '2026-10-02',
    changedFields: [],
    mainJet: 185,
    pilotJet: 37.5,
    airScrewTurnsOut: 1.5,
    idleScrew: 'set',
    idleScrewTurns: 0,
    premixRatio: 32,
  },
  { ...base, id: 'oldest', takenOn: '2026-09-12', changedFields: [], mainJet: 185, pilotJet: 37.5, airScrewTurnsOut: 1.5, idleScrew: 'set', idleScrewTurns: 0, premixRatio: 32 },
];

const headers = () => screen.getAllByRole('columnheader').map((th) => th.textContent);

function cellOf(row: HTMLElement, column: string): HTMLElement {
  return within(row).getAllByRole('cell')[headers().indexOf(column) - 1];
}

describe('past setups table', () => {
  it('highlights exactly the changed values of each setup and says what they were', () => {
    render(<SetupsTable setups={SETUPS} />);
    const newest = document.querySelector<HTMLElement>('tr[data-setup-id="newest"]')!;
    expect(cellOf(newest, 'Main jet')).toHaveClass('fw-setup-changed');
    expect(cellOf(newest, 'Main jet')).toHaveTextContent('182.5was 185');
    expect(cellOf(newest, 'Air screw')).toHaveTextContent('1.75 outwas 1.5 out');
    // Idle screw turns are shown in the idle screw column, which is highlighted for them.
    expect(cellOf(newest, 'Idle screw')).toHaveClass('fw-setup-changed');
    expect(cellOf(newest, 'Idle screw')).toHaveTextContent('Set, 1 inwas Set, 0 in');
    expect(cellOf(newest, 'Pilot jet')).not.toHaveClass('fw-setup-changed');
    expect(cellOf(newest, 'Premix')).not.toHaveClass('fw-setup-changed');
    expect(within(newest).getByRole('rowheader')).toHaveTextContent('Changed: main jet, air screw, idle screw');
    expect(newest.querySelectorAll('.fw-setup-changed')).toHaveLength(3);

    const middle = document.querySelector<HTMLElement>('tr[data-setup-id="middle"]')!;
    expect(middle.querySelectorAll('.fw-setup-changed')).toHaveLength(0);
    expect(within(middle).getByRole('rowheader')).toHaveTextContent('No change from the one before');

    const oldest = document.querySelector<HTMLElement>('tr[data-setup-id="oldest"]')!;
    expect(oldest.querySelectorAll('.fw-setup-changed')).toHaveLength(0);
    expect(within(oldest).getByRole('rowheader')).toHaveTextContent('First setup recorded');
    expect(cellOf(oldest, 'Foam fitted')).toHaveTextContent('—');
  });

  it('marks the same changes on the phone cards', () => {
    render(<SetupCards setups={SETUPS} />);
    const cards = screen.getAllByRole('listitem');
    expect(cards).toHaveLength(3);
    const changed = [...cards[0].querySelectorAll('.fw-setup-changed dt')].map((dt) => dt.textContent);
    expect(changed).toEqual(['Main jet', 'Air screw', 'Idle screw']);
    expect(cards[0]).toHaveTextContent('Latest');
    expect(cards[1].querySelectorAll('.fw-setup-changed')).toHaveLength(0);
    expect(cards[2]).toHaveTextContent('First setup recorded');
  });
});

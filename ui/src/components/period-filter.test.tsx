import { fireEvent, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { PeriodFilter } from './period-filter';

const VERSIONS = [
  { version: '1.0.0', active: false },
  { version: '1.1.0', active: true },
];

describe('period filter', () => {
  it('lists the versions, the active one marked, after the "all" choice the page names', () => {
    render(<PeriodFilter value={{}} onChange={() => {}} versions={VERSIONS} allVersionsLabel="Active version (1.1.0)" idPrefix="t" />);
    const options = Array.from((screen.getByLabelText('Ruleset version') as HTMLSelectElement).options).map((o) => [o.value, o.text]);
    expect(options).toEqual([
      ['', 'Active version (1.1.0)'],
      ['1.0.0', '1.0.0'],
      ['1.1.0', '1.1.0 (active)'],
    ]);
    expect(screen.getByLabelText('From')).toHaveAttribute('id', 't-from');
    // Nothing to clear yet.
    expect(screen.queryByRole('button', { name: 'Clear' })).toBeNull();
  });

  it('hands each change over at once, an emptied field as absent', async () => {
    const onChange = vi.fn();
    render(<PeriodFilter value={{ from: '2026-11-01', version: '1.0.0' }} onChange={onChange} versions={VERSIONS} />);
    fireEvent.change(screen.getByLabelText('To (included)'), { target: { value: '2026-11-30' } });
    expect(onChange).toHaveBeenLastCalledWith({ from: '2026-11-01', to: '2026-11-30', version: '1.0.0' });
    fireEvent.change(screen.getByLabelText('From'), { target: { value: '' } });
    expect(onChange).toHaveBeenLastCalledWith({ from: undefined, version: '1.0.0' });
    await userEvent.setup().selectOptions(screen.getByLabelText('Ruleset version'), '');
    expect(onChange).toHaveBeenLastCalledWith({ from: '2026-11-01', version: undefined });
    await userEvent.setup().click(screen.getByRole('button', { name: 'Clear' }));
    expect(onChange).toHaveBeenLastCalledWith({});
  });

  it('offers no version choice when the page gives no versions, and no Clear when the page says so', () => {
    render(<PeriodFilter value={{ from: '2026-11-01' }} onChange={() => {}} idPrefix="p" clearable={false} />);
    expect(screen.getByRole('group', { name: 'Period' })).toBeInTheDocument();
    // The page clears everything with its own button.
    expect(screen.queryByRole('button', { name: 'Clear' })).toBeNull();
    expect(screen.queryByLabelText('Ruleset version')).toBeNull();
    expect(screen.getByLabelText('From')).toHaveValue('2026-11-01');
  });

  it('says so when the first day comes after the last', () => {
    render(<PeriodFilter value={{ from: '2026-11-30', to: '2026-11-01' }} onChange={() => {}} versions={[]} />);
    expect(screen.getByText('The first day comes after the last.')).toBeInTheDocument();
    expect(screen.getByRole('group', { name: 'Period and version' })).toHaveClass('fw-period-filter');
  });
});

/**
 * The columns of the past-setups table: which snapshot fields each shows, how its value is
 * written short, and whether it changed against the snapshot before (from the server's
 * `changedFields`).
 */
import type { SetupDto, SetupField, SetupValues } from '@fuelwright/shared';
import { formatCalendarDate } from '../../../lib/setup-fields';

export interface SetupColumn {
  key: string;
  label: string;
  /** The snapshot fields behind this column: it is highlighted when any of them changed. */
  fields: readonly SetupField[];
  /** The value written short; null when not recorded. */
  format: (setup: SetupValues) => string | null;
}

const plain = (field: keyof SetupValues) => (setup: SetupValues) => {
  const value = setup[field];
  return value === undefined || value === null ? null : String(value);
};

export const SETUP_COLUMNS: readonly SetupColumn[] = [
  { key: 'mainJet', label: 'Main jet', fields: ['mainJet'], format: plain('mainJet') },
  { key: 'pilotJet', label: 'Pilot jet', fields: ['pilotJet'], format: plain('pilotJet') },
  {
    key: 'needleClipGroove',
    label: 'Clip groove',
    fields: ['needleClipGroove'],
    format: (s) => (s.needleClipGroove == null ? null : `${s.needleClipGroove} from top`),
  },
  {
    key: 'airScrewTurnsOut',
    label: 'Air screw',
    fields: ['airScrewTurnsOut'],
    format: (s) => (s.airScrewTurnsOut == null ? null : `${s.airScrewTurnsOut} out`),
  },
  {
    key: 'idleScrew',
    label: 'Idle screw',
    fields: ['idleScrew', 'idleScrewTurns'],
    format: (s) => {
      if (s.idleScrew === 'backed-off') return 'Backed off';
      if (s.idleScrew === 'set') return s.idleScrewTurns == null ? 'Set' : `Set, ${s.idleScrewTurns} in`;
      return s.idleScrewTurns == null ? null : `${s.idleScrewTurns} in`;
    },
  },
  { key: 'premixRatio', label: 'Premix', fields: ['premixRatio'], format: (s) => (s.premixRatio == null ? null : `${s.premixRatio}:1`) },
  {
    key: 'foamFittedDate',
    label: 'Foam fitted',
    fields: ['foamFittedDate'],
    format: (s) => (s.foamFittedDate ? formatCalendarDate(s.foamFittedDate) : null),
  },
  {
    key: 'lastRebuildDate',
    label: 'Last rebuild',
    fields: ['lastRebuildDate'],
    format: (s) => (s.lastRebuildDate ? formatCalendarDate(s.lastRebuildDate) : null),
  },
  {
    key: 'ventLines',
    label: 'Vent lines',
    fields: ['ventLinesFitted', 'ventLinesRoutedUp'],
    format: (s) => {
      if (s.ventLinesFitted === false) return 'Not fitted';
      const up = s.ventLinesRoutedUp === true ? ', routed up' : s.ventLinesRoutedUp === false ? ', not routed up' : '';
      if (s.ventLinesFitted === true) return `Fitted${up}`;
      return up ? up.slice(2).replace(/^./, (c) => c.toUpperCase()) : null;
    },
  },
];

/** Whether a column changed in this snapshot against the one before it. */
export function columnChanged(column: SetupColumn, setup: Pick<SetupDto, 'changedFields'>): boolean {
  return column.fields.some((field) => setup.changedFields.includes(field));
}

/** The columns that changed in this snapshot, in table order. */
export function changedColumns(setup: Pick<SetupDto, 'changedFields'>): SetupColumn[] {
  return SETUP_COLUMNS.filter((column) => columnChanged(column, setup));
}

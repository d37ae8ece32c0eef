import { Card, HTMLTable, Tag } from '@blueprintjs/core';
import type { SetupDto } from '@fuelwright/shared';
import { formatCalendarDate } from '../../../lib/setup-fields';
import { changedColumns, columnChanged, SETUP_COLUMNS, type SetupColumn } from '../lib/setup-columns';

const NOT_RECORDED = '—';

/** One value; when it changed against the snapshot before, it is marked and says what it was. */
function Value({ column, setup, previous }: { column: SetupColumn; setup: SetupDto; previous: SetupDto | undefined }) {
  const now = column.format(setup) ?? NOT_RECORDED;
  if (!previous || !columnChanged(column, setup)) return <>{now}</>;
  const was = column.format(previous) ?? 'not recorded';
  return (
    <span className="fw-changed-value" data-changed="true">
      <strong>{now}</strong>
      <span className="fw-changed-was">was {was}</span>
    </span>
  );
}

function ChangeSummary({ setup, previous }: { setup: SetupDto; previous: SetupDto | undefined }) {
  if (!previous) return <span className="fw-muted">First setup recorded</span>;
  const changed = changedColumns(setup);
  if (changed.length === 0) return <span className="fw-muted">No change from the one before</span>;
  return (
    <span>
      Changed: {changed.map((column) => column.label.toLowerCase()).join(', ')}
    </span>
  );
}

/** The mark of the setup a link asked to show (`?setup=` on the kart page). */
function SelectedTag() {
  return (
    <Tag minimal round intent="success" className="fw-setup-selected-tag">
      Selected
    </Tag>
  );
}

/**
 * Past setups, newest first, as a table; each value that changed against the one before is
 * highlighted; `selectedId` marks one row (the one a link pointed at).
 */
export function SetupsTable({ setups, selectedId }: { setups: SetupDto[]; selectedId?: string }) {
  return (
    <div className="fw-table-scroll" tabIndex={0} role="region" aria-label="Past setups (scrolls sideways)">
      <HTMLTable className="fw-data-table fw-setups-table" compact>
        <thead>
          <tr>
            <th scope="col">Date taken</th>
            {SETUP_COLUMNS.map((column) => (
              <th key={column.key} scope="col">
                {column.label}
              </th>
            ))}
            <th scope="col">Note</th>
          </tr>
        </thead>
        <tbody>
          {setups.map((setup, index) => {
            const previous = setups[index + 1];
            const selected = setup.id === selectedId;
            return (
              <tr key={setup.id} data-setup-id={setup.id} aria-current={selected ? 'true' : undefined} className={selected ? 'fw-setup-selected' : undefined}>
                <th scope="row" className="fw-setup-date">
                  {formatCalendarDate(setup.takenOn)}
                  {selected && <> <SelectedTag /></>}
                  <div className="fw-small fw-setup-change-summary">
                    <ChangeSummary setup={setup} previous={previous} />
                  </div>
                </th>
                {SETUP_COLUMNS.map((column) => (
                  <td key={column.key} className={previous && columnChanged(column, setup) ? 'fw-setup-changed' : undefined}>
                    <Value column={column} setup={setup} previous={previous} />
                  </td>
                ))}
                <td className="fw-notes-cell">
                  <span className="fw-muted fw-clamp-3">{setup.note || NOT_RECORDED}</span>
                </td>
              </tr>
            );
          })}
        </tbody>
      </HTMLTable>
    </div>
  );
}

/** The same on a phone: one card per snapshot, what changed first. */
export function SetupCards({ setups, selectedId }: { setups: SetupDto[]; selectedId?: string }) {
  return (
    <ol className="fw-card-list" aria-label="Past setups">
      {setups.map((setup, index) => {
        const previous = setups[index + 1];
        const selected = setup.id === selectedId;
        return (
          <li key={setup.id} data-setup-id={setup.id} aria-current={selected ? 'true' : undefined}>
            <Card className={selected ? 'fw-setup-card fw-setup-selected' : 'fw-setup-card'}>
              <div className="fw-setup-card-head">
                <strong>{formatCalendarDate(setup.takenOn)}</strong>
                <span className="fw-setup-card-tags">
                  {selected && <SelectedTag />}
                  {index === 0 && (
                    <Tag minimal round intent="primary">
                      Latest
                    </Tag>
                  )}
                </span>
              </div>
              <div className="fw-small fw-setup-change-summary">
                <ChangeSummary setup={setup} previous={previous} />
              </div>
              <dl className="fw-setup-values">
                {SETUP_COLUMNS.map((column) => (
                  <div key={column.key} className={previous && columnChanged(column, setup) ? 'fw-setup-changed' : undefined}>
                    <dt>{column.label}</dt>
                    <dd>
                      <Value column={column} setup={setup} previous={previous} />
                    </dd>
                  </div>
                ))}
              </dl>
              {setup.note && <p className="fw-setup-note fw-break-word">{setup.note}</p>}
            </Card>
          </li>
        );
      })}
    </ol>
  );
}

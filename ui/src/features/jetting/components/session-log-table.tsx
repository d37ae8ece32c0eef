import { useState } from 'react';
import { Alert, Button, HTMLTable, Tag, type Intent } from '@blueprintjs/core';
import { TrashIcon } from '@blueprintjs/icons';
import { Link } from 'react-router-dom';
import {
  PLUG_COLOUR_LABELS,
  formatDensity,
  formatPressure,
  formatTemperature,
  type JettingSessionDto,
  type Ran,
  type SetupDto,
  type UnitPreferences,
} from '@fuelwright/shared';
import { kartSetupPath } from '../../../app/paths';
import { useNotify } from '../../../components/toaster';
import { formatCalendarDate } from '../../../lib/setup-fields';
import { useDeleteSession } from '../api/delete-session';
import { setupJetSummary } from '../lib/setup-summary';

const RAN_INTENT: Record<Ran, Intent> = { rich: 'warning', right: 'success', lean: 'danger' };
const RAN_TEXT: Record<Ran, string> = { rich: 'Rich', right: 'Right', lean: 'Lean' };

export function formatLap(ms: number | null): string {
  if (ms === null) return '';
  const s = ms / 1000;
  const m = Math.floor(s / 60);
  return m > 0 ? `${m}:${(s - m * 60).toFixed(3).padStart(6, '0')}` : s.toFixed(3);
}

/**
 * The setup a session ran, as a link to the kart's page opened at its setups list with this one
 * highlighted; with the main jet and clip summary unless `short` (the phone line under the day).
 */
function SetupRef({ kartId, session, setups, short }: { kartId: string; session: JettingSessionDto; setups: readonly SetupDto[]; short?: boolean }) {
  if (session.setupId === null) return short ? null : <span className="fw-muted">None</span>;
  const setup = setups.find((s) => s.id === session.setupId);
  const to = kartSetupPath(kartId, session.setupId);
  const day = setup ? formatCalendarDate(setup.takenOn) : 'linked setup';
  return (
    <>
      <Link to={to} className="fw-nowrap" aria-label={setup ? `Setup of ${day}: ${setupJetSummary(setup)}` : 'The linked setup'}>
        {short ? `Setup ${day}` : day}
      </Link>
      {!short && setup && <div className="fw-muted fw-small">{setupJetSummary(setup)}</div>}
    </>
  );
}

/** The jetting log, newest first. Sessions are not edited: a wrong one is deleted and logged again. */
export function SessionLogTable({
  kartId,
  sessions,
  setups,
  units,
  canDelete,
}: {
  kartId: string;
  sessions: readonly JettingSessionDto[];
  /** The kart's setup snapshots, to name the one each session ran. */
  setups: readonly SetupDto[];
  units: UnitPreferences;
  canDelete: boolean;
}) {
  const remove = useDeleteSession(kartId);
  const notify = useNotify();
  const [confirming, setConfirming] = useState<JettingSessionDto | null>(null);

  return (
    <>
      <div className="fw-table-scroll">
        <HTMLTable className="fw-log-table" striped compact aria-label="Jetting log">
          <thead>
            <tr>
              <th scope="col">Day</th>
              <th scope="col" className="fw-hide-on-phone">
                Air
              </th>
              <th scope="col">
                Density <span className="fw-muted fw-small fw-nowrap">kg/m³</span>
              </th>
              <th scope="col">Jets</th>
              <th scope="col" className="fw-hide-on-phone">
                Setup used
              </th>
              <th scope="col" className="fw-hide-on-phone">
                Plug
              </th>
              <th scope="col">Ran</th>
              <th scope="col" className="fw-hide-on-phone">
                Lap
              </th>
              {canDelete && (
                <th scope="col">
                  <span className="fw-visually-hidden">Delete</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {sessions.map((s) => (
              <tr key={s.id}>
                <td>
                  <div className="fw-nowrap">{s.sessionOn}</div>
                  {s.track && <div className="fw-muted fw-small fw-break">{s.track}</div>}
                  {s.setupId !== null && (
                    <div className="fw-small fw-phone-only">
                      <SetupRef kartId={kartId} session={s} setups={setups} short />
                    </div>
                  )}
                </td>
                <td className="fw-hide-on-phone">
                  {formatTemperature(s.temperatureC, units.temperature)}, {formatPressure(s.stationPressureHpa, units.pressure)},{' '}
                  {Math.round(s.relativeHumidityPct)} %
                </td>
                <td className="fw-nowrap">{formatDensity(s.densityKgM3, { withUnit: false })}</td>
                <td>
                  <div className="fw-nowrap">Main {s.mainJet}</div>
                  {s.pilotJet !== null && <div className="fw-muted fw-small fw-nowrap">Pilot {s.pilotJet}</div>}
                </td>
                <td className="fw-hide-on-phone fw-setup-cell">
                  <SetupRef kartId={kartId} session={s} setups={setups} />
                </td>
                <td className="fw-hide-on-phone">{s.plugColour ? PLUG_COLOUR_LABELS[s.plugColour] : ''}</td>
                <td>
                  <Tag intent={RAN_INTENT[s.ran]} minimal>
                    {RAN_TEXT[s.ran]}
                  </Tag>
                </td>
                <td className="fw-hide-on-phone fw-nowrap">{formatLap(s.lapTimeMs)}</td>
                {canDelete && (
                  <td className="fw-action-cell">
                    <Button
                      className="fw-touch"
                      variant="minimal"
                      icon={<TrashIcon />}
                      aria-label={`Delete the session of ${s.sessionOn}`}
                      onClick={() => setConfirming(s)}
                    />
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </HTMLTable>
      </div>
      <Alert
        isOpen={confirming !== null}
        intent="danger"
        icon={<TrashIcon />}
        confirmButtonText="Delete session"
        cancelButtonText="Keep it"
        canEscapeKeyCancel
        canOutsideClickCancel
        loading={remove.isPending}
        onCancel={() => setConfirming(null)}
        onConfirm={() => {
          const s = confirming;
          if (!s) return;
          remove.mutate(s.id, {
            onSuccess: () => notify.success(`Session of ${s.sessionOn} deleted.`),
            onError: (e) => notify.error(`Not deleted: ${e.message}`),
            onSettled: () => setConfirming(null),
          });
        }}
      >
        <p>
          Delete the session of {confirming?.sessionOn} (main {confirming?.mainJet}, ran {confirming ? RAN_TEXT[confirming.ran].toLowerCase() : ''})?
          Sessions are not edited: log it again if it was entered wrong.
        </p>
      </Alert>
    </>
  );
}

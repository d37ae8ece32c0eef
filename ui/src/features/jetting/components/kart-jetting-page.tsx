import { useState } from 'react';
import { Button, FormGroup, HTMLSelect, NonIdealState, Section, SectionCard, Spinner } from '@blueprintjs/core';
import { ChartIcon, ErrorIcon, FilterIcon, HistoryIcon, LightbulbIcon, PlusIcon, SettingsIcon, WrenchIcon } from '@blueprintjs/icons';
import { useNavigate, useParams } from 'react-router-dom';
import type { JetSuggestionResponse } from '@fuelwright/shared';
import { kartJettingPath } from '../../../app/paths';
import { EMPTY_AIR_FORM, useConvertOnUnitChange, type AirFormValues } from '../../../components/air-reading-fields';
import { Page } from '../../../components/page';
import { UnitsControl } from '../../../components/units-control';
import { useRequiredUser } from '../../../lib/current-user';
import { useUnitPreferences } from '../../../lib/unit-preferences';
import { useJetKit } from '../api/get-jet-kit';
import { useKarts } from '../api/get-karts';
import { useSessions } from '../api/get-sessions';
import { useSetups } from '../api/get-setups';
import { JetKitForm } from './jet-kit-form';
import { JettingChart } from './jetting-chart';
import { LogSessionForm } from './log-session-form';
import { SessionLogTable } from './session-log-table';
import { SuggestionResult } from './suggestion-result';
import { TodayForm } from './today-form';
import '../jetting.css';

/** Jetting of one kart: today's suggestion, the chart, the log and the jet kit. */
export function KartJettingPage() {
  const { kartId = '' } = useParams();
  const me = useRequiredUser();
  const navigate = useNavigate();
  const karts = useKarts();
  const sessions = useSessions(kartId);
  const setups = useSetups(kartId);
  const jetKit = useJetKit(kartId);
  const { units, setUnits } = useUnitPreferences();
  const [todayAir, setTodayAir] = useState<AirFormValues>(EMPTY_AIR_FORM);
  const [result, setResult] = useState<JetSuggestionResponse | undefined>();
  const [logging, setLogging] = useState(false);
  useConvertOnUnitChange(units, setTodayAir);

  const kart = karts.data?.find((k) => k.id === kartId);
  const canEdit = kart ? kart.ownerId === me.id : false;
  const title = kart ? `Jetting: ${kart.name}` : 'Jetting';

  if (sessions.isError) {
    return (
      <Page title="Jetting">
        <NonIdealState
          icon={<ErrorIcon size={48} />}
          title={sessions.error.message.startsWith('No such') ? 'No such kart' : 'The jetting log could not be loaded'}
          description={sessions.error.message}
          action={<Button size="large" text="Try again" onClick={() => void sessions.refetch()} />}
        />
      </Page>
    );
  }

  const list = sessions.data ?? [];
  const right = list.filter((s) => s.ran === 'right').reverse();
  const switcher =
    karts.data && karts.data.length > 1 ? (
      <FormGroup label="Kart" labelFor="jetting-kart" inline className="fw-kart-switcher">
        <HTMLSelect
          id="jetting-kart"
          large
          value={kartId}
          onChange={(e) => {
            setResult(undefined);
            navigate(kartJettingPath(e.currentTarget.value));
          }}
        >
          {karts.data.map((k) => (
            <option key={k.id} value={k.id}>
              {k.name}
            </option>
          ))}
        </HTMLSelect>
      </FormGroup>
    ) : undefined;

  return (
    <Page
      title={
        <>
          <FilterIcon size={28} className="fw-title-icon" /> {title}
        </>
      }
      lead="Log what ran well in which air; get today’s jets from your own history, with the physics shown."
      actions={switcher}
    >
      <Section title="Today’s jets" icon={<LightbulbIcon />} className="fw-jetting-section">
        <SectionCard>
          {sessions.isPending ? (
            <Spinner aria-label="Loading the log" />
          ) : (
            <TodayForm
              key={kartId}
              kartId={kartId}
              units={units}
              values={todayAir}
              onValuesChange={setTodayAir}
              rightSessions={right}
              onResult={setResult}
            />
          )}
        </SectionCard>
        {result && (
          <SectionCard>
            <SuggestionResult result={result} units={units} />
          </SectionCard>
        )}
      </Section>

      <Section title="Main jet against air density" icon={<ChartIcon />} className="fw-jetting-section">
        <SectionCard>
          {list.length === 0 && !result ? (
            <p className="fw-muted">No sessions yet: the chart fills as you log them.</p>
          ) : (
            <JettingChart sessions={list} suggestion={result} />
          )}
        </SectionCard>
      </Section>

      <Section
        title="Log"
        icon={<HistoryIcon />}
        className="fw-jetting-section"
        rightElement={
          canEdit && !logging ? (
            <Button className="fw-touch" intent="primary" icon={<PlusIcon />} text="Log a session" onClick={() => setLogging(true)} />
          ) : undefined
        }
      >
        {logging && (
          <SectionCard>
            {setups.isPending ? (
              <Spinner aria-label="Loading the setups" />
            ) : (
              <LogSessionForm
                kartId={kartId}
                units={units}
                latest={list[0]}
                setups={setups.data ?? []}
                setupsError={setups.isError ? `The setups could not be loaded (${setups.error.message}): the session can be logged without one.` : undefined}
                initialAir={todayAir}
                onDone={() => {
                  setLogging(false);
                  setResult(undefined);
                }}
              />
            )}
          </SectionCard>
        )}
        <SectionCard padded={list.length === 0}>
          {sessions.isPending ? (
            <Spinner aria-label="Loading the log" />
          ) : list.length === 0 ? (
            <p className="fw-muted">
              Nothing logged yet. After a session, log the air, the jets and how it ran; the sessions that ran right become the
              baselines of the suggestion.
            </p>
          ) : (
            <SessionLogTable kartId={kartId} sessions={list} setups={setups.data ?? []} units={units} canDelete={canEdit} />
          )}
        </SectionCard>
      </Section>

      <Section
        title="Jet kit"
        icon={<WrenchIcon />}
        className="fw-jetting-section"
        collapsible
        collapseProps={{ defaultIsOpen: false }}
      >
        <SectionCard>
          {jetKit.data ? (
            <JetKitForm key={`${kartId}-${jetKit.dataUpdatedAt}`} kartId={kartId} kit={jetKit.data.jetKit} saved={jetKit.data.saved} canEdit={canEdit} />
          ) : jetKit.isError ? (
            <p className="fw-muted">{jetKit.error.message}</p>
          ) : (
            <Spinner aria-label="Loading the jet kit" />
          )}
        </SectionCard>
      </Section>

      <Section title="Units" icon={<SettingsIcon />} className="fw-jetting-section" collapsible collapseProps={{ defaultIsOpen: false }}>
        <SectionCard>
          <UnitsControl idPrefix="jetting-units" units={units} onChange={setUnits} />
        </SectionCard>
      </Section>
    </Page>
  );
}

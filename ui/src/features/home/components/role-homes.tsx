import {
  BookIcon,
  ChartIcon,
  ClipboardIcon,
  CloudIcon,
  DiagnosisIcon,
  DriveTimeIcon,
  EndorsedIcon,
  FolderOpenIcon,
  FolderSharedIcon,
  PeopleIcon,
} from '@blueprintjs/icons';
import { paths } from '../../../app/paths';
import { HomeCard, HomeGrid } from './home-card';

function QuickDiagnosisCard({ primary = false }: { primary?: boolean }) {
  return (
    <HomeCard
      icon={DiagnosisIcon}
      title="Quick diagnosis"
      to={paths.quickDiagnosis}
      action="Start a quick diagnosis"
      primary={primary}
    >
      Say what the engine does and where, and get the likely causes with a check plan, quickest checks first.
    </HomeCard>
  );
}

export function RacerHome() {
  return (
    <HomeGrid>
      <QuickDiagnosisCard primary />
      <HomeCard icon={DriveTimeIcon} title="My karts" to={paths.karts} action="Open karts">
        Your karts with their engine and carburettor, and a dated setup for each: jets, needle clip, air screw, foam
        and rebuild dates.
      </HomeCard>
      <HomeCard icon={FolderOpenIcon} title="Cases" to={paths.cases} action="Open cases">
        Each running problem you worked through: the likely causes, every check with its result, and what fixed it.
      </HomeCard>
      <HomeCard icon={CloudIcon} title="Conditions" to={paths.conditions} action="Work out today's air">
        Today&apos;s air density from temperature, pressure and humidity; each kart&apos;s jetting log suggests the jets for it.
      </HomeCard>
    </HomeGrid>
  );
}

export function CoachHome() {
  return (
    <HomeGrid>
      <HomeCard icon={FolderSharedIcon} title="Shared cases" to={paths.sharedCases} action="Open shared cases" primary>
        The cases your racers share with you, open ones first: review each one, comment, ask for a photo and recommend
        the next check.
      </HomeCard>
      <QuickDiagnosisCard />
    </HomeGrid>
  );
}

export function ShopHome() {
  return (
    <HomeGrid>
      <HomeCard icon={ClipboardIcon} title="Work orders" to={paths.workOrders} action="Open work orders" primary>
        Customers&apos; karts in for work: from a case shared with you, or a walk-in whose symptoms you enter on the spot.
      </HomeCard>
      <HomeCard icon={EndorsedIcon} title="Outcomes" to={paths.outcomes} action="Open outcomes">
        Log what was really wrong and what fixed it, so the ranking learns which causes are common.
      </HomeCard>
      <HomeCard icon={ChartIcon} title="Insights" to={paths.insights} action="Open insights">
        How well the ranking did against the outcomes: accuracy, calibration, and the rules that misled.
      </HomeCard>
      <QuickDiagnosisCard />
    </HomeGrid>
  );
}

export function AdminHome() {
  return (
    <HomeGrid>
      <HomeCard icon={PeopleIcon} title="Users" to={paths.users} action="Manage users" primary>
        See every account and set its role: racer, coach, shop or admin.
      </HomeCard>
      <HomeCard icon={BookIcon} title="Rulesets" to={paths.rulesets} action="Open rulesets">
        Publish and roll back versions of the knowledge base: symptoms, causes, checks, cautions and rule weights.
      </HomeCard>
      <HomeCard icon={ChartIcon} title="Insights" to={paths.insights} action="Open insights">
        What shops and racers logged as the real cause and fix, and how well the rules ranked against it.
      </HomeCard>
    </HomeGrid>
  );
}

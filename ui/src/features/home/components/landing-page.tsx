import { Card, H2 } from '@blueprintjs/core';
import { DiagnosisIcon, LogInIcon } from '@blueprintjs/icons';
import { paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Wordmark } from '../../../components/wordmark';

const AUDIENCES = [
  {
    title: 'Racers',
    text: 'Describe what the engine does, follow a check plan one step at a time, and keep your jetting and setups per kart.',
  },
  {
    title: 'Coaches',
    text: 'Review the cases your racers share, comment, and recommend the next check, even from another track.',
  },
  {
    title: 'Kart shops',
    text: 'Run work orders and log what the real cause and fix were, so the ranking learns what is common.',
  },
];

/** The public start page for visitors; signed-in users go straight to their home. */
export function LandingPage() {
  return (
    <div className="fw-page fw-landing">
      <section className="fw-hero" aria-labelledby="landing-title">
        <Wordmark size={56} showName={false} />
        <h1 id="landing-title" className="fw-hero-title">
          Find the fuel fault, fix it safely
        </h1>
        <p className="fw-hero-text">
          Fuelwright helps you work out why a two-stroke kart engine runs badly when the cause is in the fuel system or
          the carburettor. It ranks the likely causes from what you noticed, plans the quickest order of checks, walks
          you through each one with its cautions, and keeps the kart jetted for the day&apos;s air.
        </p>
        <div className="fw-hero-actions">
          <LinkButton
            className="fw-touch"
            size="large"
            intent="primary"
            icon={<DiagnosisIcon />}
            to={paths.quickDiagnosis}
            text="Start a quick diagnosis"
          />
          <LinkButton className="fw-touch" size="large" icon={<LogInIcon />} to={paths.signIn} text="Sign in" />
          <LinkButton className="fw-touch" size="large" variant="minimal" to={paths.signUp} text="Create account" />
        </div>
        <p className="fw-muted">A quick diagnosis needs no account; nothing is saved until you sign up.</p>
      </section>
      <section className="fw-home-grid" aria-label="Who uses it">
        {AUDIENCES.map((audience) => (
          <Card key={audience.title} className="fw-home-card">
            <H2 className="fw-home-card-title">{audience.title}</H2>
            <p>{audience.text}</p>
          </Card>
        ))}
      </section>
    </div>
  );
}

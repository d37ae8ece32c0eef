import { Callout } from '@blueprintjs/core';
import { DiagnosisIcon, InfoSignIcon } from '@blueprintjs/icons';
import { Link } from 'react-router-dom';
import { paths, signUpPath } from '../../../app/paths';
import { Page } from '../../../components/page';
import { useCurrentUser } from '../../../lib/current-user';
import { useCatalog } from '../../../lib/catalog';
import { QUICK_DIAGNOSIS_KEY } from '../hooks/walk-through-storage';
import { cautionCheckIds } from './caution-check-ids';
import { WalkThrough } from './walk-through';
import { CatalogNotReady } from './catalog-not-ready';

/**
 * A quick diagnosis, open to visitors: the walk-through over the stateless ranking. Nothing is
 * saved on the server; this browser keeps the place, and "Save this case" turns it into a case.
 */
export function QuickDiagnosisPage() {
  const user = useCurrentUser();
  const catalog = useCatalog();
  const saveTo = !user ? signUpPath(paths.saveQuickDiagnosis) : user.role === 'racer' ? paths.saveQuickDiagnosis : null;
  return (
    <Page
      title={
        <>
          <DiagnosisIcon size={28} className="fw-title-icon" /> Quick diagnosis
        </>
      }
      lead="Say what the engine does and when, get the likely causes and the quickest order of checks, then go through them one at a time."
    >
      {user?.role === 'racer' && (
        <Callout intent="primary" icon={<InfoSignIcon />} className="fw-diag-racer-hint">
          Working on one of your karts? <Link to={paths.diagnoseKart}>Diagnose a kart</Link> saves every step as a case you can come back to.
        </Callout>
      )}
      {catalog.data ? (
        <WalkThrough
          catalog={catalog.data}
          options={{ mode: 'quick', storageKey: QUICK_DIAGNOSIS_KEY, cautionCheckIds: cautionCheckIds(catalog.data) }}
          saveTo={saveTo}
        />
      ) : (
        <CatalogNotReady catalog={catalog} />
      )}
    </Page>
  );
}

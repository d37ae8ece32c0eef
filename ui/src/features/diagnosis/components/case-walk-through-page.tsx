import { DiagnosisIcon } from '@blueprintjs/icons';
import { generatePath, Link, useParams } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { Page } from '../../../components/page';
import { useCatalog } from '../../../lib/catalog';
import { caseStorageKey } from '../hooks/walk-through-storage';
import { cautionCheckIds } from './caution-check-ids';
import { WalkThrough } from './walk-through';
import { CatalogNotReady } from './catalog-not-ready';

/** The walk-through of a saved case: picks up where it was left (this browser's place, checked against the server). */
export function CaseWalkThroughPage() {
  const { caseId = '' } = useParams();
  const catalog = useCatalog();
  return (
    <Page
      title={
        <>
          <DiagnosisIcon size={28} className="fw-title-icon" /> Walk-through
        </>
      }
      lead={
        <>
          Every step is saved to the case as you go. <Link to={generatePath(paths.case, { caseId })}>Case page and timeline</Link>
        </>
      }
    >
      {catalog.data ? (
        <WalkThrough
          key={caseId}
          catalog={catalog.data}
          options={{ mode: 'case', caseId, storageKey: caseStorageKey(caseId), cautionCheckIds: cautionCheckIds(catalog.data) }}
        />
      ) : (
        <CatalogNotReady catalog={catalog} />
      )}
    </Page>
  );
}

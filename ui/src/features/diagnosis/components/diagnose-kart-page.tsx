import { useCallback } from 'react';
import { DiagnosisIcon } from '@blueprintjs/icons';
import { generatePath, useNavigate, useSearchParams } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { Page } from '../../../components/page';
import { useRequiredUser } from '../../../lib/current-user';
import { useCatalog } from '../../../lib/catalog';
import { useKarts } from '../api/get-karts';
import { newCaseStorageKey } from '../hooks/walk-through-storage';
import { cautionCheckIds } from './caution-check-ids';
import { WalkThrough } from './walk-through';
import { CatalogNotReady } from './catalog-not-ready';

/** "Diagnose a kart" (`?kartId=`): the intake of a new case; once opened, it continues on the case's walk-through. */
export function DiagnoseKartPage() {
  const user = useRequiredUser();
  const [params] = useSearchParams();
  const kartId = params.get('kartId');
  const navigate = useNavigate();
  const catalog = useCatalog();
  const karts = useKarts();
  const onCaseOpened = useCallback(
    (caseId: string) => navigate(generatePath(paths.caseWalkThrough, { caseId }), { replace: true }),
    [navigate],
  );
  return (
    <Page
      title={
        <>
          <DiagnosisIcon size={28} className="fw-title-icon" /> Diagnose a kart
        </>
      }
      lead="Pick the kart, say what the engine does, check the setup: the case is saved, and you can stop and come back at any step."
    >
      {catalog.data ? (
        <WalkThrough
          catalog={catalog.data}
          options={{ mode: 'case', kartId, storageKey: newCaseStorageKey(user.id), cautionCheckIds: cautionCheckIds(catalog.data) }}
          karts={karts.data}
          onCaseOpened={onCaseOpened}
        />
      ) : (
        <CatalogNotReady catalog={catalog} />
      )}
    </Page>
  );
}

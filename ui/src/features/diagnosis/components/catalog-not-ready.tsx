import { Button, NonIdealState } from '@blueprintjs/core';
import { OfflineIcon } from '@blueprintjs/icons';
import type { UseQueryResult } from '@tanstack/react-query';
import type { CatalogResponse } from '@fuelwright/shared';
import { PageSpinner } from '../../../components/page-spinner';

/** What a walk-through page shows until the catalog is there: a spinner, or the error with "Try again". */
export function CatalogNotReady({ catalog }: { catalog: UseQueryResult<CatalogResponse> }) {
  if (!catalog.isError) return <PageSpinner label="Loading the symptoms and checks" />;
  return (
    <NonIdealState
      icon={<OfflineIcon size={48} />}
      title="Cannot load the symptoms and checks"
      description={catalog.error.message}
      action={<Button className="fw-touch" size="large" intent="primary" text="Try again" onClick={() => void catalog.refetch()} />}
    />
  );
}

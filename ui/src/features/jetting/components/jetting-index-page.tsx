import { NonIdealState } from '@blueprintjs/core';
import { DriveTimeIcon, ErrorIcon } from '@blueprintjs/icons';
import { Navigate } from 'react-router-dom';
import { kartJettingPath, paths } from '../../../app/paths';
import { LinkButton } from '../../../components/link-button';
import { Page } from '../../../components/page';
import { PageSpinner } from '../../../components/page-spinner';
import { useKarts } from '../api/get-karts';

/** The menu's "Jetting": straight to the first kart's jetting (the page switches between karts). */
export function JettingIndexPage() {
  const karts = useKarts();
  if (karts.isPending) return <PageSpinner />;
  if (karts.isError) {
    return (
      <Page title="Jetting">
        <NonIdealState icon={<ErrorIcon size={48} />} title="Your karts could not be loaded" description={karts.error.message} />
      </Page>
    );
  }
  if (karts.data.length === 0) {
    return (
      <Page title="Jetting">
        <NonIdealState
          icon={<DriveTimeIcon size={48} />}
          title="No kart yet"
          description="The jetting log is kept per kart. Add your kart first."
          action={<LinkButton className="fw-touch" size="large" intent="primary" to={paths.karts} text="Go to karts" />}
        />
      </Page>
    );
  }
  return <Navigate replace to={kartJettingPath(karts.data[0].id)} />;
}

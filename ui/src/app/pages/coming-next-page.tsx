import { useMatches } from 'react-router-dom';
import { ComingNext } from '../../components/coming-next';
import { LinkButton } from '../../components/link-button';
import { Page } from '../../components/page';
import { paths } from '../paths';
import type { RouteHandle } from '../routes';

/** Placeholder for a screen a later update builds; says what it will hold (from the route table). */
export function ComingNextPage() {
  const matches = useMatches();
  const handle = matches[matches.length - 1]?.handle as RouteHandle | undefined;
  const title = handle?.title ?? 'Coming next';
  return (
    <Page title={title}>
      <ComingNext
        title={`${title}: coming next`}
        action={<LinkButton size="large" to={paths.home} text="Back to your home page" />}
      >
        {handle?.comingNext ?? 'This screen arrives in a later update.'}
      </ComingNext>
    </Page>
  );
}

import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { CommentDto } from '@fuelwright/shared';
import { makeUser, meReply, mockApi, renderApp, setPhoneWidth } from '../../../test-utils';
import { CATALOG, COACH_ID, RACER_ID, recommendedCase, sharedCase } from '../test-support/review-fixtures';

const coach = makeUser('coach', { id: COACH_ID, displayName: 'Cole Coach' });
const racer = makeUser('racer', { id: RACER_ID, displayName: 'Rae Racer' });

const comment = (patch: Partial<CommentDto>): CommentDto => ({
  id: 'm1',
  caseId: 'c1',
  authorId: RACER_ID,
  authorName: 'Rae Racer',
  authorRole: 'racer',
  body: '',
  createdAt: '2026-11-20T10:10:00.000Z',
  ...patch,
});

const empty = {
  'GET /catalog': { status: 200, body: CATALOG },
  'GET /cases/c1/comments': { status: 200, body: { comments: [] } },
  'GET /cases/c1/photos': { status: 200, body: { photos: [] } },
  'GET /cases/c1/photo-requests': { status: 200, body: { requests: [] } },
};

// Whole-app renders of a long page: slower than the default 5 s when the machine is busy.
describe('case page for the coach it is shared with', { timeout: 20_000 }, () => {
  it('reads the facts without changing them, shows comments as plain text, comments and recommends a check', async () => {
    setPhoneWidth(false);
    let thread = [comment({ body: 'Is the foam <b>crumbling</b>?\nIt smelt of fuel.' })];
    const calls = mockApi({
      ...empty,
      'GET /auth/me': meReply(coach),
      'GET /cases/c1': { status: 200, body: sharedCase() },
      'GET /cases/c1/comments': () => ({ status: 200, body: { comments: thread } }),
      'POST /cases/c1/comments': (init) => {
        const added = comment({ id: 'm2', authorId: COACH_ID, authorName: 'Cole Coach', authorRole: 'coach', body: JSON.parse(String(init.body)).body });
        thread = [...thread, added];
        return { status: 201, body: added };
      },
      'POST /cases/c1/recommendations': { status: 200, body: recommendedCase() },
    });
    renderApp('/cases/c1');
    const user = userEvent.setup();

    expect(await screen.findByRole('heading', { name: 'Case on Blue 27' })).toBeInTheDocument();
    expect(screen.getByText(/Rae Racer’s case, shared with you to review/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Continue the walk-through' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Abandon' })).toBeNull();
    // The owner's panel is not there for a coach.
    expect(screen.queryByRole('region', { name: 'Share with a coach or shop' })).toBeNull();

    // User text is shown as text: the tags stay visible characters, no element is made from them.
    const comments = await screen.findByRole('region', { name: 'Comments' });
    const body = await within(comments).findByText(/Is the foam <b>crumbling<\/b>\?/);
    expect(body.querySelector('b')).toBeNull();
    expect(body.textContent).toBe('Is the foam <b>crumbling</b>?\nIt smelt of fuel.');

    await user.type(within(comments).getByLabelText('Add a comment'), 'Check the plate too');
    await user.click(within(comments).getByRole('button', { name: 'Post comment' }));
    expect(await within(comments).findByText('Check the plate too')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST' && c.path === '/cases/c1/comments')?.init.body).toBe(JSON.stringify({ body: 'Check the plate too' }));
    await waitFor(() => expect(within(comments).getByLabelText('Add a comment')).toHaveValue(''));

    const recommend = screen.getByRole('region', { name: 'Recommend the next check' });
    await user.selectOptions(within(recommend).getByLabelText('Check'), 'plate-inspect');
    await user.type(within(recommend).getByLabelText('Why this check next'), 'The plate was knocked last week');
    await user.click(within(recommend).getByRole('button', { name: 'Recommend this check' }));
    await waitFor(() =>
      expect(calls.find((c) => c.path === '/cases/c1/recommendations')?.init.body).toBe(
        JSON.stringify({ checkId: 'plate-inspect', reason: 'The plate was knocked last week' }),
      ),
    );
    // The answered case replaces the shown one: the check now leads the plan, marked as the coach's.
    expect(await screen.findByText(/Recommended by/)).toHaveTextContent('Recommended by Cole Coach: The plate was knocked last week');
    expect(screen.getByText(/Next check:/)).toHaveTextContent('Next check: Look at the splash plate');
  });

  it('puts the server’s reason under the field when a request is refused', async () => {
    setPhoneWidth(false);
    mockApi({
      ...empty,
      'GET /auth/me': meReply(coach),
      'GET /cases/c1': { status: 200, body: sharedCase() },
      'POST /cases/c1/photo-requests': { status: 400, body: { statusCode: 400, error: 'Bad Request', message: 'Invalid', fields: { what: ['what must be at most 300 characters'] } } },
    });
    renderApp('/cases/c1');
    const user = userEvent.setup();
    const panel = await screen.findByRole('region', { name: 'Photos asked for' });
    await user.type(within(panel).getByLabelText('What the photo should show'), 'The foam');
    await user.click(within(panel).getByRole('button', { name: 'Ask for a photo' }));
    expect(await within(panel).findByText('what must be at most 300 characters')).toBeInTheDocument();
    expect(within(panel).getByLabelText('What the photo should show')).toHaveValue('The foam');
  });
});

describe('case page for the racer who owns it', { timeout: 20_000 }, () => {
  it('shows the recommended check first with who recommended it and why, and shares the case by e-mail', async () => {
    setPhoneWidth(false);
    const calls = mockApi({
      ...empty,
      'GET /auth/me': meReply(racer),
      'GET /cases/c1': { status: 200, body: recommendedCase() },
      'GET /shares?kartId=k1': { status: 200, body: { shares: [] } },
      'POST /shares': (init) => ({
        status: 201,
        body: { id: 's1', scope: 'case', kartId: 'k1', kartName: 'Blue 27', caseId: 'c1', inviteeEmail: JSON.parse(String(init.body)).email, as: 'coach', granteeId: null, granteeName: null, status: 'invited', createdAt: '2026-11-20T12:00:00.000Z' },
      }),
    });
    renderApp('/cases/c1');
    const user = userEvent.setup();

    expect(await screen.findByText(/Recommended by/)).toHaveTextContent('Recommended by Cole Coach: The plate was knocked last week');
    expect(screen.getByText(/Next check:/)).toHaveTextContent('Next check: Look at the splash plate');
    expect(screen.getByRole('button', { name: 'Continue the walk-through' })).toBeInTheDocument();
    const recommended = await screen.findByRole('region', { name: 'Recommended checks' });
    expect(within(recommended).getByText('Not done yet')).toBeInTheDocument();

    const share = await screen.findByRole('region', { name: 'Share with a coach or shop' });
    await user.type(within(share).getByLabelText('Their e-mail'), 'coach@example.test');
    await user.click(within(share).getByRole('button', { name: 'Send invitation' }));
    await waitFor(() =>
      expect(calls.find((c) => c.method === 'POST' && c.path === '/shares')?.init.body).toBe(
        JSON.stringify({ scope: 'case', caseId: 'c1', email: 'coach@example.test', as: 'coach' }),
      ),
    );
    expect(await screen.findByText(/Invitation sent to coach@example.test/)).toBeInTheDocument();
  });

  it('revokes a share after asking', async () => {
    setPhoneWidth(false);
    let status = 'active';
    const share = () => ({ id: 's1', scope: 'case', kartId: 'k1', kartName: 'Blue 27', caseId: 'c1', inviteeEmail: 'coach@example.test', as: 'coach', granteeId: COACH_ID, granteeName: 'Cole Coach', status, createdAt: '2026-11-20T12:00:00.000Z' });
    const calls = mockApi({
      ...empty,
      'GET /auth/me': meReply(racer),
      'GET /cases/c1': { status: 200, body: sharedCase() },
      'GET /shares?kartId=k1': () => ({ status: 200, body: { shares: [share()] } }),
      'DELETE /shares/s1': () => {
        status = 'revoked';
        return { status: 200, body: share() };
      },
    });
    renderApp('/cases/c1');
    const user = userEvent.setup();
    const panel = await screen.findByRole('region', { name: 'Share with a coach or shop' });
    expect(await within(panel).findByText('Has access')).toBeInTheDocument();
    await user.click(within(panel).getByRole('button', { name: 'Revoke the access of Cole Coach' }));
    await user.click(await screen.findByRole('button', { name: 'Revoke access' }));
    expect(await screen.findByText('Cole Coach no longer has access.')).toBeInTheDocument();
    expect(calls.some((c) => c.method === 'DELETE' && c.path === '/shares/s1')).toBe(true);
    await waitFor(() => expect(within(panel).queryByText('Cole Coach')).toBeNull());
  });

  it('uploads a photo as multipart and shows the server’s reason when it refuses the file', async () => {
    setPhoneWidth(false);
    const calls = mockApi({
      ...empty,
      'GET /auth/me': meReply(racer),
      'GET /cases/c1': { status: 200, body: sharedCase() },
      'GET /shares?kartId=k1': { status: 200, body: { shares: [] } },
      'POST /cases/c1/photos': {
        status: 415,
        body: { statusCode: 415, error: 'Unsupported Media Type', message: 'x', fields: { file: ['Only JPEG, PNG and WebP photos are accepted (checked by content, not by name).'] } },
      },
    });
    renderApp('/cases/c1');
    const user = userEvent.setup();
    const panel = await screen.findByRole('region', { name: 'Photos' });
    expect(await within(panel).findByText('No photos yet.')).toBeInTheDocument();
    const input = within(panel).getByLabelText('Photo file');
    expect(input).toHaveAttribute('accept', 'image/jpeg,image/png,image/webp');
    expect(within(panel).getByLabelText('Take a photo')).toHaveAttribute('capture', 'environment');

    await user.upload(input, new File([new Uint8Array([1, 2, 3])], 'foam.jpg', { type: 'image/jpeg' }));
    await user.type(within(panel).getByLabelText('Caption (optional)'), 'Foam');
    await user.click(within(panel).getByRole('button', { name: 'Upload photo' }));
    expect(await within(panel).findByText('Only JPEG, PNG and WebP photos are accepted (checked by content, not by name).')).toBeInTheDocument();
    const sent = calls.find((c) => c.method === 'POST' && c.path === '/cases/c1/photos')!.init.body as FormData;
    expect(sent).toBeInstanceOf(FormData);
    expect((sent.get('file') as File).name).toBe('foam.jpg');
    expect(sent.get('caption')).toBe('Foam');
  });

  it('refuses a file that is not a photo before sending it', async () => {
    setPhoneWidth(false);
    const calls = mockApi({
      ...empty,
      'GET /auth/me': meReply(racer),
      'GET /cases/c1': { status: 200, body: sharedCase() },
      'GET /shares?kartId=k1': { status: 200, body: { shares: [] } },
    });
    renderApp('/cases/c1');
    const panel = await screen.findByRole('region', { name: 'Photos' });
    await userEvent.setup({ applyAccept: false }).upload(within(panel).getByLabelText('Photo file'), new File(['GIF89a'], 'a.gif', { type: 'image/gif' }));
    expect(await within(panel).findByText('Only JPEG, PNG and WebP photos are accepted.')).toBeInTheDocument();
    expect(within(panel).queryByRole('button', { name: 'Upload photo' })).toBeNull();
    expect(calls.some((c) => c.path === '/cases/c1/photos' && c.method === 'POST')).toBe(false);
  });
});

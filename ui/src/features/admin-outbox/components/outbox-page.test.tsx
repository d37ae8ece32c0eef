import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { OutboxMessageDto } from '@fuelwright/shared';
import { makeUser, meReply, mockApi, renderApp } from '../../../test-utils';

const message = (patch: Partial<OutboxMessageDto>): OutboxMessageDto => ({
  id: 'o1',
  kind: 'invitation',
  toEmail: 'coach@example.test',
  subject: 'Rae Racer shared a case with you',
  text: 'Open the link: http://localhost/invitations/abc',
  html: '<p>Open the <a href="http://localhost/invitations/abc">link</a></p><script>parent.alert(1)</script>',
  status: 'sent',
  attempts: 1,
  lastError: null,
  createdAt: '2026-11-20T10:00:00.000Z',
  sentAt: '2026-11-20T10:00:02.000Z',
  ...patch,
});

describe('outbox (admin)', { timeout: 20_000 }, () => {
  it('lists the messages with status and shows the HTML part only in a sandboxed frame', async () => {
    mockApi({
      'GET /auth/me': meReply(makeUser('admin')),
      'GET /admin/outbox': {
        status: 200,
        body: {
          capturing: true,
          messages: [
            message({ id: 'o2', kind: 'comment', subject: 'Cole Coach commented', status: 'pending', attempts: 2, lastError: '451 try later', sentAt: null }),
            message({}),
          ],
        },
      },
    });
    renderApp('/admin/outbox');
    const list = await screen.findByRole('list', { name: 'Messages' });
    const items = within(list).getAllByRole('listitem');
    expect(items.map((item) => within(item).getByText(/commented|shared a case/).textContent)).toEqual(['Cole Coach commented', 'Rae Racer shared a case with you']);
    expect(within(items[0]).getByText('Waiting')).toBeInTheDocument();
    expect(within(items[0]).getByText('451 try later')).toBeInTheDocument();
    expect(screen.getByText(/local capture server/)).toBeInTheDocument();

    const user = userEvent.setup();
    await user.click(within(items[1]).getByRole('button', { name: 'Show the message' }));
    expect(await within(items[1]).findByText('Open the link: http://localhost/invitations/abc')).toBeInTheDocument();
    await user.click(within(items[1]).getByRole('radio', { name: 'HTML' }));
    const frame = within(items[1]).getByTitle('HTML part of: Rae Racer shared a case with you');
    expect(frame.tagName).toBe('IFRAME');
    expect(frame.getAttribute('sandbox')).toBe('');
    expect(frame.getAttribute('srcdoc')).toContain('<a href="http://localhost/invitations/abc">link</a>');
  });

  it('queues a failed message again from its Retry button', async () => {
    let status: OutboxMessageDto['status'] = 'failed';
    const retried: string[] = [];
    mockApi({
      'GET /auth/me': meReply(makeUser('admin')),
      'GET /admin/outbox': () => ({
        status: 200,
        body: { capturing: true, messages: [message({ id: 'o3', kind: 'comment', subject: 'Cole Coach commented', status, attempts: 31, lastError: '451 try later', sentAt: null })] },
      }),
      'POST /admin/outbox/o3/retry': () => {
        retried.push('o3');
        status = 'pending';
        return { status: 200, body: { id: 'o3', status: 'pending' } };
      },
    });
    renderApp('/admin/outbox');
    const [item] = within(await screen.findByRole('list', { name: 'Messages' })).getAllByRole('listitem');
    expect(within(item).getByText('Failed')).toBeInTheDocument();
    await userEvent.setup().click(within(item).getByRole('button', { name: 'Retry: Cole Coach commented' }));
    expect(await within(item).findByText('Waiting')).toBeInTheDocument();
    expect(retried).toEqual(['o3']);
    expect(within(item).queryByRole('button', { name: /^Retry/ })).not.toBeInTheDocument();
  });

  it('says the outbox is for development when the server does not serve it (a real mail service is configured)', async () => {
    mockApi({
      'GET /auth/me': meReply(makeUser('admin')),
      'GET /admin/outbox': { status: 404, body: { statusCode: 404, message: 'The outbox is shown only while the local mail capture is in use (development and tests).' } },
    });
    renderApp('/admin/outbox');
    expect(await screen.findByRole('heading', { name: 'The outbox is shown only in development' })).toBeInTheDocument();
    expect(screen.queryByRole('list', { name: 'Messages' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Try again' })).not.toBeInTheDocument();
  });

  it('is not for other roles', async () => {
    mockApi({ 'GET /auth/me': meReply(makeUser('coach')) });
    renderApp('/admin/outbox');
    expect(await screen.findByRole('heading', { name: 'Not for your role' })).toBeInTheDocument();
  });
});

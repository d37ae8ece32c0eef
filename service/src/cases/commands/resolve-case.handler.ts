import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { SOMETHING_ELSE_ID } from '@fuelwright/shared';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { FieldsBadRequest } from '../../common/validation.js';
import { CaseRanking } from '../case-ranking.js';
import { CaseStore } from '../case-store.js';
import { CaseAudience } from '../case-audience.js';
import { CaseProgressNotices } from '../case-progress-notices.js';
import { MailService } from '../../mail/mail.service.js';
import { loadForStep } from '../case-step.js';
import { ResolveCaseCommand } from './resolve-case.command.js';

@CommandHandler(ResolveCaseCommand)
export class ResolveCaseHandler implements ICommandHandler<ResolveCaseCommand> {
  constructor(
    private readonly store: CaseStore,
    private readonly access: AccessPolicy,
    private readonly ranking: CaseRanking,
    private readonly audience: CaseAudience,
    private readonly mail: MailService,
    private readonly progress: CaseProgressNotices,
  ) {}

  async execute({ user, caseId, input }: ResolveCaseCommand) {
    const l = await loadForStep(this.store, this.access, user, caseId, 'resolved');
    if (input.causeId !== SOMETHING_ELSE_ID && !this.ranking.isKnownCause(input.causeId, l.row.rulesetVersion)) {
      throw new FieldsBadRequest({ causeId: [`unknown cause "${input.causeId}": pick one from the catalog, or ${SOMETHING_ELSE_ID}`] });
    }
    const fix = input.fix.trim();
    const to = await this.audience.of({ caseId, kartId: l.row.kartId, ownerId: l.row.ownerId }, user.id);
    const cause = input.causeId === SOMETHING_ELSE_ID ? 'something else' : (this.ranking.causeLabel(input.causeId, l.row.rulesetVersion) ?? input.causeId);
    await this.store.append(l, user.id, [{ type: 'resolved', payload: { causeId: input.causeId, fix, note: input.note?.trim() ?? '' } }], async (tx) => {
      // Resolving is told by its own notice, not as progress; steps still held go out first.
      await this.progress.release(tx, caseId);
      for (const r of to) {
        await this.mail.enqueue(tx, {
          kind: 'case-resolved',
          toEmail: r.email,
          toUserId: r.id,
          content: {
            subject: `Case resolved on "${l.kartName}": ${cause}`,
            paragraphs: [`${user.displayName} resolved the case on "${l.kartName}".`, `Cause: ${cause}. Fix: ${fix}.`],
          },
        });
      }
    });
    return this.store.dto(await this.store.mustLoad(caseId));
  }
}

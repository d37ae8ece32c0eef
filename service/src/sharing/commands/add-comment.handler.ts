import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { eq } from 'drizzle-orm';
import { cases, comments, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { MailService } from '../../mail/mail.service.js';
import { CaseAudience } from '../../cases/case-audience.js';
import { ReviewContext } from '../review-context.js';
import { AddCommentCommand } from './add-comment.command.js';

@CommandHandler(AddCommentCommand)
export class AddCommentHandler implements ICommandHandler<AddCommentCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly review: ReviewContext,
    private readonly audience: CaseAudience,
    private readonly mail: MailService,
  ) {}

  async execute({ user, caseId, body }: AddCommentCommand) {
    const c = await this.review.load(user, caseId, 'comment');
    const to = await this.audience.of({ caseId, kartId: c.row.kartId, ownerId: c.row.ownerId }, user.id);
    const row = await this.db.transaction(async (tx) => {
      const [inserted] = await tx.insert(comments).values({ caseId, authorId: user.id, body }).returning();
      // A comment is a change to the case: it moves the case up the shared-cases dashboard.
      await tx.update(cases).set({ updatedAt: new Date() }).where(eq(cases.id, caseId));
      for (const r of to) {
        await this.mail.enqueue(tx, {
          kind: 'comment',
          toEmail: r.email,
          toUserId: r.id,
          content: {
            subject: `${user.displayName} commented on the case of "${c.kartName}"`,
            paragraphs: [`${user.displayName} wrote:`, body],
            action: { label: 'Open the case', url: this.review.caseUrl(caseId) },
          },
        });
      }
      return inserted;
    });
    return {
      id: row.id,
      caseId,
      authorId: user.id,
      authorName: user.displayName,
      authorRole: (await this.review.partsOn(c))(user.id, user.role),
      body: row.body,
      createdAt: row.createdAt.toISOString(),
    };
  }
}

import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { setups, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { AccessPolicy } from '../../common/access/access-policy.js';
import { findKart } from '../kart-row.js';
import { listSetupRows } from '../queries/list-setups.handler.js';
import { toSetupDtos } from '../setup-row.js';
import { RecordSetupCommand } from './record-setup.command.js';

@CommandHandler(RecordSetupCommand)
export class RecordSetupHandler implements ICommandHandler<RecordSetupCommand> {
  constructor(
    @Inject(DB) private readonly db: Db,
    private readonly access: AccessPolicy,
  ) {}

  async execute({ user, kartId, input }: RecordSetupCommand) {
    this.access.require(user, await findKart(this.db, kartId), 'edit', 'kart');
    const { note, ...values } = input;
    const [row] = await this.db.insert(setups).values({ ...values, note: note ?? '', kartId, createdBy: user.id }).returning({ id: setups.id });
    const all = toSetupDtos(await listSetupRows(this.db, kartId));
    return all.find((s) => s.id === row.id)!;
  }
}

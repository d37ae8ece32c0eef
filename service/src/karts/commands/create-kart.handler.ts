import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { karts, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { findKart, toKartDto } from '../kart-row.js';
import { CreateKartCommand } from './create-kart.command.js';

@CommandHandler(CreateKartCommand)
export class CreateKartHandler implements ICommandHandler<CreateKartCommand> {
  constructor(@Inject(DB) private readonly db: Db) {}

  async execute({ user, input }: CreateKartCommand) {
    const [row] = await this.db
      .insert(karts)
      .values({ ownerId: user.id, name: input.name, displacementCc: input.displacementCc, drive: input.drive, carburettorKind: input.carburettorKind, notes: input.notes ?? '' })
      .returning({ id: karts.id });
    return toKartDto((await findKart(this.db, row.id))!);
  }
}

import { Inject } from '@nestjs/common';
import { CommandHandler, type ICommandHandler } from '@nestjs/cqrs';
import { eq } from 'drizzle-orm';
import { users, type Db } from '@fuelwright/db';
import { DB } from '../../database/database.tokens.js';
import { readStoredPreferences, toUserPreferences } from '../preferences-row.js';
import { SavePreferencesCommand } from './save-preferences.command.js';

@CommandHandler(SavePreferencesCommand)
export class SavePreferencesHandler implements ICommandHandler<SavePreferencesCommand> {
  constructor(@Inject(DB) private readonly db: Db) {}

  async execute({ userId, preferences }: SavePreferencesCommand) {
    const { temperature, pressure, length } = preferences.units;
    const next = { ...(await readStoredPreferences(this.db, userId)), units: { temperature, pressure, length } };
    await this.db.update(users).set({ preferences: next, updatedAt: new Date() }).where(eq(users.id, userId));
    return toUserPreferences(next);
  }
}

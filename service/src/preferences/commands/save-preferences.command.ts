import { Command } from '@nestjs/cqrs';
import type { UserPreferences } from '@fuelwright/shared';

export class SavePreferencesCommand extends Command<UserPreferences> {
  constructor(
    public readonly userId: string,
    public readonly preferences: UserPreferences,
  ) {
    super();
  }
}

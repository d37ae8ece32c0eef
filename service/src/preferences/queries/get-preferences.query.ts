import { Query } from '@nestjs/cqrs';
import type { UserPreferences } from '@fuelwright/shared';

export class GetPreferencesQuery extends Query<UserPreferences> {
  constructor(public readonly userId: string) {
    super();
  }
}

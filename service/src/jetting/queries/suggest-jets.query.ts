import { Query } from '@nestjs/cqrs';
import type { JetSuggestionInput, JetSuggestionResponse } from '@fuelwright/shared';
import type { SessionUser } from '../../common/session-user.js';

export class SuggestJetsQuery extends Query<JetSuggestionResponse> {
  constructor(
    public readonly user: SessionUser,
    public readonly kartId: string,
    public readonly input: JetSuggestionInput,
  ) {
    super();
  }
}

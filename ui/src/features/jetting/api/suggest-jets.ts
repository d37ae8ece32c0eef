import { useMutation } from '@tanstack/react-query';
import type { JetSuggestionInput, JetSuggestionResponse } from '@fuelwright/shared';
import { api } from '../../../lib/api-client';

/** POST /api/karts/:id/jet-suggestion: today's jets from the sessions that ran right (409 while there is none). */
export async function suggestJets(kartId: string, input: JetSuggestionInput): Promise<JetSuggestionResponse> {
  return api.post<JetSuggestionResponse>(`/karts/${encodeURIComponent(kartId)}/jet-suggestion`, input);
}

export function useSuggestJets(kartId: string) {
  return useMutation({ mutationFn: (input: JetSuggestionInput) => suggestJets(kartId, input) });
}

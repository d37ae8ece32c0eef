import { useCallback, useSyncExternalStore } from 'react';
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { DEFAULT_UNIT_PREFERENCES, normalizeUnitPreferences, type UnitPreferences, type UserPreferences } from '@fuelwright/shared';
import { api } from './api-client';
import { useCurrentUser } from './current-user';

/**
 * The units the viewer reads and types air figures in. Signed-in users keep them on the server
 * (GET/PUT /api/me/preferences); visitors in this browser (localStorage). The API always speaks
 * °C, hPa and metres: convert with the helpers of @fuelwright/shared's units.
 */

export const UNITS_STORAGE_KEY = 'fuelwright.units';

/** GET /api/me/preferences */
export async function getPreferences(signal?: AbortSignal): Promise<UserPreferences> {
  return api.get<UserPreferences>('/me/preferences', { signal });
}

/** PUT /api/me/preferences */
export async function savePreferences(preferences: UserPreferences): Promise<UserPreferences> {
  return api.put<UserPreferences>('/me/preferences', preferences);
}

export const preferencesQueryKey = ['me', 'preferences'] as const;

export function getPreferencesQueryOptions() {
  return queryOptions({ queryKey: preferencesQueryKey, queryFn: ({ signal }) => getPreferences(signal), staleTime: 5 * 60_000 });
}

// ---- this browser's copy (visitors; also the first guess for a signed-in user) ----

const listeners = new Set<() => void>();
let cachedRaw: string | null | undefined;
let cachedUnits: UnitPreferences = { ...DEFAULT_UNIT_PREFERENCES };

function readStored(): UnitPreferences {
  let raw: string | null = null;
  try {
    raw = window.localStorage.getItem(UNITS_STORAGE_KEY);
  } catch {
    raw = null; // storage blocked: defaults
  }
  if (raw !== cachedRaw) {
    cachedRaw = raw;
    let parsed: unknown = null;
    try {
      parsed = raw ? JSON.parse(raw) : null;
    } catch {
      parsed = null;
    }
    cachedUnits = normalizeUnitPreferences(parsed);
  }
  return cachedUnits;
}

export function storeUnits(units: UnitPreferences): void {
  try {
    window.localStorage.setItem(UNITS_STORAGE_KEY, JSON.stringify(units));
  } catch {
    // not remembered, but used for this visit
  }
  listeners.forEach((l) => l());
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

function useStoredUnits(): UnitPreferences {
  return useSyncExternalStore(subscribe, readStored, () => DEFAULT_UNIT_PREFERENCES);
}

export interface UnitPreferencesState {
  units: UnitPreferences;
  /** Saves the choice (server for a signed-in user, this browser for a visitor). */
  setUnits: (units: UnitPreferences) => void;
  saving: boolean;
  /** The last save failed (the choice still applies on this page). */
  saveError: Error | null;
}

export function useUnitPreferences(): UnitPreferencesState {
  const user = useCurrentUser();
  const stored = useStoredUnits();
  const queryClient = useQueryClient();
  const server = useQuery({ ...getPreferencesQueryOptions(), enabled: user !== null });
  const save = useMutation({
    mutationFn: savePreferences,
    onMutate: (next) => queryClient.setQueryData(preferencesQueryKey, next),
    onSuccess: (saved) => queryClient.setQueryData(preferencesQueryKey, saved),
  });
  const setUnits = useCallback(
    (units: UnitPreferences) => {
      storeUnits(units);
      if (user) save.mutate({ units });
    },
    [user, save.mutate],
  );
  const units = user && server.data ? server.data.units : stored;
  return { units, setUnits, saving: save.isPending, saveError: save.error };
}

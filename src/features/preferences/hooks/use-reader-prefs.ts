import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useCallback, useMemo, useSyncExternalStore } from 'react';
import type { PublicUser } from '@shared/schemas/auth';
import type { UsdaZone } from '@shared/hardiness';
import type { UnitSystem } from '@shared/units';
import { meQueryOptions, useMe } from '@/lib/auth';
import { saveAccountPrefs, type AccountPrefsInput } from '../api/preferences-api';
import { accountPrefsFromStored, parseStoredPrefs, READER_PREFS_STORAGE_KEY, serializePrefs, type ReaderPrefs } from '../lib/reader-prefs';

const listeners = new Set<() => void>();

function readRaw(): string | null {
  try {
    return window.localStorage.getItem(READER_PREFS_STORAGE_KEY);
  } catch {
    // Storage can be switched off (private windows, strict settings); the defaults then apply.
    return null;
  }
}

function subscribe(onChange: () => void): () => void {
  listeners.add(onChange);
  const onStorage = (e: StorageEvent) => {
    if (e.key === READER_PREFS_STORAGE_KEY) onChange();
  };
  window.addEventListener('storage', onStorage);
  return () => {
    listeners.delete(onChange);
    window.removeEventListener('storage', onStorage);
  };
}

function writeLocal(patch: Partial<ReaderPrefs>): void {
  const next = { ...parseStoredPrefs(readRaw()), ...patch };
  try {
    window.localStorage.setItem(READER_PREFS_STORAGE_KEY, serializePrefs(next));
  } catch {
    /* not stored; the page still works with the defaults */
  }
  for (const l of listeners) l();
}

/** The choices stored on this browser, as stored (null when none), kept current across tabs. */
function useStoredPrefs(): string | null {
  return useSyncExternalStore(subscribe, readRaw, () => null);
}

/** The units and zone chosen on this browser, as a new account takes them (see `accountPrefsFromStored`). */
export function useBrowserAccountPrefs(): { unitSystem?: UnitSystem; hardinessZone?: UsdaZone } {
  const raw = useStoredPrefs();
  return useMemo(() => accountPrefsFromStored(raw), [raw]);
}

/** What `useReaderPrefs` gives a screen. */
export interface ReaderPrefsState {
  prefs: ReaderPrefs;
  /** True once we know whether someone is signed in (before that, visitor values show). */
  ready: boolean;
  /** Where the zone and units are kept: the account, or this browser. */
  storedIn: 'account' | 'browser';
  setUnitSystem: (unitSystem: UnitSystem) => void;
  setZone: (zone: UsdaZone | null) => void;
  setContainer: (container: boolean) => void;
  saving: boolean;
  saveError: unknown;
}

/**
 * The reader's units, hardiness zone and container choice. Signed-in readers keep units and zone
 * in their account (saved at once, shown before the server answers, put back if it refuses);
 * visitors keep them in this browser. The container choice always stays in the browser, as the
 * account has no place for it.
 */
export function useReaderPrefs(): ReaderPrefsState {
  const me = useMe();
  const queryClient = useQueryClient();
  const raw = useStoredPrefs();
  const local = useMemo(() => parseStoredPrefs(raw), [raw]);
  const user = me.data ?? null;

  const save = useMutation({
    mutationFn: saveAccountPrefs,
    onMutate: async (input: AccountPrefsInput) => {
      const key = meQueryOptions().queryKey;
      await queryClient.cancelQueries({ queryKey: key });
      const before = queryClient.getQueryData<PublicUser | null>(key);
      if (before) queryClient.setQueryData<PublicUser | null>(key, { ...before, ...input });
      return { before };
    },
    onError: (_error, _input, context) => {
      if (context?.before) queryClient.setQueryData(meQueryOptions().queryKey, context.before);
    },
    onSuccess: (saved) => queryClient.setQueryData(meQueryOptions().queryKey, saved),
  });
  const { mutate } = save;

  const prefs: ReaderPrefs = user ? { unitSystem: user.unitSystem, zone: user.hardinessZone, container: local.container } : local;
  const signedIn = !!user;

  const setUnitSystem = useCallback(
    (unitSystem: UnitSystem) => (signedIn ? mutate({ unitSystem }) : writeLocal({ unitSystem })),
    [signedIn, mutate],
  );
  const setZone = useCallback(
    (zone: UsdaZone | null) => (signedIn ? mutate({ hardinessZone: zone }) : writeLocal({ zone })),
    [signedIn, mutate],
  );
  const setContainer = useCallback((container: boolean) => writeLocal({ container }), []);

  return {
    prefs,
    ready: !me.isPending,
    storedIn: signedIn ? 'account' : 'browser',
    setUnitSystem,
    setZone,
    setContainer,
    saving: save.isPending,
    saveError: save.error,
  };
}

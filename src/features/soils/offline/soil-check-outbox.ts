// Soil checks made in the field wait here, in the browser's IndexedDB (idb-keyval), until the
// server has them: the check as the API takes it, its photo as a Blob, and where sending got to.
// Each check carries a key made once (clientKey); the server stores a check sent twice once.
// A check belongs to the person who made it: only their session sends it or lists it, so a
// phone shared by two people never sends one's check as the other's.
import { createStore, del, entries, get, set } from 'idb-keyval';
import type { SoilSampleCreate } from '../../../../shared/schemas/soils';

const store = createStore('fieldshed-soil-checks', 'waiting');

export type WaitingCheck = {
  /** The check's clientKey, also its key in the store. */
  key: string;
  /** Who made it. */
  userId: number;
  fieldId: number;
  /** What the person sees in the list ("Feel test, silty clay loam"). */
  title: string;
  input: SoilSampleCreate & { clientKey: string };
  photo: { blob: Blob; name: string; clientKey: string } | null;
  /** Set once the server has stored the check, so a photo still to send attaches to it. */
  sampleId: number | null;
  /** 'failed': the server refused it (reason says why); sending again will not help without a change. */
  state: 'waiting' | 'failed';
  reason: string | null;
  madeAt: string;
};

export async function keepCheck(check: Omit<WaitingCheck, 'key' | 'sampleId' | 'state' | 'reason' | 'madeAt'>): Promise<WaitingCheck> {
  const kept: WaitingCheck = { ...check, key: check.input.clientKey, sampleId: null, state: 'waiting', reason: null, madeAt: new Date().toISOString() };
  await set(kept.key, kept, store);
  return kept;
}

/** The person's checks still here, oldest first. */
export async function listChecks(userId: number): Promise<WaitingCheck[]> {
  const all = (await entries<string, WaitingCheck>(store)).map(([, c]) => c).filter((c) => c.userId === userId);
  return all.sort((a, b) => a.madeAt.localeCompare(b.madeAt));
}

export async function changeCheck(key: string, change: Partial<Pick<WaitingCheck, 'sampleId' | 'state' | 'reason'>>): Promise<void> {
  const check = await get<WaitingCheck>(key, store);
  if (check) await set(key, { ...check, ...change }, store);
}

export const dropCheck = (key: string): Promise<void> => del(key, store);

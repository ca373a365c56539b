// Sends the soil checks waiting in the browser, oldest first: the check, then its photo. A
// network failure, a server error or an ended session leaves the rest waiting for the next try;
// a refusal (400, 403, 404, 409, 413, 415, 422) marks that check failed with the server's reason.
// One run at a time per page; the keys make a send repeated by another tab harmless.
import { isApiError } from '../../../lib/api-client';
import { createSoilSample } from '../api/create-soil-sample';
import { uploadSoilPhoto } from '../api/upload-soil-photo';
import { changeCheck, dropCheck, listChecks, type WaitingCheck } from './soil-check-outbox';

/** Worth trying again later: no answer, the server's own trouble, or a session to renew. */
const worthRetrying = (e: unknown) => !isApiError(e) || e.status === 0 || e.status === 401 || e.status === 429 || e.status >= 500;

async function sendOne(check: WaitingCheck): Promise<void> {
  let sampleId = check.sampleId;
  if (sampleId === null) {
    sampleId = (await createSoilSample(check.fieldId, check.input)).id;
    await changeCheck(check.key, { sampleId });
  }
  if (check.photo) {
    const file = new File([check.photo.blob], check.photo.name, { type: check.photo.blob.type });
    await uploadSoilPhoto(check.fieldId, { file, sampleId, clientKey: check.photo.clientKey });
  }
  await dropCheck(check.key);
}

export type SendResult = { sentFieldIds: number[] };

let running: Promise<SendResult> | null = null;

/** Tries every waiting check of the signed-in person once; the fields that got a check, so their screens can refresh. */
export function sendWaitingChecks(userId: number): Promise<SendResult> {
  running ??= (async () => {
    const sentFieldIds: number[] = [];
    try {
      for (const check of await listChecks(userId)) {
        if (check.state !== 'waiting') continue;
        try {
          await sendOne(check);
          sentFieldIds.push(check.fieldId);
        } catch (e) {
          if (worthRetrying(e)) break;
          await changeCheck(check.key, { state: 'failed', reason: e instanceof Error ? e.message : String(e) });
        }
      }
    } finally {
      running = null;
    }
    return { sentFieldIds };
  })();
  return running;
}

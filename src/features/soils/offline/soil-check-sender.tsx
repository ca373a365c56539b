// Sends the signed-in person's soil checks waiting in the browser: once when the app opens,
// whenever the browser says the network is back, and every minute while any wait (a network
// that says it is there may not be). Renders nothing; mounted once for the whole app.
import { useEffect } from 'react';
import { useMe } from '../../auth/api/get-me';
import { useSendWaitingChecks, useWaitingChecks } from './waiting-checks-queries';

const RETRY_MS = 60_000;

function SenderFor({ userId }: { userId: number }) {
  const sendNow = useSendWaitingChecks(userId);
  const anyWaiting = (useWaitingChecks(userId).data ?? []).some((c) => c.state === 'waiting');
  useEffect(() => {
    // A browser that cannot open its store (IndexedDB) has nothing waiting; the Save button says so when used.
    const send = () => void sendNow().catch(() => undefined);
    send();
    window.addEventListener('online', send);
    return () => window.removeEventListener('online', send);
  }, [sendNow]);
  useEffect(() => {
    if (!anyWaiting) return;
    const timer = window.setInterval(() => void sendNow().catch(() => undefined), RETRY_MS);
    return () => window.clearInterval(timer);
  }, [anyWaiting, sendNow]);
  return null;
}

export function SoilCheckSender() {
  const userId = useMe().data?.id;
  return userId === undefined ? null : <SenderFor userId={userId} />;
}

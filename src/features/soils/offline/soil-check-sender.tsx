// Sends the soil checks waiting in the browser: once when the app opens, whenever the browser
// says the network is back, and every minute while any wait (a network that says it is there
// may not be). Renders nothing; mounted once for the whole app.
import { useEffect } from 'react';
import { useSendWaitingChecks, useWaitingChecks } from './waiting-checks-queries';

const RETRY_MS = 60_000;

export function SoilCheckSender() {
  const send = useSendWaitingChecks();
  const anyWaiting = (useWaitingChecks().data ?? []).some((c) => c.state === 'waiting');
  useEffect(() => {
    void send();
    const onOnline = () => void send();
    window.addEventListener('online', onOnline);
    return () => window.removeEventListener('online', onOnline);
  }, [send]);
  useEffect(() => {
    if (!anyWaiting) return;
    const timer = window.setInterval(() => void send(), RETRY_MS);
    return () => window.clearInterval(timer);
  }, [anyWaiting, send]);
  return null;
}

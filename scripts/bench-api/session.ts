// Signed-in requests to a running server for the API benchmarks: sign in as a demo account, read
// JSON, wait for the demo farm's terrain run that the seed queues.
import { DEMO_PASSWORD } from '../../server/db/seeders/demo-farm';

/** Signs in and returns the Cookie header to send. */
export async function signIn(baseUrl: string, email: string): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password: DEMO_PASSWORD }) });
  if (res.status !== 200) throw new Error(`sign-in as ${email} answered ${res.status}: ${await res.text()}`);
  return res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}

export async function getJson<T>(baseUrl: string, path: string, cookie: string): Promise<T> {
  const res = await fetch(`${baseUrl}${path}`, { headers: { cookie } });
  if (res.status !== 200) throw new Error(`GET ${path} answered ${res.status}: ${await res.text()}`);
  return (await res.json()) as T;
}

/** The demo farm's terrain run (queued by the seed) must be done so the board reads its figures. */
export async function waitForTerrain(baseUrl: string, farmId: number, cookie: string): Promise<void> {
  const until = Date.now() + 300_000;
  for (;;) {
    const { latestJob } = await getJson<{ latestJob: { state: string; message: string } | null }>(baseUrl, `/api/farms/${farmId}/elevation`, cookie);
    if (!latestJob || latestJob.state === 'done') return;
    if (latestJob.state === 'failed') throw new Error(`the demo terrain run failed: ${latestJob.message}`);
    if (Date.now() > until) throw new Error('the demo terrain run did not finish in 5 minutes');
    await new Promise((r) => setTimeout(r, 500));
  }
}

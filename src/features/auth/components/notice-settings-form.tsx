// Which mail notices the user gets, one switch per kind; saved as each is changed.
import { Notice } from '../../../components/ui/notice';
import { Loading } from '../../../components/ui/spinner';
import type { NoticeKind } from '../../../../shared/schemas/people';
import { useNoticeSettings } from '../api/get-notice-settings';
import { useUpdateNoticeSettings } from '../api/update-notice-settings';

const WORDS: Record<NoticeKind, { label: string; hint: string }> = {
  'plan-submitted': { label: 'A season plan is submitted for review', hint: 'For advisors.' },
  'plan-returned': { label: 'A season plan comes back with notes', hint: 'For farmers.' },
  'plan-approved': { label: 'A season plan is approved', hint: 'For farmers, and landowners whose fields are in it.' },
  'action-reminder': { label: 'Planned work is coming up', hint: 'A reminder some days before a planned action’s date.' },
  'advisor-digest': { label: 'What the advisor changed yesterday', hint: 'One mail a day at most, for farmers.' },
};

export function NoticeSettingsForm() {
  const settings = useNoticeSettings();
  const update = useUpdateNoticeSettings();
  if (settings.isPending) return <Loading label="Loading your notices…" />;
  if (settings.isError) return <Notice tone="error">{settings.error.message}</Notice>;
  return (
    <fieldset className="flex flex-col gap-2" data-testid="notice-settings">
      <legend className="sr-only">Mail notices</legend>
      {settings.data.map((s) => (
        <label key={s.kind} className="flex items-start gap-3 rounded-md border border-paper-edge bg-white/50 px-3 py-2">
          <input type="checkbox" className="mt-1" checked={s.enabled} disabled={update.isPending} onChange={(e) => update.mutate({ [s.kind]: e.target.checked })} data-testid={`notice-${s.kind}`} />
          <span className="flex flex-col">
            <span className="font-medium">{WORDS[s.kind].label}</span>
            <span className="text-sm text-ink-soft">{WORDS[s.kind].hint}</span>
          </span>
        </label>
      ))}
      {update.isError ? <Notice tone="error">Not saved: {update.error.message}</Notice> : null}
    </fieldset>
  );
}

// Every mail Fieldshed sends, as plain text and simple HTML with the same words. Links start with
// PUBLIC_URL. Each function is pure: data in, { subject, text, html } out.
import type { Role } from '../../../shared/schemas/auth';

export type ComposedMail = { subject: string; text: string; html: string };

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** Paragraphs of text, each either words or a link; the HTML keeps a calm, plain look. */
type Part = string | { link: string; label: string };

/** Notices can be turned off; invitations and password links are sent only when asked for. */
const NOTICE_FOOTER = 'You get this mail from Fieldshed. Notices can be turned off under "Mail notices" in the app.';
const ASKED_FOR_FOOTER = 'You get this mail from Fieldshed because someone asked for it with your address.';

function compose(subject: string, parts: Part[], footer = NOTICE_FOOTER): ComposedMail {
  const text = [...parts.map((p) => (typeof p === 'string' ? p : `${p.label}:\n${p.link}`)), '--', footer].join('\n\n');
  const body = parts
    .map((p) =>
      typeof p === 'string'
        ? `<p>${escapeHtml(p).replace(/\n/g, '<br>')}</p>`
        : `<p><a href="${escapeHtml(p.link)}" style="color:#7a4a2a;font-weight:600">${escapeHtml(p.label)}</a></p>`,
    )
    .join('\n');
  const html = `<!doctype html><html><body style="background:#f6f1e7;color:#2b2620;font-family:Georgia,serif;line-height:1.5;padding:16px">
<div style="max-width:560px;margin:auto">
<p style="font-size:20px;font-weight:600;color:#7a4a2a">Fieldshed</p>
${body}
<p style="font-size:12px;color:#6b6258;border-top:1px solid #d9cfbf;padding-top:8px">${escapeHtml(footer)}</p>
</div></body></html>`;
  return { subject, text, html };
}

const ROLE_WORDS: Record<Role, string> = {
  farmer: 'a farmer: you may change everything on the farm and invite people',
  advisor: 'the advisor: you see every field, work on assessments and review the season plan',
  landowner: 'a landowner: you see the map and the approved plan for the fields that are yours',
};

export function invitationMail(input: { farmName: string; role: Role; invitedBy: string | null; link: string; expiresAt: Date }): ComposedMail {
  const who = input.invitedBy ?? 'The farmer';
  return compose(`${who} invites you to ${input.farmName} on Fieldshed`, [
    `${who} has invited you to join ${input.farmName} on Fieldshed as ${ROLE_WORDS[input.role]}.`,
    { link: input.link, label: 'Open the invitation' },
    `The link works once and until ${input.expiresAt.toUTCString()}. If you did not expect this invitation, ignore this mail.`,
  ], ASKED_FOR_FOOTER);
}

export function passwordResetMail(input: { name: string; link: string; validMinutes: number }): ComposedMail {
  return compose('Choose a new Fieldshed password', [
    `Hello ${input.name},`,
    `Someone (we hope you) asked to choose a new password for your Fieldshed account. The link works once, for ${input.validMinutes} minutes.`,
    { link: input.link, label: 'Choose a new password' },
    'If you did not ask, ignore this mail: your password stays as it is.',
  ], ASKED_FOR_FOOTER);
}

export function confirmAccountMail(input: { name: string; farmName: string; link: string; validHours: number }): ComposedMail {
  return compose('Finish creating your Fieldshed account', [
    `Hello ${input.name},`,
    `Someone (we hope you) asked to create a Fieldshed account with this address, with a new farm called ${input.farmName}. Open the link to finish; it works once, for ${input.validHours} hours.`,
    { link: input.link, label: 'Finish creating the account' },
    'If you did not ask, ignore this mail: no account is made.',
  ], ASKED_FOR_FOOTER);
}

export function accountExistsMail(input: { name: string; signInLink: string; resetLink: string }): ComposedMail {
  return compose('Someone tried to create a Fieldshed account with your address', [
    `Hello ${input.name},`,
    'Someone (perhaps you) asked to create a new Fieldshed account with this address. This address already has an account, so nothing was changed.',
    { link: input.signInLink, label: 'Sign in' },
    { link: input.resetLink, label: 'Forgot your password? Choose a new one' },
    'If it was not you, you need do nothing: your account and password stay as they are.',
  ], ASKED_FOR_FOOTER);
}

export function planSubmittedMail(input: { farmName: string; season: string; by: string; link: string }): ComposedMail {
  return compose(`Season plan ${input.season} of ${input.farmName} is ready for your review`, [
    `${input.by} has submitted the ${input.season} season plan of ${input.farmName} for review.`,
    { link: input.link, label: 'Open the season plan' },
    'You can comment on it, return it with your notes, or approve it.',
  ]);
}

export function planReturnedMail(input: { farmName: string; season: string; by: string; comment: string | null; link: string }): ComposedMail {
  return compose(`Season plan ${input.season} of ${input.farmName} came back with notes`, [
    `${input.by} has returned the ${input.season} season plan of ${input.farmName}.`,
    ...(input.comment ? [`Their note: "${input.comment}"`] : []),
    { link: input.link, label: 'Open the season plan' },
  ]);
}

export function planApprovedMail(input: { farmName: string; season: string; by: string; link: string; forLandowner: boolean }): ComposedMail {
  return compose(`Season plan ${input.season} of ${input.farmName} is approved`, [
    `${input.by} has approved the ${input.season} season plan of ${input.farmName}.`,
    input.forLandowner ? 'You can read the work planned on the fields that are yours.' : 'The work in it can start; mark each action done as it is.',
    { link: input.link, label: 'Open the season plan' },
  ]);
}

export function actionReminderMail(input: { farmName: string; actions: { title: string; fieldName: string; date: string }[]; days: number; link: string }): ComposedMail {
  const list = input.actions.map((a) => `• ${a.date}: ${a.title} on ${a.fieldName}`).join('\n');
  return compose(`Coming up on ${input.farmName} in ${input.days} days`, [
    `Planned work on ${input.farmName} is due in ${input.days} days:`,
    list,
    { link: input.link, label: 'Open the season plan' },
  ]);
}

export function advisorDigestMail(input: { farmName: string; day: string; lines: string[]; link: string }): ComposedMail {
  return compose(`Changes by your advisor on ${input.farmName}, ${input.day}`, [
    `What your advisor changed on ${input.farmName} on ${input.day}:`,
    input.lines.map((l) => `• ${l}`).join('\n'),
    { link: input.link, label: 'Open the farm' },
  ]);
}

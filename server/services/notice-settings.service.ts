// Which notices a person gets: every kind is on until they turn it off.
import { NOTICE_KINDS, type NoticeSettings, type NoticeSettingsUpdate } from '../../shared/schemas/people';
import { NoticeSetting } from '../models';

export async function noticeSettings(userId: number): Promise<NoticeSettings> {
  const chosen = await NoticeSetting.ofUser(userId);
  return NOTICE_KINDS.map((kind) => ({ kind, enabled: chosen.get(kind) ?? true }));
}

export async function putNoticeSettings(userId: number, input: NoticeSettingsUpdate): Promise<NoticeSettings> {
  await NoticeSetting.put(userId, input);
  return noticeSettings(userId);
}

import type { Transaction } from 'sequelize';
import { AuditEvent } from '../models';

export async function recordEvent(
  e: { userId: number | null; farmId: number | null; entity: string; entityId: number | null; action: string; detail?: Record<string, unknown> },
  transaction?: Transaction,
): Promise<void> {
  await AuditEvent.create({ ...e, detail: e.detail ?? {} }, { transaction });
}

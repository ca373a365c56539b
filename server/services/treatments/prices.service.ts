// A farm's price list: read (the example list until someone edits it) and replace, with a
// version check so two people editing at once never overwrite each other silently.
import type { Sequelize, Transaction } from 'sequelize';
import type { PriceList, PricesUpdate } from '../../../shared/schemas/treatments';
import { FarmPrices, User } from '../../models';
import { conflict } from '../../lib/http-error';
import { presentPrices } from '../../presenters/prices.presenter';
import { recordEvent } from '../audit';

type Actor = { userId: number };

const withEditor = { model: User, as: 'editor', attributes: ['name'] };

export async function readPrices(farmId: number, transaction?: Transaction): Promise<PriceList> {
  return presentPrices(await FarmPrices.findByPk(farmId, { include: [withEditor], transaction }));
}

export async function putPrices(sequelize: Sequelize, actor: Actor, farmId: number, update: PricesUpdate): Promise<PriceList> {
  await sequelize.transaction(async (t) => {
    const row = await FarmPrices.findByPk(farmId, { lock: t.LOCK.UPDATE, transaction: t });
    const current = row?.version ?? 0;
    if (current !== update.version) {
      throw conflict(
        'stale_version',
        `Someone changed the price list since you opened it (you had version ${update.version}, it is now ${current}). Reload it and make your change again.`,
        { current: await readPrices(farmId, t) },
      );
    }
    const values = { currency: update.currency, prices: update.prices, amendments: update.amendments ?? row?.amendments ?? null, updatedBy: actor.userId, updatedAt: new Date() };
    if (row) await row.update({ ...values, version: row.version + 1 }, { transaction: t });
    else await FarmPrices.create({ farmId, ...values, version: 1 }, { transaction: t });
    await recordEvent({ userId: actor.userId, farmId, entity: 'farm_prices', entityId: farmId, action: 'updated', detail: { currency: update.currency } }, t);
  });
  return readPrices(farmId);
}

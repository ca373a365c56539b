import type { Sequelize } from 'sequelize';
import { User } from './user.model';
import { Farm } from './farm.model';
import { Membership } from './membership.model';
import { Field } from './field.model';
import { AuditEvent } from './audit-event.model';

export { User, Farm, Membership, Field, AuditEvent };

let initialised: Sequelize | null = null;

/** Binds the models to one Sequelize instance (one per process). */
export function initModels(sequelize: Sequelize): void {
  if (initialised === sequelize) return;
  for (const m of [User, Farm, Membership, Field, AuditEvent]) m.initModel(sequelize);
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Membership.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
  Field.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
  initialised = sequelize;
}

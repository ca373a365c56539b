// The model layer: one Sequelize model class per table, each in its own file with its typed
// attributes, `initModel` and `associate`. PostGIS work Sequelize cannot express lives in a
// `*.queries.ts` beside its model. Nothing outside server/models talks SQL.
import type { Sequelize } from 'sequelize';
import { User } from './user.model';
import { Farm } from './farm.model';
import { Membership } from './membership.model';
import { Field } from './field.model';
import { AuditEvent } from './audit-event.model';
import { SoilSample } from './soil-sample.model';
import { SoilPhoto } from './soil-photo.model';
import { SoilMap } from './soil-map.model';
import { SoilMapUnit } from './soil-map-unit.model';
import { ElevationModel } from './elevation-model.model';
import { ProcessingJob } from './processing-job.model';
import { FieldTerrain } from './field-terrain.model';
import { TerrainLayer } from './terrain-layer.model';
import { TerrainGrid } from './terrain-grid.model';
import { Season } from './season.model';
import { FieldCropping } from './field-cropping.model';
import { FarmClimate } from './farm-climate.model';
import { FieldGround } from './field-ground.model';
import { Assessment } from './assessment.model';
import { FarmPrices } from './farm-prices.model';
import { FieldFactorOverride } from './field-factor-override.model';
import { Plan } from './plan.model';
import { PlanAction } from './plan-action.model';
import { PlanComment } from './plan-comment.model';
import { PlanVersion } from './plan-version.model';
import { UserSession } from './user-session.model';
import { Invitation } from './invitation.model';
import { PasswordReset } from './password-reset.model';
import { OutgoingMail } from './outgoing-mail.model';
import { DevMailboxMessage } from './dev-mailbox-message.model';
import { NoticeSetting } from './notice-setting.model';
import { RegistrationRequest } from './registration-request.model';

export {
  User, Farm, Membership, Field, AuditEvent, SoilSample, SoilPhoto, SoilMap, SoilMapUnit, ElevationModel, ProcessingJob, FieldTerrain, TerrainLayer, TerrainGrid,
  Season, FieldCropping, FarmClimate, FieldGround, Assessment, FarmPrices, FieldFactorOverride, Plan, PlanAction, PlanComment, PlanVersion,
  UserSession, Invitation, PasswordReset, OutgoingMail, DevMailboxMessage, NoticeSetting, RegistrationRequest,
};

/** Every model, in an order where a table comes after the tables it refers to. */
const MODELS = [
  User, Farm, Membership, Field, AuditEvent, SoilSample, SoilPhoto, SoilMap, SoilMapUnit, ElevationModel, ProcessingJob, FieldTerrain, TerrainLayer, TerrainGrid,
  Season, FieldCropping, FarmClimate, FieldGround, Assessment, FarmPrices, FieldFactorOverride, Plan, PlanAction, PlanComment, PlanVersion,
  UserSession, Invitation, PasswordReset, OutgoingMail, DevMailboxMessage, NoticeSetting, RegistrationRequest,
];

let initialised: Sequelize | null = null;

/** Binds the models to one Sequelize instance (one per process), then declares associations. */
export function initModels(sequelize: Sequelize): void {
  if (initialised === sequelize) return;
  for (const m of MODELS) m.initModel(sequelize);
  for (const m of MODELS) m.associate();
  initialised = sequelize;
}

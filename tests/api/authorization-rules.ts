// Who may call each API route, one line per route as the router lists it. The matrix test walks
// the app's own route table: a route with no line here fails it, and so does a line whose route
// is gone. The rights follow the design's role table: farmer everything on the farm, advisor
// reviews and edits assessments and plans, landowner reads the map and the approved plan for the
// fields that are theirs, admin nothing on farms they are not a member of.
import type { Role } from '../../shared/schemas/auth';

export type Access =
  /** Anyone, signed in or not (sign-in itself, health, invitation links). */
  | { kind: 'public' }
  /** Any signed-in person; no farm involved. */
  | { kind: 'signed-in' }
  /** Members of the farm in the path with one of these roles; other members 403, others 404. */
  | { kind: 'farm'; roles: Role[] }
  /**
   * As 'farm', on the farm of the field (or its soil check, photo) in the path; a landowner
   * reaches only the fields they own, any other field is a 404.
   */
  | { kind: 'field'; roles: Role[] };

export type Probe =
  /** Called by allowed people with an empty body: they pass the checks and get this status. */
  | { allowed: number }
  /** Not called by allowed people here (it would delete the rows the matrix uses); its own tests cover it. */
  | { allowed: 'not-called'; coveredBy: string };

export type Rule = Access & Probe;

const farm = (roles: Role[], allowed: Probe['allowed'] = 200, coveredBy = ''): Rule =>
  (allowed === 'not-called' ? { kind: 'farm', roles, allowed, coveredBy } : { kind: 'farm', roles, allowed });
const field = (roles: Role[], allowed: Probe['allowed'] = 200, coveredBy = ''): Rule =>
  (allowed === 'not-called' ? { kind: 'field', roles, allowed, coveredBy } : { kind: 'field', roles, allowed });

const EVERY: Role[] = ['farmer', 'advisor', 'landowner'];
const PLANNERS: Role[] = ['farmer', 'advisor'];
const FARMER: Role[] = ['farmer'];
const ADVISOR: Role[] = ['advisor'];

export const RULES: Record<string, Rule> = {
  'GET /api/health': { kind: 'public', allowed: 200 },
  'GET /api/config': { kind: 'public', allowed: 200 },
  // Only while mail goes to the local fake (development, tests); no sign-in so a forgotten password can be reset there.
  'GET /api/dev/mailbox': { kind: 'public', allowed: 200 },
  'POST /api/auth/register': { kind: 'public', allowed: 400 },
  'POST /api/auth/login': { kind: 'public', allowed: 400 },
  'POST /api/auth/logout': { kind: 'public', allowed: 'not-called', coveredBy: 'auth.test.ts' },
  'POST /api/auth/forgot': { kind: 'public', allowed: 400 },
  'POST /api/auth/reset': { kind: 'public', allowed: 400 },
  'GET /api/invitations/:token': { kind: 'public', allowed: 404 },
  'POST /api/invitations/:token/accept': { kind: 'public', allowed: 400 },
  'POST /api/auth/password': { kind: 'signed-in', allowed: 400 },
  'GET /api/auth/me/notices': { kind: 'signed-in', allowed: 200 },
  'PUT /api/auth/me/notices': { kind: 'signed-in', allowed: 200 },
  'GET /api/auth/me': { kind: 'signed-in', allowed: 200 },
  'PATCH /api/auth/me': { kind: 'signed-in', allowed: 200 },
  'GET /api/farms/': { kind: 'signed-in', allowed: 200 },
  'GET /api/board/': { kind: 'signed-in', allowed: 200 },
  'POST /api/estimate/': { kind: 'signed-in', allowed: 400 },
  'GET /api/jobs/:jobId': farm(EVERY),

  'GET /api/farms/:farmId': farm(EVERY),
  'GET /api/farms/:farmId/fields': farm(EVERY),
  'POST /api/farms/:farmId/fields': farm(FARMER, 400),
  'POST /api/farms/:farmId/fields/import': farm(FARMER, 400),
  'GET /api/farms/:farmId/people': farm(PLANNERS),
  'POST /api/farms/:farmId/invitations': farm(FARMER, 400),
  'DELETE /api/farms/:farmId/invitations/:invitationId': farm(FARMER, 'not-called', 'people-invitations.test.ts'),
  'PATCH /api/farms/:farmId/people/:membershipId': farm(FARMER, 400),
  'DELETE /api/farms/:farmId/people/:membershipId': farm(FARMER, 'not-called', 'people-invitations.test.ts'),
  'POST /api/farms/:farmId/dems': farm(FARMER, 400),
  'GET /api/farms/:farmId/elevation': farm(PLANNERS),
  'GET /api/farms/:farmId/layers': farm(EVERY),
  // 404: no layer images yet (no elevation model run).
  'GET /api/farms/:farmId/layers/:file': farm(PLANNERS, 404),
  'GET /api/farms/:farmId/slope-classes': farm(EVERY),
  'PUT /api/farms/:farmId/slope-classes': farm(PLANNERS, 400),
  'GET /api/farms/:farmId/soil-map': farm(PLANNERS),
  'POST /api/farms/:farmId/soil-map': farm(PLANNERS, 400),
  // 404: the matrix's farm has no soil map to map.
  'PUT /api/farms/:farmId/soil-map/mapping': farm(PLANNERS, 404),
  'DELETE /api/farms/:farmId/soil-map': farm(PLANNERS, 'not-called', 'soils-map.test.ts'),
  'GET /api/farms/:farmId/seasons': farm(EVERY),
  'POST /api/farms/:farmId/seasons': farm(FARMER, 400),
  'DELETE /api/farms/:farmId/seasons/:label': farm(FARMER, 'not-called', 'season-lifecycle.test.ts'),
  'GET /api/farms/:farmId/climate': farm(EVERY),
  'PUT /api/farms/:farmId/climate': farm(PLANNERS, 400),
  'POST /api/farms/:farmId/climate/rainfall-record': farm(PLANNERS, 400),
  'GET /api/farms/:farmId/board': farm(EVERY),
  'GET /api/farms/:farmId/prices': farm(PLANNERS),
  'PUT /api/farms/:farmId/prices': farm(PLANNERS, 400),
  'GET /api/farms/:farmId/treatments': farm(PLANNERS),
  'POST /api/farms/:farmId/budget-plan': farm(PLANNERS, 400),
  'GET /api/farms/:farmId/plans': farm(EVERY),
  'POST /api/farms/:farmId/plans': farm(PLANNERS, 400),
  'GET /api/farms/:farmId/changes': farm(PLANNERS),
  'GET /api/farms/:farmId/soil-loss-history': farm(PLANNERS),
  // 400: no format asked for.
  'GET /api/farms/:farmId/export': farm(EVERY, 400),

  'GET /api/fields/:fieldId': field(EVERY),
  'PATCH /api/fields/:fieldId': field(FARMER, 400),
  'DELETE /api/fields/:fieldId': field(FARMER, 'not-called', 'fields.test.ts'),
  // 404: no elevation model has been run on the matrix's farm.
  'GET /api/fields/:fieldId/terrain': field(EVERY, 404),
  'GET /api/fields/:fieldId/soil-samples': field(EVERY),
  'POST /api/fields/:fieldId/soil-samples': field(PLANNERS, 400),
  'POST /api/fields/:fieldId/soil-samples/import': field(PLANNERS, 400),
  'PATCH /api/soil-samples/:sampleId': field(PLANNERS, 400),
  'DELETE /api/soil-samples/:sampleId': field(PLANNERS, 'not-called', 'soils-samples.test.ts'),
  'GET /api/fields/:fieldId/soil-photos': field(EVERY),
  'POST /api/fields/:fieldId/soil-photos': field(PLANNERS, 400),
  'GET /api/soil-photos/:photoId/image': field(EVERY),
  'GET /api/soil-photos/:photoId/thumbnail': field(EVERY),
  'DELETE /api/soil-photos/:photoId': field(PLANNERS, 'not-called', 'soils-photos.test.ts'),
  'GET /api/fields/:fieldId/soil-map-units': field(EVERY),
  'GET /api/fields/:fieldId/soil-summary': field(EVERY),
  'GET /api/fields/:fieldId/ground': field(EVERY),
  'PUT /api/fields/:fieldId/ground': field(PLANNERS, 400),
  'GET /api/fields/:fieldId/cropping': field(EVERY),
  'PUT /api/fields/:fieldId/cropping': field(PLANNERS, 400),
  'GET /api/fields/:fieldId/assessment': field(EVERY),
  'GET /api/fields/:fieldId/overrides': field(EVERY),
  'PUT /api/fields/:fieldId/overrides': field(PLANNERS, 400),
  'DELETE /api/fields/:fieldId/overrides/:factor': field(PLANNERS, 'not-called', 'factor-overrides.test.ts'),
  'GET /api/fields/:fieldId/treatments': field(PLANNERS),

  // Plans are the farm's; a landowner reads a plan once a revision of it is approved (the
  // matrix's plan is) and never writes.
  'GET /api/plans/:planId': farm(EVERY),
  'GET /api/plans/:planId/versions': farm(EVERY),
  'GET /api/plans/:planId/report.pdf': farm(EVERY),
  'POST /api/plans/:planId/actions': farm(PLANNERS, 400),
  'POST /api/plans/:planId/actions/from-option': farm(PLANNERS, 400),
  'POST /api/plans/:planId/submit': farm(FARMER, 400),
  'POST /api/plans/:planId/return': farm(ADVISOR, 400),
  'POST /api/plans/:planId/approve': farm(ADVISOR, 400),
  'POST /api/plans/:planId/comments': farm(PLANNERS, 400),
  'PATCH /api/plan-actions/:actionId': farm(PLANNERS, 400),
  'DELETE /api/plan-actions/:actionId': farm(PLANNERS, 'not-called', 'plans.test.ts'),
  'POST /api/plan-actions/:actionId/done': farm(PLANNERS, 400),
  'POST /api/plan-actions/:actionId/check': farm(ADVISOR, 400),
  // 404: no photo on the action.
  'GET /api/plan-actions/:actionId/photo': farm(PLANNERS, 404),
  'GET /api/plan-actions/:actionId/photo/thumbnail': farm(PLANNERS, 404),
};

// A farm for the reports and exports tests: the demo-like farm (its climate, fields, cropping and
// soil checks), one field owned by its landowner, and a season plan with actions on every field
// (earthwork, lime and a typed action whose title looks like a spreadsheet formula), approved by
// the advisor; then a draft change the landowner must not see.
import type { Sequelize } from 'sequelize';
import type { Express } from 'express';
import { Field } from '../../server/models';
import { makeDemoLikeFarm } from './demo-like-farm';
import request from 'supertest';
import { TEST_PASSWORD } from './test-app';

export const FORMULA_TITLE = '=HYPERLINK("http://example.test","click")';

/** A supertest agent signed in as the user, on an app or a running server's URL. */
async function signedInAt(target: Express | string, email: string) {
  const agent = request.agent(target);
  const res = await agent.post('/api/auth/login').send({ email, password: TEST_PASSWORD });
  if (res.status !== 200) throw new Error(`login failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

export async function makePlanFarm(app: Express | string, sequelize: Sequelize) {
  const made = await makeDemoLikeFarm(sequelize);
  const { farm, users, memberships, ids, season } = made;
  await Field.update({ ownerMembershipId: memberships.landowner.id }, { where: { id: ids['Mill Hill'] } });
  const farmer = await signedInAt(app, users.farmer.email);
  const advisor = await signedInAt(app, users.advisor.email);
  const landowner = await signedInAt(app, users.landowner.email);
  const plan = (await farmer.post(`/api/farms/${farm.id}/plans`).send({ season })).body;
  const actions = [
    { fieldId: ids['Long Slope'], treatment: 'no-till', quantity: 36, unit: 'ha', cost: 1620, plannedFrom: `${season}-04-20`, plannedTo: `${season}-05-10` },
    { fieldId: ids['Long Slope'], treatment: 'grassed-waterway', quantity: 420, unit: 'm', cost: 15960, plannedOn: `${season}-08-25` },
    { fieldId: ids['Mill Hill'], treatment: 'lime', quantity: 18.5, unit: 't', cost: 925, plannedOn: `${season}-10-02` },
    { fieldId: ids['Mill Hill'], treatment: 'cover-crop', quantity: 9, unit: 'ha', cost: 720, plannedFrom: `${season}-09-20`, plannedTo: `${season}-10-10` },
    { fieldId: ids['Hay Ground'], treatment: 'other', title: FORMULA_TITLE, cost: 50 },
  ];
  let version = 0;
  for (const a of actions) {
    const res = await farmer.post(`/api/plans/${plan.id}/actions`).send(a);
    if (res.status !== 201) throw new Error(`action not added: ${res.status} ${JSON.stringify(res.body)}`);
    version = res.body.plan.version;
  }
  version = (await farmer.post(`/api/plans/${plan.id}/submit`).send({ version })).body.version;
  const approved = await advisor.post(`/api/plans/${plan.id}/approve`).send({ version, comment: 'Fine for this season.' });
  if (approved.status !== 200) throw new Error(`plan not approved: ${approved.status} ${JSON.stringify(approved.body)}`);
  // A change after approval starts a new draft revision: the landowner keeps the approved one.
  await farmer.post(`/api/plans/${plan.id}/actions`).send({ fieldId: ids['Mill Hill'], treatment: 'gypsum', quantity: 5, unit: 't', cost: 400 });
  return { ...made, planId: plan.id as number, agents: { farmer, advisor, landowner } };
}

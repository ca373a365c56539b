// People of a farm and invitations: /api/farms/:farmId/people, /api/farms/:farmId/invitations
// (signed in), and the public answer to an invitation link, /api/invitations/:token.
import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import type { Config } from '../config';
import { InvitationAccept, InvitationCreate, MembershipUpdate } from '../../shared/schemas/people';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { parseId, validate } from '../middleware/validate';
import { perIpLimit } from '../middleware/rate-limits';
import { acceptInvitation, cancelInvitation, invite, viewInvitation } from '../services/people/invitations.service';
import { changeRole, listPeople, removePerson } from '../services/people/people.service';
import { INVITES_PER_IP, LINK_USES_PER_IP } from '../services/people/abuse-limits';
import { issueSession } from '../services/sessions';
import { presentUser } from '../presenters/user.presenter';

export function peopleRoutes(sequelize: Sequelize, config: Config): { farms: Router; invitations: Router } {
  const inviteLimit = perIpLimit(INVITES_PER_IP, 'Too many invitations from this network; wait a quarter of an hour.');
  const linkLimit = perIpLimit(LINK_USES_PER_IP, 'Too many attempts from this network; wait a quarter of an hour.');

  const farms = Router();
  farms.get('/:farmId/people', loadFarmMembership, requireRole('farmer', 'advisor'), async (req, res) => {
    res.json(await listPeople(req.membership!));
  });
  farms.post('/:farmId/invitations', inviteLimit, loadFarmMembership, requireRole('farmer'), validate(InvitationCreate), async (req, res) => {
    res.status(201).json(await invite(sequelize, config, { userId: req.user!.id, name: req.user!.name }, req.membership!.farmId, req.body));
  });
  farms.delete('/:farmId/invitations/:invitationId', loadFarmMembership, requireRole('farmer'), async (req, res) => {
    await cancelInvitation(sequelize, { userId: req.user!.id }, req.membership!.farmId, parseId(req.params.invitationId as string, 'invitationId'));
    res.status(204).end();
  });
  farms.patch('/:farmId/people/:membershipId', loadFarmMembership, requireRole('farmer'), validate(MembershipUpdate), async (req, res) => {
    const farmId = req.membership!.farmId;
    await changeRole(sequelize, { userId: req.user!.id }, farmId, parseId(req.params.membershipId as string, 'membershipId'), req.body);
    res.json(await listPeople(req.membership!));
  });
  farms.delete('/:farmId/people/:membershipId', loadFarmMembership, requireRole('farmer'), async (req, res) => {
    await removePerson(sequelize, { userId: req.user!.id }, req.membership!.farmId, parseId(req.params.membershipId as string, 'membershipId'));
    res.status(204).end();
  });

  const invitations = Router();
  invitations.get('/:token', linkLimit, async (req, res) => {
    res.json(await viewInvitation(String(req.params.token)));
  });
  invitations.post('/:token/accept', linkLimit, validate(InvitationAccept), async (req, res) => {
    const { user, farmId } = await acceptInvitation(sequelize, String(req.params.token), req.body);
    await issueSession(res, config, user.id);
    res.json({ user: presentUser(user), farmId });
  });
  return { farms, invitations };
}

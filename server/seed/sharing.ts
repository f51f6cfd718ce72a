/**
 * Demo scenario, sharing part (invented; see bows.ts): Marit shares her first
 * bow with Desmond, the technician at the bench she visits before a season,
 * and he has accepted. Idempotent: a bow that has any share is left as it is.
 */
import { AuditEntry, Bow, Share } from '@/server/models';
import type { SeedStep } from './step';

export const seedSharingStep: SeedStep = async ({ archer, tech }) => {
  const bow = await Bow.findOne({ where: { userId: archer.id }, order: [['id', 'ASC']] });
  if (!bow || (await Share.count({ where: { bowId: bow.id } })) > 0) return;
  const acceptedAt = new Date(Date.now() - 3 * 24 * 3600 * 1000);
  const share = await Share.create({
    bowId: bow.id,
    archerId: archer.id,
    techId: tech.id,
    invitedEmail: tech.email,
    state: 'active',
    acceptedAt,
    revokedAt: null,
  });
  await AuditEntry.bulkCreate([
    {
      actorId: archer.id,
      action: 'invited',
      bowId: bow.id,
      recordType: 'share',
      recordId: share.id,
      summary: `Invited ${tech.email} to see and add to this bow`,
      at: new Date(acceptedAt.getTime() - 3600 * 1000),
    },
    {
      actorId: tech.id,
      action: 'accepted',
      bowId: bow.id,
      recordType: 'share',
      recordId: share.id,
      summary: `${tech.name} accepted the invitation`,
      at: acceptedAt,
    },
  ]);
};

/**
 * The invented demo scenario (people, places and bows are made up). Safe to
 * run on every start: it only adds what is missing.
 */
import { User } from '@/server/models';
import { hashPassword } from '@/server/services/auth-service';
import { seedBowsStep } from './bows'; // bows.ts imports only the SeedStep type from here, so no import cycle
import { seedLevelStep } from './level'; // likewise; runs after the bows it checks
import { seedSharingStep } from './sharing'; // likewise; shares one of the seeded bows
import { seedTuningStep } from './tuning'; // likewise; the hunting bow's tuning records

export const demoAccounts = [
  { role: 'archer', name: 'Marit Oakhollow', email: 'marit@demo.pinwright.test', password: 'pinwright-archer' },
  { role: 'tech', name: 'Desmond Tull (Kettle Creek bow bench)', email: 'desmond@demo.pinwright.test', password: 'pinwright-tech-01' },
  { role: 'admin', name: 'Pinwright Admin', email: 'admin@demo.pinwright.test', password: 'pinwright-admin-01' },
] as const;

/** Extra seeding steps registered by features (bows, checks, …); each must be idempotent. */
export type SeedStep = (accounts: Record<(typeof demoAccounts)[number]['role'], User>) => Promise<void>;
export const seedSteps: SeedStep[] = [];
seedSteps.push(seedBowsStep);
seedSteps.push(seedLevelStep);
seedSteps.push(seedSharingStep);
seedSteps.push(seedTuningStep);

export async function seedDemo(): Promise<void> {
  const accounts = {} as Record<(typeof demoAccounts)[number]['role'], User>;
  for (const account of demoAccounts) {
    let user = await User.findOne({ where: { email: account.email } });
    if (!user) {
      user = await User.create({
        name: account.name,
        email: account.email,
        role: account.role,
        passwordHash: await hashPassword(account.password),
      });
    }
    accounts[account.role] = user;
  }
  for (const step of seedSteps) await step(accounts);
}

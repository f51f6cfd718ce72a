/**
 * The invented demo scenario (people, places and bows are made up). Safe to
 * run on every start: it only adds what is missing.
 */
import { User } from '@/server/models';
import { hashPassword } from '@/server/services/auth-service';
import type { DemoRole, SeedStep } from './step'; // the steps import their type from step.ts, never this module
import { seedBowsStep } from './bows';
import { seedLevelStep } from './level'; // runs after the bows it checks
import { seedSharingStep } from './sharing'; // shares one of the seeded bows
import { seedTuningStep } from './tuning'; // the hunting bow's tuning records

export const demoAccounts = [
  { role: 'archer', name: 'Marit Oakhollow', email: 'marit@demo.pinwright.test', password: 'pinwright-archer' },
  { role: 'tech', name: 'Desmond Tull (Kettle Creek bow bench)', email: 'desmond@demo.pinwright.test', password: 'pinwright-tech-01' },
  { role: 'admin', name: 'Pinwright Admin', email: 'admin@demo.pinwright.test', password: 'pinwright-admin-01' },
] as const satisfies readonly { role: DemoRole; name: string; email: string; password: string }[];

/** Extra seeding steps registered by features (bows, checks, …); each must be idempotent. */
export const seedSteps: SeedStep[] = [];
seedSteps.push(seedBowsStep);
seedSteps.push(seedLevelStep);
seedSteps.push(seedSharingStep);
seedSteps.push(seedTuningStep);

export async function seedDemo(): Promise<void> {
  const accounts = {} as Record<DemoRole, User>;
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

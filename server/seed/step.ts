/**
 * The shape of a demo seeding step (server/seed/demo.ts runs them in order).
 * In its own module so the steps need not import demo.ts, which imports them.
 */
import type { User } from '@/server/models';

/** The demo accounts' roles (demoAccounts in demo.ts has one account of each). */
export type DemoRole = 'archer' | 'tech' | 'admin';

/** One idempotent seeding step, given the demo account of each role. */
export type SeedStep = (accounts: Record<DemoRole, User>) => Promise<void>;

/**
 * The API's table of contents: every router and where it is mounted.
 * Feature routers add one line here.
 */
import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { authRoutes, meRoutes } from './auth';
import { healthRoutes } from './health';
import { adminRoutes } from './admin';

export function apiRoutes(sequelize: Sequelize) {
  const api = Router();
  api.use('/health', healthRoutes(sequelize));
  api.use('/auth', authRoutes());
  api.use('/me', meRoutes());
  api.use('/admin', adminRoutes());
  return api;
}

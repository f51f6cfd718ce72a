/**
 * Settings for tests/api/property.test.ts, imported before anything reads
 * server/config.ts: its own upload folder (so "no orphan files" can be checked
 * against this run's photos only) and a low bcrypt cost (thousands of
 * generated sign-ins and sign-ups; the cost is not what is under test there).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

export const propertyUploadDir = fs.mkdtempSync(path.join(os.tmpdir(), 'pinwright-property-uploads-'));
process.env.UPLOAD_DIR = propertyUploadDir;
process.env.BCRYPT_COST = '4';

// The one place that reads the environment. Everything else imports `config`.
// database.js reads the same DB_* variables for sequelize-cli.
import crypto from 'node:crypto';

import { DEFAULT_UPLOAD_MAX_MB } from '../../shared/files';
import { DEFAULT_CLAIM_MINUTES } from '../../shared/review-rules';

const env = process.env;
const nodeEnv = env.NODE_ENV ?? 'development';

function number(name: string, fallback: number): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isFinite(value)) throw new Error(`${name} must be a number, got "${raw}"`);
  return value;
}

const sessionSecret = env.SESSION_SECRET ?? (nodeEnv === 'production' ? '' : 'sightline-local-session-secret');
if (!sessionSecret) throw new Error('SESSION_SECRET must be set in production');

export const config = {
  env: nodeEnv,
  isTest: nodeEnv === 'test',
  host: env.HOST ?? '127.0.0.1',
  port: number('PORT', 8080),
  appUrl: env.APP_URL ?? `http://${env.HOST ?? '127.0.0.1'}:${env.PORT ?? 8080}`,
  // Number of proxy hops to trust for X-Forwarded-* (0 when nothing sits in front).
  trustProxy: number('TRUST_PROXY', 0),
  sessionSecret,
  sessionMaxAgeHours: number('SESSION_MAX_AGE_HOURS', 12),
  // However active, a session ends this long after sign-in.
  sessionAbsoluteHours: number('SESSION_ABSOLUTE_HOURS', 24),
  db: {
    host: env.DB_HOST ?? '127.0.0.1',
    port: number('DB_PORT', 3407),
    name: env.DB_NAME ?? 'sightline',
    user: env.DB_USER ?? 'sightline',
    password: env.DB_PASSWORD ?? 'sightline-local',
  },
  signInLimits: {
    windowMinutes: number('SIGNIN_WINDOW_MINUTES', 15),
    failuresPerAccount: number('SIGNIN_FAILURES_PER_ACCOUNT', 5),
    failuresPerIp: number('SIGNIN_FAILURES_PER_IP', 30),
  },
  smtp: {
    host: env.SMTP_HOST ?? '127.0.0.1',
    port: number('SMTP_PORT', 2525),
    from: env.MAIL_FROM ?? 'Sightline <no-reply@sightline.invalid>',
  },
  outbox: {
    // How often each instance's worker looks for e-mail to send (0 turns the worker off).
    intervalMs: number('OUTBOX_INTERVAL_MS', 3000),
    lockSeconds: number('OUTBOX_LOCK_SECONDS', 60),
    maxBackoffSeconds: number('OUTBOX_MAX_BACKOFF_SECONDS', 900),
    // After this many failed attempts a message is marked failed and shown to managers.
    maxAttempts: number('OUTBOX_MAX_ATTEMPTS', 8),
  },
  risk: {
    // How often the rework-risk model is refitted (one instance fits; 0 turns it off, as under
    // test, where a fit would write while tests count rows).
    fitIntervalMs: number('RISK_FIT_INTERVAL_MS', nodeEnv === 'test' ? 0 : 6 * 3_600_000),
    // Reviewed revisions needed before the hint is shown.
    minReviews: number('RISK_MIN_REVIEWS', 200),
  },
  // Time the technician has to answer a rework request; a reminder goes out after it.
  reworkHours: number('REWORK_HOURS', 48),
  // How long a link sent to the adjuster stays open; a manager may revoke or re-issue it.
  shareLinkDays: number('SHARE_LINK_DAYS', 30),
  // Admins can always read the local fake mailbox; in development everyone can.
  mailboxOpenToAll: env.MAILBOX_OPEN === 'true',
  mailboxUrl: env.MAILBOX_URL ?? 'http://127.0.0.1:2580',
  s3: {
    endpoint: env.S3_ENDPOINT ?? 'http://127.0.0.1:4569',
    region: env.S3_REGION ?? 'us-east-1',
    bucket: env.S3_BUCKET ?? 'sightline-files',
    accessKeyId: env.S3_ACCESS_KEY_ID ?? 'S3RVER',
    secretAccessKey: env.S3_SECRET_ACCESS_KEY ?? 'S3RVER',
    connectTimeoutMs: number('S3_CONNECT_TIMEOUT_MS', 2000),
    requestTimeoutMs: number('S3_REQUEST_TIMEOUT_MS', 8000),
  },
  review: {
    claimMinutes: number('CLAIM_MINUTES', DEFAULT_CLAIM_MINUTES),
    // Share of accepted first reviews drawn for a blind second review (calibration).
    secondReviewShare: number('SECOND_REVIEW_SHARE', 0.1),
  },
  // Maximum spacing between stations per camera class, in metres. Defaults are common practice
  // (no published source): 6 ft for a tripod depth camera, 5 ft for a 360 camera.
  stationSpacingM: {
    tripod_depth: number('SPACING_TRIPOD_DEPTH_M', 6 * 0.3048),
    camera_360: number('SPACING_CAMERA_360_M', 5 * 0.3048),
    handheld_lidar: env.SPACING_HANDHELD_LIDAR_M ? number('SPACING_HANDHELD_LIDAR_M', 0) : null,
    laser_scanner: number('SPACING_LASER_SCANNER_M', 10),
  } as Record<'tripod_depth' | 'camera_360' | 'handheld_lidar' | 'laser_scanner', number | null>,
  // Outdoors (the exterior level): from memory, common practice; see MAX_OUTDOOR_STATION_SPACING_M.
  outdoorStationSpacingM: {
    tripod_depth: number('OUTDOOR_SPACING_TRIPOD_DEPTH_M', 10 * 0.3048),
    camera_360: number('OUTDOOR_SPACING_CAMERA_360_M', 10 * 0.3048),
    handheld_lidar: null,
    laser_scanner: number('OUTDOOR_SPACING_LASER_SCANNER_M', 15),
  } as Record<'tripod_depth' | 'camera_360' | 'handheld_lidar' | 'laser_scanner', number | null>,
  uploadMaxBytes: number('UPLOAD_MAX_MB', DEFAULT_UPLOAD_MAX_MB) * 1024 * 1024,
  instanceId: env.INSTANCE_ID ?? crypto.randomUUID(),
};

export type Config = typeof config;

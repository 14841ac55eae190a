import { Router } from 'express';

const CHECK_TIMEOUT_MS = 2_000;

/** Liveness plus a database round trip; answers 503 while the database is away. */
export function healthRouter(checkDatabase: () => Promise<unknown>) {
  const router = Router();
  router.get('/', async (_req, res) => {
    const timeout = new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), CHECK_TIMEOUT_MS).unref());
    const db = await Promise.race([checkDatabase(), timeout]).then(
      () => 'ok' as const,
      () => 'down' as const,
    );
    res.status(db === 'ok' ? 200 : 503).json({ status: db === 'ok' ? 'ok' : 'degraded', db });
  });
  return router;
}

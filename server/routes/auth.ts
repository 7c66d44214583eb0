import { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import { changePasswordInput, forgotPasswordInput, loginInput, redeemTokenInput, type SessionAnswer } from '../../shared/schemas/auth.js';
import { config } from '../config.js';
import { actorOf, requireAuth, sessionCookieName, sessionCookieOptions } from '../middleware/auth.js';
import { validated } from '../middleware/validate.js';
import * as auth from '../services/auth.js';

export const authRouter = Router();

/** The known-device cookie (OWASP device cookies): lets this browser's own person in while others are throttled. */
const deviceCookieName = () => (config().COOKIE_SECURE ? '__Host-gridkeep_device' : 'gridkeep_device');

const meta = (req: Request): auth.AttemptMeta => {
  const deviceToken: unknown = req.cookies?.[deviceCookieName()];
  return {
    ip: req.ip ?? '',
    userAgent: req.get('user-agent') ?? '',
    deviceToken: typeof deviceToken === 'string' ? deviceToken : undefined,
  };
};

function sendSession(res: Response, session: auth.IssuedSession) {
  res.cookie(sessionCookieName(), session.token, sessionCookieOptions(session.maxAgeMs));
  if (session.deviceToken) res.cookie(deviceCookieName(), session.deviceToken, sessionCookieOptions(auth.DEVICE_COOKIE_MAX_AGE_MS));
  res.json({ user: session.user });
}

authRouter.post(
  '/login',
  validated({ body: loginInput }, async ({ body }, req, res) => {
    sendSession(res, await auth.signIn(body, meta(req)));
  }),
);

authRouter.post('/logout', async (req, res) => {
  if (req.actor) await auth.signOut(req.actor);
  res.clearCookie(sessionCookieName(), sessionCookieOptions());
  res.status(204).end();
});

authRouter.get('/me', requireAuth, async (req, res) => {
  res.json({ user: await auth.currentUser(actorOf(req)) });
});

// What the app asks on every first load: signed out is an answer here (200, no user), not an
// error, so a browser opening the sign-in page logs nothing. `/me` keeps its 401 for callers
// that need a session.
authRouter.get('/session', async (req, res) => {
  const answer: SessionAnswer = { user: req.actor ? await auth.currentUser(req.actor) : null };
  res.json(answer);
});

authRouter.post(
  '/password',
  requireAuth,
  validated({ body: changePasswordInput }, async ({ body }, req, res) => {
    const session = await auth.changePassword(actorOf(req), body, meta(req));
    res.cookie(sessionCookieName(), session.token, sessionCookieOptions(session.maxAgeMs));
    res.status(204).end();
  }),
);

authRouter.post(
  '/forgot',
  validated({ body: forgotPasswordInput }, async ({ body }, req, res) => {
    await auth.admitResetRequest(body.email, meta(req).ip);
    // Answer first: whether the address has an account decides the work, never the answer's time.
    res.status(202).json({ message: 'If that address belongs to an account, a reset link is on its way.' });
    auth.afterAnswer('password reset', () => auth.requestPasswordReset(body.email));
  }),
);

const tokenParams = z.object({ token: z.string().min(20).max(200) });

authRouter.get(
  '/tokens/:token',
  validated({ params: tokenParams }, async ({ params }, _req, res) => {
    res.json(await auth.describeLinkToken(params.token));
  }),
);

authRouter.post(
  '/redeem',
  validated({ body: redeemTokenInput }, async ({ body }, req, res) => {
    sendSession(res, await auth.redeemLinkToken(body, meta(req)));
  }),
);

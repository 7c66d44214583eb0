import { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import {
  changePasswordInput,
  forgotPasswordInput,
  loginInput,
  redeemTokenInput,
  type ChangePasswordInput,
  type LoginInput,
  type RedeemTokenInput,
} from '../../shared/schemas/auth.js';
import { actorOf, requireAuth, sessionCookieName, sessionCookieOptions } from '../middleware/auth.js';
import { validate } from '../middleware/validate.js';
import * as auth from '../services/auth.js';

export const authRouter = Router();

const meta = (req: Request) => ({ ip: req.ip ?? '', userAgent: req.get('user-agent') ?? '' });

function sendSession(res: Response, session: auth.IssuedSession) {
  res.cookie(sessionCookieName(), session.token, sessionCookieOptions(session.maxAgeMs));
  res.json({ user: session.user });
}

authRouter.post('/login', validate({ body: loginInput }), async (req, res) => {
  sendSession(res, await auth.signIn(req.valid.body as LoginInput, meta(req)));
});

authRouter.post('/logout', async (req, res) => {
  if (req.actor) await auth.signOut(req.actor);
  res.clearCookie(sessionCookieName(), sessionCookieOptions());
  res.status(204).end();
});

authRouter.get('/me', requireAuth, async (req, res) => {
  res.json({ user: await auth.currentUser(actorOf(req)) });
});

authRouter.post('/password', requireAuth, validate({ body: changePasswordInput }), async (req, res) => {
  const session = await auth.changePassword(actorOf(req), req.valid.body as ChangePasswordInput, meta(req));
  res.cookie(sessionCookieName(), session.token, sessionCookieOptions(session.maxAgeMs));
  res.status(204).end();
});

authRouter.post('/forgot', validate({ body: forgotPasswordInput }), async (req, res) => {
  await auth.requestPasswordReset((req.valid.body as { email: string }).email);
  res.status(202).json({ message: 'If that address belongs to an account, a reset link is on its way.' });
});

authRouter.get('/tokens/:token', validate({ params: z.object({ token: z.string().min(20).max(200) }) }), async (req, res) => {
  res.json(await auth.describeLinkToken((req.valid.params as { token: string }).token));
});

authRouter.post('/redeem', validate({ body: redeemTokenInput }), async (req, res) => {
  sendSession(res, await auth.redeemLinkToken(req.valid.body as RedeemTokenInput, meta(req)));
});

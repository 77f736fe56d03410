import type { CookieOptions, Request, Response } from 'express';
import type { AppContext } from '../app-context';
import { securedRouter } from './access';
import { AuthService, type SignedIn } from './auth.service';
import { AcceptInvitationDto, ChangePasswordDto, ResetConfirmDto, ResetRequestDto, SignInDto, TokenDto } from './auth.dto';
import { validateBody } from '../shared/validate-body';
import { signInThrottle } from './sign-in-throttle';
import { UnauthorizedError } from '../shared/errors';

export const REFRESH_COOKIE = 'kx_refresh';

export function authRoutes(ctx: AppContext) {
  const auth = new AuthService(ctx);
  const r = securedRouter('/auth', ctx.config.publicRead);
  const cookieOptions = (req: Request): CookieOptions => ({
    httpOnly: true,
    sameSite: 'strict',
    secure: req.secure,
    path: '/api/v1/auth',
    maxAge: ctx.config.refreshTokenDays * 86_400_000,
  });
  const answer = (req: Request, res: Response, signedIn: SignedIn, status = 200) => {
    res.cookie(REFRESH_COOKIE, signedIn.refreshSecret, cookieOptions(req));
    res.set('Cache-Control', 'no-store').status(status).json({ accessToken: signedIn.accessToken, expiresIn: signedIn.expiresIn, user: signedIn.user });
  };

  r.post('/login', 'public', ...signInThrottle(ctx.dataSource, 'sign-in'), async (req, res) => {
    const body = await validateBody(SignInDto, req.body);
    answer(req, res, await auth.signIn(body.email, body.password, req));
  });

  r.post('/refresh', 'public', async (req, res) => {
    try {
      answer(req, res, await auth.refresh(req.cookies?.[REFRESH_COOKIE], req));
    } catch (error) {
      if (error instanceof UnauthorizedError) res.clearCookie(REFRESH_COOKIE, { path: '/api/v1/auth' });
      throw error;
    }
  });

  r.post('/logout', 'public', async (req, res) => {
    await auth.signOut(req.cookies?.[REFRESH_COOKIE], req.user, req);
    res.clearCookie(REFRESH_COOKIE, { path: '/api/v1/auth' }).status(204).end();
  });

  r.get('/me', 'signed-in', (req, res) => {
    const p = req.user!;
    res.set('Cache-Control', 'no-store').json({ id: p.userId, email: p.email, name: p.name, roles: p.roles, via: p.kind });
  });

  r.post('/password-reset/request', 'public', ...signInThrottle(ctx.dataSource, 'password-reset'), async (req, res) => {
    const body = await validateBody(ResetRequestDto, req.body);
    await auth.requestPasswordReset(body.email, req);
    res.status(202).json({ message: 'If the address has an account, a reset link is on its way.' });
  });

  r.post('/password-reset/confirm', 'public', async (req, res) => {
    const body = await validateBody(ResetConfirmDto, req.body);
    await auth.confirmPasswordReset(body.token, body.password, req);
    res.status(204).end();
  });

  r.post('/invitations/accept', 'public', async (req, res) => {
    const body = await validateBody(AcceptInvitationDto, req.body);
    answer(req, res, await auth.acceptInvitation(body.token, body.name, body.password, req), 201);
  });

  r.post('/change-password', 'signed-in', async (req, res) => {
    const body = await validateBody(ChangePasswordDto, req.body);
    await auth.changePassword(req.user!, body.currentPassword, body.newPassword, req);
    res.status(204).end();
  });

  r.post('/verify-email/request', 'signed-in', async (req, res) => {
    await auth.requestEmailVerification(req.user!, req);
    res.status(202).json({ message: 'A confirmation link is on its way.' });
  });

  r.post('/verify-email/confirm', 'public', async (req, res) => {
    const body = await validateBody(TokenDto, req.body);
    await auth.confirmEmailVerification(body.token, req);
    res.status(204).end();
  });

  return r.router;
}

import type { NextFunction, Request, Response, Router } from 'express';
import express from 'express';
import { createSecretKey } from 'node:crypto';
import jwt from 'jsonwebtoken';
import passport from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';

import { can, type Ability } from '@/modules/accounts/core/roles';
import { publicUser, type User } from '@/modules/accounts/server/user-model';
import { authenticate, findActiveUser } from '@/modules/accounts/server/user-service';

import type { Limits } from './config';
import { notAllowed } from './errors';
import { signInLimits } from './rate-limits';
import { jsonBody } from './requests';

const ISSUER = 'feltwire';
const AUDIENCE = 'feltwire-staff';
export const LOGIN_FAILED = 'E-mail or password is not right.';

export interface AuthOptions {
  jwtSecret: string;
  jwtTtlSeconds: number;
}

export function signToken(user: Pick<User, 'id' | 'role'>, opts: AuthOptions): string {
  return jwt.sign({ role: user.role }, opts.jwtSecret, {
    subject: String(user.id),
    issuer: ISSUER,
    audience: AUDIENCE,
    expiresIn: opts.jwtTtlSeconds,
    algorithm: 'HS256',
  });
}

export function configurePassport(opts: AuthOptions): passport.PassportStatic {
  const instance = new passport.Passport() as unknown as passport.PassportStatic;
  instance.use(
    new JwtStrategy(
      {
        jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
        // A key object, made once: given a string, jsonwebtoken tries it as a PEM key first and fails, on every request (~0.4 ms).
        secretOrKey: createSecretKey(Buffer.from(opts.jwtSecret, 'utf8')) as unknown as string,
        issuer: ISSUER,
        audience: AUDIENCE,
        algorithms: ['HS256'],
      },
      (payload: { sub?: string; exp?: unknown }, done: (err: unknown, user?: User | false) => void) => {
        // A token without an expiry would sign its holder in for ever.
        if (typeof payload.exp !== 'number') return done(null, false);
        const id = Number(payload.sub);
        if (!Number.isInteger(id)) return done(null, false);
        // The user is read again on every request: a deactivated account or a new role counts at once.
        findActiveUser(id).then((user) => done(null, user ?? false), done);
      },
    ),
  );
  return instance;
}

const SIGN_IN_FIRST = 'Sign in first: the token is missing, expired or no longer valid.';

/** Refuses a request without a valid token for an active user, in GraphQL's error shape or the REST one. */
export function requireUser(pp: passport.PassportStatic, shape: 'graphql' | 'rest' = 'graphql') {
  return (req: Request, res: Response, next: NextFunction) => {
    pp.authenticate('jwt', { session: false }, (err: unknown, user: User | false) => {
      if (err) return next(err);
      if (!user) {
        const code = 'UNAUTHENTICATED';
        res.status(401).json(shape === 'graphql' ? { errors: [{ message: SIGN_IN_FIRST, extensions: { code } }] } : { error: SIGN_IN_FIRST, code });
        return;
      }
      req.user = user;
      next();
    })(req, res, next);
  };
}

/** After requireUser: the signed-in role must have the ability, asked before the request's input is read. */
export function requireAbility(ability: Ability, what: string) {
  return (req: Request, _res: Response, next: NextFunction) => next(can((req.user as User).role, ability) ? undefined : notAllowed(what));
}

const LOOPBACK = new Set(['127.0.0.1', '::1', '::ffff:127.0.0.1']);

/** A request from this machine itself: a loopback socket, and no proxy header saying it came from elsewhere. */
export function fromThisMachine(req: Request): boolean {
  return LOOPBACK.has(req.socket.remoteAddress ?? '') && req.headers['x-forwarded-for'] === undefined && req.headers.forwarded === undefined;
}

const INBOX_CLOSED = 'The demo inbox opens only on the machine that runs the server, or for a manager.';

/** The demo inbox shows buyers' names and signed-copy links: this machine, or a manager's token. */
export function inboxGuard(pp: passport.PassportStatic) {
  return (req: Request, res: Response, next: NextFunction) => {
    if (fromThisMachine(req)) return next();
    pp.authenticate('jwt', { session: false }, (err: unknown, user: User | false) => {
      if (err) return next(err);
      if (!user || !can(user.role, 'readDemoInbox')) {
        res.status(403).json({ error: INBOX_CLOSED });
        return;
      }
      next();
    })(req, res, next);
  };
}

export function authRouter(opts: AuthOptions, limits: Limits['signIn']): Router {
  const router = express.Router();
  const limit = signInLimits(limits);
  router.post('/login', limit.perAddress, jsonBody('10kb'), limit.perAccount, async (req, res) => {
    const user = await authenticate(req.body);
    if (!user) {
      res.status(401).json({ error: LOGIN_FAILED });
      return;
    }
    res.json({ token: signToken(user, opts), user: publicUser(user) });
  });
  return router;
}

import type { NextFunction, Request, Response, Router } from 'express';
import express from 'express';
import { createSecretKey } from 'node:crypto';
import jwt from 'jsonwebtoken';
import passport from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';

import { publicUser, type User } from '@/modules/accounts/server/user-model';
import { authenticate, findActiveUser } from '@/modules/accounts/server/user-service';

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
      (payload: { sub?: string }, done: (err: unknown, user?: User | false) => void) => {
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

export function authRouter(opts: AuthOptions): Router {
  const router = express.Router();
  router.post('/login', express.json({ limit: '10kb' }), async (req, res) => {
    const user = await authenticate(req.body);
    if (!user) {
      res.status(401).json({ error: LOGIN_FAILED });
      return;
    }
    res.json({ token: signToken(user, opts), user: publicUser(user) });
  });
  return router;
}

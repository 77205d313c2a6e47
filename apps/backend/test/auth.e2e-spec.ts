import { JwtService } from '@nestjs/jwt';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, DEMO_USERS } from '../src/seed/seed-users';
import { DEMO, ORIGIN, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => t.close());

describe('sign-in', () => {
  it.each(DEMO_USERS)('signs in $email as $role', async (u) => {
    const res = await t.http
      .post('/api/auth/login')
      .send({ email: u.email, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: u.email, name: u.name, role: u.role });
    expect(typeof res.body.accessToken).toBe('string');
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/gp_session=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
  });

  it('gives the same 401 for a wrong password and an unknown e-mail', async () => {
    const wrong = await t.http
      .post('/api/auth/login')
      .send({ email: DEMO.qa, password: 'not-the-password' });
    const unknown = await t.http
      .post('/api/auth/login')
      .send({ email: 'nobody@demo.example', password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.message).toBe(unknown.body.message);
    expect(wrong.body).toMatchObject({ statusCode: 401, path: '/api/auth/login' });
    expect(wrong.body.requestId).toBeTruthy();
  });

  it('refuses missing fields with a field-level message', async () => {
    const res = await t.http.post('/api/auth/login').send({ email: 'clerk@demo.example' });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual(expect.arrayContaining(['password is required']));
    const extra = await t.http
      .post('/api/auth/login')
      .send({ email: DEMO.clerk, password: 'x', admin: true });
    expect(extra.status).toBe(400);
    expect(extra.body.message.join(' ')).toMatch(/admin should not exist/);
  });

  it('answers 429 on the sixth try in a minute for one address and e-mail', async () => {
    const email = 'throttle-check@demo.example';
    const codes: number[] = [];
    for (let i = 0; i < 6; i++) {
      const res = await t.http.post('/api/auth/login').send({ email, password: 'wrong-pass' });
      codes.push(res.status);
    }
    expect(codes).toEqual([401, 401, 401, 401, 401, 429]);
  });
});

describe('sessions', () => {
  it('accepts the bearer token and the cookie', async () => {
    const token = await t.token(DEMO.clerk);
    const bearer = await t.http.get('/api/auth/me').set('Authorization', `Bearer ${token}`);
    expect(bearer.status).toBe(200);
    expect(bearer.body.email).toBe(DEMO.clerk);
    const cookie = await t.http.get('/api/auth/me').set('Cookie', `gp_session=${token}`);
    expect(cookie.status).toBe(200);
    expect(cookie.body.role).toBe('clerk');
  });

  it('refuses no token, a tampered token, an expired one and one signed with another secret', async () => {
    expect((await t.http.get('/api/auth/me')).status).toBe(401);
    const token = await t.token(DEMO.qa);
    const tampered = token.slice(0, -3) + (token.endsWith('aaa') ? 'bbb' : 'aaa');
    const res1 = await t.http.get('/api/auth/me').set('Authorization', `Bearer ${tampered}`);
    expect(res1.status).toBe(401);
    const jwt = new JwtService({ secret: t.config.jwtSecret });
    const expired = await jwt.signAsync({ sub: 1, role: 'admin' }, { expiresIn: -10 });
    expect(
      (await t.http.get('/api/auth/me').set('Authorization', `Bearer ${expired}`)).status,
    ).toBe(401);
    const foreign = await new JwtService({ secret: 'another-secret-entirely' }).signAsync({
      sub: 1,
      role: 'admin',
    });
    expect(
      (await t.http.get('/api/auth/me').set('Authorization', `Bearer ${foreign}`)).status,
    ).toBe(401);
  });

  it('requires the app Origin on cookie-authenticated writes, not on bearer ones', async () => {
    const signIn = async () =>
      (await t.http.post('/api/auth/login').send({ email: DEMO.buyer, password: DEMO_PASSWORD }))
        .body.accessToken as string;
    const token = await signIn();
    const noOrigin = await t.http.post('/api/auth/logout').set('Cookie', `gp_session=${token}`);
    expect(noOrigin.status).toBe(403);
    const foreign = await t.http
      .post('/api/auth/logout')
      .set('Cookie', `gp_session=${token}`)
      .set('Origin', 'http://evil.example');
    expect(foreign.status).toBe(403);
    const own = await t.http
      .post('/api/auth/logout')
      .set('Cookie', `gp_session=${token}`)
      .set('Origin', ORIGIN);
    expect(own.status).toBe(204);
    expect(String(own.headers['set-cookie'])).toMatch(/gp_session=;/);
    // Signed out: the token is dead. A new sign-in's token signs out by bearer, no Origin.
    const again = await t.http.post('/api/auth/logout').set('Authorization', `Bearer ${token}`);
    expect(again.status).toBe(401);
    const bearer = await t.http
      .post('/api/auth/logout')
      .set('Authorization', `Bearer ${await signIn()}`);
    expect(bearer.status).toBe(204);
  });
});

describe('users (admin)', () => {
  it('lets admin list, create and deactivate; the token stops working at once', async () => {
    const admin = await t.token(DEMO.admin);
    const list = await t.http.get('/api/users').set('Authorization', `Bearer ${admin}`);
    expect(list.status).toBe(200);
    expect(list.body).toHaveLength(4);
    const created = await t.http.post('/api/users').set('Authorization', `Bearer ${admin}`).send({
      email: 'Temp.Clerk@demo.example',
      name: 'Temp Clerk',
      role: 'clerk',
      password: 'long-enough-pw',
    });
    expect(created.status).toBe(201);
    expect(created.body.email).toBe('temp.clerk@demo.example');
    const login = await t.http
      .post('/api/auth/login')
      .send({ email: 'temp.clerk@demo.example', password: 'long-enough-pw' });
    expect(login.status).toBe(200);
    const tempToken = login.body.accessToken as string;
    // Signed in once, so the server holds the account (sessions/signed-in-users.ts).
    const before = await t.http.get('/api/auth/me').set('Authorization', `Bearer ${tempToken}`);
    expect(before.status).toBe(200);
    const off = await t.http
      .patch(`/api/users/${created.body.id}`)
      .set('Authorization', `Bearer ${admin}`)
      .send({ active: false, version: created.body.version });
    expect(off.status).toBe(200);
    expect(off.body.active).toBe(false);
    const me = await t.http.get('/api/auth/me').set('Authorization', `Bearer ${tempToken}`);
    expect(me.status).toBe(401);
  });

  it('refuses short passwords, duplicate e-mails and other roles', async () => {
    const admin = await t.token(DEMO.admin);
    const short = await t.http
      .post('/api/users')
      .set('Authorization', `Bearer ${admin}`)
      .send({ email: 'x@demo.example', name: 'X', role: 'clerk', password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.message[0]).toMatch(/^password must be at least 10 characters/);
    const dup = await t.http
      .post('/api/users')
      .set('Authorization', `Bearer ${admin}`)
      .send({ email: DEMO.clerk, name: 'Dup', role: 'clerk', password: 'long-enough-pw' });
    expect(dup.status).toBe(409);
    for (const email of [DEMO.clerk, DEMO.qa, DEMO.buyer]) {
      const res = await t.http
        .get('/api/users')
        .set('Authorization', `Bearer ${await t.token(email)}`);
      expect(res.status).toBe(403);
    }
  });

  it('does not let an admin lock themselves out', async () => {
    const admin = await t.token(DEMO.admin);
    const me = await t.http.get('/api/auth/me').set('Authorization', `Bearer ${admin}`);
    const res = await t.http
      .patch(`/api/users/${me.body.id}`)
      .set('Authorization', `Bearer ${admin}`)
      .send({ active: false, version: 1 });
    expect(res.status).toBe(422);
  });
});

describe('plumbing', () => {
  it('answers health, a JSON 404 for unknown API paths, and the OpenAPI document', async () => {
    const health = await t.http.get('/api/health');
    expect(health.status).toBe(200);
    expect(health.body.database).toBe('ok');
    const missing = await t.http.get('/api/no-such-thing');
    expect(missing.status).toBe(404);
    expect(missing.body).toMatchObject({ statusCode: 404, path: '/api/no-such-thing' });
    const docs = await t.http.get('/api/docs-json');
    expect(docs.status).toBe(200);
    expect(docs.body.paths['/api/auth/login']).toBeDefined();
  });
});

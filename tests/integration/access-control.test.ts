import { readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '@/lib/auth/roles';
import { ACTION_ACCESS, ROUTE_ACCESS, type Access } from './support/access-matrix';
import { signedInAs } from './support/session-double';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

const APP = path.resolve('src/app');
const METHODS = ['GET', 'POST', 'PATCH', 'PUT', 'DELETE'] as const;

function find(dir: string, fileName: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return find(full, fileName);
    return name === fileName ? [full] : [];
  });
}

const routeFiles = find(path.join(APP, 'api'), 'route.ts').map((f) => ({ file: f, key: path.relative(APP, path.dirname(f)).split(path.sep).join('/') }));
const actionFiles = find(APP, 'actions.ts').map((f) => ({ file: f, key: path.relative(APP, path.dirname(f)).split(path.sep).join('/') }));

let db: Awaited<ReturnType<typeof useTestDatabase>>;
const users = {} as Record<Role, Awaited<ReturnType<typeof createTestUser>>['sessionUser']>;

beforeAll(async () => {
  db = await useTestDatabase();
  for (const role of ROLES) users[role] = (await createTestUser(role)).sessionUser;
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

function allowedRoles(access: Access): readonly Role[] {
  return access === 'public' ? ROLES : access;
}

describe('every route handler checks the session and the role on the server', () => {
  it('has an access entry for every route file and method', async () => {
    expect(routeFiles.length).toBeGreaterThan(0);
    for (const { file, key } of routeFiles) {
      const module = await import(file);
      for (const method of METHODS) {
        if (typeof module[method] === 'function') expect(ROUTE_ACCESS[key]?.[method], `${method} /${key} has no entry in the access matrix`).toBeDefined();
      }
    }
  });

  for (const [key, methods] of Object.entries(ROUTE_ACCESS)) {
    for (const [method, access] of Object.entries(methods)) {
      it(`${method} /${key}: anonymous 401, wrong role 403, allowed role passes the guard`, async () => {
        const module = await import(path.join(APP, key, 'route.ts'));
        const call = () => module[method](new Request(`http://localhost/${key.replace('[id]', 'no-such-id')}`, { method, body: method === 'GET' ? undefined : '{}', headers: { 'content-type': 'application/json' } }), { params: Promise.resolve({ id: 'no-such-id' }) });
        signedInAs(null);
        const anonymous: Response = await call();
        if (access === 'public') expect(anonymous.status).toBeLessThan(400);
        else expect(anonymous.status).toBe(401);
        for (const role of ROLES) {
          signedInAs(users[role]);
          const response: Response = await call();
          if (allowedRoles(access).includes(role)) expect([401, 403], `${role} should pass the guard`).not.toContain(response.status);
          else expect(response.status, `${role} must be refused`).toBe(403);
        }
      });
    }
  }
});

describe('every server action checks the session and the role on the server', () => {
  it('has an access entry for every exported action', async () => {
    expect(actionFiles.length).toBeGreaterThan(0);
    for (const { file, key } of actionFiles) {
      const module = await import(file);
      for (const name of Object.keys(module)) expect(ACTION_ACCESS[key]?.[name], `action ${name} in ${key} has no entry`).toBeDefined();
    }
  });

  for (const [key, actions] of Object.entries(ACTION_ACCESS)) {
    for (const [name, access] of Object.entries(actions)) {
      it(`${key} ${name}: anonymous 401, wrong role 403, nothing stored on refusal`, async () => {
        const module = await import(path.join(APP, key, 'actions.ts'));
        signedInAs(null);
        const anonymous = await module[name]({});
        if (access === 'public') expect(anonymous.status).not.toBe(401);
        else expect(anonymous).toMatchObject({ ok: false, status: 401 });
        for (const role of ROLES) {
          if (allowedRoles(access).includes(role)) continue;
          signedInAs(users[role]);
          expect(await module[name]({})).toMatchObject({ ok: false, status: 403 });
        }
      });
    }
  }
});

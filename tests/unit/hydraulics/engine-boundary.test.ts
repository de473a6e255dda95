import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import * as engine from '@/lib/hydraulics';

const ENGINE_DIR = path.resolve('src/lib/hydraulics');

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? sourceFiles(full) : /\.ts$/.test(name) ? [full] : [];
  });
}

describe('the engine boundary', () => {
  it('exports the whole public API from src/lib/hydraulics/index.ts', () => {
    const functions = ['prismaticSection', 'surveyedSection', 'froudeNumber', 'specificEnergy', 'specificForce', 'normalDepth', 'criticalDepth', 'criticalDepths', 'classifySlope', 'sequentDepth', 'weirHead', 'weirDischarge', 'controlDepth', 'directStepProfile', 'standardStepProfile', 'convergedProfile', 'odeSelfCheck', 'profileType', 'affluxAlong', 'extentOfImpact', 'inundation', 'checkLimits', 'sizeCrest', 'sensitivity', 'evaluateCase'];
    for (const name of functions) expect(typeof (engine as Record<string, unknown>)[name], name).toBe('function');
    expect(engine.ENGINE_VERSION).toMatch(/^\d+\.\d+\.\d+$/);
  });

  it('stays pure: no Next, no database, no server-only, no file or network I/O', () => {
    const forbidden = /from '(next|next\/[^']*|react|server-only|sequelize|sqlite3|better-sqlite3|node:fs|fs|node:http|node:net|@\/lib\/(db|auth|mail|pdf|signing)[^']*)'/;
    for (const file of sourceFiles(ENGINE_DIR)) expect(readFileSync(file, 'utf8'), path.relative(ENGINE_DIR, file)).not.toMatch(forbidden);
  });
});

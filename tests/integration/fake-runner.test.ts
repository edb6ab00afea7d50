import path from 'node:path';
import { describe, expect, test } from 'vitest';
import { startFakes } from '../../fakes/runner';
import { answers } from '../helpers/server';

const dummy = path.resolve('tests/fixtures/fakes/dummy.ts');

describe('startFakes', () => {
  test('starts a fake, waits until it answers, and stops it', async () => {
    const running = await startFakes([{ name: 'dummy', entry: dummy, port: 17811 }], true);
    expect(running.fakes).toEqual([{ name: 'dummy', port: 17811, url: 'http://127.0.0.1:17811' }]);
    const body = await (await fetch('http://127.0.0.1:17811/anything')).json();
    expect(body).toEqual({ ok: true, path: '/anything', port: 17811 });
    await running.stop();
    expect(await answers('http://127.0.0.1:17811/health')).toBe(false);
  });

  test('fails clearly when a fake exits before it is ready', async () => {
    const broken = path.resolve('tests/fixtures/fakes/does-not-exist.ts');
    await expect(startFakes([{ name: 'broken', entry: broken, port: 17812 }], true)).rejects.toThrow(
      /broken exited before it was ready/,
    );
  });
});

// Every migration's down must undo its up: run all down, then all up again, on a scratch
// database the test script creates beside the test database.
import { execFileSync } from 'node:child_process';
import path from 'node:path';

const root = path.resolve(__dirname, '..', '..');
const env = { ...process.env, DB_NAME: `${process.env.DB_NAME}_migrations` };
const cli = (...args: string[]) =>
  execFileSync('node', ['--import', 'tsx', 'node_modules/sequelize-cli/lib/sequelize', ...args], { cwd: root, env, encoding: 'utf8' });

describe('migrations', () => {
  it('run up, all the way down, and up again cleanly', () => {
    cli('db:migrate');
    cli('db:migrate:undo:all');
    expect(cli('db:migrate:status')).not.toMatch(/^up /m);
    cli('db:migrate');
    const status = cli('db:migrate:status');
    expect(status).toMatch(/^up /m);
    expect(status).not.toMatch(/^down /m);
  }, 120_000);
});

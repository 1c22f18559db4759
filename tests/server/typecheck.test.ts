// Strict TypeScript is part of the test run: a type error anywhere fails CI, and is printed.
import { execFileSync } from 'node:child_process';
import path from 'node:path';

const root = path.resolve(__dirname, '..', '..');

function typeErrors(project: string): string {
  try {
    execFileSync('node', ['node_modules/typescript/bin/tsc', '--noEmit', '-p', project], { cwd: root, encoding: 'utf8' });
    return '';
  } catch (error) {
    return String((error as { stdout?: string }).stdout ?? error);
  }
}

describe('types', () => {
  it.each(['tsconfig.json', 'tsconfig.server.json'])('%s compiles without errors', (project) => {
    expect(typeErrors(project)).toBe('');
  }, 180_000);
});

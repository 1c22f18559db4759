// A clone of the repository has nothing beside it: no tracked file outside the docs may reach
// a path above the checkout (the handbook's folder lives there on developers' machines only).
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const root = path.resolve(__dirname, '..', '..');
const upward = /((?:\.\.\/)+)[\w.-]+/g;

function trackedSourceFiles(): string[] {
  const out = execFileSync('git', ['ls-files'], { cwd: root, encoding: 'utf8' });
  return out
    .split('\n')
    .filter((file) => file && !file.endsWith('.md') && !file.endsWith('package-lock.json') && !file.startsWith('assets/'));
}

function escapes(file: string): string[] {
  const text = fs.readFileSync(path.join(root, file), 'utf8');
  const found: string[] = [];
  text.split('\n').forEach((line, index) => {
    for (const match of line.matchAll(upward)) {
      const target = path.resolve(root, path.dirname(file), match[1]);
      if (target !== root && !target.startsWith(root + path.sep)) found.push(`${file}:${index + 1}: ${line.trim().slice(0, 120)}`);
    }
  });
  return found;
}

describe('the repository stands alone', () => {
  it('has no tracked file outside the docs that reaches above the checkout', () => {
    expect(trackedSourceFiles().flatMap(escapes)).toEqual([]);
  });
});

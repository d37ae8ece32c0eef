import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

const read = (path: string) => readFileSync(new URL(path, import.meta.url), 'utf8');

describe('.env.example', () => {
  it('lists every variable the configuration reads, each under a comment', () => {
    const source = read('./app.config.ts');
    const used = new Set([...source.matchAll(/env\.([A-Z][A-Z0-9_]+)|env, '([A-Z][A-Z0-9_]+)'/g)].map((m) => m[1] ?? m[2]));
    expect(used.size).toBeGreaterThan(20);
    const lines = read('../../../.env.example').split('\n');
    const listed = new Map<string, number>();
    lines.forEach((line, i) => {
      const name = /^#?\s*([A-Z][A-Z0-9_]+)=/.exec(line)?.[1];
      if (name) listed.set(name, i);
    });
    expect([...used].filter((name) => !listed.has(name))).toEqual([]);
    // The line above each variable explains it (a comment that is not itself a commented-out variable).
    for (const [name, i] of listed) {
      expect(lines[i - 1], `the line above ${name}`).toMatch(/^# /);
      expect(lines[i - 1], `the line above ${name}`).not.toMatch(/^#\s*[A-Z][A-Z0-9_]+=/);
    }
  });
});

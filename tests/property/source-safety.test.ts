/**
 * No code path turns text into markup or code: the source under src/ uses none of {@html}, eval(),
 * new Function, setTimeout/setInterval with a string, innerHTML/outerHTML, insertAdjacentHTML or
 * document.write. User text (scenario names, material names, pasted tables, files) reaches the page
 * only through Svelte's escaped text interpolation. Together with the Content-Security-Policy in
 * svelte.config.js (no 'unsafe-eval', no inline scripts) this keeps hostile input inert.
 *
 * ALLOWED lists a file and pattern that genuinely needs one of these, with the reason; it is empty.
 */
import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const SRC = join(ROOT, 'src');

const FORBIDDEN: [string, RegExp][] = [
  ['{@html}', /\{@html\b/],
  ['eval()', /(^|[^\w.$])eval\s*\(/],
  ['new Function', /\bnew\s+Function\s*\(/],
  ['Function() as a constructor', /(^|[^\w.$])Function\s*\(\s*['"`]/],
  ['setTimeout/setInterval with a string', /\bset(Timeout|Interval)\s*\(\s*['"`]/],
  ['innerHTML', /\binnerHTML\b/],
  ['outerHTML', /\bouterHTML\b/],
  ['insertAdjacentHTML', /\binsertAdjacentHTML\b/],
  ['document.write', /\bdocument\.write(ln)?\s*\(/],
  ['javascript: URL', /["'`]\s*javascript:/i]
];

/** [file relative to the repository, pattern name, reason] — keep empty unless truly needed. */
const ALLOWED: [string, string, string][] = [];

function sourceFiles(dir: string, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) sourceFiles(path, out);
    else if (/\.(ts|js|mjs|svelte|html)$/.test(name)) out.push(path);
  }
  return out;
}

describe('source safety', () => {
  const files = sourceFiles(SRC);

  it('finds the source files (the scan is not empty)', () => {
    expect(files.length).toBeGreaterThan(50);
    expect(files.some((f) => f.endsWith('.svelte'))).toBe(true);
  });

  it('uses no {@html}, eval, new Function, innerHTML or similar anywhere in src/', () => {
    const found: string[] = [];
    for (const file of files) {
      const rel = relative(ROOT, file).split('\\').join('/');
      readFileSync(file, 'utf8')
        .split('\n')
        .forEach((line, i) => {
          for (const [name, pattern] of FORBIDDEN) {
            if (pattern.test(line) && !ALLOWED.some(([f, n]) => f === rel && n === name)) found.push(`${rel}:${i + 1}: ${name}: ${line.trim().slice(0, 100)}`);
          }
        });
    }
    expect(found).toEqual([]);
  });

  it('the patterns catch what they are meant to catch', () => {
    const hit = (text: string) => FORBIDDEN.filter(([, p]) => p.test(text)).map(([n]) => n);
    expect(hit('<p>{@html note}</p>')).toEqual(['{@html}']);
    expect(hit('const f = eval(text);')).toEqual(['eval()']);
    expect(hit('x.eval(y); medieval(z);')).toEqual([]);
    expect(hit('new Function("a", body)')).toContain('new Function');
    expect(hit("setTimeout('go()', 10)")).toEqual(['setTimeout/setInterval with a string']);
    expect(hit('setTimeout(go, 10)')).toEqual([]);
    expect(hit('el.innerHTML = name')).toEqual(['innerHTML']);
    expect(hit('href="javascript:alert(1)"')).toEqual(['javascript: URL']);
  });
});

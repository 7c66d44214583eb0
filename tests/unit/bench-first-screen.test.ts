// The page weights `npm run bench -- firstscreen` reports, on a made-up build: which files each
// page counts (src/app/router.tsx: sign-in outside the app shell, other pages inside it).
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pageScriptSizes, scriptsNamingTheirMap } from '../../scripts/lib/bench-first-screen';

let dir: string;
const files: Record<string, string> = {
  'assets/index-1.js': 'import "./app-1.js";' + 'const react = "react-dom";'.repeat(300),
  'assets/app-1.js': 'export const router = 1;'.repeat(100),
  'assets/sign-in-1.js': 'import "./field-1.js"; export const signIn = 1;',
  'assets/field-1.js': 'export const field = "form";'.repeat(50),
  'assets/shell-1.js': 'export const shell = "navigation";'.repeat(80),
  'assets/home-1.js': 'import "./field-1.js"; export const home = "today";'.repeat(20),
};
const gz = (name: string) => gzipSync(files[name], { level: 9 }).length;

beforeAll(() => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'gridkeep-bench-sizes-'));
  fs.mkdirSync(path.join(dir, 'assets'));
  fs.mkdirSync(path.join(dir, '.vite'));
  for (const [name, content] of Object.entries(files)) fs.writeFileSync(path.join(dir, name), content);
  fs.writeFileSync(
    path.join(dir, '.vite/manifest.json'),
    JSON.stringify({
      'index.html': { file: 'assets/index-1.js', isEntry: true, imports: ['_app-1.js'], css: ['assets/index-1.css'] },
      '_app-1.js': { file: 'assets/app-1.js' },
      '_field-1.js': { file: 'assets/field-1.js' },
      'src/app/routes/auth/sign-in.tsx': { file: 'assets/sign-in-1.js', isDynamicEntry: true, imports: ['_field-1.js', '_app-1.js'] },
      'src/app/routes/app/shell.tsx': { file: 'assets/shell-1.js', isDynamicEntry: true, imports: ['_app-1.js'] },
      'src/app/routes/app/home.tsx': { file: 'assets/home-1.js', isDynamicEntry: true, imports: ['_field-1.js'] },
    }),
  );
});

afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

describe('page weights', () => {
  it('counts the entry, the page and what it imports, each file once; sign-in without the app shell', () => {
    const signIn = pageScriptSizes(dir).find((p) => p.page === 'auth/sign-in')!;
    expect(signIn.files).toBe(4);
    expect(signIn.gzipBytes).toBe(gz('assets/index-1.js') + gz('assets/app-1.js') + gz('assets/sign-in-1.js') + gz('assets/field-1.js'));
  });

  it('counts the app shell for a signed-in page', () => {
    const home = pageScriptSizes(dir).find((p) => p.page === 'app/home')!;
    expect(home.files).toBe(5);
    expect(home.gzipBytes).toBe(
      gz('assets/index-1.js') + gz('assets/app-1.js') + gz('assets/shell-1.js') + gz('assets/home-1.js') + gz('assets/field-1.js'),
    );
  });

  it('finds a built script that names its source map', () => {
    expect(scriptsNamingTheirMap(dir)).toEqual([]);
    fs.appendFileSync(path.join(dir, 'assets/home-1.js'), '\n//# sourceMappingURL=home-1.js.map\n');
    expect(scriptsNamingTheirMap(dir)).toEqual(['assets/home-1.js']);
  });
});

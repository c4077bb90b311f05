/**
 * The build's factory rewrite (scripts/build/eagerModuleFactories.js) writes each module factory
 * of a webpack bundle's modules object as a parenthesised function expression; the bundle must
 * compute the same as before, and a bundle of any other shape must be left as it is.
 */
import * as fs from 'fs';
import * as path from 'path';
import * as vm from 'vm';
import { DIST, ensureBuilt } from './ensureBuilt';

// eslint-disable-next-line @typescript-eslint/no-require-imports
const { eagerModuleFactories } = require('../../scripts/build/eagerModuleFactories') as {
  eagerModuleFactories: (code: string) => { code: string; factories: number };
};

/** A bundle of the shape webpack writes (minified): factories as methods, a bootstrap require. */
const BUNDLE = `(()=>{"use strict";var e={12(e,t,n){n.d(t,{a:()=>r,b:()=>i});const r="}{"+\`\${1+1}}\`;function i(){return typeof arguments}},7:function(e,t,n){const r=n(12);t.sum=r.a+r.b()+/[}]/.source}};const t={};function n(r){const i=t[r];if(void 0!==i)return i.exports;const o=t[r]={exports:{}};return e[r](o,o.exports,n),o.exports}n.d=(e,t)=>{for(var r in t)Object.defineProperty(e,r,{enumerable:!0,get:t[r]})};globalThis.out=n(7).sum})();`;

function run(code: string): unknown {
  const ctx: { out?: unknown } = {};
  vm.runInNewContext(code, ctx);
  return ctx.out;
}

describe('eagerModuleFactories', () => {
  test('wraps every factory, methods and function properties alike', () => {
    const { code, factories } = eagerModuleFactories(BUNDLE);
    expect(factories).toBe(2);
    expect(code).toContain('var e={12:(function(e,t,n){n.d(');
    expect(code).toContain(',7:(function(e,t,n){const r=n(12);');
    expect(code).not.toContain('12(e,t,n)');
  });

  test('the rewritten bundle computes the same', () => {
    const before = run(BUNDLE);
    // "}{" + "2}" + typeof arguments + "[}]": braces in strings, templates and regular expressions
    expect(before).toBe('}{2}object[}]');
    expect(run(eagerModuleFactories(BUNDLE).code)).toBe(before);
  });

  test('is idempotent: factories already in parentheses are left as they are', () => {
    const once = eagerModuleFactories(BUNDLE).code;
    const twice = eagerModuleFactories(once);
    expect(twice.factories).toBe(0);
    expect(twice.code).toBe(once);
  });

  test.each([
    ['no bootstrap IIFE', 'var e={1(){}};'],
    ['a modules object with a string key', '(()=>{var e={a(){}};})();'],
    ['a modules object holding a value', '(()=>{var e={1:2};})();'],
    ['no modules object', '(()=>{const t={};})();'],
  ])('leaves %s as it is', (_what, code) => {
    expect(eagerModuleFactories(code)).toEqual({ code, factories: 0 });
  });

  test('the production functions bundle has its factories wrapped', () => {
    ensureBuilt();
    const code = fs.readFileSync(path.join(DIST, 'functions.js'), 'utf8');
    expect(code).toMatch(/^\(\(\)=>\{"use strict";var [\w$]+=\{\d+:\(function\(/);
    expect(eagerModuleFactories(code).factories).toBe(0);
  });
});

// zod compiles fast parsers with `new Function` after probing whether eval is allowed; under our
// content security policy the probe itself is reported as a violation. In the browser, parse
// without compiling (forms parse a few fields; the difference doesn't show).
//
// zod keeps its settings on globalThis.__zod_globalConfig and reads it at parse time (zod's
// core.js: `config()` assigns into that object). Setting it there, rather than calling z.config,
// keeps the whole of zod out of the first load of pages that never parse in the browser.
// tests/unit/validation/zod-jitless.test.ts checks zod still reads the setting.
const g = globalThis as { __zod_globalConfig?: Record<string, unknown> };
g.__zod_globalConfig ??= {};
g.__zod_globalConfig.jitless = true;

export {};

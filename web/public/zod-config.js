// Read by zod when it loads (globalThis.__zod_globalConfig). Jitless: zod would otherwise probe for
// `new Function` while the bundle's schemas are built, which our Content-Security-Policy (no
// 'unsafe-eval') reports as a violation on every page. A classic script, so it runs before the modules.
globalThis.__zod_globalConfig = { ...globalThis.__zod_globalConfig, jitless: true };

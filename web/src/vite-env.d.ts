/// <reference types="vite/client" />

interface ImportMetaEnv {
  /**
   * Where the API lives, without a trailing slash. Empty (the default) means the same origin:
   * the Vite dev server proxies /api, and in production Nest serves the app itself.
   */
  readonly VITE_API_BASE_URL?: string;
}

interface ImportMeta {
  readonly env: ImportMetaEnv;
}

/**
 * The shape of an English catalogue with every message a string: what each other language must fill.
 * A Spanish catalogue `satisfies Catalogue<typeof en>`, so a missing or misspelt key does not compile.
 */
export type Catalogue<T> = { [K in keyof T]: T[K] extends string ? string : Catalogue<T[K]> };

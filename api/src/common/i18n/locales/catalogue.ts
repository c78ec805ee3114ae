/** An English catalogue's shape with every message a string: what another language must fill. */
export type ApiCatalogue<T> = { [K in keyof T]: T[K] extends string ? string : ApiCatalogue<T[K]> };

// Version of the catalog's table layout, stored in the file as PRAGMA user_version.
// Bump it whenever schema.sql changes in a way older readers or writers cannot handle.
export const CATALOG_SCHEMA_VERSION = 1;

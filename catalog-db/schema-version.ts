// Version of the catalog's table layout, stored in the file as PRAGMA user_version.
// Bump it whenever schema.sql changes in a way older readers or writers cannot handle.
// 2: hold_radii, model_screenings and the view vertical_branch_points (v1 files are refused; regenerate).
// 3: jobs.settings, the settings each done job's results depend on, and audits (v2 files are refused; regenerate).
// 4: signature_changes, where a family's lap signature changes and the family it continues into (v3 refused; regenerate).
export const CATALOG_SCHEMA_VERSION = 4;

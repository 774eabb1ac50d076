-- The rights of TripTestLog's two working roles on a PostgreSQL database, for its administrator (docs/shared-server.md).
-- The owner role creates the schema (the first import, or `triptestlog migrate`) and owns its tables; run this after
-- that, as the owner or a superuser, and again after each `migrate` that adds a table:
--
--   psql -v schema=public -v reader=lab_reader -v importer=lab_importer -f scripts/server-roles.sql "DBNAME"
--
-- The roles must exist (CREATE ROLE lab_reader LOGIN PASSWORD '...'). Neither may change the schema.

-- reader: check, findings, fleet, report, devices, history, verify, worksheet. SELECT only.
GRANT USAGE ON SCHEMA :"schema" TO :"reader";
GRANT SELECT ON ALL TABLES IN SCHEMA :"schema" TO :"reader";

-- importer: all a reader may, and import. Rows in, corrections applied; a temporary staging table per file.
GRANT USAGE ON SCHEMA :"schema" TO :"importer";
GRANT SELECT, INSERT, UPDATE, DELETE ON ALL TABLES IN SCHEMA :"schema" TO :"importer";
GRANT USAGE, SELECT ON ALL SEQUENCES IN SCHEMA :"schema" TO :"importer";

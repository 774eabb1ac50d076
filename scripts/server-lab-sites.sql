-- Confines each lab's roles to its own sites on a PostgreSQL database, by row-level security (docs/shared-server.md).
-- Run it as the owner role (it owns the tables) after the schema exists, after scripts/server-roles.sql, and again
-- after each `migrate` that adds a table; it is safe to run twice:
--
--   psql -v schema=public -f scripts/server-lab-sites.sql "DBNAME"
--
-- Then say which sites each role may see and write, as the owner:
--
--   INSERT INTO site_access (role_name, site) VALUES ('lab_north', 'Hill Farm'), ('lab_south', 'Quarry Road');
--   INSERT INTO site_access (role_name, site) VALUES ('asset_manager', '*');   -- every site
--
-- Once this has run, a role other than the owner sees and writes only the devices of its listed sites and their trip,
-- contact and insulation tests, revisions and corrections; a role with no row in site_access sees none. The owner
-- (who owns the tables) is not confined. Imported files' names, the instrument register and the curve and ambient
-- tables stay shared: they name no site.

SET search_path TO :"schema";

CREATE TABLE IF NOT EXISTS site_access (
    role_name name NOT NULL,
    site text NOT NULL,
    PRIMARY KEY (role_name, site)
);
ALTER TABLE site_access ENABLE ROW LEVEL SECURITY;
DROP POLICY IF EXISTS own_rows ON site_access;
CREATE POLICY own_rows ON site_access FOR SELECT USING (role_name = current_user);
GRANT SELECT ON site_access TO PUBLIC;

-- A device row belongs to its site.
ALTER TABLE devices ENABLE ROW LEVEL SECURITY;
DROP POLICY IF EXISTS lab_sites ON devices;
CREATE POLICY lab_sites ON devices
    USING (site IN (SELECT a.site FROM site_access a) OR EXISTS (SELECT 1 FROM site_access a WHERE a.site = '*'))
    WITH CHECK (site IN (SELECT a.site FROM site_access a) OR EXISTS (SELECT 1 FROM site_access a WHERE a.site = '*'));

-- A test or a revision belongs to its device: the subquery on devices is itself confined by the policy above.
ALTER TABLE trip_tests ENABLE ROW LEVEL SECURITY;
DROP POLICY IF EXISTS lab_sites ON trip_tests;
CREATE POLICY lab_sites ON trip_tests USING (device_id IN (SELECT d.id FROM devices d))
    WITH CHECK (device_id IN (SELECT d.id FROM devices d));

ALTER TABLE contact_tests ENABLE ROW LEVEL SECURITY;
DROP POLICY IF EXISTS lab_sites ON contact_tests;
CREATE POLICY lab_sites ON contact_tests USING (device_id IN (SELECT d.id FROM devices d))
    WITH CHECK (device_id IN (SELECT d.id FROM devices d));

ALTER TABLE insulation_tests ENABLE ROW LEVEL SECURITY;
DROP POLICY IF EXISTS lab_sites ON insulation_tests;
CREATE POLICY lab_sites ON insulation_tests USING (device_id IN (SELECT d.id FROM devices d))
    WITH CHECK (device_id IN (SELECT d.id FROM devices d));

ALTER TABLE device_revisions ENABLE ROW LEVEL SECURITY;
DROP POLICY IF EXISTS lab_sites ON device_revisions;
CREATE POLICY lab_sites ON device_revisions USING (device_id IN (SELECT d.id FROM devices d))
    WITH CHECK (device_id IN (SELECT d.id FROM devices d));

-- A correction's old values belong to the record it changed.
ALTER TABLE audit_changes ENABLE ROW LEVEL SECURITY;
DROP POLICY IF EXISTS lab_sites ON audit_changes;
CREATE POLICY lab_sites ON audit_changes
    USING (CASE table_name
        WHEN 'devices' THEN record_id IN (SELECT d.id FROM devices d)
        WHEN 'trip_tests' THEN record_id IN (SELECT t.id FROM trip_tests t)
        WHEN 'contact_tests' THEN record_id IN (SELECT c.id FROM contact_tests c)
        WHEN 'insulation_tests' THEN record_id IN (SELECT i.id FROM insulation_tests i)
        WHEN 'device_revisions' THEN record_id IN (SELECT r.id FROM device_revisions r)
        ELSE true END);

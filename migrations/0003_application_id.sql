-- Schema version 3: the file says it is an Undercroft store (SQLite's application_id header
-- field, "UNDC" in ASCII), so that another program's database is refused, never migrated.
PRAGMA application_id = 1431192643;

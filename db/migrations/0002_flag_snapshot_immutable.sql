-- Custom SQL migration file, put your code below! ---- A flag's snapshot is what the reporter saw; nobody may change or remove it after insert.
CREATE TRIGGER `flag_snapshots_no_update`
BEFORE UPDATE ON `flag_snapshots`
BEGIN
	SELECT RAISE(ABORT, 'flag snapshots are immutable');
END;
--> statement-breakpoint
CREATE TRIGGER `flag_snapshots_no_delete`
BEFORE DELETE ON `flag_snapshots`
BEGIN
	SELECT RAISE(ABORT, 'flag snapshots are immutable');
END;
--> statement-breakpoint
-- The audit log is append-only: what was done, by whom and when never changes. The actor's user
-- id may still be cleared when a user is removed (ON DELETE SET NULL), so only those columns lock.
CREATE TRIGGER `audit_entries_no_update`
BEFORE UPDATE OF `id`, `actor_email`, `action`, `flag_id`, `detail`, `created_at` ON `audit_entries`
BEGIN
	SELECT RAISE(ABORT, 'audit entries are append-only');
END;
--> statement-breakpoint
CREATE TRIGGER `audit_entries_no_delete`
BEFORE DELETE ON `audit_entries`
BEGIN
	SELECT RAISE(ABORT, 'audit entries are append-only');
END;

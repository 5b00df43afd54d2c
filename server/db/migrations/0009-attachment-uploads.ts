// Uploads: an attachment hangs on a lineset and, optionally, on one item of a hang revision of that lineset;
// it may have a thumbnail (images only). The checks repeat what the upload service enforces, so no other
// writer can store a type, size or digest the service would refuse. No attachments exist before this
// migration (nothing wrote them), so the new checks hold from the start.
const up = `
ALTER TABLE hang_items ADD CONSTRAINT hang_items_venue_id_id_key UNIQUE (venue_id, id);
ALTER TABLE attachments
  ADD COLUMN hang_item_id uuid,
  ADD COLUMN thumbnail_key text UNIQUE,
  ADD CONSTRAINT attachments_venue_id_id_key UNIQUE (venue_id, id),
  -- An item that goes with its hang leaves the attachment on the lineset.
  ADD CONSTRAINT attachments_hang_item_in_venue FOREIGN KEY (venue_id, hang_item_id)
    REFERENCES hang_items (venue_id, id) ON DELETE SET NULL (hang_item_id),
  ADD CONSTRAINT attachments_allowed_type
    CHECK (content_type IN ('image/jpeg', 'image/png', 'image/webp', 'application/pdf')),
  ADD CONSTRAINT attachments_size_limit CHECK (byte_size BETWEEN 1 AND 10485760),
  ADD CONSTRAINT attachments_sha256_hex CHECK (sha256 ~ '^[0-9a-f]{64}$'),
  ADD CONSTRAINT attachments_file_name_length CHECK (char_length(file_name) BETWEEN 1 AND 200);
CREATE INDEX attachments_by_lineset ON attachments (venue_id, lineset_id, created_at);
`

const down = `
DROP INDEX attachments_by_lineset;
ALTER TABLE attachments
  DROP CONSTRAINT attachments_file_name_length,
  DROP CONSTRAINT attachments_sha256_hex,
  DROP CONSTRAINT attachments_size_limit,
  DROP CONSTRAINT attachments_allowed_type,
  DROP CONSTRAINT attachments_hang_item_in_venue,
  DROP CONSTRAINT attachments_venue_id_id_key,
  DROP COLUMN thumbnail_key,
  DROP COLUMN hang_item_id;
ALTER TABLE hang_items DROP CONSTRAINT hang_items_venue_id_id_key;
`

export default { name: '0009-attachment-uploads', up, down }

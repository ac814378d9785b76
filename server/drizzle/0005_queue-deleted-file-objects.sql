-- Every deleted file row queues its stored objects for removal, however the row went (one file, its item,
-- a replaced locker, a deleted account: the cascades fire this trigger too).
CREATE FUNCTION queue_locker_item_file_objects() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  INSERT INTO stored_object_deletions (object_key) VALUES (OLD.object_key);
  IF OLD.thumb_key IS NOT NULL THEN
    INSERT INTO stored_object_deletions (object_key) VALUES (OLD.thumb_key);
  END IF;
  RETURN OLD;
END;
$$;
--> statement-breakpoint
CREATE TRIGGER locker_item_files_queue_objects
  AFTER DELETE ON locker_item_files
  FOR EACH ROW EXECUTE FUNCTION queue_locker_item_file_objects();

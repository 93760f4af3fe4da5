//! Removing a photo so that it can be put back: the row is kept in memory as it was (id,
//! caption, place in order), with the original's bytes in case its files were swept before
//! the undo (another removal sweeps files older than the grace period).

use super::{Result, Store, StoreError};
use rusqlite::types::Value;

/// A photo taken off its finding, observation or member, ready to be put back.
#[derive(Debug, Clone)]
pub struct RemovedPhoto {
    pub id: String,
    pub attached_to: String,
    pub caption: String,
    /// Every column of its row, as stored.
    row: Vec<(String, Value)>,
    /// The original file (or the report image, when no original was kept).
    bytes: Option<Vec<u8>>,
}

impl Store {
    /// Removes one photo and returns what `restore_photo` needs to put it back.
    pub fn remove_photo(&mut self, photo_id: &str) -> Result<RemovedPhoto> {
        let stored = self.photo(photo_id)?;
        let bytes = stored
            .original_path
            .as_ref()
            .or(stored.report_path.as_ref())
            .and_then(|p| std::fs::read(p).ok());
        let row = {
            let mut stmt = self.conn.prepare("SELECT * FROM photos WHERE id = ?1")?;
            let names: Vec<String> = stmt.column_names().iter().map(|c| c.to_string()).collect();
            stmt.query_row([photo_id], |r| {
                names
                    .iter()
                    .enumerate()
                    .map(|(i, n)| Ok((n.clone(), r.get::<_, Value>(i)?)))
                    .collect::<rusqlite::Result<Vec<_>>>()
            })?
        };
        self.edit(&stored.inspection_id, |tx| {
            tx.execute("DELETE FROM photos WHERE id = ?1", [photo_id])?;
            Ok(())
        })?;
        Ok(RemovedPhoto {
            id: stored.id,
            attached_to: stored.attached_to,
            caption: stored.caption,
            row,
            bytes,
        })
    }

    /// Puts a removed photo back where it was, with its caption. When its files are gone, it
    /// is imported again from the bytes kept (a new id, the same image). Refused when what
    /// it was attached to has been removed since.
    pub fn restore_photo(&mut self, removed: &RemovedPhoto) -> Result<String> {
        let inspection_id = self.check_owner(&removed.attached_to)?;
        let hash = removed.row.iter().find_map(|(n, v)| match (n.as_str(), v) {
            ("content_hash", Value::Text(h)) => Some(h.clone()),
            _ => None,
        });
        let files_here = hash.as_deref().is_none_or(|h| {
            self.photos
                .path(super::files::Kind::Report, h, "jpg")
                .exists()
        });
        if !files_here {
            let bytes = removed.bytes.as_deref().ok_or_else(|| {
                StoreError::Invalid("the photo's files are gone and no copy was kept".into())
            })?;
            return Ok(self
                .add_photo(&removed.attached_to, bytes, &removed.caption)?
                .id);
        }
        let names: Vec<&str> = removed.row.iter().map(|(n, _)| n.as_str()).collect();
        let slots: Vec<String> = (1..=names.len()).map(|i| format!("?{i}")).collect();
        let sql = format!(
            "INSERT INTO photos ({}) VALUES ({})",
            names.join(", "),
            slots.join(", ")
        );
        self.edit(&inspection_id, |tx| {
            tx.execute(
                &sql,
                rusqlite::params_from_iter(removed.row.iter().map(|(_, v)| v)),
            )?;
            Ok(())
        })?;
        Ok(removed.id.clone())
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::new_id;

    fn jpeg() -> Vec<u8> {
        use undercroft_photo::test_images::{camera_jpeg, upright_scene};
        camera_jpeg(&upright_scene(64, 48), 1)
    }

    fn store_with_photos() -> (Store, std::path::PathBuf, String, Vec<String>) {
        let dir = std::env::temp_dir().join(format!(
            "undercroft-undo-{}-{}",
            std::process::id(),
            new_id()
        ));
        std::fs::create_dir_all(&dir).unwrap();
        let mut store = Store::open(&dir.join("store.sqlite")).unwrap();
        let demo = undercroft_engine::interchange::demo();
        store.import_inspection(&demo).unwrap();
        let owner = "run-kitchen".to_string();
        let ids = (0..3)
            .map(|n| {
                let mut bytes = jpeg();
                bytes.extend_from_slice(&[n]); // three different files
                store
                    .add_photo(&owner, &bytes, &format!("photo {n}"))
                    .unwrap()
                    .id
            })
            .collect();
        (store, dir, owner, ids)
    }

    #[test]
    fn a_removed_photo_comes_back_with_its_id_caption_and_place() {
        let (mut store, dir, owner, ids) = store_with_photos();
        let removed = store.remove_photo(&ids[1]).unwrap();
        let left: Vec<String> = store
            .photos_of(&owner)
            .unwrap()
            .into_iter()
            .map(|p| p.id)
            .collect();
        assert_eq!(left, [ids[0].clone(), ids[2].clone()]);
        let back = store.restore_photo(&removed).unwrap();
        assert_eq!(back, ids[1]);
        let again = store.photos_of(&owner).unwrap();
        let order: Vec<&str> = again.iter().map(|p| p.id.as_str()).collect();
        assert_eq!(order, [ids[0].as_str(), ids[1].as_str(), ids[2].as_str()]);
        assert_eq!(again[1].caption, "photo 1");
        assert!(again[1].report_path.is_some(), "its files are there");
        std::fs::remove_dir_all(dir).ok();
    }

    #[test]
    fn a_photo_whose_files_were_swept_comes_back_from_the_bytes_kept() {
        let (mut store, dir, owner, ids) = store_with_photos();
        let removed = store.remove_photo(&ids[0]).unwrap();
        store
            .sweep_orphans_older_than(std::time::Duration::ZERO)
            .unwrap();
        let back = store.restore_photo(&removed).unwrap();
        let photo = store.photo(&back).unwrap();
        assert_eq!(
            (photo.attached_to.as_str(), photo.caption.as_str()),
            (owner.as_str(), "photo 0")
        );
        assert!(photo.report_path.is_some());
        std::fs::remove_dir_all(dir).ok();
    }

    #[test]
    fn a_photo_cannot_come_back_to_what_was_removed_since() {
        let (mut store, dir, _, ids) = store_with_photos();
        let removed = store.remove_photo(&ids[0]).unwrap();
        store.remove("run-kitchen").unwrap();
        assert!(store.restore_photo(&removed).is_err());
        std::fs::remove_dir_all(dir).ok();
    }
}

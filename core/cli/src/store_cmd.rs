//! The store's subcommands: list, new, import, export, add-photo.

use crate::output::say;
use anyhow::{bail, Context};
use clap::Args;
use std::path::{Path, PathBuf};
use undercroft_engine::interchange::{from_json_bytes, to_json};
use undercroft_engine::model::RoomUse;
use undercroft_store::{write_durably, ListFilter, NewInspection, Store};

/// Reads a file, or a pipe or device, refusing it once it passes `limit` bytes: the cap holds
/// whatever the file's metadata says (a pipe says 0, /dev/zero never ends, a sparse file
/// claims gigabytes), so memory stays bounded by the limit.
pub fn read_capped(path: &Path, limit: usize, what: &str) -> anyhow::Result<Vec<u8>> {
    use std::io::Read;
    let file =
        std::fs::File::open(path).with_context(|| format!("cannot read {}", path.display()))?;
    if file.metadata().is_ok_and(|m| m.is_dir()) {
        bail!("{} is a folder, not {what}", path.display());
    }
    let claimed = file.metadata().map(|m| m.len()).unwrap_or(0);
    if claimed > limit as u64 {
        bail!(
            "{} is {claimed} bytes, too large for {what} (at most {limit})",
            path.display()
        );
    }
    let mut bytes = Vec::with_capacity((claimed as usize).min(limit));
    file.take(limit as u64 + 1)
        .read_to_end(&mut bytes)
        .with_context(|| format!("cannot read {}", path.display()))?;
    if bytes.len() > limit {
        bail!(
            "{} is more than {limit} bytes, too large for {what}",
            path.display()
        );
    }
    Ok(bytes)
}

fn store_path(db: Option<&Path>) -> anyhow::Result<std::path::PathBuf> {
    match db {
        Some(p) => Ok(p.to_path_buf()),
        None => Store::default_path().context("no data folder on this platform; give --db PATH"),
    }
}

/// Opens the store at `--db`, or in the platform's data folder, creating it if needed (for
/// commands that write).
pub fn open(db: Option<&Path>) -> anyhow::Result<Store> {
    let path = store_path(db)?;
    Store::open(&path).with_context(|| format!("cannot open the store at {}", path.display()))
}

/// Opens a store that must exist (for commands that only read): a missing path is refused.
pub fn open_existing(db: Option<&Path>) -> anyhow::Result<Store> {
    let path = store_path(db)?;
    Store::open_existing(&path)
        .with_context(|| format!("cannot open the store at {}", path.display()))
}

#[derive(Args)]
pub struct ListArgs {
    /// Only inspections whose address or client contains this text.
    #[arg(long, default_value = "")]
    search: String,
    /// Include archived inspections.
    #[arg(long)]
    all: bool,
}

pub fn list(args: &ListArgs, db: Option<&Path>) -> anyhow::Result<()> {
    let store = open_existing(db)?;
    let rows = store.list_inspections(&ListFilter {
        search: args.search.clone(),
        include_archived: args.all,
    })?;
    if rows.is_empty() {
        say!("No inspections.")?;
    }
    for r in rows {
        let archived = if r.archived { "  (archived)" } else { "" };
        say!(
            "{}  {}  {}  {}{archived}",
            r.id,
            r.date,
            r.address,
            r.client_name
        )?;
    }
    Ok(())
}

#[derive(Args)]
pub struct NewArgs {
    #[arg(long)]
    address: String,
    #[arg(long, default_value = "")]
    client: String,
    /// Date of the visit, YYYY-MM-DD.
    #[arg(long)]
    date: String,
    /// Room use above: living (40 psf) or sleeping (30 psf).
    #[arg(long, default_value = "living")]
    room_use: String,
    /// Heavy finishes above (tile): 20 psf dead load.
    #[arg(long)]
    heavy_finish: bool,
}

pub fn new(args: &NewArgs, db: Option<&Path>) -> anyhow::Result<()> {
    let room_use = match args.room_use.trim().to_lowercase().as_str() {
        "living" | "other" => RoomUse::Living,
        "sleeping" | "bedroom" => RoomUse::Sleeping,
        other => bail!("--room-use {other:?}: expected living or sleeping"),
    };
    let mut store = open(db)?;
    let id = store.create_inspection(&NewInspection {
        address: args.address.clone(),
        client_name: args.client.clone(),
        date: args.date.clone(),
        room_use_above: Some(room_use),
        heavy_finish: args.heavy_finish,
        ..Default::default()
    })?;
    say!("{id}")?;
    Ok(())
}

#[derive(Args)]
pub struct ImportArgs {
    /// An inspection file (.json) or a bundle (.zip).
    file: PathBuf,
    /// Import as a copy with new ids, beside a stored inspection that holds the same ids.
    #[arg(long)]
    as_copy: bool,
}

pub fn import(args: &ImportArgs, db: Option<&Path>) -> anyhow::Result<()> {
    let mut head = [0u8; 2];
    let is_zip = std::fs::File::open(&args.file)
        .and_then(|mut f| std::io::Read::read_exact(&mut f, &mut head))
        .map(|_| head == *b"PK")
        .unwrap_or(false);
    let outcome = if is_zip {
        open(db)?
            .import_bundle_with(&args.file, args.as_copy)
            .with_context(|| format!("{} is not a usable bundle", args.file.display()))?
    } else {
        let bytes = read_capped(
            &args.file,
            undercroft_engine::interchange::MAX_FILE_BYTES,
            "an inspection file",
        )?;
        let inspection = from_json_bytes(&bytes)
            .with_context(|| format!("{} is not a usable inspection file", args.file.display()))?;
        let mut store = open(db)?;
        if args.as_copy {
            store.import_inspection_copy(&inspection)?
        } else {
            // The photo files beside the inspection file come in with it.
            let images = crate::photo_files::read_all(
                &inspection,
                &crate::photo_files::folder_of(&args.file),
                "imported without its image",
            );
            let (outcome, refused) = store.import_inspection_with_images(&inspection, &images)?;
            for (id, e) in refused {
                eprintln!("warning: photo {id}: {e}; imported without its image");
            }
            outcome
        }
    };
    let verb = if outcome.replaced {
        "replaced"
    } else {
        "imported"
    };
    say!(
        "{verb} {} ({} photo{})",
        outcome.inspection_id,
        outcome.photos,
        if outcome.photos == 1 { "" } else { "s" }
    )?;
    Ok(())
}

#[derive(Args)]
pub struct ExportArgs {
    /// The inspection's id (see `undercroft list`).
    id: String,
    /// Where to write.
    #[arg(short, long)]
    output: PathBuf,
    /// Write the inspection file (JSON, no photos) instead of a bundle.
    #[arg(long)]
    json: bool,
}

pub fn export(args: &ExportArgs, db: Option<&Path>) -> anyhow::Result<()> {
    let store = open_existing(db)?;
    if args.json {
        let inspection = store.export_inspection(&args.id)?;
        write_durably(&args.output, to_json(&inspection).as_bytes())
            .with_context(|| format!("cannot write {}", args.output.display()))?;
    } else {
        for p in store.export_bundle(&args.id, &args.output)? {
            eprintln!(
                "warning: photo {} ({}) has no image file in the store; the bundle holds its row without the image",
                p.id, p.caption
            );
        }
    }
    say!("wrote {}", args.output.display())?;
    Ok(())
}

#[derive(Args)]
pub struct AddPhotoArgs {
    /// The id of the area, run, member or observation the photo belongs to.
    owner: String,
    /// A JPEG or PNG file.
    file: PathBuf,
    #[arg(long, default_value = "")]
    caption: String,
}

pub fn add_photo(args: &AddPhotoArgs, db: Option<&Path>) -> anyhow::Result<()> {
    let bytes = read_capped(&args.file, undercroft_photo::MAX_FILE_BYTES, "a photo")?;
    let mut store = open(db)?;
    let photo = store
        .add_photo(&args.owner, &bytes, &args.caption)
        .with_context(|| format!("{} was not added", args.file.display()))?;
    say!("{} {}", photo.id, photo.file)?;
    Ok(())
}

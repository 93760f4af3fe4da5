//! `undercroft report (FILE.json | --inspection ID) -o out.pdf [--paper letter|a4]`: builds the
//! client report. For a stored inspection the delivery is recorded (time, file, hash).

use crate::output::say;
use anyhow::{bail, Context};
use clap::Args;
use std::path::{Path, PathBuf};
use undercroft_engine::evaluate;
use undercroft_engine::interchange::from_json_bytes;
use undercroft_engine::model::Inspection;
use undercroft_report::{build_report, pdf, Paper, PhotoFiles, ReportInput};
use undercroft_store::write_durably;

#[derive(Args)]
pub struct ReportArgs {
    /// An inspection file (photo files are looked for in its folder).
    file: Option<PathBuf>,
    /// The folder an inspection file's photos are in, instead of the file's own folder.
    /// Photos named outside it (an absolute path, `..`) are not used.
    #[arg(long, requires = "file")]
    photos: Option<PathBuf>,
    /// The id of an inspection in the store instead of a file.
    #[arg(long, conflicts_with = "file")]
    inspection: Option<String>,
    /// Where to write the PDF.
    #[arg(short, long)]
    output: PathBuf,
    /// letter or a4.
    #[arg(long, default_value = "letter")]
    paper: String,
    /// Show the computed repair options (sizes, spacings, supports) for a contractor or
    /// engineer reader; left out of the client's report by default.
    #[arg(long)]
    repair_options: bool,
    /// Who the report goes to (a name or an address), kept with the delivery record of an
    /// inspection in the store.
    #[arg(long)]
    to: Option<String>,
}

pub fn run(args: &ReportArgs, db: Option<&std::path::Path>) -> anyhow::Result<()> {
    if args.to.is_some() && args.inspection.is_none() {
        bail!("--to keeps who the report went to with its delivery in the store: use it with --inspection");
    }
    let Some(paper) = Paper::parse(&args.paper) else {
        bail!("--paper {:?}: expected letter or a4", args.paper)
    };
    let mut store = None;
    let scratch = Scratch::new()?;
    let (inspection, photo_files, notes) = match (&args.file, &args.inspection) {
        (Some(file), _) => {
            let bytes = crate::store_cmd::read_capped(
                file,
                undercroft_engine::interchange::MAX_FILE_BYTES,
                "an inspection file",
            )?;
            let inspection = from_json_bytes(&bytes)
                .with_context(|| format!("{} is not a usable inspection file", file.display()))?;
            let base = match &args.photos {
                Some(folder) => folder.clone(),
                None => crate::photo_files::folder_of(file),
            };
            let files = photos_in_folder(&inspection, &base, &scratch.0);
            (inspection, files, Vec::new())
        }
        (None, Some(id)) => {
            let s = crate::store_cmd::open_existing(db)?;
            let inspection = s.load_inspection(id)?;
            let mut files = PhotoFiles::new();
            for p in s.photos_of_inspection(id)? {
                match p.report_path {
                    Some(path) => {
                        files.insert(p.id, path);
                    }
                    None if p.hash.is_some() => eprintln!(
                        "warning: photo {} ({}) has lost its image file in the store; the report shows a blank in its place",
                        p.id, p.caption
                    ),
                    None => eprintln!(
                        "warning: photo {} ({}) was imported without its image; the report shows a blank in its place",
                        p.id, p.caption
                    ),
                }
            }
            let notes = s.finding_notes(id)?;
            store = Some(s);
            (inspection, files, notes)
        }
        (None, None) => bail!("give an inspection file or --inspection ID"),
    };
    let evaluation = evaluate(&inspection);
    let report = build_report(&ReportInput {
        inspection: &inspection,
        evaluation: &evaluation,
        notes: &notes,
        photo_files: &photo_files,
        paper,
        repair_options: args.repair_options,
    });
    let bytes = pdf::render(&report);
    // Written to a temporary name and renamed: a killed run leaves the old file whole.
    write_durably(&args.output, &bytes)
        .with_context(|| format!("cannot write {}", args.output.display()))?;
    if let Some(mut s) = store {
        let name = args
            .output
            .file_name()
            .and_then(|n| n.to_str())
            .unwrap_or("report.pdf");
        s.record_report(
            &inspection.id,
            name,
            &bytes,
            &serde_json::to_string(&evaluation.findings)?,
            args.to.as_deref().unwrap_or_default(),
        )?;
    }
    say!("wrote {} ({} bytes)", args.output.display(), bytes.len())?;
    Ok(())
}

/// A scratch folder for photos imported for one report, removed when the run ends.
struct Scratch(PathBuf);

impl Scratch {
    fn new() -> anyhow::Result<Scratch> {
        let dir = std::env::temp_dir().join(format!(
            "undercroft-report-{}-{}",
            std::process::id(),
            undercroft_store::new_id()
        ));
        std::fs::create_dir_all(&dir)
            .with_context(|| format!("cannot make a scratch folder {}", dir.display()))?;
        Ok(Scratch(dir))
    }
}

impl Drop for Scratch {
    fn drop(&mut self) {
        let _ = std::fs::remove_dir_all(&self.0);
    }
}

/// The photos an inspection file names, found only inside `base` and put through the same
/// import as any photo (upright, resized, no metadata) into `scratch`. A photo that cannot
/// be used is said on stderr and shows as a blank in the report.
fn photos_in_folder(inspection: &Inspection, base: &Path, scratch: &Path) -> PhotoFiles {
    let mut files = PhotoFiles::new();
    let read =
        crate::photo_files::read_all(inspection, base, "the report shows a blank in its place");
    for (n, p) in inspection.photos.iter().enumerate() {
        let Some(bytes) = read.get(&p.id) else {
            continue;
        };
        let refuse = |why: String| {
            eprintln!(
                "warning: photo {} ({}): {why}; the report shows a blank in its place",
                p.id, p.file
            )
        };
        match undercroft_photo::process(bytes) {
            Ok(photo) => {
                let out = scratch.join(format!("{n}.jpg"));
                match std::fs::write(&out, &photo.report_jpeg) {
                    Ok(()) => {
                        files.insert(p.id.clone(), out);
                    }
                    Err(e) => refuse(format!("could not be prepared ({e})")),
                }
            }
            Err(e) => refuse(format!("{e:#}")),
        }
    }
    files
}

//! `undercroft report (FILE.json | --inspection ID) -o out.pdf [--paper letter|a4]`: builds the
//! client report. For a stored inspection the delivery is recorded (time, file, hash).

use anyhow::{bail, Context};
use clap::Args;
use std::path::PathBuf;
use undercroft_core::evaluate;
use undercroft_core::interchange::from_json_bytes;
use undercroft_core::report::{build_report, pdf, Paper, PhotoFiles, ReportInput};

#[derive(Args)]
pub struct ReportArgs {
    /// An inspection file (photo files are looked for relative to it).
    file: Option<PathBuf>,
    /// The id of an inspection in the store instead of a file.
    #[arg(long, conflicts_with = "file")]
    inspection: Option<String>,
    /// Where to write the PDF.
    #[arg(short, long)]
    output: PathBuf,
    /// letter or a4.
    #[arg(long, default_value = "letter")]
    paper: String,
}

pub fn run(args: &ReportArgs, db: Option<&std::path::Path>) -> anyhow::Result<()> {
    let Some(paper) = Paper::parse(&args.paper) else {
        bail!("--paper {:?}: expected letter or a4", args.paper)
    };
    let mut store = None;
    let (inspection, photo_files, notes) = match (&args.file, &args.inspection) {
        (Some(file), _) => {
            let bytes =
                std::fs::read(file).with_context(|| format!("cannot read {}", file.display()))?;
            let inspection = from_json_bytes(&bytes)
                .with_context(|| format!("{} is not a usable inspection file", file.display()))?;
            let base = file.parent().map(PathBuf::from).unwrap_or_default();
            let files: PhotoFiles = inspection
                .photos
                .iter()
                .map(|p| (p.id.clone(), base.join(&p.file)))
                .filter(|(_, path)| path.is_file())
                .collect();
            (inspection, files, Vec::new())
        }
        (None, Some(id)) => {
            let s = crate::store_cmd::open(db)?;
            let inspection = s.load_inspection(id)?;
            let files: PhotoFiles = s
                .photos_of_inspection(id)?
                .into_iter()
                .filter_map(|p| p.report_path.map(|path| (p.id, path)))
                .collect();
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
    });
    let bytes = pdf::render(&report);
    std::fs::write(&args.output, &bytes)
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
        )?;
    }
    println!("wrote {} ({} bytes)", args.output.display(), bytes.len());
    Ok(())
}

//! The demo report as `undercroft report demo-data/demo-inspection.json` writes it: eight
//! pages or fewer with the same findings, its drawn photos embedded once each without any
//! metadata, and the PDF's own title, author and a real creation date.

use std::path::PathBuf;
use std::process::Command;

fn repo_root() -> PathBuf {
    PathBuf::from(env!("CARGO_MANIFEST_DIR"))
        .join("../..")
        .canonicalize()
        .unwrap()
}

fn demo_path() -> PathBuf {
    repo_root().join("demo-data").join("demo-inspection.json")
}

fn demo() -> undercroft_engine::Inspection {
    undercroft_engine::interchange::from_json(&std::fs::read_to_string(demo_path()).unwrap())
        .unwrap()
}

fn tool(name: &str, args: &[&std::ffi::OsStr]) -> String {
    let out = Command::new(name)
        .args(args)
        .output()
        .unwrap_or_else(|e| panic!("{name} is needed (Debian: poppler-utils): {e}"));
    assert!(out.status.success(), "{name} failed");
    String::from_utf8_lossy(&out.stdout).into_owned()
}

struct Temp(PathBuf);

impl Temp {
    fn new(name: &str) -> Temp {
        let dir = std::env::temp_dir().join(format!(
            "undercroft-demo-report-{name}-{}",
            std::process::id()
        ));
        std::fs::create_dir_all(&dir).unwrap();
        Temp(dir)
    }
}

impl Drop for Temp {
    fn drop(&mut self) {
        std::fs::remove_dir_all(&self.0).ok();
    }
}

#[test]
fn the_demo_report_fits_eight_pages_with_its_photos_and_metadata() {
    let t = Temp::new("demo");
    let out = t.0.join("demo.pdf");
    let o = Command::new(env!("CARGO_BIN_EXE_undercroft"))
        .args([
            "report".as_ref(),
            demo_path().as_os_str(),
            "-o".as_ref(),
            out.as_os_str(),
        ])
        .output()
        .unwrap();
    assert!(o.status.success(), "{}", String::from_utf8_lossy(&o.stderr));
    assert!(
        o.stderr.is_empty(),
        "{}",
        String::from_utf8_lossy(&o.stderr)
    );
    let info = tool("pdfinfo", &[out.as_os_str()]);
    let field = |name: &str| {
        info.lines()
            .find_map(|l| l.strip_prefix(name))
            .map(str::trim)
            .unwrap_or_default()
            .to_string()
    };
    let pages: usize = field("Pages:").parse().unwrap();
    assert!(pages <= 8, "the demo report has {pages} pages");
    assert_eq!(
        field("Title:"),
        "Wood floor framing screening: 2719 Quillback Road, Marrow Falls"
    );
    assert!(field("Author:").starts_with("Tomasz Ferreira-Lund"));
    let created = field("CreationDate:");
    assert!(!created.contains("1970"), "{created}");
    // Every demo photo embedded once, as the JPEG the import made: no EXIF, no APP1 at all.
    let list = tool("pdfimages", &["-list".as_ref(), out.as_os_str()]);
    assert_eq!(list.lines().skip(2).count(), demo().photos.len(), "{list}");
    let prefix = t.0.join("img");
    tool(
        "pdfimages",
        &["-j".as_ref(), out.as_os_str(), prefix.as_os_str()],
    );
    let mut extracted = 0;
    for entry in std::fs::read_dir(&t.0).unwrap().flatten() {
        let name = entry.file_name().to_string_lossy().into_owned();
        if name.starts_with("img") && name.ends_with(".jpg") {
            let jpeg = std::fs::read(entry.path()).unwrap();
            assert!(
                !jpeg.windows(2).any(|w| w == [0xFF, 0xE1]),
                "{name} has an APP1 segment"
            );
            extracted += 1;
        }
    }
    assert_eq!(extracted, demo().photos.len());
    // The committed demo photos are small and carry no metadata of their own.
    let folder = repo_root().join("demo-data").join("photos");
    let total: u64 = std::fs::read_dir(&folder)
        .unwrap()
        .flatten()
        .map(|e| e.metadata().unwrap().len())
        .sum();
    assert!(total < 400_000, "demo photos take {total} bytes");
}

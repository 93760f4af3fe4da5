//! Crash test: a child process edits the store as fast as it can and is killed with SIGKILL
//! at a random moment, 50 times. Every edit it acknowledged before the kill is there after
//! reopening, photo rows have their files, and `PRAGMA integrity_check` says ok.

use std::io::Read;
use std::process::{Command, Stdio};
use std::time::Duration;
use undercroft_store::Store;

const RUNS: usize = 50;

/// A small xorshift generator: random kill moments, repeatable from the seed.
struct Rng(u64);

impl Rng {
    fn next(&mut self) -> u64 {
        self.0 ^= self.0 << 13;
        self.0 ^= self.0 >> 7;
        self.0 ^= self.0 << 17;
        self.0
    }
}

fn photo_bytes() -> Vec<u8> {
    // A real small JPEG made by the store's own encoder path: import a PNG and keep its report.
    let image = image::RgbImage::from_fn(640, 480, |x, y| {
        image::Rgb([(x % 256) as u8, (y % 256) as u8, 128])
    });
    let mut png = Vec::new();
    image::DynamicImage::ImageRgb8(image)
        .write_to(&mut std::io::Cursor::new(&mut png), image::ImageFormat::Png)
        .unwrap();
    undercroft_photo::process(&png).unwrap().report_jpeg
}

#[test]
fn acknowledged_edits_survive_sigkill() {
    let dir = std::env::temp_dir().join(format!("undercroft-crash-{}", std::process::id()));
    std::fs::create_dir_all(&dir).unwrap();
    let db = dir.join("undercroft.sqlite");
    let photo = dir.join("photo.jpg");
    std::fs::write(&photo, photo_bytes()).unwrap();
    let mut rng = Rng(0x5eed_cafe_f00d);
    let mut acknowledged_total = 0;
    let mut last_label = None;
    for run in 0..RUNS {
        let mut child = Command::new(env!("CARGO_BIN_EXE_crash-editor"))
            .arg(&db)
            .arg(&photo)
            .stdout(Stdio::piped())
            .stderr(Stdio::null())
            .spawn()
            .unwrap();
        std::thread::sleep(Duration::from_millis(30 + rng.next() % 400));
        child.kill().unwrap(); // SIGKILL on Unix
        child.wait().unwrap();
        let mut out = String::new();
        child
            .stdout
            .take()
            .unwrap()
            .read_to_string(&mut out)
            .unwrap();
        // A line cut by the kill is not an acknowledgement.
        let complete = if out.ends_with('\n') {
            out.as_str()
        } else {
            out.rsplit_once('\n').map_or("", |(done, _)| done)
        };
        let acks: Vec<&str> = complete.lines().collect();

        let store = Store::open(&db).unwrap_or_else(|e| panic!("run {run}: reopen failed: {e}"));
        assert_eq!(store.integrity_check().unwrap(), "ok", "run {run}");
        let inspection = store.load_inspection("crash-inspection").unwrap();
        let joist = &inspection.areas[0].runs[0].joists[0];
        let observations: std::collections::HashSet<&str> =
            joist.observations.iter().map(|o| o.id.as_ref()).collect();
        for ack in &acks {
            let (what, value) = ack.split_once(' ').unwrap();
            match what {
                "observation" => assert!(
                    observations.contains(value),
                    "run {run}: acknowledged {value} lost"
                ),
                "photo" => {
                    let p = store
                        .photo(value)
                        .unwrap_or_else(|e| panic!("run {run}: photo {value}: {e}"));
                    assert!(
                        p.report_path.is_some() && p.thumb_path.is_some(),
                        "run {run}: photo {value} lost its files"
                    );
                }
                "label" => last_label = Some(value.to_string()),
                other => panic!("unexpected line {other}"),
            }
        }
        if let Some(acked) = &last_label {
            // The stored label is the last acknowledged one, or a later one this child made
            // before the kill without getting to acknowledge it.
            let parse = |l: &str| -> (u32, u64) {
                let (pid, n) = l.trim_start_matches("Joist ").split_once('-').unwrap();
                (pid.parse().unwrap(), n.parse().unwrap())
            };
            let (stored, acked_at) = (parse(&joist.label), parse(acked));
            let later_by_this_child =
                stored.0 == child.id() && (acked_at.0 != child.id() || stored.1 > acked_at.1);
            assert!(
                joist.label == *acked || later_by_this_child,
                "run {run}: label {} but {acked} was acknowledged",
                joist.label
            );
        }
        // What was found is durable now: the next run is held to it.
        if last_label.is_some() {
            last_label = Some(joist.label.clone());
        }
        acknowledged_total += acks.len();
    }
    assert!(
        acknowledged_total > RUNS * 5,
        "the child made too few edits to test anything: {acknowledged_total}"
    );
    eprintln!("{RUNS} kills, {acknowledged_total} acknowledged edits, none lost");
    std::fs::remove_dir_all(&dir).ok();
}

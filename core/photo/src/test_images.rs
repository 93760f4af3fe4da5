//! Test images made in Rust: an upright scene with a red top-left corner, stored turned as a
//! camera would store it, with an EXIF orientation and GPS tags; and hostile files.

use image::{DynamicImage, RgbImage};

/// The upright scene: red top-left quadrant, blue top-right, green bottom-left, white the rest.
pub fn upright_scene(width: u32, height: u32) -> RgbImage {
    RgbImage::from_fn(width, height, |x, y| {
        let (left, top) = (x < width / 2, y < height / 2);
        image::Rgb(match (left, top) {
            (true, true) => [220, 20, 20],
            (false, true) => [20, 20, 220],
            (true, false) => [20, 200, 20],
            (false, false) => [240, 240, 240],
        })
    })
}

/// The scene as a camera stores it for an EXIF orientation (1, 3, 6 or 8): the pixels turned
/// so that applying the orientation makes them upright again. Source: EXIF 2.32 (CIPA
/// DC-008) Orientation: 6 = the stored 0th row is the visual right side (display rotates 90
/// clockwise), 8 = rotate 270, 3 = rotate 180.
pub fn stored_for(orientation: u16, upright: &RgbImage) -> RgbImage {
    let image = DynamicImage::ImageRgb8(upright.clone());
    match orientation {
        6 => image.rotate270(),
        3 => image.rotate180(),
        8 => image.rotate90(),
        _ => image,
    }
    .into_rgb8()
}

/// A JPEG of `image` with an APP1 EXIF segment holding the orientation and a GPS IFD.
pub fn camera_jpeg(image: &RgbImage, orientation: u16) -> Vec<u8> {
    let rgb = super::pixels::Rgb {
        width: image.width(),
        height: image.height(),
        pixels: image.as_raw().clone(),
    };
    let plain = super::pixels::encode(&rgb, 92).expect("encode");
    let mut out = plain[..2].to_vec();
    out.extend_from_slice(&app1_exif(orientation));
    out.extend_from_slice(&plain[2..]);
    out
}

/// APP1 "Exif" with IFD0 {Orientation, GPSInfo pointer} and a GPS IFD {GPSLatitudeRef "N"}.
fn app1_exif(orientation: u16) -> Vec<u8> {
    let mut t = Vec::new();
    t.extend_from_slice(b"II*\0");
    t.extend_from_slice(&8u32.to_le_bytes());
    // IFD0 at 8: 2 entries, then next-IFD 0.
    t.extend_from_slice(&2u16.to_le_bytes());
    t.extend_from_slice(&0x0112u16.to_le_bytes());
    t.extend_from_slice(&3u16.to_le_bytes());
    t.extend_from_slice(&1u32.to_le_bytes());
    t.extend_from_slice(&orientation.to_le_bytes());
    t.extend_from_slice(&[0, 0]);
    let gps_at = 8 + 2 + 12 * 2 + 4;
    t.extend_from_slice(&0x8825u16.to_le_bytes());
    t.extend_from_slice(&4u16.to_le_bytes());
    t.extend_from_slice(&1u32.to_le_bytes());
    t.extend_from_slice(&(gps_at as u32).to_le_bytes());
    t.extend_from_slice(&0u32.to_le_bytes());
    // GPS IFD: 1 entry, GPSLatitudeRef = "N".
    t.extend_from_slice(&1u16.to_le_bytes());
    t.extend_from_slice(&0x0001u16.to_le_bytes());
    t.extend_from_slice(&2u16.to_le_bytes());
    t.extend_from_slice(&2u32.to_le_bytes());
    t.extend_from_slice(b"N\0\0\0");
    t.extend_from_slice(&0u32.to_le_bytes());
    let mut seg = vec![0xFF, 0xE1];
    seg.extend_from_slice(&((t.len() + 8) as u16).to_be_bytes());
    seg.extend_from_slice(b"Exif\0\0");
    seg.extend_from_slice(&t);
    seg
}

/// A PNG of `image`.
pub fn png(image: &RgbImage) -> Vec<u8> {
    let mut out = Vec::new();
    DynamicImage::ImageRgb8(image.clone())
        .write_to(&mut std::io::Cursor::new(&mut out), image::ImageFormat::Png)
        .expect("encode png");
    out
}

/// A real PNG whose IHDR is rewritten to claim `width` x `height` (CRC fixed): a
/// decompression bomb's header without its gigabytes.
pub fn png_claiming(width: u32, height: u32) -> Vec<u8> {
    let mut bytes = png(&upright_scene(8, 8));
    // Signature (8) + length (4) + "IHDR" (4): width at 16, height at 20, CRC at 29.
    bytes[16..20].copy_from_slice(&width.to_be_bytes());
    bytes[20..24].copy_from_slice(&height.to_be_bytes());
    let crc = crc32(&bytes[12..29]);
    bytes[29..33].copy_from_slice(&crc.to_be_bytes());
    bytes
}

/// A real JPEG whose SOF header is rewritten to claim `width` x `height`.
pub fn jpeg_claiming(width: u16, height: u16) -> Vec<u8> {
    let mut bytes = camera_jpeg(&upright_scene(64, 48), 1);
    let sof = bytes
        .windows(2)
        .position(|w| w == [0xFF, 0xC0])
        .expect("baseline SOF");
    bytes[sof + 5..sof + 7].copy_from_slice(&height.to_be_bytes());
    bytes[sof + 7..sof + 9].copy_from_slice(&width.to_be_bytes());
    bytes
}

/// CRC-32 as PNG uses it (ISO/IEC 15948 annex D).
fn crc32(data: &[u8]) -> u32 {
    let mut crc = 0xFFFF_FFFFu32;
    for &b in data {
        crc ^= b as u32;
        for _ in 0..8 {
            crc = if crc & 1 != 0 {
                0xEDB8_8320 ^ (crc >> 1)
            } else {
                crc >> 1
            };
        }
    }
    !crc
}

/// Whether a JPEG carries any APP1 (EXIF/XMP) segment before its scan.
pub fn has_app1(jpeg: &[u8]) -> bool {
    super::exif::segments(jpeg).any(|(marker, _)| marker == 0xE1)
}

//! Photo import: JPEG or PNG bytes in; an upright report image (1280 px long side) and a
//! thumbnail (320 px), both JPEG without any metadata, out. Bad input is refused before any
//! large allocation.

mod exif;
mod pixels;
mod sniff;

pub use sniff::{sniff, SourceFormat};

use thiserror::Error;

/// Long side of the report image, px: two to a row on a page prints at about 300 dpi, and 40
/// photos fit a report under 10 MB (about 200 KB each at quality 80).
pub const REPORT_LONG_SIDE: u32 = 1280;
/// Long side of the thumbnail, px.
pub const THUMB_LONG_SIDE: u32 = 320;
/// JPEG quality of the report image and the thumbnail.
pub const REPORT_QUALITY: i32 = 80;
pub const THUMB_QUALITY: i32 = 75;
/// Largest file accepted (a 12 MP phone JPEG is 3-6 MB; a 200 MP one about 40 MB).
pub const MAX_FILE_BYTES: usize = 64 * 1024 * 1024;
/// Largest side accepted, px (JPEG's own ceiling is 65535).
pub const MAX_SIDE: u32 = 16_384;
/// Largest JPEG accepted, pixels: JPEGs are decoded at reduced scale, so memory stays small.
pub const MAX_JPEG_PIXELS: u64 = 210_000_000;
/// Largest PNG accepted, pixels: PNGs are decoded at full size (3 bytes a pixel).
pub const MAX_PNG_PIXELS: u64 = 40_000_000;
/// Most memory one photo's decode may take: the buffered coefficients of a progressive JPEG,
/// or a PNG's decoded pixels. With the file itself (at most 64 MiB) and the output images,
/// one command stays well under 256 MiB.
pub const DECODE_BUDGET_BYTES: u64 = 128 * 1024 * 1024;

#[derive(Debug, Error, PartialEq)]
pub enum PhotoError {
    #[error("the file is empty")]
    Empty,
    #[error("the file is {0} bytes; photos over 64 MiB are not accepted")]
    TooLarge(usize),
    #[error("{0} photos are not supported; set the camera to JPEG (\"Most compatible\") or share the photo as JPEG")]
    Unsupported(&'static str),
    #[error("not an image (neither JPEG nor PNG)")]
    NotAnImage,
    #[error("the image is {0} x {1} px, larger than this app accepts")]
    TooManyPixels(u32, u32),
    #[error("the image is damaged or cut short: {0}")]
    Damaged(String),
    #[error("the image is {0} x {1} px, {2}: decoding it would take more than 128 MiB; export it as a standard JPEG or a smaller image")]
    OverBudget(u32, u32, &'static str),
}

/// The two images kept for the report, and what was learnt on the way.
#[derive(Debug, Clone, PartialEq)]
pub struct ProcessedPhoto {
    pub format: SourceFormat,
    /// Size of the source as stored (before the EXIF orientation).
    pub source_width: u32,
    pub source_height: u32,
    /// EXIF orientation found (1 to 8; 1 when none).
    pub orientation: u8,
    pub report_jpeg: Vec<u8>,
    pub report_width: u32,
    pub report_height: u32,
    pub thumb_jpeg: Vec<u8>,
    pub thumb_width: u32,
    pub thumb_height: u32,
}

/// Runs the whole import of one photo, single-threaded.
pub fn process(bytes: &[u8]) -> Result<ProcessedPhoto, PhotoError> {
    if bytes.is_empty() {
        return Err(PhotoError::Empty);
    }
    if bytes.len() > MAX_FILE_BYTES {
        return Err(PhotoError::TooLarge(bytes.len()));
    }
    let format = sniff(bytes)?;
    let decoded = match format {
        SourceFormat::Jpeg => pixels::decode_jpeg(bytes, REPORT_LONG_SIDE)?,
        SourceFormat::Png => pixels::decode_png(bytes)?,
    };
    let orientation = decoded.orientation;
    let (source_width, source_height) = (decoded.source_width, decoded.source_height);
    let report = pixels::fit(decoded.image, REPORT_LONG_SIDE)?;
    let report = pixels::orient(report, orientation);
    // The thumbnail is made and encoded beside the report image's encoding.
    let (report_jpeg, thumb) = std::thread::scope(|s| {
        let thumb = s.spawn(|| -> Result<_, PhotoError> {
            let thumb = pixels::fit(report.clone(), THUMB_LONG_SIDE)?;
            let jpeg = pixels::encode(&thumb, THUMB_QUALITY)?;
            Ok((thumb.width, thumb.height, jpeg))
        });
        let report_jpeg = pixels::encode(&report, REPORT_QUALITY);
        (
            report_jpeg,
            thumb.join().expect("the thumbnail does not panic"),
        )
    });
    let (thumb_width, thumb_height, thumb_jpeg) = thumb?;
    Ok(ProcessedPhoto {
        format,
        source_width,
        source_height,
        orientation,
        report_width: report.width,
        report_height: report.height,
        report_jpeg: report_jpeg?,
        thumb_width,
        thumb_height,
        thumb_jpeg,
    })
}

/// Encodes packed RGB pixels (3 bytes a pixel, rows packed) as a JPEG with no metadata: for
/// tools that make images, such as the office server's load test.
pub fn encode_rgb(
    width: u32,
    height: u32,
    pixels: Vec<u8>,
    quality: i32,
) -> Result<Vec<u8>, PhotoError> {
    if width == 0 || height == 0 || pixels.len() as u64 != 3 * width as u64 * height as u64 {
        return Err(PhotoError::Damaged(
            "the pixels do not fill the size given".into(),
        ));
    }
    pixels::encode(
        &pixels::Rgb {
            width,
            height,
            pixels,
        },
        quality,
    )
}

/// Width and height of a JPEG without decoding it (for embedding a stored image).
pub fn jpeg_size(bytes: &[u8]) -> Result<(u32, u32), PhotoError> {
    pixels::jpeg_header(bytes).map(|h| (h.0, h.1))
}

#[cfg(any(test, feature = "test-images"))]
pub mod test_images;
#[cfg(test)]
mod tests;

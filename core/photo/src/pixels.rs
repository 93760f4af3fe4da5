//! Pixel work: decode (JPEG at reduced scale with libjpeg-turbo, PNG with `image`), resize
//! (fast_image_resize, bilinear), orient, encode (libjpeg-turbo, 4:2:0, no metadata).

use super::{exif, PhotoError, DECODE_BUDGET_BYTES, MAX_JPEG_PIXELS, MAX_PNG_PIXELS, MAX_SIDE};
use fast_image_resize::images::Image as FirImage;
use fast_image_resize::{FilterType, PixelType, ResizeAlg, ResizeOptions, Resizer};
use image::metadata::Orientation;
use image::{DynamicImage, ImageDecoder, RgbImage};
use turbojpeg::{Decompressor, PixelFormat, ScalingFactor, Subsamp};

/// An RGB image, 3 bytes a pixel, rows packed.
#[derive(Debug, Clone)]
pub struct Rgb {
    pub width: u32,
    pub height: u32,
    pub pixels: Vec<u8>,
}

pub struct Decoded {
    pub image: Rgb,
    pub source_width: u32,
    pub source_height: u32,
    pub orientation: u8,
}

fn check_size(width: u32, height: u32, max_pixels: u64) -> Result<(), PhotoError> {
    if width == 0 || height == 0 {
        return Err(PhotoError::Damaged("the image has no pixels".into()));
    }
    if width > MAX_SIDE || height > MAX_SIDE || width as u64 * height as u64 > max_pixels {
        return Err(PhotoError::TooManyPixels(width, height));
    }
    Ok(())
}

fn damaged(e: impl std::fmt::Display) -> PhotoError {
    PhotoError::Damaged(e.to_string())
}

/// Width and height from the JPEG header, with the size limits applied.
pub fn jpeg_header(bytes: &[u8]) -> Result<(u32, u32), PhotoError> {
    let header = turbojpeg::read_header(bytes).map_err(damaged)?;
    let (w, h) = (header.width as u32, header.height as u32);
    check_size(w, h, MAX_JPEG_PIXELS)?;
    Ok((w, h))
}

/// Bytes libjpeg-turbo holds for a JPEG it must buffer whole before output (progressive, or
/// several scans): every DCT coefficient of every component, 2 bytes each (libjpeg's
/// jdcoefct.c, buffered-image mode), whatever the output scale. None for a single-scan
/// sequential JPEG, which is decoded a band at a time.
pub fn jpeg_coefficient_bytes(bytes: &[u8], width: u32, height: u32) -> Option<u64> {
    let mut progressive = false;
    let mut sampling: Vec<(u64, u64)> = Vec::new();
    for (marker, body) in exif::segments(bytes) {
        // SOF0..SOF15 except DHT (C4), JPG (C8) and DAC (CC).
        if (0xC0..=0xCF).contains(&marker) && ![0xC4, 0xC8, 0xCC].contains(&marker) {
            progressive = matches!(marker, 0xC2 | 0xC6 | 0xCA | 0xCE);
            let count = *body.get(5)? as usize;
            sampling = (0..count)
                .filter_map(|c| body.get(6 + 3 * c + 1))
                .map(|f| ((f >> 4).max(1) as u64, (f & 0x0F).max(1) as u64))
                .collect();
        }
    }
    let scan = exif::first_scan(bytes)?;
    // Inside entropy-coded data every FF is stuffed (ITU T.81 B.1.1.5): another FF DA is
    // another scan.
    let several_scans = bytes[scan + 2..].windows(2).any(|w| w == [0xFF, 0xDA]);
    if !(progressive || several_scans) || sampling.is_empty() {
        return None;
    }
    let hmax = sampling.iter().map(|s| s.0).max()?;
    let vmax = sampling.iter().map(|s| s.1).max()?;
    let blocks = |size: u64, f: u64, max: u64| (size * f).div_ceil(max).div_ceil(8);
    Some(
        sampling
            .iter()
            .map(|&(hf, vf)| blocks(width as u64, hf, hmax) * blocks(height as u64, vf, vmax) * 128)
            .sum(),
    )
}

/// Decodes a JPEG at the smallest DCT scale (1/8, 1/4, 1/2, 1) whose long side still reaches
/// `long_side`. Warnings (a file cut short) are errors: a half-grey photo is not evidence.
pub fn decode_jpeg(bytes: &[u8], long_side: u32) -> Result<Decoded, PhotoError> {
    let (width, height) = jpeg_header(bytes)?;
    if jpeg_coefficient_bytes(bytes, width, height).is_some_and(|b| b > DECODE_BUDGET_BYTES) {
        return Err(PhotoError::OverBudget(width, height, "a progressive JPEG"));
    }
    let long = width.max(height);
    // libjpeg-turbo's scaled inverse DCTs (M/8 for M = 1..8): the smallest output that still
    // reaches the long side, so the fewest pixels are decoded and resized.
    let scale = (1..8usize)
        .map(|m| ScalingFactor::new(m, 8))
        .find(|f| f.scale(long as usize) >= long_side as usize)
        .unwrap_or(ScalingFactor::ONE);
    let mut decompressor = Decompressor::new().map_err(damaged)?;
    decompressor.set_scaling_factor(scale).map_err(damaged)?;
    let (w, h) = (scale.scale(width as usize), scale.scale(height as usize));
    let mut image = turbojpeg::Image {
        pixels: vec![0u8; 3 * w * h],
        width: w,
        pitch: 3 * w,
        height: h,
        format: PixelFormat::RGB,
    };
    decompressor
        .decompress(bytes, image.as_deref_mut())
        .map_err(damaged)?;
    if !eoi_after_scan(bytes) {
        return Err(PhotoError::Damaged(
            "the file ends before the end-of-image marker".into(),
        ));
    }
    Ok(Decoded {
        image: Rgb {
            width: w as u32,
            height: h as u32,
            pixels: image.pixels,
        },
        source_width: width,
        source_height: height,
        orientation: exif::jpeg_orientation(bytes),
    })
}

/// True when an end-of-image marker (FF D9) follows the first scan. Inside entropy-coded data
/// every FF byte is stuffed (ITU T.81 B.1.1.5), so an FF D9 there is the real end; one in an
/// EXIF thumbnail before the scan does not count. Cameras may append a trailer after it.
fn eoi_after_scan(bytes: &[u8]) -> bool {
    let Some(scan) = exif::first_scan(bytes) else {
        return false;
    };
    bytes[scan..].windows(2).any(|w| w == [0xFF, 0xD9])
}

/// Decodes a PNG at full size after checking its dimensions.
pub fn decode_png(bytes: &[u8]) -> Result<Decoded, PhotoError> {
    let mut decoder =
        image::codecs::png::PngDecoder::new(std::io::Cursor::new(bytes)).map_err(damaged)?;
    let (width, height) = decoder.dimensions();
    check_size(width, height, MAX_PNG_PIXELS)?;
    // The decoded buffer (up to 8 bytes a pixel for 16-bit RGBA) and, unless it is already
    // 8-bit RGB, its 3-byte copy.
    let decoded = decoder.color_type().bytes_per_pixel() as u64;
    let copy = if decoder.color_type() == image::ColorType::Rgb8 {
        0
    } else {
        3
    };
    if width as u64 * height as u64 * (decoded + copy) > DECODE_BUDGET_BYTES {
        return Err(PhotoError::OverBudget(width, height, "a PNG of this depth"));
    }
    let mut limits = image::Limits::default();
    limits.max_image_width = Some(MAX_SIDE);
    limits.max_image_height = Some(MAX_SIDE);
    limits.max_alloc = Some(DECODE_BUDGET_BYTES);
    decoder.set_limits(limits).map_err(damaged)?;
    let orientation = decoder.orientation().map(|o| o.to_exif()).unwrap_or(1);
    let image = DynamicImage::from_decoder(decoder)
        .map_err(damaged)?
        .into_rgb8();
    Ok(Decoded {
        image: Rgb {
            width,
            height,
            pixels: image.into_raw(),
        },
        source_width: width,
        source_height: height,
        orientation,
    })
}

/// Shrinks the image so its long side is at most `long_side` (never enlarges).
pub fn fit(image: Rgb, long_side: u32) -> Result<Rgb, PhotoError> {
    let long = image.width.max(image.height);
    if long <= long_side {
        return Ok(image);
    }
    let scale = long_side as f64 / long as f64;
    let w = ((image.width as f64 * scale).round() as u32).max(1);
    let h = ((image.height as f64 * scale).round() as u32).max(1);
    let src = FirImage::from_vec_u8(image.width, image.height, image.pixels, PixelType::U8x3)
        .map_err(damaged)?;
    let mut dst = FirImage::new(w, h, PixelType::U8x3);
    let options = ResizeOptions::new().resize_alg(ResizeAlg::Convolution(FilterType::Bilinear));
    Resizer::new()
        .resize(&src, &mut dst, &options)
        .map_err(damaged)?;
    Ok(Rgb {
        width: w,
        height: h,
        pixels: dst.into_vec(),
    })
}

/// Turns the pixels upright per the EXIF orientation (1 to 8).
pub fn orient(image: Rgb, orientation: u8) -> Rgb {
    let Some(o) = Orientation::from_exif(orientation).filter(|o| *o != Orientation::NoTransforms)
    else {
        return image;
    };
    let Some(buffer) = RgbImage::from_raw(image.width, image.height, image.pixels.clone()) else {
        return image;
    };
    let mut dynamic = DynamicImage::ImageRgb8(buffer);
    dynamic.apply_orientation(o);
    let upright = dynamic.into_rgb8();
    Rgb {
        width: upright.width(),
        height: upright.height(),
        pixels: upright.into_raw(),
    }
}

/// Encodes baseline JPEG, 4:2:0; libjpeg-turbo writes only a JFIF header, no EXIF.
pub fn encode(image: &Rgb, quality: i32) -> Result<Vec<u8>, PhotoError> {
    let view = turbojpeg::Image {
        pixels: image.pixels.as_slice(),
        width: image.width as usize,
        pitch: 3 * image.width as usize,
        height: image.height as usize,
        format: PixelFormat::RGB,
    };
    let mut compressor = turbojpeg::Compressor::new().map_err(damaged)?;
    compressor.set_quality(quality).map_err(damaged)?;
    compressor.set_subsamp(Subsamp::Sub2x2).map_err(damaged)?;
    compressor.compress_to_vec(view).map_err(damaged)
}

//! Tests of the photo import: upright for every orientation, no metadata, sizes, and every
//! kind of bad input refused cleanly.

use super::test_images::*;
use super::*;
use image::RgbImage;

fn decode(jpeg: &[u8]) -> RgbImage {
    let img = turbojpeg::decompress(jpeg, turbojpeg::PixelFormat::RGB).expect("decodes");
    RgbImage::from_raw(img.width as u32, img.height as u32, img.pixels).expect("packed rows")
}

/// Mean colour of a small patch around (fx, fy) given as fractions of the image size.
fn patch(img: &RgbImage, fx: f64, fy: f64) -> [u8; 3] {
    let (cx, cy) = (
        (img.width() as f64 * fx) as u32,
        (img.height() as f64 * fy) as u32,
    );
    let mut sum = [0u32; 3];
    let mut n = 0;
    for y in cy.saturating_sub(3)..(cy + 3).min(img.height()) {
        for x in cx.saturating_sub(3)..(cx + 3).min(img.width()) {
            let p = img.get_pixel(x, y).0;
            for c in 0..3 {
                sum[c] += p[c] as u32;
            }
            n += 1;
        }
    }
    [(sum[0] / n) as u8, (sum[1] / n) as u8, (sum[2] / n) as u8]
}

fn is_red(p: [u8; 3]) -> bool {
    p[0] > 150 && p[1] < 90 && p[2] < 90
}

fn is_blue(p: [u8; 3]) -> bool {
    p[2] > 150 && p[0] < 90 && p[1] < 90
}

// Source: EXIF 2.32 (CIPA DC-008) Orientation 1, 3, 6, 8 (the four a phone writes).
#[test]
fn upright_for_all_four_orientations_and_no_exif() {
    let scene = upright_scene(2400, 1800);
    for orientation in [1u16, 6, 3, 8] {
        let input = camera_jpeg(&stored_for(orientation, &scene), orientation);
        assert!(has_app1(&input), "the test input carries EXIF");
        let out = process(&input).unwrap();
        assert_eq!(out.orientation, orientation as u8);
        assert_eq!(
            (out.report_width, out.report_height),
            (1280, 960),
            "orientation {orientation}"
        );
        assert_eq!((out.thumb_width, out.thumb_height), (320, 240));
        for jpeg in [&out.report_jpeg, &out.thumb_jpeg] {
            assert!(
                !has_app1(jpeg),
                "orientation {orientation}: output carries APP1"
            );
            let img = decode(jpeg);
            assert!(
                is_red(patch(&img, 0.25, 0.25)),
                "orientation {orientation}: top-left is {:?}",
                patch(&img, 0.25, 0.25)
            );
            assert!(
                is_blue(patch(&img, 0.75, 0.25)),
                "orientation {orientation}: top-right is {:?}",
                patch(&img, 0.75, 0.25)
            );
        }
    }
}

#[test]
fn small_photos_are_not_enlarged_and_png_works() {
    let out = process(&camera_jpeg(&upright_scene(800, 600), 1)).unwrap();
    assert_eq!((out.report_width, out.report_height), (800, 600));
    let out = process(&png(&upright_scene(2000, 1000))).unwrap();
    assert_eq!(out.format, SourceFormat::Png);
    assert_eq!((out.report_width, out.report_height), (1280, 640));
    assert!(is_red(patch(&decode(&out.report_jpeg), 0.25, 0.25)));
}

#[test]
fn bad_input_is_refused() {
    assert_eq!(process(&[]), Err(PhotoError::Empty));
    assert_eq!(process(b"not an image at all"), Err(PhotoError::NotAnImage));
    assert_eq!(
        process(b"\0\0\0\x18ftypheic\0\0\0\0mif1heic"),
        Err(PhotoError::Unsupported("HEIC/HEIF"))
    );
    let good = camera_jpeg(&upright_scene(1200, 900), 1);
    for cut in [good.len() / 2, good.len() - 2, 300] {
        assert!(
            matches!(process(&good[..cut]), Err(PhotoError::Damaged(_))),
            "cut at {cut}"
        );
    }
    let mut scrambled = good.clone();
    for b in scrambled[400..].iter_mut().step_by(7) {
        *b = b.wrapping_add(77);
    }
    assert!(process(&scrambled).is_err());
    assert_eq!(
        process(&png_claiming(30_000, 30_000)),
        Err(PhotoError::TooManyPixels(30_000, 30_000))
    );
    assert_eq!(
        process(&jpeg_claiming(30_000, 30_000)),
        Err(PhotoError::TooManyPixels(30_000, 30_000))
    );
    assert!(matches!(
        process(&jpeg_claiming(16_000, 12_000)),
        Err(PhotoError::Damaged(_))
    ));
    let huge = vec![0u8; 200 * 1024 * 1024];
    assert_eq!(process(&huge), Err(PhotoError::TooLarge(200 * 1024 * 1024)));
}

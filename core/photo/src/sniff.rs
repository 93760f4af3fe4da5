//! Tells the image formats apart by their first bytes.

use super::PhotoError;

#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum SourceFormat {
    Jpeg,
    Png,
}

impl SourceFormat {
    pub fn extension(self) -> &'static str {
        match self {
            SourceFormat::Jpeg => "jpg",
            SourceFormat::Png => "png",
        }
    }
}

/// The format of `bytes`, or why it is refused. Source of the signatures: the JPEG (ITU T.81
/// B.1.1.3, SOI FF D8), PNG (ISO/IEC 15948 5.2), ISO-BMFF `ftyp` brands (HEIF ISO/IEC 23008-12),
/// GIF, WebP (RIFF), TIFF and BMP file formats.
pub fn sniff(bytes: &[u8]) -> Result<SourceFormat, PhotoError> {
    if bytes.starts_with(&[0xFF, 0xD8, 0xFF]) {
        return Ok(SourceFormat::Jpeg);
    }
    if bytes.starts_with(b"\x89PNG\r\n\x1a\n") {
        return Ok(SourceFormat::Png);
    }
    if bytes.len() >= 12 && &bytes[4..8] == b"ftyp" {
        let brand = &bytes[8..12];
        return Err(match brand {
            b"heic" | b"heix" | b"hevc" | b"hevx" | b"heim" | b"heis" | b"mif1" | b"msf1" => {
                PhotoError::Unsupported("HEIC/HEIF")
            }
            b"avif" | b"avis" => PhotoError::Unsupported("AVIF"),
            _ => PhotoError::Unsupported("MP4, MOV or other ISO media"),
        });
    }
    if bytes.starts_with(b"GIF8") {
        return Err(PhotoError::Unsupported("GIF"));
    }
    if bytes.len() >= 12 && bytes.starts_with(b"RIFF") && &bytes[8..12] == b"WEBP" {
        return Err(PhotoError::Unsupported("WebP"));
    }
    if bytes.starts_with(b"II*\0") || bytes.starts_with(b"MM\0*") {
        return Err(PhotoError::Unsupported("TIFF or camera raw"));
    }
    if bytes.starts_with(b"BM") {
        return Err(PhotoError::Unsupported("BMP"));
    }
    Err(PhotoError::NotAnImage)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn formats() {
        assert_eq!(sniff(&[0xFF, 0xD8, 0xFF, 0xE0]), Ok(SourceFormat::Jpeg));
        assert_eq!(sniff(b"\x89PNG\r\n\x1a\n...."), Ok(SourceFormat::Png));
        assert_eq!(
            sniff(b"\0\0\0\x18ftypheic\0\0\0\0"),
            Err(PhotoError::Unsupported("HEIC/HEIF"))
        );
        assert_eq!(
            sniff(b"\0\0\0\x18ftypmif1\0\0\0\0"),
            Err(PhotoError::Unsupported("HEIC/HEIF"))
        );
        assert_eq!(sniff(b"GIF89a"), Err(PhotoError::Unsupported("GIF")));
        assert_eq!(
            sniff(b"RIFF\0\0\0\0WEBPVP8 "),
            Err(PhotoError::Unsupported("WebP"))
        );
        assert_eq!(sniff(b"hello, world"), Err(PhotoError::NotAnImage));
        assert_eq!(sniff(b"\xFF"), Err(PhotoError::NotAnImage));
    }
}

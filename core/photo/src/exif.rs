//! Finds the EXIF orientation in a JPEG's APP1 segment (turbojpeg does not expose it).

/// The EXIF orientation (1 to 8) of a JPEG, 1 when there is none or it cannot be read.
/// Walks the marker segments before the first scan (ITU T.81 B.1.1.4; EXIF 2.32 4.5.4: APP1
/// "Exif\0\0" followed by a TIFF header).
pub fn jpeg_orientation(bytes: &[u8]) -> u8 {
    exif_tiff(bytes)
        .and_then(image::metadata::Orientation::from_exif_chunk)
        .map(|o| o.to_exif())
        .unwrap_or(1)
}

/// The TIFF structure inside the first APP1 "Exif" segment.
fn exif_tiff(bytes: &[u8]) -> Option<&[u8]> {
    segments(bytes).find_map(|(marker, body)| {
        (marker == 0xE1 && body.starts_with(b"Exif\0\0")).then(|| &body[6..])
    })
}

/// Offset of the first start-of-scan marker (FF DA), if the headers before it are whole.
pub fn first_scan(bytes: &[u8]) -> Option<usize> {
    let mut walker = Segments {
        bytes,
        at: 2,
        scan: None,
    };
    for _ in walker.by_ref() {}
    walker.scan
}

/// The marker segments before the first scan: (marker, body).
pub fn segments(bytes: &[u8]) -> impl Iterator<Item = (u8, &[u8])> {
    Segments {
        bytes,
        at: 2,
        scan: None,
    }
}

struct Segments<'b> {
    bytes: &'b [u8],
    at: usize,
    scan: Option<usize>,
}

impl<'b> Iterator for Segments<'b> {
    type Item = (u8, &'b [u8]);
    fn next(&mut self) -> Option<Self::Item> {
        let bytes = self.bytes;
        while self.at + 4 <= bytes.len() {
            if bytes[self.at] != 0xFF {
                return None;
            }
            let marker = bytes[self.at + 1];
            if marker == 0xFF {
                self.at += 1; // fill byte
                continue;
            }
            if marker == 0xDA {
                self.scan = Some(self.at);
                return None;
            }
            if marker == 0xD9 {
                return None;
            }
            let length = u16::from_be_bytes([bytes[self.at + 2], bytes[self.at + 3]]) as usize;
            if length < 2 {
                return None;
            }
            let body = bytes.get(self.at + 4..self.at + 2 + length)?;
            self.at += 2 + length;
            return Some((marker, body));
        }
        None
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    /// A JPEG prefix with an APP1 EXIF segment holding only the orientation tag (0x0112).
    fn exif_prefix(orientation: u16, big_endian: bool) -> Vec<u8> {
        let mut tiff = Vec::new();
        type Bytes16 = fn(u16) -> [u8; 2];
        type Bytes32 = fn(u32) -> [u8; 4];
        let (b16, b32): (Bytes16, Bytes32) = if big_endian {
            (u16::to_be_bytes, u32::to_be_bytes)
        } else {
            (u16::to_le_bytes, u32::to_le_bytes)
        };
        tiff.extend_from_slice(if big_endian { b"MM\0*" } else { b"II*\0" });
        tiff.extend_from_slice(&b32(8));
        tiff.extend_from_slice(&b16(1));
        tiff.extend_from_slice(&b16(0x0112));
        tiff.extend_from_slice(&b16(3));
        tiff.extend_from_slice(&b32(1));
        tiff.extend_from_slice(&b16(orientation));
        tiff.extend_from_slice(&[0, 0]);
        tiff.extend_from_slice(&b32(0));
        let mut out = vec![0xFF, 0xD8, 0xFF, 0xE1];
        out.extend_from_slice(&((tiff.len() + 8) as u16).to_be_bytes());
        out.extend_from_slice(b"Exif\0\0");
        out.extend_from_slice(&tiff);
        out.extend_from_slice(&[0xFF, 0xDA]);
        out
    }

    // Source: EXIF 2.32 (CIPA DC-008) 4.6.4 A, Orientation tag 0x0112, values 1-8.
    #[test]
    fn reads_orientation_both_byte_orders() {
        for o in 1..=8 {
            assert_eq!(jpeg_orientation(&exif_prefix(o, false)), o as u8);
            assert_eq!(jpeg_orientation(&exif_prefix(o, true)), o as u8);
        }
    }

    #[test]
    fn missing_or_broken_exif_is_upright() {
        assert_eq!(jpeg_orientation(&[0xFF, 0xD8, 0xFF, 0xDA]), 1);
        assert_eq!(jpeg_orientation(&[0xFF, 0xD8, 0xFF, 0xE1, 0x00]), 1);
        let mut cut = exif_prefix(6, false);
        cut.truncate(20);
        assert_eq!(jpeg_orientation(&cut), 1);
        assert_eq!(jpeg_orientation(&exif_prefix(9, false)), 1);
    }
}

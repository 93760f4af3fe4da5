//! Page layout: a cursor down the page, text in runs by font, wrapping, rules, boxes, images,
//! and the running head and page numbers added when all pages are known.

use super::fonts::{self, Face};
use printpdf::*;
use std::collections::HashMap;
use std::path::{Path, PathBuf};

pub const MARGIN: f32 = 40.0;
/// Line height as a multiple of the type size.
pub const LEADING: f32 = 1.2;
const HEAD_SPACE: f32 = 20.0;
const FOOT_SPACE: f32 = 16.0;

pub fn rgb(r: f32, g: f32, b: f32) -> Color {
    Color::Rgb(Rgb {
        r,
        g,
        b,
        icc_profile: None,
    })
}

pub const INK: (f32, f32, f32) = (0.1, 0.1, 0.12);
pub const MUTED: (f32, f32, f32) = (0.35, 0.35, 0.4);

pub struct Writer {
    pub doc: PdfDocument,
    faces: HashMap<Face, FontId>,
    pages: Vec<Vec<Op>>,
    pub ops: Vec<Op>,
    pub width: f32,
    pub height: f32,
    /// Distance of the cursor from the bottom of the page.
    pub y: f32,
    images: HashMap<PathBuf, Option<(XObjectId, u32, u32)>>,
}

impl Writer {
    pub fn new(title: &str, width: f32, height: f32) -> Writer {
        let mut w = Writer {
            doc: PdfDocument::new(title),
            faces: HashMap::new(),
            pages: Vec::new(),
            ops: Vec::new(),
            width,
            height,
            y: height - MARGIN - HEAD_SPACE,
            images: HashMap::new(),
        };
        w.face(Face::Regular);
        w
    }

    pub fn content_width(&self) -> f32 {
        self.width - 2.0 * MARGIN
    }

    fn bottom(&self) -> f32 {
        MARGIN + FOOT_SPACE
    }

    fn face(&mut self, face: Face) -> FontId {
        if let Some(id) = self.faces.get(&face) {
            return id.clone();
        }
        let id = self.doc.add_font(fonts::font(face));
        self.faces.insert(face, id.clone());
        id
    }

    pub fn new_page(&mut self) {
        let ops = std::mem::take(&mut self.ops);
        self.pages.push(ops);
        self.y = self.height - MARGIN - HEAD_SPACE;
    }

    /// Text on an earlier page (from 1), or on this one: for what is known only later, such
    /// as the contents' page numbers.
    #[allow(clippy::too_many_arguments)]
    pub fn text_on_page(
        &mut self,
        page: usize,
        x: f32,
        y: f32,
        text: &str,
        size: f32,
        style: Face,
        color: (f32, f32, f32),
    ) {
        if page == self.page_number() {
            self.text_at(x, y, text, size, style, color);
        } else if let Some(ops) = self.pages.get_mut(page - 1) {
            let ops = std::mem::take(ops);
            let current = std::mem::replace(&mut self.ops, ops);
            self.text_at(x, y, text, size, style, color);
            self.pages[page - 1] = std::mem::replace(&mut self.ops, current);
        }
    }

    /// The number of the page being written, from 1.
    pub fn page_number(&self) -> usize {
        self.pages.len() + 1
    }

    /// Title, author, subject and the real creation time in the PDF's own metadata.
    pub fn set_meta(&mut self, meta: &crate::Meta, created: DateTime) {
        let info = &mut self.doc.metadata.info;
        info.document_title = meta.title.clone();
        info.author = meta.author.clone();
        info.subject = meta.subject.clone();
        info.creator = "Undercroft".into();
        info.producer = format!("Undercroft {}", env!("CARGO_PKG_VERSION"));
        info.creation_date = created;
        info.modification_date = created;
        info.metadata_date = created;
    }

    /// True when the current page has nothing on it yet.
    pub fn page_is_empty(&self) -> bool {
        self.ops.is_empty()
    }

    /// Starts a new page unless `needed` points fit above the footer.
    pub fn ensure(&mut self, needed: f32) {
        if self.y - needed < self.bottom() && !self.page_is_empty() {
            self.new_page();
        }
    }

    pub fn space(&mut self, points: f32) {
        self.y -= points;
    }

    /// One line of text with its baseline at (x, y), in runs by font.
    pub fn text_at(
        &mut self,
        x: f32,
        y: f32,
        text: &str,
        size: f32,
        style: Face,
        color: (f32, f32, f32),
    ) {
        let mut cursor = x;
        let text = super::scripts::visual(text);
        let text: &str = &text;
        self.ops.push(Op::StartTextSection);
        self.ops.push(Op::SetFillColor {
            col: rgb(color.0, color.1, color.2),
        });
        for (face, run) in fonts::runs(text, style) {
            let id = self.face(face);
            self.ops.push(Op::SetFont {
                font: PdfFontHandle::External(id),
                size: Pt(size),
            });
            self.ops.push(Op::SetTextMatrix {
                matrix: TextMatrix::Translate(Pt(cursor), Pt(y)),
            });
            let advance = fonts::measure_run(&run, size, face);
            self.ops.push(Op::ShowText {
                items: vec![TextItem::Text(run)],
            });
            cursor += advance;
        }
        self.ops.push(Op::EndTextSection);
    }

    /// Wrapped text at `indent` from the left margin, moving the cursor down; breaks pages
    /// between lines.
    pub fn paragraph(
        &mut self,
        text: &str,
        size: f32,
        style: Face,
        indent: f32,
        color: (f32, f32, f32),
    ) {
        let width = self.content_width() - indent;
        self.paragraph_within(text, size, style, indent, width, color);
    }

    /// A paragraph wrapped to `width` points from `indent`.
    pub fn paragraph_within(
        &mut self,
        text: &str,
        size: f32,
        style: Face,
        indent: f32,
        width: f32,
        color: (f32, f32, f32),
    ) {
        let leading = size * LEADING;
        let lines = fonts::wrap(text, size, style, width);
        for line in lines {
            self.ensure(leading);
            self.y -= leading;
            self.text_at(
                MARGIN + indent,
                self.y + size * 0.25,
                &line,
                size,
                style,
                color,
            );
        }
    }

    /// "Label: value" with the label bold, value wrapped beside it.
    pub fn labelled(&mut self, label: &str, value: &str, size: f32, label_width: f32, indent: f32) {
        let leading = size * LEADING;
        let lines = fonts::wrap(
            value,
            size,
            Face::Regular,
            self.content_width() - indent - label_width,
        );
        for (n, line) in lines.iter().enumerate() {
            self.ensure(leading);
            self.y -= leading;
            if n == 0 {
                self.text_at(
                    MARGIN + indent,
                    self.y + size * 0.25,
                    label,
                    size,
                    Face::Bold,
                    MUTED,
                );
            }
            self.text_at(
                MARGIN + indent + label_width,
                self.y + size * 0.25,
                line,
                size,
                Face::Regular,
                INK,
            );
        }
    }

    pub fn line(
        &mut self,
        points: &[(f32, f32)],
        color: (f32, f32, f32),
        thickness: f32,
        dash: Option<&[f32]>,
    ) {
        self.ops.push(Op::SaveGraphicsState);
        self.ops.push(Op::SetOutlineColor {
            col: rgb(color.0, color.1, color.2),
        });
        self.ops.push(Op::SetOutlineThickness { pt: Pt(thickness) });
        if let Some(d) = dash {
            self.ops.push(Op::SetLineDashPattern {
                dash: LineDashPattern::new(0.0, d),
            });
        }
        let points = points
            .iter()
            .map(|&(x, y)| LinePoint {
                p: Point { x: Pt(x), y: Pt(y) },
                bezier: false,
            })
            .collect();
        self.ops.push(Op::DrawLine {
            line: Line {
                points,
                is_closed: false,
            },
        });
        self.ops.push(Op::RestoreGraphicsState);
    }

    /// A rectangle (x, y from the bottom left), filled and/or outlined.
    pub fn rect(
        &mut self,
        x: f32,
        y: f32,
        w: f32,
        h: f32,
        fill: Option<(f32, f32, f32)>,
        stroke: Option<(f32, f32, f32)>,
    ) {
        self.ops.push(Op::SaveGraphicsState);
        let mode = match (fill, stroke) {
            (Some(f), Some(s)) => {
                self.ops.push(Op::SetFillColor {
                    col: rgb(f.0, f.1, f.2),
                });
                self.ops.push(Op::SetOutlineColor {
                    col: rgb(s.0, s.1, s.2),
                });
                PaintMode::FillStroke
            }
            (Some(f), None) => {
                self.ops.push(Op::SetFillColor {
                    col: rgb(f.0, f.1, f.2),
                });
                PaintMode::Fill
            }
            (None, _) => {
                let s = stroke.unwrap_or(INK);
                self.ops.push(Op::SetOutlineColor {
                    col: rgb(s.0, s.1, s.2),
                });
                PaintMode::Stroke
            }
        };
        self.ops.push(Op::SetOutlineThickness { pt: Pt(0.6) });
        self.ops.push(Op::DrawRectangle {
            rectangle: Rect {
                x: Pt(x),
                y: Pt(y),
                width: Pt(w),
                height: Pt(h),
                mode: Some(mode),
                winding_order: None,
            },
        });
        self.ops.push(Op::RestoreGraphicsState);
    }

    /// A circle approximated by a polygon (outline, optionally filled).
    pub fn circle(
        &mut self,
        cx: f32,
        cy: f32,
        r: f32,
        fill: Option<(f32, f32, f32)>,
        stroke: (f32, f32, f32),
    ) {
        let points: Vec<LinePoint> = (0..32)
            .map(|k| {
                let a = k as f32 / 32.0 * std::f32::consts::TAU;
                LinePoint {
                    p: Point {
                        x: Pt(cx + r * a.cos()),
                        y: Pt(cy + r * a.sin()),
                    },
                    bezier: false,
                }
            })
            .collect();
        self.ops.push(Op::SaveGraphicsState);
        self.ops.push(Op::SetOutlineColor {
            col: rgb(stroke.0, stroke.1, stroke.2),
        });
        self.ops.push(Op::SetOutlineThickness { pt: Pt(0.8) });
        let mode = match fill {
            Some(f) => {
                self.ops.push(Op::SetFillColor {
                    col: rgb(f.0, f.1, f.2),
                });
                PaintMode::FillStroke
            }
            None => PaintMode::Stroke,
        };
        self.ops.push(Op::DrawPolygon {
            polygon: Polygon {
                rings: vec![PolygonRing { points }],
                mode,
                winding_order: WindingOrder::NonZero,
            },
        });
        self.ops.push(Op::RestoreGraphicsState);
    }

    /// The stored JPEG as an image XObject, its bytes embedded as they are (DCTDecode), once
    /// per file. None when the file is missing or not a JPEG.
    pub fn jpeg(&mut self, path: &Path) -> Option<(XObjectId, u32, u32)> {
        if let Some(known) = self.images.get(path) {
            return known.clone();
        }
        let loaded = std::fs::read(path).ok().and_then(|bytes| {
            let (w, h) = undercroft_photo::jpeg_size(&bytes).ok()?;
            let mut dict = std::collections::BTreeMap::new();
            dict.insert("Type".to_string(), DictItem::Name(b"XObject".to_vec()));
            dict.insert("Subtype".to_string(), DictItem::Name(b"Image".to_vec()));
            dict.insert("Width".to_string(), DictItem::Int(w as i64));
            dict.insert("Height".to_string(), DictItem::Int(h as i64));
            dict.insert(
                "ColorSpace".to_string(),
                DictItem::Name(color_space(&bytes).to_vec()),
            );
            dict.insert("BitsPerComponent".to_string(), DictItem::Int(8));
            dict.insert("Filter".to_string(), DictItem::Name(b"DCTDecode".to_vec()));
            let xobject = ExternalXObject {
                stream: ExternalStream {
                    dict,
                    content: bytes,
                    compress: false,
                },
                width: Some(Px(w as usize)),
                height: Some(Px(h as usize)),
                dpi: None,
            };
            Some((self.doc.add_xobject(&xobject), w, h))
        });
        self.images.insert(path.to_path_buf(), loaded.clone());
        loaded
    }

    /// Places an image with its lower-left corner at (x, y), `w` points wide.
    pub fn place_image(&mut self, id: XObjectId, px_w: u32, x: f32, y: f32, w: f32) {
        let dpi = px_w as f32 * 72.0 / w;
        self.ops.push(Op::UseXobject {
            id,
            transform: XObjectTransform {
                translate_x: Some(Pt(x)),
                translate_y: Some(Pt(y)),
                dpi: Some(dpi),
                ..Default::default()
            },
        });
    }

    /// Finishes: running head and "page n of N" on every page, then the PDF bytes.
    pub fn finish(mut self, running_head: &str) -> Vec<u8> {
        if !self.ops.is_empty() || self.pages.is_empty() {
            self.new_page();
        }
        let total = self.pages.len();
        let pages = std::mem::take(&mut self.pages);
        let mut out = Vec::with_capacity(total);
        for (n, ops) in pages.into_iter().enumerate() {
            self.ops = ops;
            let top = self.height - MARGIN + 6.0;
            let head = fit(
                running_head,
                8.0,
                Face::Regular,
                self.content_width() - 10.0,
            );
            self.text_at(MARGIN, top, &head, 8.0, Face::Regular, MUTED);
            self.line(
                &[(MARGIN, top - 6.0), (self.width - MARGIN, top - 6.0)],
                (0.7, 0.7, 0.72),
                0.5,
                None,
            );
            let page = format!("Page {} of {total}", n + 1);
            let pw = fonts::width(&page, 8.0, Face::Regular);
            self.text_at(
                self.width - MARGIN - pw,
                MARGIN - 6.0,
                &page,
                8.0,
                Face::Regular,
                MUTED,
            );
            self.text_at(
                MARGIN,
                MARGIN - 6.0,
                "Screening report, not an engineering evaluation",
                8.0,
                Face::Regular,
                MUTED,
            );
            let ops = std::mem::take(&mut self.ops);
            out.push(PdfPage::new(
                Mm(self.width * 25.4 / 72.0),
                Mm(self.height * 25.4 / 72.0),
                ops,
            ));
        }
        let options = PdfSaveOptions {
            optimize: true,
            subset_fonts: true,
            secure: true,
            image_optimization: None,
        };
        let mut warnings = Vec::new();
        self.doc.with_pages(out).save(&options, &mut warnings)
    }
}

/// Shortens text with an ellipsis to fit `max` points (linear in the text's length).
pub fn fit(text: &str, size: f32, style: Face, max: f32) -> String {
    if fonts::width(text, size, style) <= max {
        return text.to_string();
    }
    let room = max - fonts::width("...", size, style);
    let mut used = 0.0;
    let mut out = String::new();
    let mut buf = [0u8; 4];
    for c in text.chars() {
        used += fonts::width(c.encode_utf8(&mut buf), size, style);
        if used > room {
            break;
        }
        out.push(c);
    }
    format!("{out}...")
}

/// DeviceGray for one-component JPEGs, DeviceRGB otherwise (from the SOF header).
fn color_space(jpeg: &[u8]) -> &'static [u8] {
    let components = jpeg
        .windows(2)
        .position(|w| w[0] == 0xFF && (0xC0..=0xC2).contains(&w[1]))
        .and_then(|at| jpeg.get(at + 9).copied());
    if components == Some(1) {
        b"DeviceGray"
    } else {
        b"DeviceRGB"
    }
}

//! The load path under the joists: girder lines with the posts along them, what each post
//! stands on, and the footing under it.

use super::Bearing;
use crate::lumber::{GradeChoice, NominalSize, Species};
use crate::units::Length;
use serde::{Deserialize, Serialize};

/// What a girder is made of.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum GirderKind {
    /// Two to four plies of dimension lumber side by side.
    #[default]
    BuiltUp,
    /// One solid sawn timber (4x, 6x).
    SolidSawn,
    /// Glulam, LVL or PSL: sized from the maker's tables.
    Engineered,
    /// A rolled steel shape.
    Steel,
}

impl GirderKind {
    pub fn name(self) -> &'static str {
        match self {
            GirderKind::BuiltUp => "built-up girder",
            GirderKind::SolidSawn => "solid sawn girder",
            GirderKind::Engineered => "engineered girder",
            GirderKind::Steel => "steel girder",
        }
    }

    pub fn is_engineered_or_steel(self) -> bool {
        matches!(self, GirderKind::Engineered | GirderKind::Steel)
    }
}

/// How the plies of a built-up girder are held together.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum PlyFastening {
    Nailed,
    Bolted,
    NoneSeen,
}

/// A load standing on the girder at one place (a post above, the end of a header), pounds.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct PointLoad {
    /// From the face of the girder's support at end A.
    pub at: Length,
    pub pounds: f64,
}

/// A girder line: one girder from its support at end A to its support at end B, carried
/// between them by posts. Positions are measured from the face of the support at end A.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct GirderLine {
    pub id: String,
    pub label: String,
    #[serde(default)]
    pub kind: GirderKind,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub species: Option<Species>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub grade: Option<GradeChoice>,
    /// One ply of a built-up girder, or the solid member.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub size: Option<NominalSize>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub plies: Option<u8>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub fastening: Option<PlyFastening>,
    /// A steel or engineered member as marked ("W8x18", "3-1/2 x 11-7/8 LVL").
    #[serde(default, skip_serializing_if = "String::is_empty")]
    pub product: String,
    /// Face of support at end A to face of support at end B.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub length: Option<Length>,
    /// Bearing at end A and end B (on a wall, in a pocket).
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub end_a: Option<Bearing>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub end_b: Option<Bearing>,
    /// Least air space around a girder end in a masonry or concrete pocket.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub pocket_air_space: Option<Length>,
    #[serde(default)]
    pub posts: Vec<Post>,
    /// Positions of joints in the plies of a built-up girder.
    #[serde(default, skip_serializing_if = "Vec::is_empty")]
    pub splices: Vec<Length>,
    /// A wall standing on the girder along its length, lb per foot.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub wall_above_plf: Option<f64>,
    #[serde(default, skip_serializing_if = "Vec::is_empty")]
    pub point_loads: Vec<PointLoad>,
    /// Least distance from the girder's bottom to exposed ground.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub ground_clearance: Option<Length>,
    /// Naturally durable or preservative-treated wood.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub treated: Option<bool>,
    /// Highest moisture reading on the girder, percent.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub moisture_percent: Option<f64>,
    #[serde(default, skip_serializing_if = "String::is_empty")]
    pub notes: String,
}

impl GirderLine {
    /// An empty girder line with this id and label.
    pub fn new(id: impl Into<String>, label: impl Into<String>) -> GirderLine {
        GirderLine {
            id: id.into(),
            label: label.into(),
            kind: GirderKind::default(),
            species: None,
            grade: None,
            size: None,
            plies: None,
            fastening: None,
            product: String::new(),
            length: None,
            end_a: None,
            end_b: None,
            pocket_air_space: None,
            posts: Vec::new(),
            splices: Vec::new(),
            wall_above_plf: None,
            point_loads: Vec::new(),
            ground_clearance: None,
            treated: None,
            moisture_percent: None,
            notes: String::new(),
        }
    }

    /// The posts in order along the line.
    pub fn posts_in_order(&self) -> Vec<&Post> {
        let mut posts: Vec<&Post> = self.posts.iter().collect();
        posts.sort_by(|a, b| a.at.in_inches().total_cmp(&b.at.in_inches()));
        posts
    }
}

/// What a post is.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum PostMaterial {
    #[default]
    Wood,
    /// A steel pipe or adjustable steel column.
    Steel,
    /// A masonry or concrete pier built up to the girder.
    Masonry,
}

/// What a post stands on.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum PostBase {
    /// A poured concrete pier.
    ConcretePier,
    /// A mortared masonry pier.
    MasonryPier,
    /// Blocks stacked without mortar.
    StackedBlock,
    /// A block of wood.
    WoodBlock,
    /// A concrete floor slab.
    Slab,
    /// Bare soil.
    Soil,
}

impl PostBase {
    pub fn name(self) -> &'static str {
        match self {
            PostBase::ConcretePier => "poured concrete pier",
            PostBase::MasonryPier => "masonry pier",
            PostBase::StackedBlock => "stacked blocks without mortar",
            PostBase::WoodBlock => "wood block",
            PostBase::Slab => "concrete floor slab",
            PostBase::Soil => "bare soil",
        }
    }
}

/// How a post is held at one end.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum PostHold {
    /// A metal connector (post cap or base, column plate) fastened to both parts.
    Connector,
    /// A dowel or pin into the pier, or a column plate bolted down.
    Pinned,
    /// Toenails or cleats only.
    Nailed,
    /// Nothing holds it: it stands or the girder rests on it by weight.
    NoneSeen,
}

impl PostHold {
    pub fn name(self) -> &'static str {
        match self {
            PostHold::Connector => "metal connector",
            PostHold::Pinned => "pinned or bolted",
            PostHold::Nailed => "toenails or cleats",
            PostHold::NoneSeen => "nothing seen",
        }
    }

    /// Whether this holds the end against sliding off its support.
    pub fn restrains(self) -> bool {
        !matches!(self, PostHold::NoneSeen)
    }
}

/// A condition seen on a post or its support, for a professional to evaluate.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum PostCondition {
    /// Shims between the post and the girder or the pier.
    Shimmed,
    /// Blocks, bricks or wood stacked to make up height.
    StackedBlocks,
    Cracked,
    Leaning,
    /// Decay or insect damage in the post.
    Decay,
    /// The pier or footing has settled or tilted.
    Settled,
}

impl PostCondition {
    pub fn name(self) -> &'static str {
        match self {
            PostCondition::Shimmed => "shimmed",
            PostCondition::StackedBlocks => "made up with stacked blocks",
            PostCondition::Cracked => "cracked",
            PostCondition::Leaning => "leaning",
            PostCondition::Decay => "decayed or insect-damaged",
            PostCondition::Settled => "pier or footing settled",
        }
    }
}

/// The footing under a post, where it can be seen.
#[derive(Debug, Clone, Copy, PartialEq, Default, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Footing {
    /// False (the default) when the footing is buried or hidden: it is then not evaluated.
    #[serde(default)]
    pub visible: bool,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub width: Option<Length>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub length: Option<Length>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub thickness: Option<Length>,
}

/// A post (or column, or pier) under a girder line.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct Post {
    pub id: String,
    pub label: String,
    /// Centre of the post from the face of the girder's support at end A.
    pub at: Length,
    #[serde(default)]
    pub material: PostMaterial,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub species: Option<Species>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub grade: Option<GradeChoice>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub size: Option<NominalSize>,
    /// Outside diameter of a steel column.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub diameter: Option<Length>,
    /// Unbraced height, top of pier to underside of girder.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub height: Option<Length>,
    /// Length of girder resting on the post top (a cap plate's length); for a wood post with
    /// none entered, its least side.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub bearing: Option<Length>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub top: Option<PostHold>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub bottom: Option<PostHold>,
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub stands_on: Option<PostBase>,
    /// Height of the pier or pedestal top above exposed ground or the floor.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub base_height: Option<Length>,
    /// Naturally durable or preservative-treated wood.
    #[serde(default, skip_serializing_if = "Option::is_none")]
    pub treated: Option<bool>,
    #[serde(default)]
    pub footing: Footing,
    #[serde(default, skip_serializing_if = "Vec::is_empty")]
    pub conditions: Vec<PostCondition>,
    #[serde(default, skip_serializing_if = "String::is_empty")]
    pub notes: String,
}

impl Post {
    /// An empty post with this id and label at this position.
    pub fn new(id: impl Into<String>, label: impl Into<String>, at: Length) -> Post {
        Post {
            id: id.into(),
            label: label.into(),
            at,
            material: PostMaterial::default(),
            species: None,
            grade: None,
            size: None,
            diameter: None,
            height: None,
            bearing: None,
            top: None,
            bottom: None,
            stands_on: None,
            base_height: None,
            treated: None,
            footing: Footing::default(),
            conditions: Vec::new(),
            notes: String::new(),
        }
    }
}

/// Soil under the footings, where known: the classes of the presumptive bearing table.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum SoilClass {
    CrystallineBedrock,
    SedimentaryRock,
    SandyGravel,
    Sand,
    ClaySilt,
}

impl SoilClass {
    pub const ALL: [SoilClass; 5] = [
        SoilClass::CrystallineBedrock,
        SoilClass::SedimentaryRock,
        SoilClass::SandyGravel,
        SoilClass::Sand,
        SoilClass::ClaySilt,
    ];

    /// Presumptive load-bearing value, psf.
    /// Source: IRC 2018 Table R401.4.1: crystalline bedrock 12,000; sedimentary and foliated
    /// rock 4,000; sandy gravel and/or gravel (GW and GP) 3,000; sand, silty sand, clayey
    /// sand, silty gravel and clayey gravel (SW, SP, SM, SC, GM and GC) 2,000; clay, sandy
    /// clay, silty clay, clayey silt, silt and sandy silt (CL, ML, MH and CH) 1,500.
    pub fn bearing_psf(self) -> f64 {
        match self {
            SoilClass::CrystallineBedrock => 12_000.0,
            SoilClass::SedimentaryRock => 4_000.0,
            SoilClass::SandyGravel => 3_000.0,
            SoilClass::Sand => 2_000.0,
            SoilClass::ClaySilt => 1_500.0,
        }
    }

    pub fn name(self) -> &'static str {
        match self {
            SoilClass::CrystallineBedrock => "crystalline bedrock",
            SoilClass::SedimentaryRock => "sedimentary and foliated rock",
            SoilClass::SandyGravel => "sandy gravel or gravel",
            SoilClass::Sand => "sand, silty or clayey sand, silty or clayey gravel",
            SoilClass::ClaySilt => "clay, sandy or silty clay, clayey silt, silt",
        }
    }
}

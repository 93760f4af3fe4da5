//! `undercroft span`: the allowable span of one sawn joist, each check's span, which governs.

use crate::output::say;
use anyhow::{bail, Context};
use clap::Args;
use serde_json::json;
use undercroft_engine::lumber::{
    GradeChoice, LoadDuration, NominalSize, Section, Species, UNKNOWN_GRADE_DEFAULT,
};
use undercroft_engine::mechanics::{allowable_span, SpanInput};
use undercroft_engine::units::{format_length, parse_length, Length, Psf, UnitSystem};
use undercroft_engine::SCREENING_NOTICE;

#[derive(Args)]
pub struct SpanArgs {
    /// Species group: spf, dfl, hem-fir (hf), sp.
    #[arg(long)]
    species: Species,
    /// Grade from the stamp: ss, no1, no2, no3 (or #2, 2), or none if no stamp is visible.
    #[arg(long)]
    grade: GradeChoice,
    /// Nominal size, e.g. 2x10. May be left out when --actual is given.
    #[arg(long)]
    size: Option<NominalSize>,
    /// On-centre spacing; inches unless a unit is typed (16, 19.2, 24, 400mm).
    #[arg(long, allow_hyphen_values = true)]
    spacing: String,
    /// Live load, psf (30 sleeping rooms, 40 other rooms: IRC Table R301.5).
    #[arg(long, default_value_t = 40.0, allow_negative_numbers = true)]
    live: f64,
    /// Dead load, psf (10, or 20 with heavy finishes).
    #[arg(long, default_value_t = 10.0, allow_negative_numbers = true)]
    dead: f64,
    /// Live-load deflection limit L/n (360 for floors: IRC Table R301.7).
    #[arg(long, default_value_t = 360.0, allow_negative_numbers = true)]
    deflection: f64,
    /// Wet service (moisture content above 19 %).
    #[arg(long)]
    wet: bool,
    /// Measured actual size, thickness x depth in inches (rough-sawn lumber), e.g. 1.625x9.5.
    #[arg(long)]
    actual: Option<String>,
    /// Print one JSON object.
    #[arg(long)]
    json: bool,
}

pub fn run(args: &SpanArgs) -> anyhow::Result<()> {
    let spacing = parse_length(&args.spacing, Some(1.0))
        .with_context(|| format!("--spacing {:?}", args.spacing))?;
    if !(4.0..=48.0).contains(&spacing.in_inches()) {
        bail!("--spacing {} in: expected 4 to 48 in", spacing.in_inches());
    }
    if !(args.live.is_finite() && args.live > 0.0 && args.live <= 500.0) {
        bail!(
            "--live {}: expected more than 0 and at most 500 psf",
            args.live
        );
    }
    if !(args.dead.is_finite() && args.dead >= 0.0 && args.dead <= 500.0) {
        bail!("--dead {}: expected 0 to 500 psf", args.dead);
    }
    if !(args.deflection.is_finite() && args.deflection >= 60.0 && args.deflection <= 1200.0) {
        bail!("--deflection {}: expected L/60 to L/1200", args.deflection);
    }
    let section = match (&args.actual, args.size) {
        (Some(text), nominal) => Section::measured(text, nominal).context("--actual")?,
        (None, Some(size)) => size.dressed_section(),
        (None, None) => bail!("give --size (e.g. 2x10) or --actual (e.g. 1.625x9.5)"),
    };
    let input = SpanInput {
        species: args.species,
        grade: args.grade.grade_for_design(),
        section,
        spacing,
        live: Psf(args.live),
        dead: Psf(args.dead),
        deflection_denominator: args.deflection,
        wet_service: args.wet,
        incised: false,
        duration: LoadDuration::TenYears,
        repetitive: true,
    };
    let Some(r) = allowable_span(&input) else {
        bail!(
            "no design values for {} {} {}",
            args.species.name(),
            args.grade,
            section.nominal
        );
    };
    let ftin = |inches: f64| format_length(Length::inches(inches), UnitSystem::Imperial);
    if args.json {
        let out = json!({
            "species": args.species.key(),
            "grade": args.grade.key(),
            "grade_used": input.grade.key(),
            "size": section.nominal.to_string(),
            "thickness_in": section.thickness.in_inches(),
            "depth_in": section.depth.in_inches(),
            "rough_sawn": section.rough_sawn,
            "spacing_in": spacing.in_inches(),
            "live_psf": args.live,
            "dead_psf": args.dead,
            "deflection_limit": args.deflection,
            "wet_service": args.wet,
            "allowable_span_in": r.allowable_span_in,
            "allowable_span_rounded_in": r.allowable_span_rounded_in,
            "allowable_span_ftin": ftin(r.allowable_span_rounded_in),
            "governing": r.governing,
            "bending_span_in": r.bending_span_in,
            "deflection_span_in": r.deflection_span_in,
            "shear_span_in": r.shear_span_in,
            "factors": r.factors,
            "design_values_source": r.design.source_short(),
        });
        say!("{}", serde_json::to_string_pretty(&out)?)?;
        return Ok(());
    }
    say!(
        "Allowable span: {} ({} in; by mechanics {:.2} in)",
        ftin(r.allowable_span_rounded_in),
        r.allowable_span_rounded_in,
        r.allowable_span_in
    )?;
    for (name, value) in [
        ("bending", r.bending_span_in),
        ("deflection", r.deflection_span_in),
        ("shear", r.shear_span_in),
    ] {
        let mark = if name == r.governing.name() {
            "  <- governs"
        } else {
            ""
        };
        say!("  {name:<11} {:>12}  ({value:.2} in){mark}", ftin(value))?;
    }
    say!(
        "Member: {} {} {}, {} x {} ({}), {} in on centre",
        section.nominal,
        args.species.name(),
        args.grade,
        ftin(section.thickness.in_inches()),
        ftin(section.depth.in_inches()),
        if section.rough_sawn {
            "measured"
        } else {
            "dressed"
        },
        spacing.in_inches()
    )?;
    if args.grade == GradeChoice::NoStampVisible {
        say!(
            "  No grade stamp visible: designed as {}, a conservative default.",
            UNKNOWN_GRADE_DEFAULT.name()
        )?;
    }
    say!(
        "Loads: {} psf live, {} psf dead, live-load deflection L/{}, {} service",
        args.live,
        args.dead,
        args.deflection,
        if args.wet { "wet" } else { "dry" }
    )?;
    let f = &r.factors;
    say!(
        "Design values ({}): Fb' = {:.0} psi (CD {} CM {} CF {} Cr {}), E' = {:.0} psi, Fv' = {:.0} psi",
        r.design.source_short(),
        f.fb_adjusted_psi,
        f.cd,
        f.cm_fb,
        f.cf,
        f.cr,
        f.e_adjusted_psi,
        f.fv_adjusted_psi
    )?;
    let at = r.allowable_rounded();
    say!(
        "At that span each end carries {:.0} lb and needs {} of bearing for Fc-perp (NDS 3.10.2).",
        r.reaction_lb(at),
        ftin(r.required_bearing(at).in_inches())
    )?;
    say!("\n{SCREENING_NOTICE}")?;
    Ok(())
}

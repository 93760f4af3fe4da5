//! The app's one stylesheet, a visual language of our own: a warm paper ground with a lamp-amber
//! accent under the top bar, a four-step type scale (15, 18, 21, 24 px), spacing in 4 px steps,
//! large tap targets, status colours always beside their words (and a mark before them), and a
//! dark scheme for dim crawlspaces (chosen in settings, or as the device is set).

pub const CSS: &str = r#"
.app { --ink: #16181d; --paper: #f4f2ec; --surface: #ffffff; --muted: #4f535a; --line: #c6c1b5; --accent: #8a4b14;
  --over: #a3161a; --near: #7a5200; --ok: #1d5e2c; --grey: #4a5a6a;
  --s1: 4px; --s2: 8px; --s3: 12px; --s4: 16px; --s5: 24px;
  --t-small: 15px; --t-body: 18px; --t-head: 21px; --t-title: 24px; }
.app.screen-dark { --ink: #ecebe6; --paper: #101114; --surface: #1a1d22; --muted: #b4b6ba; --line: #3c414a; --accent: #f0a860;
  --over: #ff8a80; --near: #ffcc66; --ok: #8fd99c; --grey: #a9bfd4; }
@media (prefers-color-scheme: dark) {
  .app.screen-device { --ink: #ecebe6; --paper: #101114; --surface: #1a1d22; --muted: #b4b6ba; --line: #3c414a; --accent: #f0a860;
    --over: #ff8a80; --near: #ffcc66; --ok: #8fd99c; --grey: #a9bfd4; }
}
body { margin: 0; font: var(--t-body, 18px)/1.45 system-ui, sans-serif; }
.app { min-height: 100vh; color: var(--ink); background: var(--paper); font-size: var(--t-body); }
a { color: var(--ink); text-underline-offset: 3px; }
input[type=checkbox] { width: 44px; height: 44px; min-height: 44px; vertical-align: middle; margin: 4px 8px 4px 0; accent-color: var(--accent); }
nav.back a, nav.bar-action a, p > a, .card > a { display: inline-block; min-height: 44px; line-height: 44px; }
main { padding: 0 var(--s4) 96px; max-width: 720px; margin: 0 auto; }
.top-bar { position: sticky; top: 0; z-index: 6; margin: 0 calc(-1 * var(--s4)) var(--s3); padding: var(--s1) var(--s4) var(--s2);
  background: var(--surface); border-bottom: 3px solid var(--accent); }
.top-bar nav { font-size: var(--t-small); }
.top-bar nav a { text-decoration: none; color: var(--accent); font-weight: 600; max-width: 100%; overflow: hidden; text-overflow: ellipsis; white-space: nowrap; }
.top-bar h1 { font-size: var(--t-head); margin: 0; line-height: 1.25; overflow-wrap: anywhere; }
.top-bar nav.bar-action { float: right; }
h1 { font-size: var(--t-title); margin: var(--s2) 0 var(--s3); } h2 { font-size: var(--t-head); margin: var(--s5) 0 var(--s2); letter-spacing: 0.01em; }
a, button, .tap { min-height: 48px; min-width: 48px; }
button, .button { font: inherit; padding: 10px 16px; border-radius: 10px; border: 2px solid var(--ink); background: var(--ink); color: var(--paper); font-weight: 600; }
a.button { display: inline-flex; align-items: center; text-decoration: none; box-sizing: border-box; }
button.quiet { background: transparent; color: var(--ink); border-color: var(--line); }
button:disabled { opacity: 0.45; }
input, select, textarea { font: inherit; width: 100%; box-sizing: border-box; min-height: 48px; padding: 8px 10px; border: 2px solid var(--line); border-radius: 10px; background: var(--surface); color: var(--ink); }
input:focus, select:focus, textarea:focus { outline: 3px solid var(--accent); outline-offset: 1px; }
label { display: block; margin: var(--s3) 0 var(--s1); font-weight: 600; font-size: var(--t-small); text-transform: none; }
.field-error { color: var(--over); font-weight: 600; margin: var(--s1) 0 0; }
.field-error::before { content: "\26A0  "; }
.checks label { display: flex; align-items: center; gap: 8px; font-weight: 400; min-height: 44px; margin: 0; font-size: var(--t-body); }
.checks input { width: 44px; min-height: 44px; margin: 0; flex: none; }
figure.girder-view figcaption { font-size: var(--t-small); color: var(--muted); }
ul.findings-brief li { padding: 8px 0; border-bottom: 1px solid var(--line); }
ul.list:empty { display: none; }
ul.list { list-style: none; padding: 0; margin: 0; background: var(--surface); border: 1px solid var(--line); border-radius: 12px; overflow: hidden; }
ul.list li + li { border-top: 1px solid var(--line); }
ul.list li a { display: block; padding: var(--s3) var(--s3); color: var(--ink); text-decoration: none; font-weight: 600; }
ul.list li a::after { content: " \203A"; color: var(--muted); float: right; }
.muted { color: var(--muted); font-size: var(--t-small); font-weight: 400; }
.card { background: var(--surface); border: 1px solid var(--line); border-left: 6px solid var(--line); border-radius: 12px; padding: var(--s3) var(--s4); margin: var(--s3) 0; }
.card:has(.status-over-limit), .card:has(.status-to-evaluate) { border-left-color: var(--over); }
.card:has(.status-near-limit), .card:has(.status-incomplete) { border-left-color: var(--near); }
.card:has(.status-within) { border-left-color: var(--ok); }
.status { font-weight: 700; }
.status-over-limit, .status-to-evaluate { color: var(--over); } .status-near-limit, .status-incomplete { color: var(--near); } .status-within { color: var(--ok); } .status-not-checked, .status-none { color: var(--grey); }
.row-status::before { content: "\25CF  "; }
.notice { font-size: var(--t-small); padding: var(--s2) var(--s3); color: var(--muted); border: 1px dashed var(--line); border-radius: 10px; }
figure.side-view { margin: 8px 0; }
.danger-zone { margin-top: 28px; border-top: 1px solid var(--line); padding-top: 8px; }
button.danger { background: var(--over); border-color: var(--over); color: var(--paper); }
button + button { margin-left: 8px; }
.field-needed { color: var(--muted); font-size: 15px; margin: 2px 0 0; }
.question { border: 2px solid var(--near); border-radius: 10px; padding: 8px 12px; margin: 6px 0 10px; }
.question p { margin: 0 0 8px; }
.question .answers { display: flex; flex-wrap: wrap; gap: 8px; }
.question .answers button { margin: 0; }
.keypad { position: fixed; left: 0; right: 0; bottom: 0; z-index: 10; background: var(--paper); border-top: 2px solid var(--ink); padding: 6px 6px 10px; box-shadow: 0 -6px 18px rgba(0,0,0,.35); }
.keypad-shows { margin: 0 4px 6px; min-height: 28px; font-size: 22px; font-variant-numeric: tabular-nums; }
.keypad .keys, .keypad .fractions { display: grid; gap: 6px; margin-bottom: 6px; max-width: 720px; margin-left: auto; margin-right: auto; }
.keypad .keys { grid-template-columns: repeat(4, 1fr); }
.keypad .fractions { grid-template-columns: repeat(5, 1fr); }
.keypad .key { margin: 0; min-width: 0; padding: 0; height: 52px; font-size: 22px; border-radius: 10px; background: transparent; color: var(--ink); border: 2px solid var(--line); }
.keypad .key.fraction { font-size: 15px; height: 48px; }
.keypad .key.done { background: var(--ink); color: var(--paper); border-color: var(--ink); }
.keypad .key.quiet { font-size: 15px; }
.keypad-room { height: 400px; }
.walk-bar { position: sticky; top: 0; z-index: 5; display: flex; align-items: center; gap: 8px; background: var(--paper); padding: 6px 0; border-bottom: 1px solid var(--line); }
.walk-bar .walk-place { flex: 1; text-align: center; line-height: 1.2; }
.walk-bar .walk-place span { display: block; }
.walk-bar button { margin: 0; }
.quick-observations { display: flex; flex-wrap: wrap; gap: 8px; }
.quick-observations button { margin: 0; }
details { margin: var(--s3) 0; }
details > summary { min-height: 48px; display: flex; align-items: center; font-weight: 600; cursor: pointer; }
.offscreen { position: absolute; left: -9999px; width: 1px; height: 1px; }
.photo-picker { display: flex; flex-wrap: wrap; gap: 8px; margin: 8px 0; }
.photo-picker label.button { display: inline-flex; align-items: center; margin: 0; box-sizing: border-box; min-height: 48px; }
label.button.quiet { background: transparent; color: var(--ink); }
.undo-bar { display: flex; align-items: center; justify-content: space-between; gap: 8px; border: 2px solid var(--ink); border-radius: 10px; padding: 6px 10px; margin: 8px 0; }
.mark-canvas { position: relative; line-height: 0; }
.mark-canvas img { width: 100%; display: block; }
.mark-canvas svg { position: absolute; inset: 0; width: 100%; height: 100%; cursor: crosshair; touch-action: manipulation; }
.mark-canvas svg * { pointer-events: none; }
.mark { fill: none; stroke: #ffd10d; stroke-width: 3px; vector-effect: non-scaling-stroke; stroke-linecap: round; paint-order: stroke; filter: drop-shadow(0 0 1px #000); }
.mark-label { fill: #ffd10d; font-size: 6px; font-weight: 700; text-anchor: middle; paint-order: stroke; stroke: #111; stroke-width: 1px; }
.mark-first { fill: #ffd10d; stroke: #111; stroke-width: 0.5px; }
.mark-tools, .mark-actions { display: flex; flex-wrap: wrap; gap: 8px; margin: 8px 0; }
.mark-tools button, .mark-actions button { margin: 0; }
button.chosen { background: var(--accent); border-color: var(--accent); color: var(--paper); }
.row-status { font-weight: 700; font-size: 15px; }
"#;

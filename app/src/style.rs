//! The app's one stylesheet: large tap targets, high contrast, a dark scheme for dim light
//! (chosen in settings, or as the device is set).

pub const CSS: &str = r#"
.app { --ink: #111; --paper: #fff; --muted: #555; --line: #bbb; --over: #9e1a1a; --near: #8a5a00; --ok: #1d5e2c; }
.app.screen-dark { --ink: #f2f2f2; --paper: #101114; --muted: #b8b8b8; --line: #444; --over: #ff7b7b; --near: #ffc44d; --ok: #7fd691; }
@media (prefers-color-scheme: dark) {
  .app.screen-device { --ink: #f2f2f2; --paper: #101114; --muted: #b8b8b8; --line: #444; --over: #ff7b7b; --near: #ffc44d; --ok: #7fd691; }
}
body { margin: 0; font: 18px/1.4 system-ui, sans-serif; }
.app { min-height: 100vh; color: var(--ink); background: var(--paper); }
a { color: var(--ink); }
input[type=checkbox] { width: 44px; height: 44px; min-height: 44px; vertical-align: middle; margin: 4px 8px 4px 0; accent-color: var(--ink); }
nav.back a, p > a, .card > a { display: inline-block; min-height: 44px; line-height: 44px; }
main { padding: 12px 14px 80px; max-width: 720px; margin: 0 auto; }
h1 { font-size: 24px; margin: 8px 0 12px; } h2 { font-size: 20px; margin: 18px 0 8px; }
a, button, .tap { min-height: 48px; min-width: 48px; }
button, .button { font: inherit; padding: 10px 16px; border-radius: 8px; border: 2px solid var(--ink); background: var(--ink); color: var(--paper); }
button.quiet { background: transparent; color: var(--ink); }
input, select, textarea { font: inherit; width: 100%; box-sizing: border-box; min-height: 48px; padding: 8px 10px; border: 2px solid var(--line); border-radius: 8px; background: var(--paper); color: var(--ink); }
label { display: block; margin: 10px 0 4px; font-weight: 600; }
.field-error { color: var(--over); font-weight: 600; }
.checks label { display: flex; align-items: center; gap: 8px; font-weight: 400; min-height: 44px; margin: 0; }
.checks input { width: 44px; min-height: 44px; margin: 0; flex: none; }
figure.girder-view figcaption { font-size: 14px; color: var(--muted); }
ul.findings-brief li { padding: 8px 0; border-bottom: 1px solid var(--line); }
ul.list { list-style: none; padding: 0; margin: 0; }
ul.list li a { display: block; padding: 12px 8px; border-bottom: 1px solid var(--line); color: var(--ink); text-decoration: none; }
.muted { color: var(--muted); font-size: 15px; }
.card { border: 2px solid var(--line); border-radius: 10px; padding: 10px 12px; margin: 12px 0; }
.status { font-weight: 700; }
.status-over-limit, .status-to-evaluate { color: var(--over); } .status-near-limit, .status-incomplete { color: var(--near); } .status-within { color: var(--ok); }
.notice { font-size: 13px; padding: 4px 14px; color: var(--muted); border-bottom: 1px solid var(--line); }
nav.back { margin: 4px 0; }
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
details > summary { min-height: 48px; display: flex; align-items: center; font-weight: 600; cursor: pointer; }
.offscreen { position: absolute; left: -9999px; width: 1px; height: 1px; }
.photo-picker { display: flex; flex-wrap: wrap; gap: 8px; margin: 8px 0; }
.photo-picker label.button { display: inline-flex; align-items: center; margin: 0; box-sizing: border-box; min-height: 48px; }
label.button.quiet { background: transparent; color: var(--ink); }
.undo-bar { display: flex; align-items: center; justify-content: space-between; gap: 8px; border: 2px solid var(--ink); border-radius: 10px; padding: 6px 10px; margin: 8px 0; }
.row-status { font-weight: 700; font-size: 15px; }
"#;

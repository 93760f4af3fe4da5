//! The office page's frame: escaping, the page shell and its stylesheet.

/// Text made safe inside HTML elements and quoted attributes.
pub fn esc(text: &str) -> String {
    let mut out = String::with_capacity(text.len());
    for c in text.chars() {
        match c {
            '&' => out.push_str("&amp;"),
            '<' => out.push_str("&lt;"),
            '>' => out.push_str("&gt;"),
            '"' => out.push_str("&quot;"),
            '\'' => out.push_str("&#39;"),
            _ => out.push(c),
        }
    }
    out
}

/// A value for a URL's query or path.
pub fn url(text: &str) -> String {
    text.bytes()
        .map(|b| {
            if b.is_ascii_alphanumeric() || b"-_.~".contains(&b) {
                (b as char).to_string()
            } else {
                format!("%{b:02X}")
            }
        })
        .collect()
}

const STYLE: &str = "
body{font:16px/1.45 system-ui,sans-serif;margin:0;background:#f6f3ec;color:#2a2722}
header{background:#3b342b;color:#f6f3ec;padding:.7rem 1.2rem;display:flex;gap:1rem;align-items:center}
header a{color:#f2c572;text-decoration:none;font-weight:600}
header .who{margin-left:auto;font-size:.9rem}
main{max-width:72rem;margin:0 auto;padding:1rem 1.2rem 3rem}
h1{font-size:1.5rem;margin:.6rem 0}
h2{font-size:1.15rem;margin:1.4rem 0 .5rem}
form.search{display:grid;grid-template-columns:repeat(auto-fit,minmax(12rem,1fr));gap:.6rem;background:#fffdf8;padding:.9rem;border:1px solid #d8cfbf;border-radius:.4rem}
form.search .actions{display:flex;align-items:flex-end}
form.settings{display:grid;gap:.8rem;max-width:40rem;background:#fffdf8;padding:1rem;border:1px solid #d8cfbf;border-radius:.4rem}
form.settings textarea{min-height:6rem}
form.inline{display:inline;margin-left:.5rem}
button.revoke{background:#7a1d0a;padding:.15rem .6rem;font-size:.85rem}
code{font-size:.9rem;word-break:break-all}
form.settings .actions button{min-width:8rem}
label{display:flex;flex-direction:column;font-size:.85rem;gap:.2rem}
input,textarea,select{font:inherit;padding:.35rem .45rem;border:1px solid #b9ad98;border-radius:.3rem;background:#fff}
button{font:inherit;padding:.4rem .9rem;border:0;border-radius:.3rem;background:#b7791f;color:#fff;cursor:pointer}
table{border-collapse:collapse;width:100%;background:#fffdf8}
th,td{text-align:left;padding:.4rem .5rem;border-bottom:1px solid #e4dccd;vertical-align:top}
th{font-size:.8rem;text-transform:uppercase;letter-spacing:.03em;color:#6b604f}
.tag{display:inline-block;padding:0 .4rem;border-radius:.25rem;font-size:.8rem;font-weight:600}
.over-limit,.to-evaluate{background:#f6d5cc;color:#7a1d0a}
.near-limit,.incomplete{background:#f7e7b9;color:#6a4b00}
.within{background:#d9ead3;color:#1f4d18}
.not-checked{background:#e4e0d8;color:#444}
.conflict{background:#e8d5f2;color:#4b1f66}
.notice{font-size:.85rem;color:#5b5143;border-left:3px solid #b7791f;padding-left:.6rem}
.error{background:#f6d5cc;color:#7a1d0a;padding:.6rem;border-radius:.3rem}
.muted{color:#6b604f;font-size:.9rem}
";

/// A whole page: title, who is signed in (if anyone), the body.
pub fn page(title: &str, who: Option<(&str, bool)>, body: &str) -> String {
    let nav = match who {
        Some((name, office)) => format!(
            "<a href=\"/office\">Archive</a>{}<span class=\"who\">{}</span>\
             <form method=\"post\" action=\"/office/sign-out\"><button>Sign out</button></form>",
            if office {
                "<a href=\"/office/settings\">Firm settings</a><a href=\"/office/people\">People</a>"
            } else {
                ""
            },
            esc(name)
        ),
        None => String::new(),
    };
    format!(
        "<!doctype html><html lang=\"en\"><head><meta charset=\"utf-8\">\
         <meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\
         <title>{} · Undercroft office</title><style>{STYLE}</style></head>\
         <body><header><strong>Undercroft office</strong>{nav}</header><main>{body}</main></body></html>",
        esc(title)
    )
}

//! The bar at the top of every screen: the way back (to the screen above, by its name) and
//! the screen's title, kept in sight while the screen scrolls.

use dioxus::prelude::*;

#[component]
pub fn TopBar(
    title: String,
    /// The back link, when the screen has one above it.
    children: Element,
) -> Element {
    rsx! {
        header { class: "top-bar",
            nav { class: "back", {children} }
            h1 { "{title}" }
        }
    }
}

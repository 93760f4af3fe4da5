//! The app's settings: who the inspector is, units, code edition and default loads, kept in
//! the store so they survive like everything else.

use super::{Result, Store};
use rusqlite::OptionalExtension;
use serde::{Deserialize, Serialize};
use undercroft_engine::model::RoomUse;
use undercroft_engine::units::UnitSystem;

#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(default)]
pub struct Settings {
    pub inspector_name: String,
    pub company: String,
    pub license: String,
    pub units: UnitSystem,
    pub code_edition: String,
    pub room_use_above: RoomUse,
    pub heavy_finish: bool,
    /// Light or dark screen, or as the device is set.
    pub screen: Screen,
}

/// The screen's colours: dark for dim crawlspaces, light for daylight, or the device's choice.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[serde(rename_all = "kebab-case")]
pub enum Screen {
    #[default]
    Device,
    Light,
    Dark,
}

impl Screen {
    /// The value a pick list and a style class use.
    pub fn key(self) -> &'static str {
        match self {
            Screen::Device => "device",
            Screen::Light => "light",
            Screen::Dark => "dark",
        }
    }

    /// From `key()`; anything else follows the device.
    pub fn from_key(key: &str) -> Screen {
        match key {
            "light" => Screen::Light,
            "dark" => Screen::Dark,
            _ => Screen::Device,
        }
    }
}

impl Default for Settings {
    fn default() -> Self {
        Settings {
            inspector_name: String::new(),
            company: String::new(),
            license: String::new(),
            units: UnitSystem::Imperial,
            code_edition: "IRC 2018".into(),
            room_use_above: RoomUse::Living,
            heavy_finish: false,
            screen: Screen::Device,
        }
    }
}

/// The key of the device's own settings.
pub(super) const KEY: &str = "app";

/// The value kept under a settings key, if any and if it still reads.
pub(super) fn read_setting<T: for<'de> Deserialize<'de>>(
    conn: &rusqlite::Connection,
    key: &str,
) -> Result<Option<T>> {
    let text: Option<String> = conn
        .query_row("SELECT value FROM settings WHERE key = ?1", [key], |r| {
            r.get(0)
        })
        .optional()?;
    Ok(text.and_then(|t| serde_json::from_str(&t).ok()))
}

/// Keeps a value under a settings key (in the caller's transaction, if it is one).
pub(super) fn write_setting<T: Serialize>(
    conn: &rusqlite::Connection,
    key: &str,
    value: &T,
) -> Result<()> {
    conn.execute(
        "INSERT INTO settings (key, value) VALUES (?1, ?2) ON CONFLICT (key) DO UPDATE SET value = ?2",
        (key, serde_json::to_string(value)?),
    )?;
    Ok(())
}

impl Store {
    /// The saved settings, or the defaults.
    pub fn settings(&self) -> Result<Settings> {
        Ok(read_setting(&self.conn, KEY)?.unwrap_or_default())
    }

    pub fn save_settings(&mut self, settings: &Settings) -> Result<()> {
        write_setting(&self.conn, KEY, settings)
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn settings_survive_reopening() {
        let dir =
            std::env::temp_dir().join(format!("undercroft-settings-{}", super::super::new_id()));
        let db = dir.join("s.sqlite");
        let mut store = Store::open(&db).unwrap();
        assert_eq!(store.settings().unwrap(), Settings::default());
        let mine = Settings {
            inspector_name: "Tomasz".into(),
            units: UnitSystem::Metric,
            heavy_finish: true,
            screen: Screen::Dark,
            ..Default::default()
        };
        store.save_settings(&mine).unwrap();
        drop(store);
        assert_eq!(Store::open(&db).unwrap().settings().unwrap(), mine);
        std::fs::remove_dir_all(&dir).ok();
    }

    #[test]
    fn settings_saved_before_the_screen_choice_existed_still_read() {
        let old: Settings =
            serde_json::from_str(r#"{"inspector_name":"Ana","units":"metric"}"#).unwrap();
        assert_eq!(old.inspector_name, "Ana");
        assert_eq!(old.screen, Screen::Device);
        for screen in [Screen::Device, Screen::Light, Screen::Dark] {
            assert_eq!(Screen::from_key(screen.key()), screen);
        }
    }
}

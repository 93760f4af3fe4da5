//! Serde for small enums written in files as a stable text key and read back leniently.

/// Serializes `$ty` with its `$key` method and deserializes it with its `FromStr`,
/// whose error text becomes the serde error (so a bad file names the bad field).
#[macro_export]
#[doc(hidden)]
macro_rules! serde_via_text {
    ($ty:ty, $key:ident) => {
        impl serde::Serialize for $ty {
            fn serialize<S: serde::Serializer>(&self, s: S) -> Result<S::Ok, S::Error> {
                s.serialize_str(self.$key())
            }
        }
        impl<'de> serde::Deserialize<'de> for $ty {
            fn deserialize<D: serde::Deserializer<'de>>(d: D) -> Result<Self, D::Error> {
                let text = <std::borrow::Cow<'de, str>>::deserialize(d)?;
                text.parse().map_err(serde::de::Error::custom)
            }
        }
    };
}

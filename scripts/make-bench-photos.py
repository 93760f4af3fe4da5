#!/usr/bin/env python3
"""Writes phone-like test photos for the photo and report benchmarks (never committed).

Each photo is what a phone camera stores: 4032 x 3024 (12 MP), baseline JPEG at quality 90
with 4:2:0 chroma, 3 to 6 MB. The picture is an invented view of a floor's underside (joists
with grain, subfloor boards, a water stain, uneven lamp light, sensor noise), so it
compresses like a photo rather than like flat colour or pure noise. The stored pixels are
always landscape; the EXIF Orientation tag (cycling 1, 6, 3, 8) says how to show them, and
the scene carries an "UP" arrow so a viewer that ignores the tag shows it on its side. EXIF
also carries an invented camera, time and GPS position, for the import's metadata
stripping. Deterministic for a given --seed.

Usage: python3 scripts/make-bench-photos.py --n 20 --seed 1 --out /tmp/photos20
Needs Pillow and NumPy (pip install pillow numpy).
"""
import argparse
import os

import numpy as np
from PIL import Image, ImageDraw

WIDTH, HEIGHT = 4032, 3024
ORIENTATIONS = [1, 6, 3, 8]
# How to turn the upright scene into the stored pixels, per EXIF orientation (the viewer
# applies the inverse). Source: EXIF 2.32 (CIPA DC-008-2019), tag 0x0112.
STORE_TURN = {
    1: None,
    3: Image.Transpose.ROTATE_180,
    6: Image.Transpose.ROTATE_90,
    8: Image.Transpose.ROTATE_270,
}


def soft_noise(rng, w, h, cell):
    """Smooth random field in 0..1: a coarse grid of random values, scaled up bilinearly."""
    grid = rng.random((h // cell + 2, w // cell + 2)).astype(np.float32)
    small = Image.fromarray((grid * 255).astype(np.uint8))
    return np.asarray(small.resize((w, h), Image.BILINEAR), dtype=np.float32) / 255.0


def underside(rng, w, h, number):
    """The upright scene, w x h, as an RGB array."""
    y, x = np.mgrid[0:h, 0:w].astype(np.float32)
    # Lamp light from one side, falling off towards the corners.
    cx, cy = rng.uniform(0.3, 0.7) * w, rng.uniform(0.2, 0.5) * h
    light = 1.15 - 0.75 * np.hypot((x - cx) / w, (y - cy) / h)
    # Subfloor boards: bands across the frame with seams and slow tone changes.
    board = 0.55 + 0.1 * soft_noise(rng, w, h, 64)
    board_width = int(h / rng.uniform(5.0, 8.0))
    board -= 0.25 * (((y.astype(np.int32) % board_width) < 6).astype(np.float32))
    # Joists: lighter bands along the frame with fine grain.
    joist = np.zeros((h, w), dtype=np.float32)
    spacing = int(w / rng.uniform(3.0, 4.5))
    width = int(spacing * 0.14)
    first = int(rng.uniform(0.1, 0.5) * spacing)
    for left in range(first, w, spacing):
        joist[:, left : left + width] = 1.0
    grain = 0.5 + 0.5 * np.sin(x / 7.0 + 4.0 * soft_noise(rng, w, h, 48) * 6.28)
    wood = np.where(joist > 0, 0.78 + 0.08 * grain, board)
    # A water stain.
    sx, sy, sr = rng.uniform(0.2, 0.8) * w, rng.uniform(0.3, 0.8) * h, rng.uniform(0.06, 0.15) * w
    stain = np.clip(1.0 - np.hypot(x - sx, y - sy) / sr, 0.0, 1.0) ** 0.7
    tone = np.clip(wood * light * (1.0 - 0.35 * stain), 0.0, 1.0)
    rgb = np.stack([tone * 0.93, tone * 0.72, tone * 0.48], axis=-1)
    # Sensor noise, stronger in the dark.
    rgb += rng.normal(0.0, 0.045, rgb.shape).astype(np.float32) * (1.4 - tone)[..., None]
    image = Image.fromarray((np.clip(rgb, 0.0, 1.0) * 255).astype(np.uint8), "RGB")
    draw = ImageDraw.Draw(image)
    # An arrow pointing up, and the photo's number, at the top left of the upright scene.
    s = min(w, h) // 8
    draw.polygon([(s, s // 3), (s // 3, s), (s - s // 6, s), (s - s // 6, 2 * s),
                  (s + s // 6, 2 * s), (s + s // 6, s), (5 * s // 3, s)], fill=(250, 250, 250))
    draw.text((2 * s, s // 2), f"UP {number}", fill=(250, 250, 250))
    return image


def degrees(value):
    """A coordinate as EXIF's three rationals: degrees, minutes, seconds."""
    value = abs(value)
    d = int(value)
    m = int((value - d) * 60)
    s = round(((value - d) * 60 - m) * 60, 2)
    return (float(d), float(m), s)


def exif_of(rng, number, orientation):
    exif = Image.Exif()
    exif[0x0112] = orientation  # Orientation
    exif[0x010F] = "Invented Phone Co."  # Make
    exif[0x0110] = "Bench Model 12"  # Model
    exif[0x0132] = f"2026:03:{1 + number % 28:02d} 10:{number % 60:02d}:00"  # DateTime
    latitude, longitude = rng.uniform(30.0, 45.0), -rng.uniform(80.0, 120.0)
    exif[0x8825] = {  # GPS
        1: "N",
        2: degrees(latitude),
        3: "W",
        4: degrees(longitude),
    }
    return exif


def main():
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--n", type=int, default=20)
    parser.add_argument("--seed", type=int, default=1)
    parser.add_argument("--out", required=True)
    args = parser.parse_args()
    os.makedirs(args.out, exist_ok=True)
    for i in range(args.n):
        rng = np.random.default_rng([args.seed, i])
        orientation = ORIENTATIONS[i % len(ORIENTATIONS)]
        upright = (WIDTH, HEIGHT) if orientation in (1, 3) else (HEIGHT, WIDTH)
        scene = underside(rng, upright[0], upright[1], i + 1)
        turn = STORE_TURN[orientation]
        stored = scene.transpose(turn) if turn is not None else scene
        assert stored.size == (WIDTH, HEIGHT)
        path = os.path.join(args.out, f"photo-{i + 1:03d}.jpg")
        stored.save(path, "JPEG", quality=90, subsampling=2, exif=exif_of(rng, i, orientation))
        print(f"{path} {os.path.getsize(path) / 1e6:.1f} MB orientation {orientation}")


if __name__ == "__main__":
    main()

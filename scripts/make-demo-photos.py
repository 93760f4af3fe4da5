#!/usr/bin/env python3
"""Draws the demo inspection's invented photos (demo-data/photos/*.jpg).

Each is a plain drawing of a scene an inspector photographs under a floor (a decayed joist
end, a notch, a cut I-joist flange, a shimmed post, a cut joist over a duct, a torn ground
cover, the front of the house), with grain and sensor-like noise so it reads as a photo.
640 x 480, JPEG quality 72, no metadata: about 40 KB each. Deterministic (fixed seeds).

Usage: python3 scripts/make-demo-photos.py   (needs Pillow)
"""
import os
import random

from PIL import Image, ImageDraw, ImageFilter

W, H = 640, 480
OUT = os.path.join(os.path.dirname(__file__), "..", "demo-data", "photos")


def grain(draw, box, base, rng, horizontal=True):
    """A plank or joist face with darker grain lines."""
    x0, y0, x1, y1 = box
    draw.rectangle(box, fill=base)
    for _ in range(int((y1 - y0 if horizontal else x1 - x0) / 3)):
        shade = tuple(max(0, c - rng.randint(10, 35)) for c in base)
        if horizontal:
            y = rng.uniform(y0, y1)
            pts = [(x, y + 2.5 * ((x / 37.0 + y) % 3 - 1.5)) for x in range(int(x0), int(x1) + 1, 16)]
        else:
            x = rng.uniform(x0, x1)
            pts = [(x + 2.5 * ((y / 41.0 + x) % 3 - 1.5), y) for y in range(int(y0), int(y1) + 1, 16)]
        draw.line(pts, fill=shade, width=1)


def finish(img, name, seed):
    """Light falloff, noise, a slight blur, then written without any metadata."""
    rng = random.Random(seed)
    noise = Image.effect_noise((W, H), 18).convert("RGB")
    img = Image.blend(img, noise, 0.06)
    vignette = Image.radial_gradient("L").resize((W, H)).point(lambda v: 255 - int(v * 0.55))
    dark = Image.new("RGB", (W, H), (8, 8, 10))
    img = Image.composite(img, dark, vignette)
    img = img.filter(ImageFilter.GaussianBlur(0.6 + rng.random() * 0.2))
    img.save(os.path.join(OUT, name), "JPEG", quality=72, optimize=True)


def underside(rng, wood=(196, 160, 112)):
    """Subfloor boards seen from below and the lighting of a torch in a crawlspace."""
    img = Image.new("RGB", (W, H), (60, 52, 44))
    d = ImageDraw.Draw(img)
    for k in range(0, W, 80):
        grain(d, (k, 0, k + 78, 150), tuple(c - 30 for c in wood), rng, horizontal=False)
    return img, d


def decay():
    rng = random.Random(1)
    img, d = underside(rng)
    d.rectangle((0, 330, W, H), fill=(150, 148, 140))  # foundation wall and sill
    grain(d, (0, 300, W, 335), (170, 140, 100), rng)  # sill plate
    grain(d, (180, 150, 330, 300), (196, 160, 112), rng, horizontal=False)  # joist end
    d.ellipse((170, 215, 345, 330), fill=(74, 50, 32))  # decay over the bearing
    for _ in range(260):
        x, y = rng.uniform(185, 330), rng.uniform(225, 320)
        d.point((x, y), fill=(40, 28, 18))
    for k in range(6):  # cubical checking
        d.line((190, 240 + 14 * k, 330, 236 + 14 * k), fill=(45, 30, 20), width=2)
        d.line((205 + 22 * k, 225, 200 + 22 * k, 320), fill=(45, 30, 20), width=2)
    d.line((420, 260, 345, 262), fill=(230, 200, 40), width=6)  # an awl pushed in
    finish(img, "decay-at-joist-end.jpg", 1)


def notch():
    rng = random.Random(2)
    img, d = underside(rng)
    grain(d, (0, 170, W, 330), (200, 166, 118), rng)  # joist side
    d.rectangle((260, 290, 360, 330), fill=(60, 52, 44))  # notch in the bottom edge
    d.rectangle((250, 300, 640, 350), fill=(235, 235, 228))  # drain pipe through it
    d.ellipse((225, 296, 275, 354), fill=(215, 215, 205))
    d.text((420, 310), "2\" deep", fill=(30, 30, 30))
    finish(img, "notch-at-drain.jpg", 2)


def ijoist_cut():
    rng = random.Random(3)
    img, d = underside(rng)
    grain(d, (0, 170, W, 200), (205, 170, 120), rng)  # top flange
    d.rectangle((0, 200, W, 330), fill=(176, 150, 96))  # OSB web
    for _ in range(500):
        x, y = rng.uniform(0, W), rng.uniform(200, 330)
        d.line((x, y, x + rng.uniform(4, 14), y + rng.uniform(-2, 2)), fill=(150, 120, 70))
    grain(d, (0, 330, 250, 360), (205, 170, 120), rng)  # bottom flange, cut
    grain(d, (330, 330, W, 360), (205, 170, 120), rng)
    d.ellipse((255, 320, 325, 390), fill=(240, 240, 236))  # toilet drain
    d.ellipse((268, 333, 312, 377), fill=(40, 40, 40))
    finish(img, "cut-i-joist-flange.jpg", 3)


def shimmed_post():
    rng = random.Random(4)
    img, d = underside(rng)
    grain(d, (0, 140, W, 210), (180, 146, 100), rng)  # girder plies
    d.line((0, 163, W, 163), fill=(90, 70, 50), width=2)
    d.line((0, 187, W, 187), fill=(90, 70, 50), width=2)
    for k, (x0, x1) in enumerate([(280, 370), (272, 378), (285, 362)]):  # shims
        d.polygon([(x0, 210 + 7 * k), (x1, 212 + 7 * k), (x1, 217 + 7 * k), (x0, 214 + 7 * k)], fill=(214, 184, 132))
    grain(d, (290, 232, 360, 410), (170, 140, 96), rng, horizontal=False)  # 4x4 post
    d.rectangle((250, 410, 400, H), fill=(150, 150, 145))  # concrete pier
    d.rectangle((0, 440, W, H), fill=(110, 96, 80))  # soil
    d.rectangle((250, 410, 400, 440), fill=(150, 150, 145))
    finish(img, "shimmed-post.jpg", 4)


def duct_cut():
    rng = random.Random(5)
    img, d = underside(rng)
    grain(d, (0, 160, 250, 320), (200, 166, 118), rng)  # joist, cut
    grain(d, (390, 160, W, 320), (200, 166, 118), rng)
    d.rectangle((250, 150, 390, 360), fill=(170, 174, 180))  # sheet-metal duct
    for k in range(8):
        d.line((250, 160 + 25 * k, 390, 160 + 25 * k), fill=(140, 144, 150), width=2)
    finish(img, "joist-cut-for-duct.jpg", 5)


def ground_cover():
    rng = random.Random(6)
    img = Image.new("RGB", (W, H), (98, 84, 68))
    d = ImageDraw.Draw(img)
    for _ in range(3000):
        x, y = rng.uniform(0, W), rng.uniform(160, H)
        d.point((x, y), fill=(70 + rng.randint(0, 40), 60 + rng.randint(0, 30), 48))
    d.polygon([(0, 200), (330, 180), (290, 300), (380, 420), (0, 470)], fill=(40, 44, 48))  # sheet
    d.polygon([(420, 190), (W, 200), (W, 480), (470, 460), (520, 330)], fill=(40, 44, 48))
    d.ellipse((300, 330, 470, 400), fill=(60, 72, 78))  # standing water
    grain(d, (0, 0, W, 120), (170, 140, 100), rng)
    finish(img, "torn-ground-cover.jpg", 6)


def house():
    rng = random.Random(7)
    img = Image.new("RGB", (W, H), (168, 196, 222))
    d = ImageDraw.Draw(img)
    d.rectangle((0, 380, W, H), fill=(92, 128, 70))
    d.rectangle((120, 200, 520, 390), fill=(214, 206, 186))
    for y in range(206, 390, 12):
        d.line((120, y, 520, y), fill=(190, 182, 162))
    d.polygon([(100, 205), (320, 90), (540, 205)], fill=(96, 70, 60))
    d.rectangle((290, 290, 345, 390), fill=(120, 60, 48))
    for x in (160, 400):
        d.rectangle((x, 240, x + 70, 300), fill=(90, 110, 130))
        d.line((x + 35, 240, x + 35, 300), fill=(230, 230, 230), width=3)
    d.rectangle((250, 382, 390, 396), fill=(150, 150, 146))  # porch step
    grain(d, (230, 360, 410, 384), (170, 140, 100), rng)  # porch deck
    finish(img, "house-front.jpg", 7)


if __name__ == "__main__":
    os.makedirs(OUT, exist_ok=True)
    for draw in (decay, notch, ijoist_cut, shimmed_post, duct_cut, ground_cover, house):
        draw()
    print("wrote", sorted(os.listdir(OUT)))

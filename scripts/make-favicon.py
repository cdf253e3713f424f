"""Rasterises app/icon.svg's shapes (Riser's own mark) into app/favicon.ico (16 and 32 px, 32-bit BMP entries).
Run: python3 scripts/make-favicon.py. Pure Python, no imaging library."""
import struct

INK, COPPER, PAPER, SPRAY = (0x14, 0x20, 0x2B), (0x9A, 0x4F, 0x12), (0xF7, 0xF4, 0xEE), (0xDC, 0xEC, 0xF1)

def rect(x, y, w, h, r=0.0):
    def inside(px, py):
        if not (x <= px < x + w and y <= py < y + h):
            return False
        if r <= 0:
            return True
        cx = min(max(px, x + r), x + w - r)
        cy = min(max(py, y + r), y + h - r)
        return (px - cx) ** 2 + (py - cy) ** 2 <= r * r
    return inside

def circle(cx, cy, r):
    return lambda px, py: (px - cx) ** 2 + (py - cy) ** 2 <= r * r

SHAPES = [
    (rect(0, 0, 32, 32, 6), INK),
    (rect(13.5, 13, 5, 16), COPPER),
    (rect(11.5, 26, 9, 3), COPPER),
    (rect(15, 9, 2, 4), PAPER),
    (rect(6, 6, 20, 3, 1.5), PAPER),
    (circle(6, 13, 1.6), SPRAY),
    (circle(26, 13, 1.6), SPRAY),
    (circle(9, 17, 1.4), SPRAY),
    (circle(23, 17, 1.4), SPRAY),
]

def render(size, ss=4):
    px = []
    for row in range(size):
        line = []
        for col in range(size):
            acc = [0.0, 0.0, 0.0, 0.0]
            for sy in range(ss):
                for sx in range(ss):
                    u = (col + (sx + 0.5) / ss) * 32 / size
                    v = (row + (sy + 0.5) / ss) * 32 / size
                    colour = None
                    for test, c in SHAPES:
                        if test(u, v):
                            colour = c
                    if colour:
                        acc[0] += colour[0]; acc[1] += colour[1]; acc[2] += colour[2]; acc[3] += 255
            n = ss * ss
            a = acc[3] / n
            if a:
                line.append((round(acc[0] / (acc[3] / 255)), round(acc[1] / (acc[3] / 255)), round(acc[2] / (acc[3] / 255)), round(a)))
            else:
                line.append((0, 0, 0, 0))
        px.append(line)
    return px

def bmp_entry(size):
    px = render(size)
    header = struct.pack("<IiiHHIIiiII", 40, size, size * 2, 1, 32, 0, 0, 0, 0, 0, 0)
    data = b"".join(struct.pack("BBBB", b, g, r, a) for line in reversed(px) for (r, g, b, a) in line)
    mask_row = ((size + 31) // 32) * 4
    mask = b"\x00" * (mask_row * size)
    return header + data + mask

entries = [bmp_entry(s) for s in (16, 32)]
out = struct.pack("<HHH", 0, 1, len(entries))
offset = 6 + 16 * len(entries)
for s, e in zip((16, 32), entries):
    out += struct.pack("<BBBBHHII", s, s, 0, 0, 1, 32, len(e), offset)
    offset += len(e)
out += b"".join(entries)
open("app/favicon.ico", "wb").write(out)
print("app/favicon.ico", len(out), "bytes")

/**
 * A minimal EXIF reader for tests: whether an EXIF block (as sharp's metadata().exif returns it)
 * points to a GPS IFD. Layout per CIPA DC-008 (Exif 2.32): "Exif\0\0", then a TIFF header (byte
 * order "II"/"MM", 42, offset of IFD0); IFD0 entries are 12 bytes each, and tag 0x8825 is the
 * "GPS Info IFD Pointer".
 */
export const GPS_IFD_POINTER_TAG = 0x8825;

export function exifHasGps(exif: Buffer | undefined | null): boolean {
  if (!exif || exif.length < 14) return false;
  const tiff = exif.subarray(0, 6).toString("latin1") === "Exif\0\0" ? exif.subarray(6) : exif;
  const little = tiff.subarray(0, 2).toString("latin1") === "II";
  const u16 = (o: number) => (little ? tiff.readUInt16LE(o) : tiff.readUInt16BE(o));
  const u32 = (o: number) => (little ? tiff.readUInt32LE(o) : tiff.readUInt32BE(o));
  if (u16(2) !== 42) return false;
  const ifd0 = u32(4);
  const count = u16(ifd0);
  for (let i = 0; i < count; i++) if (u16(ifd0 + 2 + i * 12) === GPS_IFD_POINTER_TAG) return true;
  return false;
}

/** A JPEG that carries a GPS position (and a camera make) in its EXIF, as a phone photo would. */
export async function jpegWithGps(width = 640, height = 480): Promise<Buffer> {
  const sharp = (await import("sharp")).default;
  return sharp({ create: { width, height, channels: 3, background: "#9a4f12" } })
    .jpeg({ quality: 90 })
    .withExif({
      IFD0: { Make: "Invented Camera Co", Model: "Field 1" },
      // an invented position (Juniper Flats is not a real place)
      IFD3: { GPSLatitudeRef: "N", GPSLatitude: "45/1 31/1 12/1", GPSLongitudeRef: "W", GPSLongitude: "122/1 40/1 30/1" },
    })
    .toBuffer();
}

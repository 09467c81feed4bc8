import sharp from 'sharp';

/**
 * A real JPEG as a phone takes it: larger than the web copy, turned by the EXIF orientation tag
 * (6: the camera was held upright), and carrying a GPS position that must not survive.
 */
export function phonePhoto(width = 2400, height = 1800) {
  return sharp({ create: { width, height, channels: 3, background: { r: 120, g: 72, b: 40 } } })
    .jpeg({ quality: 80 })
    .withMetadata({ orientation: 6 })
    .withExif({ IFD0: { Make: 'Test camera' }, IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '52/1 12/1 30/1', GPSLongitudeRef: 'W', GPSLongitude: '1/1 30/1 0/1' } })
    .toBuffer();
}

export const smallPng = () => sharp({ create: { width: 200, height: 120, channels: 4, background: { r: 10, g: 90, b: 60, alpha: 0.5 } } }).png().toBuffer();

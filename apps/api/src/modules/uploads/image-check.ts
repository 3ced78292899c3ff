// Checks an uploaded image by its CONTENT: the bytes must be a JPEG, PNG or WebP (file-type reads
// the signature), whatever the file name or the browser's type say, and its pixel size must be
// readable (image-size parses the header). Anything else is a 4xx naming the form field.
import { fileTypeFromBuffer } from 'file-type';
import { imageSize } from 'image-size';
import { imageContentTypes } from '@seamwright/shared';
import type { ImageContentType } from '@seamwright/shared';
import { AppError } from '../../errors.js';

export interface CheckedImage {
  contentType: ImageContentType;
  /** The extension that matches the content (for the name it is served under). */
  extension: 'jpg' | 'png' | 'webp';
  widthPx: number;
  heightPx: number;
}

const extensionOf: Record<ImageContentType, CheckedImage['extension']> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
};

function fieldError(
  code: 'VALIDATION_FAILED' | 'UNSUPPORTED_MEDIA_TYPE',
  field: string,
  message: string,
) {
  return new AppError(code, `${field}: ${message}`, { errors: [{ path: field, message }] });
}

const isImageType = (mime: string): mime is ImageContentType =>
  (imageContentTypes as readonly string[]).includes(mime);

export async function checkImage(
  file: { buffer: Buffer; size: number } | undefined,
  field: string,
): Promise<CheckedImage> {
  if (!file) throw fieldError('VALIDATION_FAILED', field, 'Choose an image file to upload');
  if (file.size === 0 || file.buffer.length === 0)
    throw fieldError('VALIDATION_FAILED', field, 'The file is empty');
  const detected = await fileTypeFromBuffer(file.buffer);
  if (!detected || !isImageType(detected.mime)) {
    const found = detected ? `it is ${detected.mime}` : 'its content is not an image we know';
    throw fieldError(
      'UNSUPPORTED_MEDIA_TYPE',
      field,
      `Upload a JPEG, PNG or WebP image; ${found}, whatever its name says`,
    );
  }
  let size: { width?: number; height?: number };
  try {
    size = imageSize(file.buffer);
  } catch {
    size = {};
  }
  if (!size.width || !size.height)
    throw fieldError('VALIDATION_FAILED', field, 'The image is damaged: its size cannot be read');
  return {
    contentType: detected.mime,
    extension: extensionOf[detected.mime],
    widthPx: size.width,
    heightPx: size.height,
  };
}

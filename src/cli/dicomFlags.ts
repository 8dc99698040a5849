// The flags of `npm run calc -- --dicom DIR`; the others take effect only with --dicom.
export const DICOM_FLAG = 'dicom';
export const DICOM_ONLY_FLAGS = [
  'write-plan',
  'calibration',
  'body-threshold',
  'similarity',
  'min-slab',
  'extra-points',
] as const;

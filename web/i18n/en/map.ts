/** English text of the map screen and of exchange files (export, import, merge). */
export const map = {
  // Exchange files
  'exchange.caution.short':
    'Screening estimate, not an evaluation by a licensed engineer. Follow local codes and posting rules.',
  'exchange.readme.title': 'Grainline export',
  'exchange.readme.caution': 'CAUTION. {caution}',
  'exchange.readme.files':
    '{geojson}: every survey as GeoJSON (RFC 7946, WGS84 longitude/latitude), with all inputs, results, versions, revision and inspector. {csv}: a one-line-per-survey summary for spreadsheets (RFC 4180). {photos}: the photos, one folder per survey id.',
  'exchange.readme.written': 'Written {at} by Grainline build {build}: {count} surveys.',
  'exchange.readme.photos': 'Photos included: {count}.',
  'exchange.readme.noPhotos': 'Photos were not included in this export.',
  'exchange.readme.missing':
    'Photos listed in the records but not readable on the device ({count}):',

  // Import: whole-file problems
  'exchange.file.notJson': 'This file is not JSON text, so it cannot be a GeoJSON export.',
  'exchange.file.notGeoJson': 'This file is not a GeoJSON FeatureCollection.',
  'exchange.file.noFeatures': 'This FeatureCollection has no list of features.',
  'exchange.file.otherFormat': 'This GeoJSON was not written by Grainline.',
  'exchange.file.newerFormat':
    'This file was written by a newer version of Grainline (file format {version}). Update the app, then import it again.',
  'exchange.file.tooMany': 'This file holds more than {max} features; split it into smaller files.',
  'exchange.file.tooLarge': 'This file is larger than {max} MB; split it into smaller files.',
  'exchange.file.unreadable': 'The file could not be read from the device.',
  'exchange.file.zipEmpty': 'This zip holds no GeoJSON file.',
  'exchange.file.zipBroken': 'This zip file is damaged and could not be opened.',

  // Import: reasons for one feature
  'exchange.reason.atField': '{message} (field {path})',
  'exchange.reason.notFeature': 'It is not a GeoJSON Feature.',
  'exchange.reason.noRecord': 'It carries no Grainline survey record (properties.record).',
  'exchange.reason.recordNotJson': 'Its survey record is text that is not valid JSON.',
  'exchange.reason.newerVersion':
    'It was written by a newer version of Grainline (record schema {version}). Update the app, then import it again.',
  'exchange.reason.invalid': 'Its survey record is not valid.',
  'exchange.reason.geometryMissing':
    'It has no point, but its survey record has a location. One of them was changed.',
  'exchange.reason.geometryWithoutLocation':
    'It has a point, but its survey record has no location. One of them was changed.',
  'exchange.reason.geometryNotPoint': 'Its geometry is not a Point with longitude and latitude.',
  'exchange.reason.geometryMismatch':
    'Its point ({point}) is not where its survey record says ({location}). One of them was moved.',
} as const;

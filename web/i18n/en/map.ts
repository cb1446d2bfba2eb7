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

  // Exchange: buttons and reports
  'exchange.title': 'Files',
  'exchange.import.button': 'Import GeoJSON or zip',
  'exchange.import.busy': 'Importing…',
  'exchange.import.strict': 'All or nothing',
  'exchange.import.strictHint':
    'If any survey in the file is not valid, import none of it. Otherwise the valid ones are imported and the others listed.',
  'exchange.import.refused': 'Nothing was imported from {file}.',
  'exchange.import.untouched': 'The surveys already on this device were not changed.',
  'exchange.import.strictRefused':
    'Nothing was imported from {file}: surveys that are not valid: {bad} (all-or-nothing was chosen).',
  'exchange.import.failed': 'The import of {file} could not be saved; nothing was written.',
  'exchange.import.done': 'Imported {file}.',
  'exchange.import.accepted': 'Valid surveys in the file: {count}',
  'exchange.import.newSurveys': 'New surveys: {count}',
  'exchange.import.newRevisions': 'Revisions added: {count}',
  'exchange.import.newerCurrent': 'Surveys updated to a newer revision: {count}',
  'exchange.import.duplicates': 'Already on this device, skipped: {count}',
  'exchange.import.migrated': 'Written by an earlier version and updated on import: {count}',
  'exchange.import.withoutLocation': 'Without a location (listed beside the map): {count}',
  'exchange.import.photos': 'Photos added: {added}; photos that could not be stored: {failed}',
  'exchange.import.conflicts': 'Conflicts kept side by side: {count}',
  'exchange.import.conflict':
    '{address}: two different versions of revision {revision} (by {holder} and by {variant}). Both are kept; the first stays current until someone chooses.',
  'exchange.import.rejectedList': 'Not imported, with the reasons: {count}',
  'exchange.import.feature': 'Feature {n}',
  'exchange.import.moreRejected': 'And {count} more not listed here.',
  'exchange.export.geojson': 'Export GeoJSON',
  'exchange.export.csv': 'Export CSV summary',
  'exchange.export.zip': 'Export zip with photos',
  'exchange.export.busy': 'Preparing the file…',
  'exchange.export.shareTitle': 'Grainline surveys',
  'exchange.export.shared': 'Shared {file} ({count} surveys).',
  'exchange.export.downloaded': 'Saved {file} ({count} surveys).',
  'exchange.export.cancelled': 'Sharing was cancelled; {file} was not sent.',
  'exchange.export.unplaced':
    'Surveys without a location are in the file with no point (geometry null): {count}.',
  'exchange.export.photos': 'Photos included: {count}; not readable on this device: {missing}.',
  'exchange.export.failed': 'The export failed ({detail}). Nothing on the device was changed.',

  // Map screen
  'map.label': 'Map of screened buildings',
  'map.toolbar': 'Map tools',
  'map.loadFailed': 'The surveys could not be read from this device.',
  'map.viewFailed': 'The map could not be started. The surveys are safe; reload to try again.',
  'map.status.all': 'Surveys: {total}',
  'map.status.some': 'Showing {shown} of {total} surveys',
  'map.status.checking': 'checking for changes…',
  'map.empty':
    'No surveys on this device yet. Import the files of your inspectors to see them here.',
  'map.empty.import': 'Import files',
  'map.fit': 'Fit',
  'map.zoomIn': 'Zoom in',
  'map.zoomOut': 'Zoom out',
  'map.panel.close': 'Close',
  'map.sheet.basemap': 'Basemap',
  'map.sheet.files': 'Files',
  'map.sheet.unplaced': 'Surveys without location',
  'map.tiles.unavailable': 'No map tiles here (offline?): grid and scale only.',
  'map.tiles.none': 'Plain background: grid and scale only.',
  'map.cluster.label':
    '{count} surveys here: keep out {keepOut}, limited entry {limited}, open {open}, not screened {unscreened}; needing an engineer: {assessment}. Tap to zoom in.',
  'map.flag.assessment': 'needs an engineer',
  'map.flag.conflict': 'conflicting versions kept',
  'map.damage.unknown': 'Not stated',
  'map.inspector.none': '(no name)',

  // Filters
  'map.filters.title': 'Filters',
  'map.filters.button': 'Filters',
  'map.filters.buttonActive': 'Filters ({count})',
  'map.filters.clear': 'Clear filters',
  'map.filters.show': 'Show {count}',
  'map.filter.posting': 'Outcome',
  'map.filter.damage': 'Damage state',
  'map.filter.assessment': 'Engineer needed',
  'map.filter.system': 'Structural system',
  'map.filter.inspector': 'Inspector',
  'map.filter.date': 'Date surveyed',
  'map.filter.from': 'From',
  'map.filter.to': 'To',
  'map.assessment.needed': 'Needs detailed assessment',
  'map.assessment.notNeeded': 'No assessment flagged',
  'map.system.lightFrame': 'Light timber frame',
  'map.system.massTimber': 'Mass timber panels',
  'map.system.rockingWall': 'Rocking walls',
  'map.system.heavyFrame': 'Heavy timber frame',
  'map.system.unknown': 'Other system',

  // Summary card
  'map.card.noAddress': 'Survey without address',
  'map.card.close': 'Close the summary',
  'map.card.damage': 'Damage: {state}',
  'map.card.assessment': 'Needs a detailed assessment by an engineer.',
  'map.card.conflict':
    'Two different versions of this survey are kept. Open it to compare them and choose one.',
  'map.card.system': 'System',
  'map.card.inspector': 'Inspector',
  'map.card.updated': 'Last change',
  'map.card.revision': 'Revision',
  'map.card.open': 'Open survey',

  // Surveys without location
  'map.unplaced.button': 'Without location: {count}',
  'map.unplaced.title': 'Surveys without location ({count})',
  'map.unplaced.why':
    'These surveys have no position, so they cannot be drawn. They are kept, exported (with no point) and can be placed from the survey.',
  'map.unplaced.more': 'And {count} more.',

  // Files
  'map.files.button': 'Files',
  'map.files.title': 'Import and export',
  'map.files.scopeAll': 'Exports hold every survey on this device ({count}).',
  'map.files.scopeShown': 'Exports hold the {count} surveys the filters show.',

  // Basemap
  'map.basemap.button': 'Basemap',
  'map.basemap.title': 'Basemap',
  'map.basemap.show': 'Show under the markers',
  'map.basemap.none': 'Plain background',
  'map.basemap.noneHint': 'Grid and scale bar only; needs nothing.',
  'map.basemap.online': 'Online map tiles',
  'map.basemap.onlineHint': 'Tiles you view are kept on this device for offline use.',
  'map.basemap.onlineOffline':
    'You are offline: only tiles viewed before will show; the grid fills in the rest.',
  'map.basemap.archive': 'Offline basemap: {name}',
  'map.basemap.archiveHint': '{mb} MB, zoom {min} to {max}',
  'map.basemap.offlineTitle': 'Offline basemap (for areas without signal)',
  'map.basemap.offlineHint':
    'Load a PMTiles file (a single-file tile archive with image tiles) prepared before going out. It is stored on this device.',
  'map.basemap.load': 'Load a basemap file (.pmtiles)',
  'map.basemap.loading': 'Reading the basemap…',
  'map.basemap.loaded': 'Offline basemap “{name}” stored on this device and shown.',
  'map.basemap.storeFailed':
    'The basemap could not be stored (the device may be full). Your surveys are not affected.',
  'map.basemap.remove': 'Remove',
  'map.basemap.tooLarge': 'This file is larger than {max} MB.',
  'map.basemap.notPmtiles': 'This file is not a PMTiles archive.',
  'map.basemap.version':
    'This PMTiles archive is version {version}; Grainline reads version 3. Convert it with the PMTiles tools.',
  'map.basemap.vector':
    'This archive holds vector tiles; Grainline needs image tiles (PNG, JPEG, WebP or AVIF).',
  'map.basemap.unreadable': 'This basemap file is damaged and could not be read.',
  'map.basemap.serviceTitle': 'Online tile service',
  'map.basemap.url': 'Tile address (with {z}, {x} and {y})',
  'map.basemap.url.notHttps':
    'The address must start with https:// (the app loads images securely only).',
  'map.basemap.url.placeholders': 'The address must contain {z}, {x} and {y}.',
  'map.basemap.url.notUrl': 'This is not a web address.',
  'map.basemap.attribution': 'Attribution shown on the map (required by the service)',
  'map.basemap.save': 'Save',
  'map.basemap.reset': 'Use OpenStreetMap',
  'map.basemap.saved': 'Tile service saved.',
  'map.basemap.policy':
    'OpenStreetMap’s tiles are run by volunteers for light use: tiles are only fetched as you view them, kept on this device within a size limit, never downloaded in bulk. For large operations, set your own tile server here.',
  'map.basemap.cache': 'Tiles kept on this device: {tiles} ({mb} MB of {max} MB).',
  'map.basemap.clearCache': 'Empty',
} as const;

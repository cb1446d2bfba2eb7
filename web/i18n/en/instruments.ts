/** English text of the phone instruments: the tilt meter and the ambient vibration recorder. */
export const instruments = {
  // Sensor access
  'instruments.access.ask': 'Allow motion sensor',
  'instruments.access.askHint':
    'This phone asks before a page may read its motion sensor. Tap the button, then allow it.',
  'instruments.access.denied':
    'Motion sensor access was refused. Allow it in the browser settings for this site, then try again.',
  'instruments.access.unsupported': 'This browser offers no motion sensor.',
  'instruments.access.insecure':
    'The motion sensor is only available when Grainline is opened over https or from this device.',
  'instruments.access.noReadings':
    'No readings arrive from the motion sensor. This device may have none (most computers do not).',

  // Tilt meter
  'instruments.tilt.title': 'Phone tilt meter',
  'instruments.tilt.open': 'Measure the lean with this phone',
  'instruments.tilt.close': 'Close the tilt meter',
  'instruments.tilt.intro':
    'Stand the phone upright on one long edge, screen at a right angle to the wall or column, and press the edge firmly onto the face. Measure near mid-height: a bowed member leans differently at its ends.',
  'instruments.tilt.position1':
    'Position 1: press one long edge onto the face and hold the phone still.',
  'instruments.tilt.position2':
    'Position 2: turn the phone half a turn about its long side, so the screen faces the other way, and press the other long edge onto the same spot.',
  'instruments.tilt.measure': 'Measure position {n}',
  'instruments.tilt.settling': 'Hold still…',
  'instruments.tilt.averaging': 'Measuring… {percent} %',
  'instruments.tilt.cancel': 'Cancel',
  'instruments.tilt.live': 'Live reading: {degrees}°',
  'instruments.tilt.liveStill': 'steady',
  'instruments.tilt.liveMoving': 'moving',
  'instruments.tilt.position1Done': 'Position 1 recorded: {degrees}°.',
  'instruments.tilt.issue.not-still':
    'The phone moved. Press it firmly onto the face and try again.',
  'instruments.tilt.issue.not-upright':
    'Hold the phone upright, its long edge within 45° of vertical, and try again.',
  'instruments.tilt.issue.implausible-magnitude':
    'The reading does not match gravity: the phone was moving, or its sensor is far off. Try again.',
  'instruments.tilt.issue.too-few':
    'Too few readings arrived. Keep the screen on and this page in front, then try again.',
  'instruments.tilt.issue.offset-implausible':
    'The two positions disagree too much: the phone was probably not on the same spot or not turned as shown. Start again from position 1.',
  'instruments.tilt.issue.too-steep':
    'The lean is over 15°. That is not a residual drift to measure: treat the building as a collapse hazard.',
  'instruments.tilt.result': 'Lean {degrees}° ± {uncertainty}°',
  'instruments.tilt.drift': 'Drift ratio {percent} % ± {uncertainty} %',
  'instruments.tilt.offset': 'Sensor offset found and removed: {degrees}°',
  'instruments.tilt.use': 'Use this drift ratio',
  'instruments.tilt.again': 'Measure again',
  'instruments.tilt.used': 'Drift ratio entered from the phone tilt meter.',
  'instruments.tilt.caution':
    'A phone is not a calibrated inclinometer. Check a large or surprising lean with a plumb line or a level.',

  // Vibration recorder
  'instruments.vib.title': 'Building frequency (ambient vibration)',
  'instruments.vib.open': 'Record the building’s own vibration',
  'instruments.vib.close': 'Close the vibration recorder',
  'instruments.vib.intro':
    'Lay the phone flat on the floor of the top storey, near a wall or column line rather than mid-span, and leave it alone for the whole recording. Nobody should walk nearby; machines that run nearby will show up too.',
  'instruments.vib.longEdge': 'The phone’s long edge points along',
  'instruments.vib.longEdgeX': 'plan x',
  'instruments.vib.longEdgeY': 'plan y',
  'instruments.vib.longEdgeUnknown': 'not noted',
  'instruments.vib.duration': 'Recording length',
  'instruments.vib.durationValue': '{seconds} s',
  'instruments.vib.start': 'Start recording',
  'instruments.vib.stop': 'Stop now',
  'instruments.vib.recording': 'Recording… {elapsed} of {total} s',
  'instruments.vib.rate': '{count} readings, {rate} per second',
  'instruments.vib.keepStill': 'Do not touch the phone. Keep the screen on.',
  'instruments.vib.analysing': 'Analysing the recording…',
  'instruments.vib.analysisFailed': 'The analysis failed. The recording is kept; try again.',
  'instruments.vib.retry': 'Analyse again',
  'instruments.vib.estimate': 'Fundamental frequency {frequency} Hz (period {period} s)',
  'instruments.vib.uncertainty': 'Standard error ± {uncertainty} Hz',
  'instruments.vib.damping': 'Damping {percent} % (half-power bandwidth)',
  'instruments.vib.dampingWithError':
    'Damping {percent} % ± {uncertainty} % (half-power bandwidth)',
  'instruments.vib.noDamping': 'Damping not measurable from this peak.',
  'instruments.vib.confidence': 'Confidence {percent} %',
  'instruments.vib.direction': 'Direction: plan {direction}',
  'instruments.vib.directionUnknown': 'Direction: not clear (the peak shows on both phone axes)',
  'instruments.vib.secondary': 'A second peak at {frequency} Hz along plan {direction}.',
  'instruments.vib.expected': 'Expected {frequency} Hz (period {period} s, from a code formula)',
  'instruments.vib.stiffness': 'Stiffness indicator k/k_ref = {ratio} ± {uncertainty}',
  'instruments.vib.stiffnessLow':
    'The building is markedly less stiff than expected: a sign of hidden damage to connections or sheathing, to be checked.',
  'instruments.vib.status.no-clear-peak':
    'No clear peak: the recording looks like the sensor’s own noise. No frequency is reported.',
  'instruments.vib.status.below-resolution':
    'The motion is smaller than the steps this browser reports the sensor in. No frequency can be measured here.',
  'instruments.vib.status.no-signal':
    'The readings never changed: this browser or phone gives too coarse readings. No frequency is reported.',
  'instruments.vib.status.too-short': 'The recording is too short to analyse.',
  'instruments.vib.status.rate-too-low': 'The phone sent too few readings per second to analyse.',
  'instruments.vib.save': 'Save with the survey',
  'instruments.vib.saveRecordOnly': 'Keep the recording with the survey',
  'instruments.vib.again': 'Record again',
  'instruments.vib.saved': 'Saved with the survey.',
  'instruments.vib.spectrum': 'Spectrum of the recording, 0 to {max} Hz',
  'instruments.vib.spectrumPeak': 'peak',
  'instruments.vib.caveatTitle': 'What this measurement can and cannot tell',
  'instruments.vib.caveat.phone-noise':
    'A phone’s sensor is noisy (about 150 µg/√Hz). A stiff low-rise building often sways less than that in calm conditions; then no peak is found, and that says nothing about damage.',
  'instruments.vib.caveat.browser-rounding':
    'This browser rounds the readings (to 0.1 m/s²), which hides small motion.',
  'instruments.vib.caveat.reordered':
    'Some readings arrived out of order and were put back in order.',
  'instruments.vib.caveat.dropped-samples':
    'Some readings were incomplete or repeated and were left out.',
  'instruments.vib.caveat.gaps':
    'The readings stopped for a while; the longest unbroken stretch was used.',
  'instruments.vib.caveat.not-flat': 'The phone was not lying flat.',
  'instruments.vib.caveat.vertical-dominant':
    'The peak is as strong vertically: it may be a floor or a machine, not the building’s sway.',
  'instruments.vib.caveat.both-axes': 'The peak shows on both horizontal axes of the phone.',
  'instruments.vib.caveat.two-modes':
    'Each horizontal axis shows its own peak: the lower is reported.',
  'instruments.vib.caveat.damping-unresolved':
    'The peak is too narrow or too faint for a damping value.',
  'instruments.vib.caveat.empirical-reference':
    'The expected frequency comes from a code formula that scatters widely for real buildings; the stiffness indicator is weak evidence unless the reference was measured before the event.',

  'instruments.data.invalid': 'This instrument recording could not be read. It is kept as stored.',
  'instruments.screening':
    'Phone measurements are screening evidence only, not a substitute for evaluation by a licensed engineer.',
} as const;

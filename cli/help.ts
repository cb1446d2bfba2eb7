/** The text of `grainline --help`. */
import { CALC_VERSION } from '../calc/index.js';

export const USAGE = `grainline — screening verdicts of timber buildings, from exported surveys

Usage
  grainline screen [options] <file>...      screen every survey in the files
  grainline --help | -h                     this text
  grainline --version                       versions of the calculation and the result

Input
  <file> is a GeoJSON FeatureCollection exported by the Grainline app (or a single
  Feature of one), or a JSON array whose items are Features, survey records (with
  "schemaVersion") or bare calculation inputs (building, walls, observations, hazard,
  measured). "-" reads standard input. Files are read as a stream: any size works.
  Every item is checked with the app's own rules; a bad item is reported by its index
  with the reasons and does not stop the others.

Options
  --json       print the full results as a JSON array instead of the table: one entry
               per item, { file, index, ok, source, id, address, result } when it was
               screened, { file, index, ok: false, id, address, reasons } when not.
               "result" is the ScreeningResult (resultVersion, calcVersion, damage state
               and probabilities, evidence, posting, flags, confidence, cautions).
  --quick      skip the pulse time-history check of rocking walls (tens of ms per wall);
               their prediction is then the spectral estimate alone, which is known to be
               unreliable in some cases.
  --color      colour the posting in the table; --no-color: never. By default the table
               is coloured when it goes to a terminal and NO_COLOR is not set. The
               posting always reads without colour: symbol and word (○ Open, ◐ Limited
               entry, ■ Keep out).

Table columns
  #                 index of the item in its file (from 0)
  Address or id     the survey's address, else its id, else the file name
  System            structural system
  Period x / y (s)  fundamental period used along x and y
  D/C               largest storey shear demand over nominal strength
  Damage            governing damage state (Hazus names: None … Complete)
  Posting           recommended posting (Grainline's own three levels)
  Flags             DA: needs a detailed assessment

Messages and the count of screened and failed items go to standard error.

Exit status
  0  every item was screened
  1  some items could not be read or screened (each is reported)
  2  a file could not be read at all (missing, empty, not JSON, cut short), or the
     command line is wrong

Calculation ${CALC_VERSION}. Screening estimates only: not a substitute for evaluation by a
licensed engineer. Follow local codes and the jurisdiction's posting rules, and never enter
a building that looks unsafe.
`;

/**
 * Element names the streaming reader acts on, as small numbers: each tag name is looked up once when
 * it opens, and every later decision (text collection, dispatch on open and close, the parent check)
 * compares numbers instead of strings. Names the reader ignores get `OTHER`.
 */

export const OTHER = 0;
// Score header and structure.
export const WORK_TITLE = 1;
export const MOVEMENT_TITLE = 2;
export const CREATOR = 3;
export const IDENTIFICATION = 4;
export const SCORE_PART = 5;
export const PART_NAME = 6;
export const PART = 7;
export const MEASURE = 8;
export const BACKUP = 9;
export const FORWARD = 10;
export const DURATION = 11;
export const SOUND = 12;
export const REPEAT = 13;
export const ENDING = 14;
// <note> and its children.
export const NOTE = 20;
export const PITCH = 21;
export const STEP = 22;
export const ALTER = 23;
export const OCTAVE = 24;
export const VOICE = 25;
export const STAFF = 26;
export const TYPE = 27;
export const TIME_MODIFICATION = 28;
export const ACTUAL_NOTES = 29;
export const NORMAL_NOTES = 30;
export const TECHNICAL = 31;
export const FINGERING = 32;
export const DYNAMICS = 33;
export const OTHER_DYNAMICS = 34;
export const CHORD = 35;
export const GRACE = 36;
export const CUE = 37;
export const REST = 38;
export const UNPITCHED = 39;
export const DOT = 40;
export const TIE = 41;
export const FERMATA = 42;
export const ACCENT = 43;
export const STACCATO = 44;
export const TENUTO = 45;
export const TUPLET = 46;
export const TREMOLO = 47;
export const ARPEGGIATE = 48;
export const NON_ARPEGGIATE = 49;
export const TIED = 80;
// <attributes>.
export const ATTRIBUTES = 50;
export const DIVISIONS = 51;
export const FIFTHS = 52;
export const MODE = 53;
export const BEATS = 54;
export const BEAT_TYPE = 55;
export const SENZA_MISURA = 56;
export const STAVES = 57;
export const CLEF = 58;
export const SIGN = 59;
export const LINE = 60;
export const CLEF_OCTAVE_CHANGE = 61;
export const TRANSPOSE = 62;
export const CHROMATIC = 63;
export const OCTAVE_CHANGE = 64;
// <direction>.
export const DIRECTION = 70;
export const WORDS = 71;
export const OCTAVE_SHIFT = 72;
export const BEAT_UNIT = 73;
export const BEAT_UNIT_DOT = 74;
export const PER_MINUTE = 75;
/** Elements that change what sounds and that the reader does not model (each gives a warning). */
export const UNSUPPORTED = 90;

const CODES = new Map<string, number>([
  ["work-title", WORK_TITLE], ["movement-title", MOVEMENT_TITLE], ["creator", CREATOR],
  ["identification", IDENTIFICATION], ["score-part", SCORE_PART], ["part-name", PART_NAME], ["part", PART],
  ["measure", MEASURE], ["backup", BACKUP], ["forward", FORWARD], ["duration", DURATION], ["sound", SOUND],
  ["repeat", REPEAT], ["ending", ENDING],
  ["note", NOTE], ["pitch", PITCH], ["step", STEP], ["alter", ALTER], ["octave", OCTAVE], ["voice", VOICE],
  ["staff", STAFF], ["type", TYPE], ["time-modification", TIME_MODIFICATION], ["actual-notes", ACTUAL_NOTES],
  ["normal-notes", NORMAL_NOTES], ["technical", TECHNICAL], ["fingering", FINGERING], ["dynamics", DYNAMICS],
  ["other-dynamics", OTHER_DYNAMICS], ["chord", CHORD], ["grace", GRACE], ["cue", CUE], ["rest", REST],
  ["unpitched", UNPITCHED], ["dot", DOT], ["tie", TIE], ["tied", TIED], ["fermata", FERMATA], ["accent", ACCENT],
  ["staccato", STACCATO], ["tenuto", TENUTO], ["tuplet", TUPLET], ["tremolo", TREMOLO],
  ["arpeggiate", ARPEGGIATE], ["non-arpeggiate", NON_ARPEGGIATE],
  ["attributes", ATTRIBUTES], ["divisions", DIVISIONS], ["fifths", FIFTHS], ["mode", MODE], ["beats", BEATS],
  ["beat-type", BEAT_TYPE], ["senza-misura", SENZA_MISURA], ["staves", STAVES], ["clef", CLEF], ["sign", SIGN],
  ["line", LINE], ["clef-octave-change", CLEF_OCTAVE_CHANGE], ["transpose", TRANSPOSE], ["chromatic", CHROMATIC],
  ["octave-change", OCTAVE_CHANGE],
  ["direction", DIRECTION], ["words", WORDS], ["octave-shift", OCTAVE_SHIFT], ["beat-unit", BEAT_UNIT],
  ["beat-unit-dot", BEAT_UNIT_DOT], ["per-minute", PER_MINUTE],
  ["glissando", UNSUPPORTED], ["slide", UNSUPPORTED], ["figured-bass", UNSUPPORTED],
  ["harmon-mute", UNSUPPORTED], ["multiple-rest", UNSUPPORTED],
]);

/**
 * The code of an element name (`OTHER` for names the reader ignores).
 *
 * @example
 * elementCode("note") === NOTE; // true
 * elementCode("stem"); // 0 (OTHER)
 */
export function elementCode(name: string): number {
  return CODES.get(name) ?? OTHER;
}

/**
 * Whether the reader uses the character data of an element. Text is collected only inside these, so
 * saxes skips building the whitespace strings between all other tags.
 *
 * @example
 * carriesText(STEP); // true
 * carriesText(NOTE); // false
 */
export function carriesText(code: number): boolean {
  switch (code) {
    case STEP: case ALTER: case OCTAVE: case DURATION: case VOICE: case STAFF: case TYPE:
    case ACTUAL_NOTES: case NORMAL_NOTES: case FINGERING: case OTHER_DYNAMICS: case TREMOLO:
    case DIVISIONS: case FIFTHS: case MODE: case BEATS: case BEAT_TYPE: case STAVES: case SIGN:
    case LINE: case CLEF_OCTAVE_CHANGE: case CHROMATIC: case OCTAVE_CHANGE:
    case WORDS: case BEAT_UNIT: case PER_MINUTE:
    case WORK_TITLE: case MOVEMENT_TITLE: case CREATOR: case PART_NAME:
      return true;
    default:
      return false;
  }
}

/** A two-bar right-hand drill written for the lab: C–E–G–E broken chord with fingering, then a held chord. */
const note = (step: string, octave: number, type: string, duration: number, finger?: number, chord = false) =>
  `<note>${chord ? "<chord/>" : ""}<pitch><step>${step}</step><octave>${octave}</octave></pitch><duration>${duration}</duration><type>${type}</type>${
    finger ? `<notations><technical><fingering>${finger}</fingering></technical></notations>` : ""
  }</note>`;

export const LAB_DRILL_XML = `<?xml version="1.0" encoding="UTF-8"?>
<score-partwise version="4.0">
  <part-list><score-part id="P1"><part-name>Piano</part-name></score-part></part-list>
  <part id="P1">
    <measure number="1">
      <attributes><divisions>2</divisions><key><fifths>0</fifths></key><time><beats>4</beats><beat-type>4</beat-type></time><clef><sign>G</sign><line>2</line></clef></attributes>
      ${note("C", 4, "eighth", 1, 1)}${note("E", 4, "eighth", 1, 3)}${note("G", 4, "eighth", 1, 5)}${note("E", 4, "eighth", 1, 3)}
      ${note("C", 4, "eighth", 1, 1)}${note("E", 4, "eighth", 1, 3)}${note("G", 4, "eighth", 1, 5)}${note("E", 4, "eighth", 1, 3)}
    </measure>
    <measure number="2">
      ${note("C", 4, "whole", 8, 1)}${note("E", 4, "whole", 8, 3, true)}${note("G", 4, "whole", 8, 5, true)}
      <barline location="right"><bar-style>light-heavy</bar-style></barline>
    </measure>
  </part>
</score-partwise>`;

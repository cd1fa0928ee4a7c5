/**
 * Words that name each field in the column headers lab equipment writes, in English,
 * German, French, Spanish, Portuguese and Italian, folded (lower case, no accents; see
 * foldText). `words` match a whole word of the header; `stems` match inside a word, for
 * compounds ("Belastungsstufe", "Setzungsmessung"). Phrases are checked first, so "load
 * step" is an increment, not a stress.
 */
export interface FieldWords {
  readonly phrases: readonly string[];
  readonly words: readonly string[];
  readonly stems: readonly string[];
}

export const INCREMENT_WORDS: FieldWords = {
  phrases: ['load step', 'load stage', 'load no', 'load number', 'load #', 'loading step', 'stage no', 'step no', 'paso de carga', 'passo de carga', 'fase di carico', 'n palier', 'no palier', 'etapa de carga', 'estagio de carga'],
  words: ['inc', 'incr', 'increment', 'incremento', 'incrementos', 'stage', 'step', 'stufe', 'lst', 'palier', 'etape', 'etapa', 'escalon', 'escalao', 'estagio', 'fase', 'gradino'],
  stems: ['increment', 'laststufe', 'belastungsstufe', 'lastschritt', 'palier', 'escalon', 'estagio', 'gradino'],
};

export const STRESS_WORDS: FieldWords = {
  phrases: ['vertical stress', 'effective stress', 'applied stress', 'axial stress', 'normal stress'],
  words: ['stress', 'pressure', 'load', 'loading', 'sigma', 'σ', "σ'", 'σ′', 'p', 'sv', 'spannung', 'druck', 'last', 'auflast', 'belastung', 'contrainte', 'pression', 'charge', 'tension', 'esfuerzo', 'presion', 'carga', 'tensao', 'pressao', 'tensione', 'pressione', 'carico'],
  stems: ['spannung', 'belastung', 'auflast', 'contrainte', 'esfuerzo', 'tensione', 'pressione'],
};

/** Time since the load went on (preferred over a clock or a date when a file has both). */
export const ELAPSED_WORDS: FieldWords = {
  phrases: ['elapsed time', 'time elapsed', 'temps ecoule', 'tiempo transcurrido', 'tempo decorrido', 'tempo trascorso', 'verstrichene zeit', 'zeit seit'],
  words: ['elapsed', 'time', 't', 'zeit', 'dauer', 'messzeit', 'temps', 'duree', 'tiempo', 'duracion', 'tempo', 'duracao', 'durata', 'trascorso', 'ecoule', 'transcurrido', 'decorrido'],
  stems: ['elapsed', 'messzeit', 'versuchszeit', 'laufzeit'],
};

/** A clock or a date: a time column, but the last choice. */
export const CLOCK_WORDS: FieldWords = {
  phrases: ['date time', 'date/time', 'data/hora', 'data ora', 'fecha/hora', 'fecha y hora', 'date et heure', 'datum/uhrzeit'],
  words: ['clock', 'timestamp', 'datetime', 'date', 'uhrzeit', 'datum', 'heure', 'hora', 'fecha', 'data', 'ora', 'zeitstempel', 'horodatage'],
  stems: ['timestamp', 'zeitstempel', 'uhrzeit', 'horodat'],
};

export const DEFORMATION_WORDS: FieldWords = {
  phrases: ['vertical displacement', 'axial displacement', 'dial reading', 'gauge reading', 'gage reading'],
  words: ['deformation', 'settlement', 'displacement', 'compression', 'def', 'd', 'dh', 'δh', 'lvdt', 'transducer', 'setzung', 'verformung', 'weg', 'stauchung', 'verschiebung', 'tassement', 'deplacement', 'asentamiento', 'deformacion', 'desplazamiento', 'recalque', 'deformacao', 'deslocamento', 'cedimento', 'deformazione', 'spostamento', 'abbassamento'],
  stems: ['setzung', 'verformung', 'stauchung', 'zusammendruck', 'tassement', 'deformac', 'deformazion', 'asentamiento', 'recalque', 'cediment', 'displacement', 'settlement'],
};

/** Words of a gauge reading rather than a deformation: a raw reading with a zero and a direction. */
export const DIAL_WORDS: FieldWords = {
  phrases: ['dial reading', 'gauge reading', 'gage reading'],
  words: ['dial', 'gauge', 'gage', 'reading', 'readings', 'messuhr', 'comparateur', 'lecture', 'lectura', 'deformimetro', 'leitura', 'extensometro', 'lettura', 'comparatore', 'div', 'divisions'],
  stems: ['messuhr', 'comparat', 'deformimetr', 'extensomet'],
};

/** Columns that are none of the fields, whatever else their name says. */
export const OTHER_WORDS: FieldWords = {
  phrases: [],
  words: ['temperature', 'temp', 'temperatur', 'temperatura', 'note', 'notes', 'comment', 'comments', 'remark', 'remarks', 'bemerkung', 'remarque', 'observacion', 'observacao', 'nota', 'osservazioni', 'strain', 'dehnung', 'void', 'porenzahl', 'pore', 'humidity', 'feuchte'],
  stems: ['temperat', 'bemerk', 'porenzahl'],
};

/** Whether a header's words (folded) name a field, and how strongly: 3 a phrase, 2 a word, 1 a stem, 0 none. */
export function wordScore(words: readonly string[], field: FieldWords): number {
  const joined = words.join(' ');
  if (field.phrases.some((phrase) => ` ${joined} `.includes(` ${phrase} `))) return 3;
  if (words.some((word) => field.words.includes(word))) return 2;
  if (words.some((word) => field.stems.some((stem) => word.includes(stem)))) return 1;
  return 0;
}

// Public API of Cordarium's stringing check: pegs, strings and courses checked against each other.
// Pure TypeScript with no I/O: usable on the server and in client components.

export {
  checkStringing,
  enumerateStringings,
  interpretationWords,
  numberWords,
  ARRANGEMENTS,
  INSTRUMENT_PRACTICE,
  type Confidence,
  type CountReading,
  type TermReading,
  type StringingInput,
  type StringingFinding,
  type FindingLevel,
  type FindingBasis,
  type Interpretation,
  type InstrumentPractice,
  type SettledStringing,
  type StringingReport,
  type StringingStatus,
} from "./check";

/** Version of the beam-planning engine; stored with every saved plan so a re-run can say what changed. */
export const BEAM_ENGINE_VERSION = '1.1.0'

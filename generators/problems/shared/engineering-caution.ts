/**
 * The caution every page about mechanisms, robots and cameras carries (definitions' `caution` field): the
 * configurations are computed from idealised equations and settle no design question on their own.
 */
export const ENGINEERING_CAUTION =
  'The configurations on this page are computed from idealised equations (exact joints, rigid links, perfect lengths and measurements) for illustration. They are no substitute for engineering verification of a real mechanism, robot or camera system: tolerances, joint limits, collisions, loads and singular positions are not considered. Defer to the local codes, standards and licensed practice that apply.';

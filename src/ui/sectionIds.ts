/** Ids of sections that other parts of the page link to. */

/** The results' "setting the wire on the day" section (the inputs' shortcut on small screens). */
export const SETTING_ON_THE_DAY_ID = 'setting-on-the-day';

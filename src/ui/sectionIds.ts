/** Ids of sections that other parts of the page link to. */

/** The design aids' "Today's setting" (the inputs' shortcut on small screens). */
export const TODAYS_SETTING_ID = 'todays-setting';

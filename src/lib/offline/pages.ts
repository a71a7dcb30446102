/** The public pages that work offline once visited: the service worker keeps them at install, and
 * the offline notice checks the network on them (they are the pages that can open without it). */
export const OFFLINE_PAGES = ['/lab', '/try'];

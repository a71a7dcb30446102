import { bench, describe } from 'vitest';
import { cutList } from '../../src/lib/engine/cutlist';
import { planSheets } from '../../src/lib/engine/sheets';
import { checkWall, DEMO_WALL, wallShop } from '../../src/lib/engine/wall';
import { isSheetGood } from '../../src/lib/engine/wall/geometry';

/** The demo wall: two tall bookcases and two low units with two drawers each (70 parts). Goal for
 * the layout: well under a second in the browser (issue 10). */
const check = checkWall(DEMO_WALL);
const list = cutList(check.parts, DEMO_WALL.roughAllowance);
console.log(`wall bench: ${check.parts.length} parts, ${list.groups.length} groups`);

describe('wall of four cases', () => {
	bench('sheet layouts of the cut list (nesting, cut order, offcuts)', () => {
		planSheets(list.groups, (g) => !isSheetGood(g.material));
	});
	bench('check the wall (shelves, joints, tip-over) with cut list, banding and hardware', () => {
		wallShop(DEMO_WALL);
	});
});

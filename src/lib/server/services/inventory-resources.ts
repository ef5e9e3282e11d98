import { amplifiers } from './inventory-amplifiers';
import { loudspeakers } from './inventory-loudspeakers';
import { createPackage, deletePackage, getPackage, listPackages, updatePackage } from './inventory-packages';
import { createStockUnit, deleteStockUnit, getStockUnit, listStockUnits, updateStockUnit } from './inventory-units';

/** The four inventory collections behind one shape, so the pages and API treat them alike where they are alike. */
export const packages = { list: listPackages, get: getPackage, create: createPackage, update: updatePackage, remove: deletePackage };
export const stockUnits = { list: listStockUnits, get: getStockUnit, create: createStockUnit, update: updateStockUnit, remove: deleteStockUnit };
export { amplifiers, loudspeakers };


/** Injection token of the Drizzle database (`Db` from @fuelwright/db). */
export const DB = Symbol('DB');
/** Injection token of the whole handle (driver kind, close). */
export const DB_HANDLE = Symbol('DB_HANDLE');

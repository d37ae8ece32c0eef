/** Injection token of the Drizzle database (`Db` from @fuelwright/db). */
export const DB = Symbol('DB');
/** Injection token of the whole handle (driver kind, close). */
export const DB_HANDLE = Symbol('DB_HANDLE');
/** Injection token: whether this start seeded the demo club into an empty database (then the demo history follows). */
export const DEMO_JUST_SEEDED = Symbol('DEMO_JUST_SEEDED');

import { customType } from 'drizzle-orm/mysql-core';

/**
 * A JSON document column. MariaDB's JSON is LONGTEXT with a validity check and mysql2 hands it
 * back as a string, so it is parsed here rather than in every query.
 */
export const jsonDoc = <T>(name: string) =>
  customType<{ data: T; driverData: string }>({
    dataType: () => 'json',
    toDriver: (value) => JSON.stringify(value),
    fromDriver: (value) => (typeof value === 'string' ? JSON.parse(value) : value) as T,
  })(name);

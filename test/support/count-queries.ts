// Counts the SQL statements the models send while a request runs: how a test tells a cache hit from a computation.
import { Site } from '../../database/models/index.js';

export async function countQueries<T>(run: () => Promise<T>): Promise<{ result: T; queries: number }> {
  const sequelize = Site.sequelize!;
  const original = sequelize.query.bind(sequelize);
  let queries = 0;
  sequelize.query = ((...args: Parameters<typeof original>) => {
    queries++;
    return original(...args);
  }) as typeof sequelize.query;
  try {
    return { result: await run(), queries };
  } finally {
    sequelize.query = original;
  }
}

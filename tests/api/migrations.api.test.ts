import { describe, expect, it } from 'vitest';
import { MikroORM } from '@mikro-orm/postgresql';
import { ormConfig } from '@server/db/mikro-orm.config.js';
import { TEST_DATABASE_URL } from '../support/db.js';

describe('migrations', () => {
  it('the committed migrations produce exactly the schema the entities describe', async () => {
    const orm = await MikroORM.init(ormConfig(TEST_DATABASE_URL));
    try {
      const diff = await orm.schema.getUpdateSchemaSQL({ wrap: false, safe: false });
      expect(diff.trim()).toBe('');
    } finally {
      await orm.close(true);
    }
  });
});

// Brings the database DATABASE_URL names up to date and exits (the test run's template database).
import { openDatabase } from '../../server/db/data-source';

openDatabase(process.env.DATABASE_URL!)
  .then((ds) => ds.destroy())
  .catch((err) => {
    console.error(err);
    process.exit(1);
  });

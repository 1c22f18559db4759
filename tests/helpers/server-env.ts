// Server tests run against the test database only; refuse anything else so a stray run
// can never write test rows into the demo or a real database.
process.env.NODE_ENV = 'test';
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED = 'true';
process.env.DB_NAME ??= 'sightline_test';
if (!/_test$/.test(process.env.DB_NAME)) {
  throw new Error(`Server tests need a database whose name ends in _test, not "${process.env.DB_NAME}".`);
}

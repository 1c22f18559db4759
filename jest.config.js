// Three kinds of test in one run: server and shared logic (ts-jest, real MariaDB),
// client components (jest-expo web preset), and browser tests (playwright-core + chromium).
const moduleNameMapper = { '^@/(.*)$': '<rootDir>/$1' };
// d3-delaunay and its helpers ship only as ES modules; Babel turns them into CommonJS for Jest.
const esmOnly = ['d3-delaunay', 'd3-quadtree', 'delaunator', 'robust-predicates'];
const nodeTs = {
  preset: 'ts-jest',
  testEnvironment: 'node',
  moduleNameMapper,
  transform: {
    '^.+\\.tsx?$': ['ts-jest', { tsconfig: 'tsconfig.server.json' }],
    '^.+\\.m?js$': ['babel-jest', { babelrc: false, configFile: false, plugins: ['@babel/plugin-transform-modules-commonjs'] }],
  },
  transformIgnorePatterns: [`node_modules/(?!(${esmOnly.join('|')})/)`],
};

module.exports = {
  testSequencer: '<rootDir>/tests/helpers/sequencer.js',
  projects: [
    {
      ...nodeTs,
      displayName: 'server',
      setupFiles: ['<rootDir>/tests/helpers/server-env.ts'],
      testMatch: ['<rootDir>/tests/server/**/*.test.ts', '<rootDir>/tests/shared/**/*.test.ts', '<rootDir>/tests/reliability/**/*.test.ts'],
    },
    {
      displayName: 'components',
      preset: 'jest-expo/web',
      moduleNameMapper,
      testMatch: ['<rootDir>/tests/components/**/*.test.{ts,tsx}'],
      setupFilesAfterEnv: ['<rootDir>/tests/helpers/components-setup.ts'],
      transformIgnorePatterns: [
        'node_modules/(?!((jest-)?react-native|@react-native(-community)?|expo(nent)?|@expo(nent)?/.*|@expo-google-fonts/.*|react-navigation|@react-navigation/.*|react-native-svg|@tanstack/.*|standard-navigation|d3-.*|delaunator|robust-predicates|internmap))',
      ],
    },
    { ...nodeTs, displayName: 'e2e', testMatch: ['<rootDir>/tests/e2e/**/*.test.ts'] },
  ],
};

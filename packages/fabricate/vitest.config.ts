import { defineProject } from 'vitest/config';

export default defineProject({
  test: { name: 'fabricate', include: ['src/**/*.test.ts'], testTimeout: 60000 },
});

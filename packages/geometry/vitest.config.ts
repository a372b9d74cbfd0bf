import { defineProject } from 'vitest/config';

export default defineProject({
  test: { name: 'geometry', include: ['src/**/*.test.ts'], testTimeout: 60000 },
});

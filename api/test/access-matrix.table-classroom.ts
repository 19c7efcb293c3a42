import type { MatrixRoute } from './access-matrix.table.js';

// Classroom and comments: the routes an instructor reads a student's log through, and everything
// around a class. Entries land here with the routes themselves.

export const CLASSROOM_ROUTES: Record<string, MatrixRoute> = {};

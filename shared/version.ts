// The program version results and exports are stamped with; package.json carries the same
// number (a unit test holds them together), which the shared code cannot import.
export const programVersion = '0.1.0';

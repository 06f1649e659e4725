/**
 * The grid across the film: nodes from the lower wall (y = 0) to the upper wall or far field, faces
 * half-way between them, and the widths of the control volumes around the nodes.
 */
package dev.filmshear.solver.grid;

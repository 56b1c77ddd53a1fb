/**
 * The solver as it was before the speed work on rigid pairs (commit 65ff77a: the top-level solver
 * package and its {@code field} package, package names changed, nothing else), kept so that every
 * benchmark measures today's code and the baseline side by side in one run. Not maintained: it
 * exists only to be measured against.
 */
package org.kinduct.solver.baseline;

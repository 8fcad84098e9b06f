/**
 * Typed warnings that results carry when they stand on shaky ground: a stack, a solution and each
 * workflow result answer {@code warnings()}, a list of {@link org.wurtzkit.warnings.Warning}
 * records whose {@link org.wurtzkit.warnings.WarningKind} a caller can branch on, and print them in
 * their {@code toString()}. A warning never changes a number; it says why the number may mislead.
 */
package org.wurtzkit.warnings;

/**
 * The library's exceptions and its one home for argument checks. A bad argument is an
 * {@link org.wurtzkit.errors.InvalidParameterException} (an {@link java.lang.IllegalArgumentException})
 * whose message names the parameter, the value and the allowed range; build such messages with
 * {@link org.wurtzkit.errors.Require}, never by hand, and never clamp a value silently. Every other
 * failure is a {@link org.wurtzkit.errors.WurtzkitException} that answers which
 * {@link org.wurtzkit.errors.ErrorKind} it is, so that callers branch on the kind instead of parsing
 * messages; a failed solve adds what it computed (see the solvers' {@code NotConvergedException}).
 * All exceptions are unchecked and their messages are in English. A workflow whose thread is
 * interrupted stops with the JDK's {@link java.util.concurrent.CancellationException}, which is
 * not a failure and so not part of this family.
 */
package org.wurtzkit.errors;

/**
 * The {@code halyard} command line: one picocli command class per subcommand, each a thin shell over
 * {@code plugin-core}. Errors reach the user as one {@code error: ...} line on stderr.
 */
package org.halyard.cli;

/**
 * Headless commands (plain Java, no display), one picocli class each, listed in {@link org.foldbook.cli.Main}'s
 * {@code subcommands}: {@code sweep} (the stepped-rate simulation of a recording or a notebook channel),
 * {@code fold} (the quick fold calculator), {@code demo} (writes the demo notebook). A new command (e.g. the
 * audit) is one class here, one entry in that list and its word in the {@code ./foldbook} script. Exit codes
 * are {@link org.foldbook.cli.Main#OK}, {@link org.foldbook.cli.Main#FINDINGS} and
 * {@link org.foldbook.cli.Main#BAD_INPUT}.
 */
package org.foldbook.cli;

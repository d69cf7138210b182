/** Headless commands (plain Java main, no display): the stepped-rate sweep, later the audit. */
package org.foldbook.cli;

/**
 * The command line: commands, options, exit codes and messages. Nothing numeric happens here.
 */
package dev.odetab.cli;

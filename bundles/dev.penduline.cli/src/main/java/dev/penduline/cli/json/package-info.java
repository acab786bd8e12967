/** JSON output of the command line ({@code --json}): a small streaming writer, no dependencies. */
package dev.penduline.cli.json;

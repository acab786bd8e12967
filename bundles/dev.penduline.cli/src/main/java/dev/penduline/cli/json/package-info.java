/**
 * JSON output of the command line ({@code --json}): a thin writer over Gson's streaming writer that
 * keeps the CLI's number rules (integral doubles as integers, non-finite as null).
 */
package dev.penduline.cli.json;

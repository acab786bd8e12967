/**
 * The subcommands of the command line. Each parses its options, calls the services layer and
 * prints a readable report or, with {@code --json}, a JSON object whose keys carry their units
 * ({@code _kg}, {@code _m}, {@code _kg_m2}, {@code _s}, {@code _deg}).
 */
package dev.penduline.cli.commands;

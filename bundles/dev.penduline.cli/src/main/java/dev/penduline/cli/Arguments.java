package dev.penduline.cli;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import dev.penduline.physics.InputMessage;

/**
 * The options of one command: {@code --name VALUE}, {@code --name=VALUE}, repeatable options,
 * flags and positional arguments. Unknown options and missing values are usage errors that name
 * the option; every number is checked against its option's rule in {@link OptionRules}.
 */
public final class Arguments {

    private final Map<String, List<String>> values = new LinkedHashMap<>();
    private final Set<String> flags = new LinkedHashSet<>();
    private final List<String> positional = new ArrayList<>();

    private Arguments() {
    }

    /**
     * Parses the arguments of a command.
     *
     * @param args         the arguments after the command's name
     * @param valueOptions options that take a value (without the leading dashes)
     * @param flagOptions  options without a value
     * @return the parsed arguments
     * @throws UsageException for an unknown option or a missing value
     */
    public static Arguments parse(List<String> args, Set<String> valueOptions, Set<String> flagOptions)
            throws UsageException {
        Arguments a = new Arguments();
        for (int i = 0; i < args.size(); i++) {
            String arg = args.get(i);
            if (!arg.startsWith("--") || arg.equals("--")) {
                a.positional.add(arg);
                continue;
            }
            String name = arg.substring(2);
            String inline = null;
            int eq = name.indexOf('=');
            if (eq >= 0) {
                inline = name.substring(eq + 1);
                name = name.substring(0, eq);
            }
            if (flagOptions.contains(name) && inline == null) {
                a.flags.add(name);
            } else if (valueOptions.contains(name)) {
                String value = inline;
                if (value == null) {
                    if (i + 1 >= args.size()) {
                        throw new UsageException(InputMessage.OPTION_NEEDS_VALUE, name);
                    }
                    value = args.get(++i);
                }
                a.values.computeIfAbsent(name, k -> new ArrayList<>()).add(value);
            } else {
                throw new UsageException(InputMessage.UNKNOWN_OPTION, name, suggestion(name, valueOptions, flagOptions));
            }
        }
        return a;
    }

    private static String suggestion(String name, Set<String> valueOptions, Set<String> flagOptions) {
        List<String> known = new ArrayList<>(valueOptions);
        known.addAll(flagOptions);
        known.sort(null);
        return ". Options: --" + String.join(", --", known);
    }

    /**
     * The positional arguments, in order.
     *
     * @return the positional arguments
     */
    public List<String> positional() {
        return List.copyOf(positional);
    }

    /**
     * Whether a flag was given.
     *
     * @param name the flag without dashes
     * @return true when present
     */
    public boolean flag(String name) {
        return flags.contains(name);
    }

    /**
     * Whether an option was given.
     *
     * @param name the option without dashes
     * @return true when present
     */
    public boolean has(String name) {
        return values.containsKey(name);
    }

    /**
     * The last value of an option.
     *
     * @param name the option without dashes
     * @return the value, or null when absent
     */
    public String value(String name) {
        List<String> v = values.get(name);
        return v == null ? null : v.get(v.size() - 1);
    }

    /**
     * Every value of a repeatable option.
     *
     * @param name the option without dashes
     * @return the values, possibly empty
     */
    public List<String> all(String name) {
        return List.copyOf(values.getOrDefault(name, List.of()));
    }

    /**
     * A numeric option, checked against its rule in {@link OptionRules}.
     *
     * @param name     the option without dashes
     * @param fallback the value when absent (not checked)
     * @return the number
     * @throws UsageException when the value is not a finite number or is outside the option's range
     */
    public double number(String name, double fallback) throws UsageException {
        String v = value(name);
        if (v == null) {
            return fallback;
        }
        double d;
        try {
            d = Double.parseDouble(v.strip());
        } catch (NumberFormatException e) {
            d = Double.NaN;
        }
        if (!Double.isFinite(d)) {
            throw new UsageException(InputMessage.OPTION_NOT_A_NUMBER, name, OptionRules.shown(v),
                    OptionRules.of(name).describe());
        }
        return OptionRules.check(name, v, d);
    }

    /**
     * A whole-number option (counts, iterations, seeds), checked against its rule.
     *
     * @param name     the option without dashes
     * @param fallback the value when absent
     * @return the number
     * @throws UsageException when the value is not a whole number inside the option's range
     */
    public long whole(String name, long fallback) throws UsageException {
        if (!OptionRules.of(name).whole()) {
            throw new IllegalStateException("--" + name + " is not a whole-number option");
        }
        return has(name) ? (long) number(name, fallback) : fallback;
    }

    /**
     * A required numeric option.
     *
     * @param name the option without dashes
     * @return the number
     * @throws UsageException when absent or not a number
     */
    public double requiredNumber(String name) throws UsageException {
        if (!has(name)) {
            throw new UsageException(InputMessage.OPTION_REQUIRED, name);
        }
        return number(name, Double.NaN);
    }
}

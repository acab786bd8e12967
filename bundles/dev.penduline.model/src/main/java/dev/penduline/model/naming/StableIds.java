package dev.penduline.model.naming;

import java.text.Normalizer;
import java.util.Collection;
import java.util.Locale;

/**
 * Identifiers derived from names: readable, stable across saves, and never random, so a
 * mechanism file diffs cleanly and a fit result can name the sessions and terms it used.
 *
 * <p>{@code slug("Rib (left) ×2")} is {@code "rib-left-2"}: accents dropped, lower case, every run
 * of other characters one {@code '-'}. {@link #unique} appends {@code -2}, {@code -3}, … when the
 * slug is taken among the siblings. An identifier is assigned once, when the element is created;
 * renaming the element keeps it.
 */
public final class StableIds {

    private StableIds() {
    }

    /**
     * The slug of a name.
     *
     * @param name     the element's name (may be null or blank)
     * @param fallback used when the name has no letter or digit, e.g. {@code "part"}
     * @return lower-case letters and digits joined by single hyphens, never empty
     */
    public static String slug(String name, String fallback) {
        final String decomposed = Normalizer.normalize(name == null ? "" : name, Normalizer.Form.NFKD)
                .replaceAll("\\p{M}+", "")
                .toLowerCase(Locale.ROOT);
        final String slug = decomposed.replaceAll("[^a-z0-9]+", "-").replaceAll("^-+|-+$", "");
        return slug.isEmpty() ? fallback : slug;
    }

    /**
     * An identifier not yet in {@code taken}: the base itself, else {@code base-2}, {@code base-3}, ….
     *
     * @param base  the wanted identifier
     * @param taken the identifiers already used among the siblings
     * @return the first free identifier
     */
    public static String unique(String base, Collection<String> taken) {
        if (!taken.contains(base)) {
            return base;
        }
        for (int n = 2;; n++) {
            final String candidate = base + "-" + n;
            if (!taken.contains(candidate)) {
                return candidate;
            }
        }
    }
}

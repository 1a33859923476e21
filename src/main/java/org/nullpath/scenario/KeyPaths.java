package org.nullpath.scenario;

/** Dotted key paths such as {@code craft.lark.legs[0].burn.acceleration}, as problems name them. */
final class KeyPaths {
    private KeyPaths() {
    }

    /** {@code path.key}, or {@code key} at the top. */
    static String child(String path, String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    /** {@code path[i]}. */
    static String item(String path, int i) {
        return path + "[" + i + "]";
    }
}

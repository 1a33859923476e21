package org.nullpath.scenario;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import com.fasterxml.jackson.dataformat.yaml.snakeyaml.error.Mark;
import com.fasterxml.jackson.dataformat.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.LoaderOptions;

/**
 * One YAML document read into a small tree whose every node and key remembers its 1-based line and
 * column, so that a problem found later can point at the text that caused it.
 *
 * <p>The tree is built from Jackson's streaming parser. Guards against hostile input: the document
 * size is bounded before parsing (by the caller) and again by the YAML reader's code point limit;
 * nesting is bounded; an alias ({@code *name}) shares the anchored node rather than copying it, at most
 * {@link #MAX_COLLECTION_ALIASES} aliases may refer to mappings or lists, and the document may expand
 * to at most {@link #MAX_EXPANDED_NODES} values when every alias is counted in full.
 */
final class YamlTree {
    /** Deepest nesting of mappings and lists, counting expanded aliases. */
    static final int MAX_DEPTH = 64;
    /** Most aliases that may refer to a mapping or a list. */
    static final int MAX_COLLECTION_ALIASES = 50;
    /** Most values the document may hold once aliases are expanded. */
    static final long MAX_EXPANDED_NODES = 1_000_000;
    /** Most characters a document may hold (the file size limit, 4 MiB). */
    static final int MAX_CHARS = 4 * 1024 * 1024;

    private static final YAMLFactory FACTORY = factory();

    private YamlTree() {
    }

    private static YAMLFactory factory() {
        LoaderOptions options = new LoaderOptions();
        options.setMaxAliasesForCollections(MAX_COLLECTION_ALIASES);
        options.setNestingDepthLimit(MAX_DEPTH);
        options.setCodePointLimit(MAX_CHARS);
        StreamReadConstraints limits = StreamReadConstraints.builder()
                .maxNestingDepth(MAX_DEPTH)
                .maxDocumentLength(MAX_CHARS)
                .maxStringLength(MAX_CHARS)
                .maxNameLength(10_000)
                .maxNumberLength(1_000)
                .maxTokenCount(4 * MAX_EXPANDED_NODES)
                .build();
        return YAMLFactory.builder().loaderOptions(options).streamReadConstraints(limits)
                // "key:" with nothing after it is YAML null, as the YAML spec has it; '' stays empty text.
                .enable(YAMLParser.Feature.EMPTY_STRING_AS_NULL)
                .build();
    }

    /** A value in the tree. */
    sealed interface Node extends Located permits MapNode, ListNode, Scalar {
        int line();

        int column();

        /** Number of values in this subtree with aliases expanded (1 for a scalar). */
        long size();

        /** Nesting levels below this node (0 for a scalar). */
        int height();
    }

    /** A key of a mapping, where it was written, and its value. */
    record Entry(String key, int line, int column, Node value) implements Located {
    }

    /** A mapping: keys in file order (a repeated key keeps its first value; the repeat is a problem). */
    record MapNode(Map<String, Entry> entries, int line, int column, long size, int height) implements Node {
        Entry get(String key) {
            return entries.get(key);
        }
    }

    /** A list. */
    record ListNode(List<Node> items, int line, int column, long size, int height) implements Node {
    }

    /** What a scalar looked like to the YAML reader. */
    enum ScalarType {
        /** Text (quoted, or plain text that is not a number, boolean or null). */
        TEXT,
        /** A plain number, including YAML's {@code .nan} and {@code .inf}. */
        NUMBER,
        BOOLEAN,
        /** Nothing: {@code ~}, {@code null} or an empty value. */
        NULL,
        /** Tagged binary data. */
        BINARY
    }

    /**
     * A scalar value.
     *
     * @param text   the text as written
     * @param type   how YAML typed it
     * @param number its value when {@code type} is NUMBER (may be NaN or infinite); 1 or 0 for a BOOLEAN; else NaN
     */
    record Scalar(String text, ScalarType type, double number, int line, int column) implements Node {
        @Override
        public long size() {
            return 1;
        }

        @Override
        public int height() {
            return 0;
        }
    }

    /** Stops the build at the first problem that leaves the rest of the document unreadable. */
    private static final class Fatal extends Exception {
        Fatal() {
            super(null, null, false, false);
        }
    }

    /**
     * Reads {@code text} as one YAML document. Problems that leave the document readable (repeated keys)
     * are added and the build goes on; a syntax error or an exceeded limit is added and ends it.
     *
     * @return the root node, or null when the document cannot be read or holds nothing (a problem was added)
     */
    static Node parse(String text, Problems problems) {
        try (JsonParser parser = FACTORY.createParser(text)) {
            Builder b = new Builder((YAMLParser) parser, problems);
            return b.document();
        } catch (Fatal e) {
            return null;
        } catch (IOException | RuntimeException e) {
            problems.add(0, 0, "", "cannot read the YAML: " + e.getMessage());
            return null;
        }
    }

    private static final class Builder {
        private final YAMLParser p;
        private final Problems problems;
        private final Map<String, Node> anchors = new LinkedHashMap<>();
        private final Set<String> open = new HashSet<>();
        private int collectionAliases;

        Builder(YAMLParser p, Problems problems) {
            this.p = p;
            this.problems = problems;
        }

        Node document() throws Fatal {
            JsonToken t = next();
            if (t == null) {
                problems.add(0, 0, "", "the file holds no YAML document (it is empty or only comments)");
                throw new Fatal();
            }
            Node root = value(t, 1, "");
            JsonToken extra = next();
            if (extra != null) {
                JsonLocation at = p.currentTokenLocation();
                problems.add(at.getLineNr(), at.getColumnNr(), "",
                        "the file holds more than one YAML document (a second one starts here); a scenario is one document");
                throw new Fatal();
            }
            return root;
        }

        private JsonToken next() throws Fatal {
            try {
                return p.nextToken();
            } catch (MarkedYAMLException e) {
                Mark m = e.getProblemMark();
                StringBuilder msg = new StringBuilder("YAML syntax error: ").append(e.getProblem());
                if (e.getContext() != null) {
                    msg.append(" (").append(e.getContext());
                    Mark c = e.getContextMark();
                    if (c != null) {
                        msg.append(" that starts at line ").append(c.getLine() + 1).append(", column ")
                                .append(c.getColumn() + 1);
                    }
                    msg.append(')');
                }
                if (m != null) {
                    problems.add(m.getLine() + 1, m.getColumn() + 1, "", msg.toString());
                } else {
                    addAtParser(msg.toString());
                }
                throw new Fatal();
            } catch (StreamConstraintsException e) {
                String what = e.getOriginalMessage();
                if (what != null && what.contains("nesting depth")) {
                    addAtParser("the document is nested more than " + MAX_DEPTH + " levels deep");
                } else {
                    addAtParser("the document is beyond a reading limit: " + what);
                }
                throw new Fatal();
            } catch (JsonProcessingException e) {
                String what = e.getCause() != null ? e.getCause().getMessage() : e.getOriginalMessage();
                if (what != null && what.contains("exceeds the limit")) {
                    what = "the document is longer than " + MAX_CHARS + " characters (4 MiB)";
                } else if (what != null && what.startsWith("Expected a field name")) {
                    // the parser's own words name its internal event classes
                    what = "a mapping key must be a plain name, not a list or a mapping";
                }
                JsonLocation at = e.getLocation();
                if (at != null && at.getLineNr() > 0) {
                    problems.add(at.getLineNr(), Math.max(at.getColumnNr(), 0), "", what);
                } else {
                    addAtParser(what);
                }
                throw new Fatal();
            } catch (IOException e) {
                addAtParser("cannot read the YAML: " + e.getMessage());
                throw new Fatal();
            }
        }

        private void addAtParser(String message) {
            JsonLocation at = p.currentLocation();
            int line = at == null ? 0 : Math.max(at.getLineNr(), 0);
            problems.add(line, line > 0 ? Math.max(at.getColumnNr(), 0) : 0, "", message);
        }

        /** Builds the value whose first token {@code t} has just been read, at nesting level {@code depth}. */
        private Node value(JsonToken t, int depth, String path) throws Fatal {
            if (t == null) {
                addAtParser("the YAML ends in the middle of a value");
                throw new Fatal();
            }
            JsonLocation at = p.currentTokenLocation();
            int line = at.getLineNr();
            int column = at.getColumnNr();
            boolean alias = t == JsonToken.VALUE_STRING && p.isCurrentAlias();
            if (alias) {
                return alias(text(), line, column, depth, path);
            }
            String anchor = p.getCurrentAnchor();
            if (anchor != null && (t == JsonToken.START_OBJECT || t == JsonToken.START_ARRAY)) {
                open.add(anchor);
            }
            Node node = switch (t) {
                case START_OBJECT -> mapping(line, column, depth, path);
                case START_ARRAY -> list(line, column, depth, path);
                case VALUE_STRING -> new Scalar(text(), ScalarType.TEXT, Double.NaN, line, column);
                case VALUE_NUMBER_INT, VALUE_NUMBER_FLOAT -> new Scalar(text(), ScalarType.NUMBER, number(), line, column);
                case VALUE_TRUE -> new Scalar(text(), ScalarType.BOOLEAN, 1, line, column);
                case VALUE_FALSE -> new Scalar(text(), ScalarType.BOOLEAN, 0, line, column);
                case VALUE_NULL -> new Scalar(text(), ScalarType.NULL, Double.NaN, line, column);
                default -> new Scalar(text(), ScalarType.BINARY, Double.NaN, line, column);
            };
            if (anchor != null) {
                open.remove(anchor);
                anchors.put(anchor, node);
            }
            return node;
        }

        private Node alias(String name, int line, int column, int depth, String path) throws Fatal {
            Node target = anchors.get(name);
            if (target == null) {
                problems.add(line, column, path, open.contains(name)
                        ? "alias '*" + name + "' refers to the node that contains it; recursive YAML is not allowed"
                        : "alias '*" + name + "' refers to no mapping or list anchored '&" + name + "' before it"
                        + " (nullpath takes anchors on mappings and lists, not on single values: write the value"
                        + " again)");
                throw new Fatal();
            }
            if (!(target instanceof Scalar)) {
                collectionAliases++;
                if (collectionAliases > MAX_COLLECTION_ALIASES) {
                    problems.add(line, column, path, "more than " + MAX_COLLECTION_ALIASES
                            + " aliases refer to mappings or lists; nullpath refuses such documents (they can expand without bound)");
                    throw new Fatal();
                }
            }
            if (depth + target.height() > MAX_DEPTH) {
                problems.add(line, column, path, "alias '*" + name + "' nests the document more than " + MAX_DEPTH
                        + " levels deep");
                throw new Fatal();
            }
            return target;
        }

        private MapNode mapping(int line, int column, int depth, String path) throws Fatal {
            Map<String, Entry> entries = new LinkedHashMap<>();
            Extent extent = new Extent(line, column, path);
            while (true) {
                JsonToken t = next();
                if (t == JsonToken.END_OBJECT || t == null) {
                    break;
                }
                JsonLocation at = p.currentTokenLocation();
                String key = text();
                Node value = value(next(), depth + 1, KeyPaths.child(path, key));
                extent.add(value);
                Entry first = entries.get(key);
                if (first != null) {
                    problems.add(at.getLineNr(), at.getColumnNr(), KeyPaths.child(path, key), "key '" + key + "' is repeated (first given at line "
                            + first.line() + ", column " + first.column() + "); each key may appear once");
                } else {
                    entries.put(key, new Entry(key, at.getLineNr(), at.getColumnNr(), value));
                }
            }
            return new MapNode(Collections.unmodifiableMap(entries), line, column, extent.size, extent.height);
        }

        private ListNode list(int line, int column, int depth, String path) throws Fatal {
            List<Node> items = new ArrayList<>();
            Extent extent = new Extent(line, column, path);
            while (true) {
                JsonToken t = next();
                if (t == JsonToken.END_ARRAY || t == null) {
                    break;
                }
                Node value = value(t, depth + 1, KeyPaths.item(path, items.size()));
                extent.add(value);
                items.add(value);
            }
            return new ListNode(Collections.unmodifiableList(items), line, column, extent.size, extent.height);
        }

        /** The size (values counted through aliases) and height of a collection as its children are read. */
        private final class Extent {
            private final int line;
            private final int column;
            private final String path;
            private long size = 1;
            private int height;

            Extent(int line, int column, String path) {
                this.line = line;
                this.column = column;
                this.path = path;
            }

            /** Counts one child in; refuses a document that expands beyond the limit. */
            void add(Node child) throws Fatal {
                size += child.size();
                if (size > MAX_EXPANDED_NODES) {
                    problems.add(line, column, path, "the document expands to more than " + MAX_EXPANDED_NODES
                            + " values through its aliases; nullpath refuses it");
                    throw new Fatal();
                }
                height = Math.max(height, child.height() + 1);
            }
        }

        private String text() throws Fatal {
            try {
                String s = p.getText();
                return s == null ? "" : s;
            } catch (IOException e) {
                addAtParser("cannot read the YAML: " + e.getMessage());
                throw new Fatal();
            }
        }

        private double number() {
            try {
                return p.getDoubleValue();
            } catch (IOException | RuntimeException e) {
                return Double.NaN;
            }
        }
    }
}

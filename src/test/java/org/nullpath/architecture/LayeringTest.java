package org.nullpath.architecture;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

import com.tngtech.archunit.core.domain.Dependency;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.library.Architectures.layeredArchitecture;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The layering of docs/architecture.md, checked on the compiled main classes (ArchUnit): every arrow
 * between packages points down, no two packages depend on each other, and within a package no two files
 * (top-level classes with their nested types) depend on each other.
 */
class LayeringTest {
    private static JavaClasses main;

    @BeforeAll
    static void importMainClasses() {
        main = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.nullpath");
    }

    @Test
    void everyArrowBetweenPackagesPointsDown() {
        layeredArchitecture().consideringOnlyDependenciesInLayers()
                .layer("spark").definedBy("org.nullpath.spark..")
                .layer("cli").definedBy("org.nullpath.cli..")
                .layer("scenario").definedBy("org.nullpath.scenario..")
                .layer("report").definedBy("org.nullpath.report..")
                .layer("schedule").definedBy("org.nullpath.schedule..")
                .layer("mission").definedBy("org.nullpath.mission..")
                .layer("link").definedBy("org.nullpath.link..")
                .layer("lightcone").definedBy("org.nullpath.lightcone..")
                .layer("worldline").definedBy("org.nullpath.worldline..")
                .layer("spacetime").definedBy("org.nullpath.spacetime..")
                .layer("units").definedBy("org.nullpath.units..")
                // the Spark engine: reached by the sweep command by name only (Class.forName), so nothing depends on it
                .whereLayer("spark").mayNotBeAccessedByAnyLayer()
                .whereLayer("cli").mayOnlyBeAccessedByLayers("spark")
                .whereLayer("scenario").mayOnlyBeAccessedByLayers("spark", "cli")
                .whereLayer("report").mayOnlyBeAccessedByLayers("spark", "cli")
                .whereLayer("schedule").mayOnlyBeAccessedByLayers("spark", "cli", "report")
                .whereLayer("mission").mayOnlyBeAccessedByLayers("spark", "cli", "scenario", "report", "schedule")
                .whereLayer("link").mayOnlyBeAccessedByLayers("cli", "scenario", "report", "schedule", "mission")
                .whereLayer("lightcone").mayOnlyBeAccessedByLayers("cli", "scenario", "report", "schedule", "mission",
                        "link")
                .whereLayer("worldline").mayOnlyBeAccessedByLayers("cli", "scenario", "report", "schedule", "mission",
                        "link", "lightcone")
                .whereLayer("spacetime").mayOnlyBeAccessedByLayers("cli", "scenario", "report", "schedule", "mission",
                        "link", "lightcone", "worldline")
                .check(main);
    }

    @Test
    void noTwoPackagesDependOnEachOther() {
        slices().matching("org.nullpath.(*)..").should().beFreeOfCycles().check(main);
    }

    @Test
    void noTwoFilesOfAPackageDependOnEachOther() {
        // the graph of top-level classes (nested types count as their file), within each package
        Map<String, Set<String>> edges = new TreeMap<>();
        for (JavaClass c : main) {
            String from = fileOf(c);
            edges.computeIfAbsent(from, k -> new TreeSet<>());
            for (Dependency d : c.getDirectDependenciesFromSelf()) {
                JavaClass target = d.getTargetClass();
                if (!target.getPackageName().equals(c.getPackageName()) || target.isArray()) {
                    continue;
                }
                String to = fileOf(target);
                if (!to.equals(from) && to.startsWith("org.nullpath.")) {
                    edges.get(from).add(to);
                }
            }
        }
        assertEquals(List.of(), cycles(edges), "files that depend on each other (a cycle through their types)");
    }

    private static String fileOf(JavaClass c) {
        JavaClass top = c;
        while (top.getEnclosingClass().isPresent()) {
            top = top.getEnclosingClass().get();
        }
        return top.getName();
    }

    /** Strongly connected components with more than one file (Tarjan's algorithm). */
    private static List<Set<String>> cycles(Map<String, Set<String>> edges) {
        Map<String, Integer> index = new HashMap<>();
        Map<String, Integer> low = new HashMap<>();
        Deque<String> stack = new ArrayDeque<>();
        Set<String> onStack = new TreeSet<>();
        List<Set<String>> out = new ArrayList<>();
        int[] counter = {0};
        for (String v : edges.keySet()) {
            if (!index.containsKey(v)) {
                connect(v, edges, index, low, stack, onStack, out, counter);
            }
        }
        return out;
    }

    private static void connect(String v, Map<String, Set<String>> edges, Map<String, Integer> index,
                                Map<String, Integer> low, Deque<String> stack, Set<String> onStack,
                                List<Set<String>> out, int[] counter) {
        index.put(v, counter[0]);
        low.put(v, counter[0]);
        counter[0]++;
        stack.push(v);
        onStack.add(v);
        for (String w : edges.getOrDefault(v, Set.of())) {
            if (!index.containsKey(w)) {
                connect(w, edges, index, low, stack, onStack, out, counter);
                low.put(v, Math.min(low.get(v), low.get(w)));
            } else if (onStack.contains(w)) {
                low.put(v, Math.min(low.get(v), index.get(w)));
            }
        }
        if (low.get(v).equals(index.get(v))) {
            Set<String> component = new TreeSet<>();
            String w;
            do {
                w = stack.pop();
                onStack.remove(w);
                component.add(w);
            } while (!w.equals(v));
            if (component.size() > 1) {
                out.add(component);
            }
        }
    }
}

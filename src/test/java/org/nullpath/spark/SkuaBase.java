package org.nullpath.spark;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.nullpath.testkit.ScenarioText;

/** The invented scenario the Spark tests sweep: craft skua burns from station yard, ten uplink messages. */
final class SkuaBase {
    private SkuaBase() {
    }

    /** Writes it as {@code base.yaml} into {@code dir}. */
    static Path write(Path dir, String title) throws IOException {
        return Files.writeString(dir.resolve("base.yaml"), ScenarioText.titled(title).station("yard", "{}")
                .craft("skua", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: 60 d}",
                        "coast: {duration: forever}")
                .link("up", "yard", "skua")
                .message("{link: up, first: 0 d, last: 100 d, every: 10 d}")
                .yaml());
    }
}

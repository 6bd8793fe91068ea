package org.eddycast.plugin;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ServiceLoader;
import org.junit.jupiter.api.Test;

/** A host finds the tool exactly as any host would: through ServiceLoader, reading metadata with no UI. */
class PluginDiscoveryTest {

    @Test
    void hostFindsTheToolAndReadsItsMetadataWithoutBuildingUi() {
        StandaloneHost.Discovery d = StandaloneHost.discover(getClass().getClassLoader());
        assertTrue(d.failures().isEmpty(), () -> "failures: " + d.failures());
        ToolPlugin tool = d.tools().stream().filter(t -> t.info().id().equals("eddycast")).findFirst().orElseThrow();
        PluginInfo info = tool.info();
        assertEquals("eddycast", info.name());
        assertTrue(info.runsHeadless());
        assertNotNull(getClass().getClassLoader().getResource(info.iconResource()), "icon resource present");
        // the plain ServiceLoader route, as a host that does not use our helper
        long found = ServiceLoader.load(ToolPlugin.class).stream().filter(p -> p.get().info().id().equals("eddycast"))
                .count();
        assertEquals(1, found);
    }
}

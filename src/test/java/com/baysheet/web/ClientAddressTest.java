package com.baysheet.web;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

class ClientAddressTest {
    @Test
    void forwardedForIsIgnoredUnlessTheRequestComesFromTheTrustedProxy() {
        assertThat(ClientAddress.of("10.0.0.5", "1.2.3.4", null)).isEqualTo("10.0.0.5");
        assertThat(ClientAddress.of("10.0.0.5", "1.2.3.4", "10.0.0.1")).isEqualTo("10.0.0.5");
    }

    @Test
    void fromTheProxyTheEntryItAppendedCountsNotWhatTheClientSent() {
        assertThat(ClientAddress.of("10.0.0.1", "6.6.6.6, 192.168.1.20", "10.0.0.1")).isEqualTo("192.168.1.20");
        assertThat(ClientAddress.of("10.0.0.1", "not an address", "10.0.0.1")).isEqualTo("10.0.0.1");
    }

    @Test
    void theFlagAndTheVariableSetTheProxy() throws Exception {
        assertThat(ServerOptions.parse(new String[]{"--trusted-proxy", "10.0.0.1"}, java.util.Map.of()).trustedProxy()).isEqualTo("10.0.0.1");
        assertThat(ServerOptions.parse(new String[]{}, java.util.Map.of("BAYSHEET_TRUSTED_PROXY", "::1")).trustedProxy()).isEqualTo("::1");
        assertThat(ServerOptions.parse(new String[]{}, java.util.Map.of()).trustedProxy()).isNull();
    }
}

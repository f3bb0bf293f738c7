package com.baysheet.web;

/**
 * The client's address as the throttle counts it and the audit trail records it. X-Forwarded-For is
 * anyone's to write, so it is believed only on a request that comes from the configured proxy, and then
 * only its last entry: the one that proxy appended (entries before it are whatever the client sent).
 */
public final class ClientAddress {
    private ClientAddress() {}

    /** @param trustedProxy the proxy's address as the server sees it, or null to believe no one */
    public static String of(String remote, String forwardedFor, String trustedProxy) {
        if (trustedProxy == null || forwardedFor == null || !trustedProxy.equals(remote)) return remote;
        String[] hops = forwardedFor.split(",");
        String last = hops[hops.length - 1].strip();
        return last.isEmpty() || last.length() > 64 || !last.matches("[0-9A-Fa-f.:\\[\\]]+") ? remote : last;
    }
}

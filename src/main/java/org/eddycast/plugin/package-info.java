/**
 * The plug-in contract: how a host program finds eddycast with {@link java.util.ServiceLoader}, reads its
 * metadata without building any user interface ({@link org.eddycast.plugin.ToolPlugin#info()}), asks it for its
 * panel and hands it a narrow {@link org.eddycast.plugin.HostContext}. {@link org.eddycast.plugin.StandaloneHost}
 * is a small host that runs any such tool in a window of its own.
 */
package org.eddycast.plugin;

/** The self-contained HTML report of a run (images embedded as data URIs), with cautions and provenance. */
package org.gyreplan.app.report;

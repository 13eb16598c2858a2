package eluvia.cost;

import org.junit.platform.suite.api.SelectPackages;
import org.junit.platform.suite.api.Suite;

/**
 * All tests of the cost bundle, for running them together from an IDE. The name does not match the
 * Tycho surefire patterns, so the build does not run them twice.
 */
@Suite
@SelectPackages("eluvia.cost")
final class CostTestSuite {
}

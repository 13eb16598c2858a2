package eluvia.cost;

/**
 * The three kinds of cost of the US EPA / USACE (2000) feasibility-study costing guide
 * (EPA 540-R-00-002).
 */
public enum CostCategory {
    /** Spent once to build the remedy (taken as year 0). */
    CAPITAL,
    /** Spent every year of operation, years 1 to n (end-of-year convention). */
    ANNUAL_OPERATION_AND_MAINTENANCE,
    /** Spent once in a given year (a review, a replacement, closure). */
    PERIODIC
}

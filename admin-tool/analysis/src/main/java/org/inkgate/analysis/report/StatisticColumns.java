package org.inkgate.analysis.report;

/**
 * The report's vocabulary of statistics: for each, its label in full words (the published name of
 * the statistic kept, e.g. "infit mean square", "Rasch-Andrich threshold") and its stable
 * snake_case CSV name. Define a statistic here once and use the constant in every table that shows
 * it, so the HTML label and the CSV header never drift apart; docs/analysis.md ("Table columns")
 * lists them and a test keeps the two in step.
 */
public final class StatisticColumns {

    // counts and identities
    public static final Column ELEMENT = Column.of("element", "element");
    public static final Column FACET = Column.of("facet", "facet");
    public static final Column STATUS = Column.of("status", "status");
    public static final Column RATINGS = Column.of("ratings", "ratings");
    public static final Column ELEMENTS = Column.of("elements", "elements");
    public static final Column CELLS = Column.of("cells", "cells");
    public static final Column SCORE = Column.of("score", "score");
    public static final Column PERCENT = Column.of("percent of ratings", "percent");
    public static final Column RATING_NUMBER = Column.of("rating number", "rating_number");

    // location and spread
    public static final Column MEASURE = Column.of("measure (logits)", "measure");
    public static final Column STANDARD_ERROR = Column.of("standard error", "standard_error");
    public static final Column JOINT_STANDARD_ERROR = Column.of("joint standard error", "joint_standard_error");
    public static final Column STANDARD_ERROR_BASIS = Column.of("standard error basis", "standard_error_basis");
    public static final Column MEAN = Column.of("mean", "mean");
    public static final Column STANDARD_DEVIATION = Column.of("standard deviation", "standard_deviation");
    public static final Column ROOT_MEAN_SQUARE_ERROR = Column.of("root mean square standard error",
            "root_mean_square_standard_error");
    public static final Column TRUE_STANDARD_DEVIATION = Column.of("true standard deviation", "true_standard_deviation");
    public static final Column SEPARATION = Column.of("separation", "separation");
    public static final Column RELIABILITY = Column.of("reliability", "reliability");
    public static final Column STRATA = Column.of("strata", "strata");

    // scores
    public static final Column OBSERVED_SCORE = Column.of("observed score", "observed_score");
    public static final Column EXPECTED_SCORE = Column.of("expected score", "expected_score");
    public static final Column OBSERVED_AVERAGE = Column.of("observed average", "observed_average");
    public static final Column OBSERVED_MINUS_EXPECTED = Column.of("observed minus expected, per rating",
            "observed_minus_expected_per_rating");
    public static final Column RESIDUAL = Column.of("residual", "residual");
    public static final Column STANDARDISED_RESIDUAL = Column.of("standardised residual", "standardised_residual");

    // fit
    public static final Column INFIT_MEAN_SQUARE = Column.of("infit mean square", "infit_mean_square");
    public static final Column INFIT_STANDARDISED = Column.of("standardised infit", "infit_standardised");
    public static final Column OUTFIT_MEAN_SQUARE = Column.of("outfit mean square", "outfit_mean_square");
    public static final Column OUTFIT_STANDARDISED = Column.of("standardised outfit", "outfit_standardised");
    public static final Column POINT_MEASURE_CORRELATION = Column.of("point-measure correlation",
            "point_measure_correlation");
    public static final Column FIT_FLAG = Column.of("fit flag", "fit_flag");

    // rating scale
    public static final Column SCALE = Column.of("threshold set", "scale");
    public static final Column AVERAGE_MEASURE = Column.of("average measure", "average_measure");
    public static final Column EXPECTED_AVERAGE_MEASURE = Column.of("expected average measure",
            "expected_average_measure");
    public static final Column THRESHOLD = Column.of("Rasch-Andrich threshold", "threshold");
    public static final Column THRESHOLD_STANDARD_ERROR = Column.of("threshold standard error",
            "threshold_standard_error");
    public static final Column THRESHOLD_JOINT_STANDARD_ERROR = Column.of("threshold joint standard error",
            "threshold_joint_standard_error");

    // tests
    public static final Column CHI_SQUARE = Column.of("chi-square", "chi_square");
    public static final Column DEGREES_OF_FREEDOM = Column.of("degrees of freedom", "degrees_of_freedom");
    public static final Column P_VALUE = Column.pValue("p-value", "p_value");
    public static final Column T_STATISTIC = Column.of("t statistic", "t_statistic");

    // interaction (bias)
    public static final Column PAIR = Column.of("pair", "pair");
    public static final Column BIAS_SIZE = Column.of("bias size (logits)", "bias_size");
    public static final Column SIGNIFICANT_CELLS = Column.of("cells with p-value below 0.05", "cells_p_below_0_05");
    public static final Column EXTREME = Column.of("extreme", "extreme");
    public static final Column ESTIMATION = Column.of("estimation", "estimation");

    // anchoring and adjusted scores (issue 18 §2)
    public static final Column DISPLACEMENT = Column.of("displacement (logits)", "displacement");
    public static final Column ADJUSTED_SCORE = Column.of("adjusted score", "adjusted_score");
    public static final Column ADJUSTED_SCORE_LOW = Column.of("adjusted score, 95% low", "adjusted_score_low");
    public static final Column ADJUSTED_SCORE_HIGH = Column.of("adjusted score, 95% high", "adjusted_score_high");

    private StatisticColumns() {
    }
}

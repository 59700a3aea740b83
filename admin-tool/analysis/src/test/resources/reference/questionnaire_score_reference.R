# A SIMULATED study (not demo data, not real people) and the reference values of the questionnaire
# section and of rater agreement on the reported score, from Debian's R (r-base-core, r-cran-psych).
# Run from this folder: Rscript questionnaire_score_reference.R > questionnaire_score_reference.txt
# It writes study_candidates.csv and study_ratings.csv (the data the tests feed through the real
# programs) and questionnaire_score_reference.csv (key,value: the summary.json keys of the report
# with R's values; NA where R gives no value). Copies of the three CSV files are in
# admin-tool/app/src/test/resources/analysis for the admin app's end-to-end test.
suppressMessages(library(psych))
options(digits = 15)
cat(R.version.string, "psych", as.character(packageVersion("psych")), "\n")
set.seed(20261202)

n <- 18
candidate <- sprintf("S%02d", 1:n)
level <- rep(c("A2", "B1", "B2"), each = 6)
k <- rep(0:5, times = 3)
tasks <- c("ferry-complaint", "market-square")
conds <- c("with-resources", "without-resources")
first_task <- tasks[c(0, 1, 0, 1, 0, 1)[k + 1] + 1]
first_condition <- conds[c(0, 0, 1, 1, 1, 0)[k + 1] + 1]
second_condition <- ifelse(first_condition == conds[1], conds[2], conds[1])
conditions <- paste(first_condition, second_condition)
ability <- c(A2 = -1, B1 = 0, B2 = 1)[level] + rnorm(n, 0, 0.6)
# spelling check use in the task with resources: suggestions accepted and flags ignored
spelling_accepted <- rpois(n, exp(1 - 0.3 * ability))
spelling_ignored <- rpois(n, 1.5)
uses <- spelling_accepted + spelling_ignored
help <- as.integer(cut(0.4 * uses + rnorm(n, 0, 1), c(-Inf, 0.5, 1.5, 2.5, 3.5, Inf)))
help[c(5, 14)] <- NA
time <- sample(1:4, n, replace = TRUE, prob = c(0.15, 0.3, 0.35, 0.2))
time[9] <- NA
comments <- rep(NA_character_, n)
comments[2] <- "The suggestions came too late, I had already moved on."
comments[7] <- "<script>alert('x')</script> & \"quoted\", with commas"
comments[12] <- "Nothing to add."
write.csv(data.frame(candidate, level, first_task, first_condition, conditions, spelling_accepted, spelling_ignored,
                     help, time, comments), "study_candidates.csv", row.names = FALSE, na = "")

# two ratings of two criteria (scores 1-9) per response; the first rating is 0.4 points more lenient
clamp <- function(x) pmin(9, pmax(1, x))
rows <- list()
for (i in 1:n) for (t in tasks) {
  cond <- if (t == first_task[i]) first_condition[i] else second_condition[i]
  true <- 5 + 1.5 * ability[i] + (t == "market-square") * -0.3 + (cond == "with-resources") * 0.4
  for (crit in c("language-control", "task-fulfilment")) {
    ct <- true + rnorm(1, 0, 0.5)
    rows[[length(rows) + 1]] <- data.frame(candidate = candidate[i], task = t, condition = cond, criterion = crit,
                                           first = clamp(round(ct + 0.4 + rnorm(1, 0, 0.8))),
                                           second = clamp(round(ct + rnorm(1, 0, 0.8))))
  }
}
ratings <- do.call(rbind, rows)
write.csv(ratings, "study_ratings.csv", row.names = FALSE)

keys <- character(); values <- character()
put <- function(key, value) {
  keys <<- c(keys, key)
  values <<- c(values, if (is.na(value)) "NA" else format(value, digits = 15))
}
slug <- function(s) gsub("^_+|_+$", "", gsub("[^a-z0-9]+", "_", tolower(s)))

# --- rater agreement on the reported score (score rule MEAN: the mean over criteria, per rater) ---
resp <- aggregate(cbind(first, second) ~ candidate + task + condition, data = ratings, FUN = mean)
resp$first_total <- aggregate(first ~ candidate + task + condition, data = ratings, FUN = sum)$first
resp$second_total <- aggregate(second ~ candidate + task + condition, data = ratings, FUN = sum)$second
scope <- function(prefix, d) {
  p <- paste0("raters.reported_score.", prefix, ".")
  put(paste0(p, "pairs"), nrow(d))
  pr <- cor.test(d$first, d$second, method = "pearson")
  put(paste0(p, "pearson_r"), unname(pr$estimate))
  put(paste0(p, "pearson_lower"), pr$conf.int[1])
  put(paste0(p, "pearson_upper"), pr$conf.int[2])
  put(paste0(p, "pearson_p"), pr$p.value)
  sp <- suppressWarnings(cor.test(d$first, d$second, method = "spearman", exact = FALSE))
  put(paste0(p, "spearman_rho"), unname(sp$estimate))
  put(paste0(p, "spearman_p"), sp$p.value)
  put(paste0(p, "exact_agreement"), mean(d$first_total == d$second_total))
  put(paste0(p, "adjacent_agreement"), mean(abs(d$first_total - d$second_total) <= 1))
  put(paste0(p, "mean_abs_difference"), mean(abs(d$first - d$second)))
  icc <- psych::ICC(cbind(d$first, d$second), alpha = 0.05, lmer = FALSE)$results
  for (j in seq_len(nrow(icc))) {
    f <- tolower(icc$type[j])
    put(paste0(p, f), icc$ICC[j])
    put(paste0(p, f, "_lower"), icc[j, "lower bound"])
    put(paste0(p, f, "_upper"), icc[j, "upper bound"])
  }
}
scope("all", resp)
for (t in tasks) scope(paste0("task.", slug(t)), resp[resp$task == t, ])
for (cd in conds) scope(paste0("condition.", slug(cd)), resp[resp$condition == cd, ])

# --- questionnaire: Likert counts and descriptives by condition order and level; answers against use ---
likert <- function(item, values, points) {
  groups <- list(all = rep(TRUE, n))
  for (cd in sort(unique(conditions))) groups[[paste0("condition.", slug(cd))]] <- conditions == cd
  for (l in sort(unique(level))) groups[[paste0("level.", slug(l))]] <- level == l
  for (cd in sort(unique(conditions))) for (l in sort(unique(level))) {
    groups[[paste0("condition.", slug(cd), ".level.", slug(l))]] <- conditions == cd & level == l
  }
  for (g in names(groups)) {
    in_group <- groups[[g]]
    if (!any(in_group)) next
    v <- values[in_group]
    a <- v[!is.na(v)]
    p <- paste0("questionnaire.after_writing.", item, ".", g, ".")
    put(paste0(p, "asked"), length(v))
    put(paste0(p, "answered"), length(a))
    for (point in 1:points) put(paste0(p, "count.", point), sum(a == point))
    put(paste0(p, "mean"), if (length(a) > 0) mean(a) else NA)
    put(paste0(p, "sd"), if (length(a) > 1) sd(a) else NA)
    put(paste0(p, "median"), if (length(a) > 0) median(a) else NA)
  }
  ok <- !is.na(values)
  sp <- suppressWarnings(cor.test(values[ok], uses[ok], method = "spearman", exact = FALSE))
  p <- paste0("questionnaire.after_writing.", item, ".tool.spelling.")
  put(paste0(p, "n"), sum(ok))
  put(paste0(p, "spearman_rho"), unname(sp$estimate))
  put(paste0(p, "p"), sp$p.value)
}
likert("help", help, 5)
likert("time", time, 4)
put("questionnaire.after_writing.comments.all.asked", n)
put("questionnaire.after_writing.comments.all.answered", sum(!is.na(comments)))

write.csv(data.frame(key = keys, value = values), "questionnaire_score_reference.csv", row.names = FALSE, quote = FALSE)
for (i in seq_along(keys)) cat(keys[i], values[i], "\n")

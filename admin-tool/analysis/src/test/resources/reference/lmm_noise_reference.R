# Reference values for the linear mixed model on small noise-only rating sets where Commons Math's
# BOBYQA used to stop with "trust region step has failed to reduce Q" (stop 26; see
# LinearMixedModelRobustnessTest). From Debian's R: r-base-core 4.2.2 with lme4 from r-cran-lme4.
# Run from this folder:
#   Rscript lmm_noise_reference.R > lmm_noise_reference.txt
# Data: lmm_noise_seed_{97,123,170}.csv, invented (integer scores drawn at random by the Java test's
# seeded generator, LinearMixedModelRobustnessTest.noiseStudy), used only to check arithmetic.
# Model: score ~ condition + (1|candidate) + (1|rater) + (1|task), REML, conditions a then b; a factor
# with one level is left out, as Inkgate does. Tolerances tightened so the values are the optimum,
# not where the default stopping rule happens to stop.
suppressMessages(library(lme4))
options(digits = 15)
cat("version", R.version.string, "lme4", as.character(packageVersion("lme4")), "\n")
out <- function(name, ...) { v <- list(...); cat(name, paste(names(v), unlist(v)), "\n") }
tight <- lmerControl(optimizer = "bobyqa", optCtrl = list(rhobeg = 0.2, rhoend = 1e-12, maxfun = 1e5),
                     calc.derivs = FALSE, check.conv.singular = "ignore")
for (seed in c(97, 123, 170)) {
  d <- read.csv(sprintf("lmm_noise_seed_%d.csv", seed), stringsAsFactors = FALSE)
  d$condition <- factor(d$condition, levels = c("a", "b"))
  groups <- Filter(function(g) length(unique(d[[g]])) > 1, c("candidate", "rater", "task"))
  f <- as.formula(paste("score ~ condition +", paste(sprintf("(1 | %s)", groups), collapse = " + ")))
  fit <- lmer(f, data = d, REML = TRUE, control = tight)
  p <- paste0("seed", seed)
  fe <- fixef(fit); se <- sqrt(diag(as.matrix(vcov(fit))))
  for (i in seq_along(fe)) out(paste0(p, "_fixed_", i), estimate = fe[[i]], se = se[[i]])
  vc <- as.data.frame(VarCorr(fit))
  for (i in seq_len(nrow(vc))) out(paste0(p, "_variance_", vc$grp[i]), variance = vc$vcov[i])
  out(paste0(p, "_fit"), reml = fit@devcomp$cmp[["REML"]], ratings = nobs(fit))
}

# Reference values for the linear mixed model of the condition effect (issue 20 section 2) from
# Debian's R: r-base-core 4.2.2 with lme4 from r-cran-lme4. Run from this folder:
#   Rscript lmm_reference.R > lmm_reference.txt
# Model: score ~ condition + (1|candidate) + (1|rater) + (1|task), REML (lme4's lmer).
# Data:
#  (a) lme4's published data set Penicillin (Davies & Goldsmith 1972, via lme4): 144 diameters,
#      24 plates crossed with 6 samples; model diameter ~ 1 + (1|plate) + (1|sample), written to
#      lmm_penicillin.csv beside this script;
#  (b) an invented, seeded simulation of a within-candidate writing study (3 conditions, tasks
#      rotated over conditions, 2 of 8 raters per response), generated below and written to
#      lmm_simulated_ratings.csv. Invented data: used only to check arithmetic.
# The optimizer's tolerances are tightened so the check tests the estimates, not where lme4's
# default stopping rule happens to stop.
suppressMessages(library(lme4))
options(digits = 15)
cat("version", R.version.string, "lme4", as.character(packageVersion("lme4")), "\n")
out <- function(name, ...) { v <- list(...); cat(name, paste(names(v), unlist(v)), "\n") }
tight <- lmerControl(optimizer = "bobyqa", optCtrl = list(rhobeg = 0.2, rhoend = 1e-12, maxfun = 1e5),
                     calc.derivs = FALSE)
report <- function(prefix, fit) {
  fe <- fixef(fit); se <- sqrt(diag(as.matrix(vcov(fit))))
  ci <- confint(fit, method = "Wald", level = 0.95)
  for (i in seq_along(fe)) {
    out(paste0(prefix, "_fixed_", i), estimate = fe[[i]], se = se[[i]], t = fe[[i]] / se[[i]],
        lower = ci[names(fe)[i], 1], upper = ci[names(fe)[i], 2])
  }
  vc <- as.data.frame(VarCorr(fit))
  for (i in seq_len(nrow(vc))) out(paste0(prefix, "_variance_", vc$grp[i]), variance = vc$vcov[i], sd = vc$sdcor[i])
  out(paste0(prefix, "_fit"), reml = fit@devcomp$cmp[["REML"]], sigma = sigma(fit), ratings = nobs(fit))
  th <- getME(fit, "theta")
  names(th) <- sub("[.][(]Intercept[)]$", "", names(th))
  do.call(out, c(list(paste0(prefix, "_theta")), as.list(th)))
}

# (a) Penicillin
data(Penicillin, package = "lme4")
write.csv(data.frame(diameter = Penicillin$diameter, plate = as.character(Penicillin$plate),
                     sample = as.character(Penicillin$sample)), "lmm_penicillin.csv", row.names = FALSE)
pen <- lmer(diameter ~ 1 + (1 | plate) + (1 | sample), data = Penicillin, REML = TRUE, control = tight)
report("penicillin", pen)

# (b) invented within-candidate study: 48 candidates, 3 conditions, 6 tasks, 8 raters
set.seed(20261203)
conditions <- c("none", "spelling", "full")
rows <- list()
for (c in 1:48) {
  for (j in 1:3) {
    task <- ((c + 2 * j) %% 6) + 1
    raters <- sample(1:8, 2)
    for (r in raters) rows[[length(rows) + 1]] <- data.frame(candidate = sprintf("C%02d", c),
        task = sprintf("T%d", task), condition = conditions[j], rater = sprintf("R%d", r))
  }
}
sim <- do.call(rbind, rows)
cand_eff <- setNames(rnorm(48, 0, 1.0), sprintf("C%02d", 1:48))
rater_eff <- setNames(rnorm(8, 0, 0.5), sprintf("R%d", 1:8))
task_eff <- setNames(rnorm(6, 0, 0.4), sprintf("T%d", 1:6))
cond_eff <- c(none = 0, spelling = 0.2, full = 0.6)
sim$score <- round(5 + cond_eff[sim$condition] + cand_eff[sim$candidate] + rater_eff[sim$rater] +
                   task_eff[sim$task] + rnorm(nrow(sim), 0, 0.8), 1)
write.csv(sim, "lmm_simulated_ratings.csv", row.names = FALSE)
sim$condition <- factor(sim$condition, levels = conditions)
fit <- lmer(score ~ condition + (1 | candidate) + (1 | rater) + (1 | task), data = sim, REML = TRUE,
            control = tight)
report("simulated", fit)
# the same fit at lme4's default settings, to show how far its default stopping rule lies from the tight one
def <- lmer(score ~ condition + (1 | candidate) + (1 | rater) + (1 | task), data = sim, REML = TRUE)
out("simulated_default_settings_fit", reml = def@devcomp$cmp[["REML"]], full = fixef(def)[["conditionfull"]])

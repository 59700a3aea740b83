# Reference standard errors for the joint-SE check (Inkgate issue 8): the rating-scale fit of
# reference.R on ratingscale-2000.csv, with vcov() turned into SEs of the centred task and rater
# measures and of the centred thresholds F_j = mean(intercepts) - intercept_j.
# Run from this folder:  Rscript reference-se.R
suppressPackageStartupMessages(library(VGAM))
options(contrasts = c("contr.sum", "contr.poly"))
d <- read.csv("ratingscale-2000.csv")
d$candidate <- factor(d$candidate); d$task <- factor(d$task); d$rater <- factor(d$rater); d$y <- ordered(d$score)
fit <- vglm(y ~ candidate + task + rater, family = acat(parallel = TRUE), data = d,
            control = vglm.control(epsilon = 1e-10, maxit = 100))
v <- vcov(fit); nm <- names(coef(fit))
se_of <- function(weights) { w <- numeric(length(nm)); names(w) <- nm; w[names(weights)] <- weights; sqrt(drop(t(w) %*% v %*% w)) }
effect_se <- function(prefix, levels) {
  k <- grep(paste0("^", prefix, "[0-9]+$"), nm, value = TRUE)
  c(sapply(k, function(x) se_of(setNames(1, x))), se_of(setNames(rep(-1, length(k)), k)))
}
ints <- grep("^\\(Intercept\\)", nm, value = TRUE); m <- length(ints)
thr <- sapply(1:m, function(j) { w <- rep(1 / m, m); w[j] <- w[j] - 1; se_of(setNames(w, ints)) })
out <- rbind(
  data.frame(facet = "task", element = levels(d$task), se = effect_se("task")),
  data.frame(facet = "rater", element = levels(d$rater), se = effect_se("rater")),
  data.frame(facet = "threshold", element = paste0("F", 1:m), se = thr))
write.csv(out, "ratingscale-2000-vgam-se.csv", row.names = FALSE, quote = FALSE)

# Reference values for the partial-credit equivalence test (Inkgate issue 8).
# Fits the committed simulated set ratingscale-2000.csv (written by reference.R) with task-specific
# thresholds: VGAM acat with parallel candidate and rater terms and non-parallel intercepts and
# task terms, sum-to-zero contrasts. Run from this folder:  Rscript reference-pcm.R
suppressPackageStartupMessages(library(VGAM))
options(contrasts = c("contr.sum", "contr.poly"))
d <- read.csv("ratingscale-2000.csv")
d$candidate <- factor(d$candidate); d$task <- factor(d$task); d$rater <- factor(d$rater); d$y <- ordered(d$score)
fit <- vglm(y ~ candidate + task + rater, family = acat(parallel = TRUE ~ candidate + rater - 1), data = d,
            control = vglm.control(epsilon = 1e-10, maxit = 100))
co <- coef(fit)
m <- nlevels(d$y) - 1; nt <- nlevels(d$task)
ints <- co[paste0("(Intercept):", 1:m)]
b <- matrix(0, nt, m)
for (t in 1:(nt - 1)) b[t, ] <- co[paste0("task", t, ":", 1:m)]
b[nt, ] <- -colSums(b[1:(nt - 1), , drop = FALSE])
g <- -(matrix(ints, nt, m, byrow = TRUE) + b)       # D_t + F_tj, up to the common constant
mu <- mean(ints)
eff <- function(prefix) { k <- co[grep(paste0("^", prefix, "[0-9]+$"), names(co))]; c(k, -sum(k)) }
out <- rbind(
  data.frame(facet = "candidate", element = levels(d$candidate), measure = mu + eff("candidate")),
  data.frame(facet = "task", element = levels(d$task), measure = rowMeans(g) + mu),
  data.frame(facet = "rater", element = levels(d$rater), measure = -eff("rater")),
  data.frame(facet = "threshold", element = paste0(rep(levels(d$task), each = m), ":F", rep(1:m, nt)),
             measure = as.vector(t(g - rowMeans(g)))))
write.csv(out, "ratingscale-2000-pcm-vgam.csv", row.names = FALSE, quote = FALSE)

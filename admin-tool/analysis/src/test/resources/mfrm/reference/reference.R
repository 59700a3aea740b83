# Reference values for the many-facet Rasch equivalence tests (Inkgate issue 8).
# Simulated data only (invented parameters, fixed seed); nothing here is real exam data.
# Run from this folder:  Rscript reference.R
# Needs r-base-core and r-cran-vgam (Debian packages). Writes the *.csv files next to it.
suppressPackageStartupMessages(library(VGAM))
options(contrasts = c("contr.sum", "contr.poly"))
set.seed(20261202)

# ---- 1. dichotomous: candidate x item x rater, binomial GLM y ~ candidate + item + rater ----
nc <- 60; ni <- 8; nr <- 3
b <- rnorm(nc, 0, 1.2); d <- seq(-1.5, 1.5, length.out = ni); r <- c(-0.4, 0.1, 0.3)
g <- expand.grid(cand = 1:nc, item = 1:ni, rater = 1:nr)
eta <- b[g$cand] - d[g$item] - r[g$rater]
g$y <- rbinom(nrow(g), 1, plogis(eta))
tot <- tapply(g$y, g$cand, sum); keep <- names(tot)[tot > 0 & tot < ni * nr]
g <- g[g$cand %in% as.integer(keep), ]
dich <- data.frame(candidate = sprintf("c%03d", g$cand), item = sprintf("i%d", g$item),
                   rater = sprintf("r%d", g$rater), score = g$y)
write.csv(dich, "dichotomous.csv", row.names = FALSE, quote = FALSE)
dich$candidate <- factor(dich$candidate); dich$item <- factor(dich$item); dich$rater <- factor(dich$rater)
fit <- glm(score ~ candidate + item + rater, family = binomial, data = dich,
           control = glm.control(epsilon = 1e-12, maxit = 100))
co <- coef(fit); mu <- co[1]
eff <- function(prefix, f) { k <- co[grep(paste0("^", prefix), names(co))]; c(k, -sum(k)) }
out <- rbind(
  data.frame(facet = "candidate", element = levels(dich$candidate), measure = mu + eff("candidate", dich$candidate)),
  data.frame(facet = "item", element = levels(dich$item), measure = -eff("item", dich$item)),
  data.frame(facet = "rater", element = levels(dich$rater), measure = -eff("rater", dich$rater)))
write.csv(out, "dichotomous-glm.csv", row.names = FALSE, quote = FALSE)

# fit statistics from the GLM's fitted probabilities (Wright & Masters 1982, ch. 5):
# outfit = mean z^2, infit = sum (y-p)^2 / sum p(1-p); point-measure correlation of the item's
# responses with the linear predictor without the item's own term
p <- fitted(fit); eta <- predict(fit, type = "link")
z2 <- (dich$score - p)^2 / (p * (1 - p))
fitstats <- function(f, name) {
  data.frame(facet = name, element = levels(f),
             infit = as.vector(tapply((dich$score - p)^2, f, sum) / tapply(p * (1 - p), f, sum)),
             outfit = as.vector(tapply(z2, f, mean)))
}
fs <- rbind(fitstats(dich$candidate, "candidate"), fitstats(dich$item, "item"), fitstats(dich$rater, "rater"))
itemEff <- eff("item", dich$item); names(itemEff) <- levels(dich$item)
rest <- eta - itemEff[as.character(dich$item)]
pm <- sapply(levels(dich$item), function(i) cor(dich$score[dich$item == i], rest[dich$item == i]))
fs$pointMeasure <- NA
fs$pointMeasure[fs$facet == "item"] <- pm[fs$element[fs$facet == "item"]]
write.csv(fs, "dichotomous-fit.csv", row.names = FALSE, quote = FALSE)

# bias item x rater with every main effect anchored: per cell a binomial GLM with the main-effects
# linear predictor as offset and one intercept (= the bias size, positive = more 1s than expected)
cells <- unique(dich[, c("item", "rater")])
bias <- do.call(rbind, lapply(seq_len(nrow(cells)), function(i) {
  sel <- dich$item == cells$item[i] & dich$rater == cells$rater[i]
  b <- glm(dich$score[sel] ~ 1, family = binomial, offset = eta[sel],
           control = glm.control(epsilon = 1e-12, maxit = 100))
  data.frame(item = cells$item[i], rater = cells$rater[i], size = coef(b)[1],
             se = sqrt(vcov(b)[1, 1]))
}))
write.csv(bias, "dichotomous-bias.csv", row.names = FALSE, quote = FALSE)

# ---- 2. rating scale, 5 categories: candidate x task x rater, VGAM acat(parallel = TRUE) ----
simulate_rs <- function(nc, nt, nr, name) {
  b <- rnorm(nc, 0.3, 1); d <- seq(-0.8, 0.8, length.out = nt); r <- seq(-0.6, 0.6, length.out = nr)
  f <- c(-1.6, -0.5, 0.4, 1.7)
  g <- expand.grid(cand = 1:nc, task = 1:nt, rater = 1:nr)
  eta <- b[g$cand] - d[g$task] - r[g$rater]
  num <- sapply(0:4, function(k) exp(k * eta - c(0, cumsum(f))[k + 1]))
  p <- num / rowSums(num)
  g$score <- apply(p, 1, function(pr) sample(0:4, 1, prob = pr))
  tot <- tapply(g$score, g$cand, sum); m <- 4 * nt * nr
  keep <- as.integer(names(tot)[tot > 0 & tot < m]); g <- g[g$cand %in% keep, ]
  data <- data.frame(candidate = sprintf("c%03d", g$cand), task = sprintf("t%d", g$task),
                     rater = sprintf("r%02d", g$rater), score = g$score)
  write.csv(data, paste0(name, ".csv"), row.names = FALSE, quote = FALSE)
  data
}
fit_rs <- function(data, name) {
  data$candidate <- factor(data$candidate); data$task <- factor(data$task); data$rater <- factor(data$rater)
  data$y <- ordered(data$score)
  times <- numeric(5)
  for (i in 1:5) times[i] <- system.time(
    fit <- vglm(y ~ candidate + task + rater, family = acat(parallel = TRUE), data = data,
                control = vglm.control(epsilon = 1e-10, maxit = 100)))["elapsed"]
  co <- coef(fit)
  ints <- co[grep("^\\(Intercept\\)", names(co))]; mu <- mean(ints)
  eff <- function(prefix) { k <- co[grep(paste0("^", prefix), names(co))]; c(k, -sum(k)) }
  out <- rbind(
    data.frame(facet = "candidate", element = levels(data$candidate), measure = mu + eff("candidate")),
    data.frame(facet = "task", element = levels(data$task), measure = -eff("task")),
    data.frame(facet = "rater", element = levels(data$rater), measure = -eff("rater")),
    data.frame(facet = "threshold", element = paste0("F", seq_along(ints)), measure = mu - ints))
  write.csv(out, paste0(name, "-vgam.csv"), row.names = FALSE, quote = FALSE)
  data.frame(data = name, ratings = nrow(data), median_seconds = median(times),
             runs = paste(sprintf("%.3f", times), collapse = " "))
}
t1 <- fit_rs(simulate_rs(100, 4, 5, "ratingscale-2000"), "ratingscale-2000")
t2 <- fit_rs(simulate_rs(150, 8, 5, "ratingscale-6000"), "ratingscale-6000")
write.csv(rbind(t1, t2), "vgam-timings.csv", row.names = FALSE, quote = FALSE)
writeLines(c(R.version.string, paste("VGAM", packageVersion("VGAM")), paste("uptime:", system("uptime", intern = TRUE))),
           "versions.txt")

# Reference values for a parallel-groups study with three conditions (issue 20 section 2) from
# Debian's R (r-base-core; car from r-cran-car). Run from this folder:
#   Rscript parallel_groups.R > parallel_groups.txt
# It also writes parallel_groups_ratings.csv, the INVENTED data set (seeded; no real candidates):
# 36 candidates of an imagined writing study, each under ONE condition (none / spelling / full),
# group sizes 14, 12 and 10 and unequal spreads on purpose, one task, one rater, one criterion, so a
# candidate's score in the report equals their single rating and R sees the same numbers.
# Games-Howell is not in base R or car: it is computed from its formula (Games & Howell 1976) with
# R's ptukey/qtukey. Eta squared, omega squared (Hays 1963) and Kruskal-Wallis epsilon squared
# (Tomczak & Tomczak 2014, epsilon^2 = H / (n - 1)) are computed from R's sums of squares and H.
suppressMessages(library(car))
options(digits = 15)
cat("version", R.version.string, "car", as.character(packageVersion("car")), "\n")
out <- function(name, ...) { v <- list(...); cat(name, paste(names(v), unlist(v)), "\n") }

set.seed(20261203)
cond <- factor(rep(c("none", "spelling", "full"), times = c(14, 12, 10)), levels = c("none", "full", "spelling"))
centre <- c(none = 3.0, spelling = 3.4, full = 4.3)
spread <- c(none = 0.6, spelling = 0.9, full = 1.3)
score <- round(rnorm(length(cond), centre[as.character(cond)], spread[as.character(cond)]), 1)
id <- sprintf("G%02d", seq_along(cond))
level <- rep(c("B1", "B2"), length.out = length(cond))
write.csv(data.frame(candidate = id, level = level, form = "", task = "letter", condition = as.character(cond),
                     rater = "R1", criterion = "content", score = score),
          "parallel_groups_ratings.csv", row.names = FALSE, quote = FALSE)

n <- tapply(score, cond, length); m <- tapply(score, cond, mean); v <- tapply(score, cond, var)
out("groups", n_none = n[["none"]], n_full = n[["full"]], n_spelling = n[["spelling"]],
    mean_none = m[["none"]], mean_full = m[["full"]], mean_spelling = m[["spelling"]])
fit <- aov(score ~ cond)
a <- summary(fit)[[1]]
ssb <- a[1, "Sum Sq"]; ssw <- a[2, "Sum Sq"]; msw <- a[2, "Mean Sq"]
out("anova", F = a[1, "F value"], df1 = a[1, "Df"], df2 = a[2, "Df"], p = a[1, "Pr(>F)"],
    etasq = ssb / (ssb + ssw), omegasq = (ssb - a[1, "Df"] * msw) / (ssb + ssw + msw))
w <- oneway.test(score ~ cond, var.equal = FALSE)
out("welch", F = w$statistic, df1 = w$parameter[[1]], df2 = w$parameter[[2]], p = w$p.value)
lm_ <- car::leveneTest(score ~ cond, center = mean)
out("levene_mean", F = lm_[1, "F value"], p = lm_[1, "Pr(>F)"])
bf <- car::leveneTest(score ~ cond, center = median)
out("brown_forsythe", F = bf[1, "F value"], p = bf[1, "Pr(>F)"])
kw <- kruskal.test(score ~ cond)
out("kruskal", H = kw$statistic, df = kw$parameter, p = kw$p.value, epsq = kw$statistic / (length(score) - 1))
tk <- TukeyHSD(fit, conf.level = 0.95)$cond
for (pair in rownames(tk)) {
  out(paste0("tukey_", sub("-", "_minus_", pair)), diff = tk[pair, "diff"], lower = tk[pair, "lwr"],
      upper = tk[pair, "upr"], p = tk[pair, "p adj"])
}
lv <- levels(cond); k <- length(lv)
for (i in 1:(k - 1)) for (j in (i + 1):k) {
  a_ <- lv[i]; b_ <- lv[j]
  va <- v[[a_]] / n[[a_]]; vb <- v[[b_]] / n[[b_]]
  d <- m[[b_]] - m[[a_]]; se <- sqrt((va + vb) / 2)
  df <- (va + vb)^2 / (va^2 / (n[[a_]] - 1) + vb^2 / (n[[b_]] - 1))
  qc <- qtukey(0.95, k, df)
  out(paste0("games_howell_", b_, "_minus_", a_), diff = d, lower = d - qc * se, upper = d + qc * se, df = df,
      p = ptukey(abs(d) / se, k, df, lower.tail = FALSE))
}

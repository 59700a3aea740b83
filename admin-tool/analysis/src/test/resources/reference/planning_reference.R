# Reference values for study planning (issue 20 section 3) from Debian's R (r-base-core: base stats
# only; the pwr package is not in Debian). Run from this folder:
#   Rscript planning_reference.R > planning_reference.txt
# Each line: a name, then key value pairs. Effects and variance components are invented planning
# figures, not data.
options(digits = 15)
cat("version", R.version.string, "\n")
# (the first argument is .name so that a figure called n does not partially match it)
out <- function(.name, ...) { v <- list(...); cat(.name, paste(names(v), unlist(v)), "\n") }

# --- the noncentral t (R's pt(ncp =) is Lenth's AS 243) ---
for (a in list(c(2, 10, 1), c(1.5, 4, 2.5), c(-1, 7, 0.5), c(-2.5, 3.5, -1), c(0.3, 1, 3), c(4, 30, 4.2),
               c(1.96, 200, 2.8), c(10, 12, 8), c(-0.7, 25, -3), c(3, 60, 36))) {
  out("pt", t = a[1], df = a[2], ncp = a[3], lower = pt(a[1], a[2], a[3]), upper = pt(a[1], a[2], a[3], lower.tail = FALSE))
}
# --- the noncentral F (R's pf(ncp =) is the Poisson mixture of betas, AS 226 with AS R84) ---
for (a in list(c(2, 3, 20, 5), c(1, 1, 10, 2), c(3.5, 2, 38, 12), c(1.2, 1.6, 30.4, 6.5), c(0.5, 4, 8, 0.5),
               c(5, 2, 100, 60), c(2.1, 3, 300, 200), c(4, 1, 5, 0))) {
  out("pf", f = a[1], df1 = a[2], df2 = a[3], ncp = a[4], lower = pf(a[1], a[2], a[3], a[4]),
      upper = pf(a[1], a[2], a[3], a[4], lower.tail = FALSE))
}

# --- power of a t test: both rejection regions when two-sided (power.t.test's strict = TRUE) ---
tpower <- function(delta, df, alpha, sides) {
  if (sides == 1) { c <- qt(1 - alpha, df); return(pt(c, df, abs(delta), lower.tail = FALSE)) }
  c <- qt(1 - alpha / 2, df)
  pt(c, df, delta, lower.tail = FALSE) + pt(-c, df, delta)
}
paired_power <- function(n, dz, alpha, sides) tpower(dz * sqrt(n), n - 1, alpha, sides)
groups_power <- function(n1, d, alpha, sides, ratio) {
  n2 <- max(1, ceiling(ratio * n1 - 1e-9)); tpower(d / sqrt(1 / n1 + 1 / n2), n1 + n2 - 2, alpha, sides)
}
rm_power <- function(n, k, f, rho, eps, alpha) {
  d1 <- (k - 1) * eps; d2 <- (n - 1) * (k - 1) * eps; lambda <- n * k * f^2 / (1 - rho) * eps
  pf(qf(1 - alpha, d1, d2), d1, d2, lambda, lower.tail = FALSE)
}
smallest <- function(power_of, target, from = 2) { n <- from; while (power_of(n) < target) n <- n + 1; n }

# paired: d_z = d / sqrt(2 (1 - rho)); a logit difference over the candidate SD in logits gives d
dz <- 0.4 / sqrt(2 * (1 - 0.6))
out("paired_dz", d = 0.4, rho = 0.6, dz = dz)
out("paired_power", n = 30, dz = dz, alpha = 0.05, sides = 2, power = paired_power(30, dz, 0.05, 2),
    power_t_test = power.t.test(n = 30, delta = dz, sd = 1, type = "one.sample", strict = TRUE)$power)
out("paired_power", n = 12, dz = 0.8, alpha = 0.01, sides = 1, power = paired_power(12, 0.8, 0.01, 1),
    power_t_test = power.t.test(n = 12, delta = 0.8, sd = 1, sig.level = 0.01, type = "one.sample",
                                alternative = "one.sided")$power)
for (a in list(c(dz, 0.05, 0.8, 2), c(0.5, 0.05, 0.9, 2), c(0.3, 0.01, 0.8, 1), c(0.6 / 0.9, 0.05, 0.8, 2))) {
  n <- smallest(function(n) paired_power(n, a[1], a[2], a[4]), a[3])
  cont <- power.t.test(delta = a[1], sd = 1, sig.level = a[2], power = a[3], type = "one.sample",
                       alternative = if (a[4] == 1) "one.sided" else "two.sided", strict = TRUE)$n
  out("paired_n", dz = a[1], alpha = a[2], target = a[3], sides = a[4], n = n, power_t_test_n = cont,
      power_at_n = paired_power(n, a[1], a[2], a[4]), power_below = paired_power(n - 1, a[1], a[2], a[4]))
}

# two groups: equal (power.t.test beside it) and unequal allocation
out("groups_power", n1 = 40, d = 0.5, alpha = 0.05, sides = 2, ratio = 1, power = groups_power(40, 0.5, 0.05, 2, 1),
    power_t_test = power.t.test(n = 40, delta = 0.5, sd = 1, strict = TRUE)$power)
out("groups_power", n1 = 25, d = 0.6, alpha = 0.05, sides = 2, ratio = 2, power = groups_power(25, 0.6, 0.05, 2, 2))
out("groups_power", n1 = 15, d = 0.7, alpha = 0.05, sides = 1, ratio = 1.5, power = groups_power(15, 0.7, 0.05, 1, 1.5))
for (a in list(c(0.5, 0.05, 0.8, 2, 1), c(0.8, 0.05, 0.8, 2, 1), c(0.2, 0.05, 0.8, 2, 1),
               c(0.5, 0.05, 0.8, 2, 2), c(0.35, 0.05, 0.9, 1, 1), c(0.6, 0.01, 0.8, 2, 0.5))) {
  n <- smallest(function(n) groups_power(n, a[1], a[2], a[4], a[5]), a[3], from = 2)
  out("groups_n", d = a[1], alpha = a[2], target = a[3], sides = a[4], ratio = a[5], n1 = n,
      n2 = max(1, ceiling(a[5] * n - 1e-9)), power_at_n = groups_power(n, a[1], a[2], a[4], a[5]),
      power_below = groups_power(n - 1, a[1], a[2], a[4], a[5]))
}

# repeated measures: lambda = n k f^2 / (1 - rho), epsilon times lambda and both df
out("rm_power", n = 20, k = 3, f = 0.25, rho = 0.5, eps = 1, alpha = 0.05, power = rm_power(20, 3, 0.25, 0.5, 1, 0.05))
out("rm_power", n = 36, k = 4, f = 0.2, rho = 0.7, eps = 0.75, alpha = 0.05, power = rm_power(36, 4, 0.2, 0.7, 0.75, 0.05))
out("rm_power", n = 10, k = 5, f = 0.4, rho = 0.3, eps = 0.6, alpha = 0.01, power = rm_power(10, 5, 0.4, 0.3, 0.6, 0.01))
for (a in list(c(3, 0.25, 0.5, 1, 0.05, 0.8), c(3, 0.1, 0.5, 1, 0.05, 0.8), c(4, 0.2, 0.7, 0.75, 0.05, 0.9),
               c(2, 0.25, 0.5, 1, 0.05, 0.8))) {
  n <- smallest(function(n) rm_power(n, a[1], a[2], a[3], a[4], a[5]), a[6])
  out("rm_n", k = a[1], f = a[2], rho = a[3], eps = a[4], alpha = a[5], target = a[6], n = n,
      power_at_n = rm_power(n, a[1], a[2], a[3], a[4], a[5]), power_below = rm_power(n - 1, a[1], a[2], a[3], a[4], a[5]))
}
# k = 2 and epsilon 1: the F test is the square of the paired t, and f = d / 2, rho as given, so
# d_z = 2 f / sqrt(2 (1 - rho)): the two powers agree (an identity, checked here)
out("rm_vs_paired", rm = rm_power(30, 2, 0.2, 0.5, 1, 0.05), paired = paired_power(30, 0.4 / sqrt(2 * (1 - 0.5)), 0.05, 2))
# Cohen's f from planned means (divisor k) and the within-condition SD
m <- c(50, 53, 55); out("cohens_f", m1 = 50, m2 = 53, m3 = 55, sd = 10, f = sqrt(mean((m - mean(m))^2)) / 10)

# --- simulation cross-checks (seeded; Monte Carlo error about 0.01) ---
set.seed(20201)
reps <- 4000
sim_paired <- mean(replicate(reps, { d <- rnorm(30, dz, 1); t.test(d)$p.value < 0.05 }))
out("sim_paired", n = 30, dz = dz, reps = reps, power = sim_paired, formula = paired_power(30, dz, 0.05, 2))
sim_rm <- function(n, means, rho, reps) {
  k <- length(means); S <- matrix(rho, k, k); diag(S) <- 1; L <- chol(S)
  mean(replicate(reps, {
    y <- matrix(rnorm(n * k), n, k) %*% L + matrix(means, n, k, byrow = TRUE)
    r <- y - outer(rowMeans(y), rep(1, k)) - outer(rep(1, n), colMeans(y)) + mean(y)
    ssc <- n * sum((colMeans(y) - mean(y))^2); sse <- sum(r^2)
    Fv <- (ssc / (k - 1)) / (sse / ((n - 1) * (k - 1)))
    pf(Fv, k - 1, (n - 1) * (k - 1), lower.tail = FALSE) < 0.05
  }))
}
mu <- c(0, 0.25, 0.6); f3 <- sqrt(mean((mu - mean(mu))^2))
out("sim_rm", n = 20, k = 3, f = f3, rho = 0.5, reps = reps, power = sim_rm(20, mu, 0.5, reps),
    formula = rm_power(20, 3, f3, 0.5, 1, 0.05))

# --- D study, crossed candidate x rater x task (Brennan 2001, section 4.1) ---
vc <- c(p = 0.40, r = 0.02, t = 0.05, pr = 0.04, pt = 0.15, rt = 0.01, prt = 0.20)
for (nt in c(1, 2, 3)) for (nr in c(1, 2, 3)) {
  rel <- vc[["pr"]] / nr + vc[["pt"]] / nt + vc[["prt"]] / (nr * nt)
  abs <- rel + vc[["r"]] / nr + vc[["t"]] / nt + vc[["rt"]] / (nr * nt)
  out("dstudy", raters = nr, tasks = nt, relative = rel, absolute = abs, g = vc[["p"]] / (vc[["p"]] + rel),
      phi = vc[["p"]] / (vc[["p"]] + abs))
}

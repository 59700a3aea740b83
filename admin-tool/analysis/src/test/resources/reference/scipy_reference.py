# Reference values for inkgate-analysis tests from Debian's scipy/statsmodels.
# Run: /usr/bin/python3 scipy_reference.py > scipy_reference.txt   (from this folder)
import csv, numpy as np, scipy, statsmodels
from scipy import stats
from statsmodels.stats.inter_rater import cohens_kappa

def col(f, c, where=None, eq=None):
    with open(f) as h:
        return np.array([float(r[c]) for r in csv.DictReader(h) if where is None or r[where] == eq])

print("scipy", scipy.__version__, "statsmodels", statsmodels.__version__)
# Wilcoxon signed-rank, sleep (group 2 - group 1): ties and a zero -> normal approximation,
# zeros dropped (zero_method='wilcox'), continuity correction
g1 = col("sleep.csv", "extra", "group", "1"); g2 = col("sleep.csv", "extra", "group", "2")
r = stats.wilcoxon(g2, g1, zero_method="wilcox", correction=True, method="approx")
print("wilcoxon_sleep_approx_cc statistic(min(V+,V-))", r.statistic, "p", repr(r.pvalue))
# Wilcoxon exact, no ties: Lakens movie ratings are tied, so use the Shapiro-Wilk 1965 weights minus 160.3
x = np.array([148, 154, 158, 160, 161, 162, 166, 170, 182, 195, 236], float)
y = x - 160.3
r = stats.wilcoxon(y, method="exact")
print("wilcoxon_sw1965_minus_160.3_exact statistic(min)", r.statistic, "p", repr(r.pvalue))
# Kappa with SEs (Fleiss, Cohen & Everitt 1969 as implemented in statsmodels)
t2 = np.array([[20, 5], [10, 15]])
for wt in [None, "linear", "quadratic"]:
    pass
k = cohens_kappa(t2)
print("kappa_2x2 kappa", repr(k.kappa), "se", repr(k.std_kappa), "se0", repr(k.std_kappa0))
# Artstein & Poesio (2008) Table 4 marginals as a 3x3 agreement table is not printed in full;
# use a 3x3 table built from ToothGrowth: dose (0.5,1,2) vs length tertile (as a two-rating table)
tg_len = col("ToothGrowth.csv", "len"); tg_dose = col("ToothGrowth.csv", "dose")
cut = np.quantile(tg_len, [1/3, 2/3])
a = np.array([{0.5: 0, 1.0: 1, 2.0: 2}[d] for d in tg_dose])
b = np.digitize(tg_len, cut)
tab = np.zeros((3, 3))
for i, j in zip(a, b): tab[i, j] += 1
print("toothgrowth_table", tab.astype(int).tolist())
for wt, name in [(None, "unweighted"), ("linear", "linear"), ("quadratic", "quadratic")]:
    k = cohens_kappa(tab, wt=wt)
    print("kappa_tooth", name, "kappa", repr(k.kappa), "se", repr(k.std_kappa), "se0", repr(k.std_kappa0))
# Fisher exact 2x2 and chi-square
print("fisher_2x2 p", repr(stats.fisher_exact([[20, 5], [10, 15]])[1]))
print("fisher_2x2_small p", repr(stats.fisher_exact([[3, 1], [1, 3]])[1]))
chi = stats.chi2_contingency(tab, correction=False)
print("chisq_tooth stat", repr(chi[0]), "df", chi[2], "p", repr(chi[1]))
# Games-Howell has no scipy implementation; Tukey HSD check of scipy against METHODS.md
pg = {g: col("PlantGrowth.csv", "weight", "group", g) for g in ["ctrl", "trt1", "trt2"]}
th = stats.tukey_hsd(pg["ctrl"], pg["trt1"], pg["trt2"])
print("tukey_plant pvalues", th.pvalue.tolist())
# Levene / Brown-Forsythe
print("levene_mean", stats.levene(*pg.values(), center="mean"))
print("levene_median", stats.levene(*pg.values(), center="median"))
# Spearman and Pearson on the Shrout-Fleiss judges 1 and 3
with open("shrout_fleiss_1979.csv") as h:
    rows = list(csv.DictReader(h))
j1 = np.array([float(r["J1"]) for r in rows]); j3 = np.array([float(r["J3"]) for r in rows])
print("pearson_sf_j1_j3", stats.pearsonr(j1, j3))
print("spearman_sf_j1_j3", stats.spearmanr(j1, j3))

# Games-Howell on PlantGrowth by its definition (Games & Howell 1976): Welch SE and df per pair,
# p from scipy's studentized range (an implementation independent of ours)
from itertools import combinations
names = ["ctrl", "trt1", "trt2"]
for a, b in combinations(names, 2):
    xa, xb = pg[a], pg[b]
    va, vb = xa.var(ddof=1) / len(xa), xb.var(ddof=1) / len(xb)
    df = (va + vb) ** 2 / (va ** 2 / (len(xa) - 1) + vb ** 2 / (len(xb) - 1))
    se = np.sqrt((va + vb) / 2)
    diff = xb.mean() - xa.mean()
    q = abs(diff) / se
    p = stats.studentized_range.sf(q, 3, df)
    qc = stats.studentized_range.ppf(0.95, 3, df)
    print("gameshowell_plant", b + "-" + a, "diff", repr(diff), "df", repr(df), "p", repr(p),
          "lwr", repr(diff - qc * se), "upr", repr(diff + qc * se))
# Noncentral t (scipy.stats.nct) CI for d_s, Lakens (2013) movie ratings; and d_z for sleep
m1 = np.array([9, 7, 8, 9, 8, 9, 9, 10, 9, 9.]); m2 = np.array([9, 6, 7, 8, 7, 9, 8, 8, 8, 7.])
t = stats.ttest_ind(m1, m2).statistic
from scipy.optimize import brentq
def nct_ci(t, df, conf=0.95):
    lo = brentq(lambda d: stats.nct.cdf(t, df, d) - (1 + conf) / 2, t - 20, t + 20)
    hi = brentq(lambda d: stats.nct.cdf(t, df, d) - (1 - conf) / 2, t - 20, t + 20)
    return lo, hi
lo, hi = nct_ci(t, 18)
sc = np.sqrt(1 / 10 + 1 / 10)
print("lakens_movie_ds_ci", repr(lo * sc), repr(hi * sc))
tp = stats.ttest_rel(g2, g1).statistic
lo, hi = nct_ci(tp, 9)
print("sleep_dz_ci (group2-group1)", repr(lo / np.sqrt(10)), repr(hi / np.sqrt(10)))
print("nct_cdf(2.5, 9, 1.3)", repr(stats.nct.cdf(2.5, 9, 1.3)))

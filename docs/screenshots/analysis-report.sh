#!/bin/sh
# Regenerates docs/screenshots/analysis-report.png: the analysis report of the invented, simulated
# demo data (DemoReport; not a real sitting), rendered by headless Chromium (Debian package
# `chromium`). Run from the repository root with JAVA_HOME set as in DEVELOPERS.md.
set -eu
root=$PWD
out=$root/admin-tool/analysis/target/analysis-demo
mvn -B -q -pl admin-tool/analysis -am -DskipTests install
mvn -B -q -pl admin-tool/analysis dependency:build-classpath -Dmdep.includeScope=test \
    -Dmdep.outputFile="$root/admin-tool/analysis/target/demo-classpath.txt"
java -Djava.awt.headless=true \
    -cp "admin-tool/analysis/target/test-classes:admin-tool/analysis/target/classes:$(cat admin-tool/analysis/target/demo-classpath.txt)" \
    org.inkgate.analysis.bench.DemoReport "$out"
# The picture shows the head of the report (title, rules, contents) and its many-facet Rasch
# section. A copy of the page hides the classical sections in between and says so in the picture.
sed 's#</style>#  main > section:not(\#mfrm) { display: none; }\n  main::before { content: "[This picture leaves out the classical sections listed above; the report shows them before this one.]"; display: block; margin-top: 1.5rem; color: \#555; font-style: italic; }\n</style>#' \
    "$out/report/report.html" > "$out/report/report-picture.html"
chromium --headless --no-sandbox --disable-gpu --hide-scrollbars --window-size=1280,2320 \
    --screenshot="$root/docs/screenshots/analysis-report.png" "file://$out/report/report-picture.html"

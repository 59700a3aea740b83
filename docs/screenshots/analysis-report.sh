#!/bin/sh
# Regenerates docs/screenshots/analysis-report.png: parts of the analysis report of the invented,
# simulated demo data (DemoReport; not a real sitting), rendered by headless Chromium (Debian
# package `chromium`). Run from the repository root with JAVA_HOME set as in DEVELOPERS.md.
# Nothing is installed into the local Maven repository: the demo runs from target/ folders.
set -eu
root=$PWD
out=$root/admin-tool/analysis/target/analysis-demo
mvn -B -q -pl admin-tool/analysis test-compile
mvn -B -q -pl admin-tool/analysis dependency:build-classpath -Dmdep.includeScope=test \
    -Dmdep.outputFile="$root/admin-tool/analysis/target/demo-classpath.txt"
java -Djava.awt.headless=true \
    -cp "admin-tool/analysis/target/test-classes:admin-tool/analysis/target/classes:$(cat admin-tool/analysis/target/demo-classpath.txt)" \
    org.inkgate.analysis.bench.DemoReport "$out"
# The picture shows the report's title, the Wright map, the facet summaries, the raters' measures
# and, moved after them, the writing-process table (scrolled to its start). A copy of the page hides the rest of the
# report and says so in the picture.
sed 's#</style>#  nav, .preamble, main > section:not(\#mfrm):not(\#process), section > p, section > figure:not(\#chart_mfrm_wright_map), section > .table-block:not(\#mfrm_facets):not(\#mfrm_elements_rater):not(\#process_measures) { display: none; }\n  section > h2 { margin-top: 1rem; } main { display: flex; flex-direction: column; } \#mfrm { order: -1; }\n  main::before { content: "[This picture shows only the Wright map and three tables; the report holds every other section, table and chart.]"; display: block; order: -2; color: \#555; font-style: italic; }\n</style>#' \
    "$out/report/report.html" > "$out/report/report-picture.html"
chromium --headless --no-sandbox --disable-gpu --hide-scrollbars --window-size=1280,2760 \
    --screenshot="$root/docs/screenshots/analysis-report.png" "file://$out/report/report-picture.html"

#!/bin/bash
# Bundle benchmark with the real WordNet 3.1 dictionary pack and the demo glossary pack: copies the
# invented demo exam source, names both packs built by resource-packs, times 3 signed and 3 sealed
# bundle commands (JVM start included). Needs: mvn -q -B -pl admin-tool/app -am -DskipTests package
set -euo pipefail
cd "$(dirname "$0")/../../../../.."
if [ -d /usr/lib/jvm/temurin-25-jdk-amd64 ]; then export JAVA_HOME=/usr/lib/jvm/temurin-25-jdk-amd64; fi
W=/tmp/wn-bench; rm -rf $W; mkdir -p $W
cp -r admin-tool/app/src/demo/exam-source $W/exam; mkdir -p $W/exam/packs
cp resource-packs/target/packs/*.inkpack $W/exam/packs/
python3 - <<'PY'
p='/tmp/wn-bench/exam/exam.yaml'; s=open(p).read()
s=s.replace("      spelling: suggestions\n","      spelling: suggestions\n      dictionary: wordnet-3.1-en\n      glossary: demo-ferry-en-es\n",1)
s=s.replace("rubric: rubric.yaml","packs:\n  - id: wordnet-3.1-en\n    kind: dictionary\n    version: \"3.1\"\n    file: packs/wordnet-3.1-en.inkpack\n  - id: demo-ferry-en-es\n    kind: glossary\n    version: \"%s\"\n    file: packs/demo-ferry-en-es.inkpack\nrubric: rubric.yaml")
import json,zipfile
v=json.loads(zipfile.ZipFile('/tmp/wn-bench/exam/packs/demo-ferry-en-es.inkpack').read('manifest.json'))['version']
s=s.replace('"%s"','"'+v+'"')
open(p,'w').write(s)
PY
export P="invented passphrase" PIN="invented-pin-8642"
A=admin-tool/app/inkgate-admin
$A keys init --keys $W/keys --passphrase-env P > /dev/null
$A exam check $W/exam
$A forms $W/exam --roster admin-tool/app/src/demo/roster.csv --seed 1 --out $W/assignment.csv > /dev/null
for seal in "" "--seal"; do
  for i in 1 2 3; do
    s=$(date +%s.%N)
    $A bundle $W/exam --out $W/b$i.inkexam --keys $W/keys --roster admin-tool/app/src/demo/roster.csv --assignment $W/assignment.csv --passphrase-env P --pin-env PIN $seal > $W/out.txt 2>&1
    e=$(date +%s.%N); echo "bundle ${seal:-signed} run $i: $(echo "$e - $s" | bc) s, $(stat -c %s $W/b$i.inkexam) bytes"
  done
done

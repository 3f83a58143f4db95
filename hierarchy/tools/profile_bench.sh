#!/usr/bin/env bash
# Timing and accuracy figures of the near-field profile (not a test): builds the hierarchy module and its test
# classes inside the reactor (offline, no install), then runs org.tertius.hierarchy.nls.ProfileBench.
#   hierarchy/tools/profile_bench.sh        # 3 repeats of the 1000 x 400 grid with 1 and 2 threads, then the report
#   hierarchy/tools/profile_bench.sh 1      # one repeat
set -euo pipefail
cd "$(dirname "$0")/../.."
mvn -q -B -o test-compile -pl hierarchy -am
version() { sed -n "s:.*<$1>\(.*\)</$1>.*:\1:p" pom.xml | head -1; }
M2="$HOME/.m2/repository"
HV=$(version hipparchus.version)
AV=$(version apfloat.version)
CP="hierarchy/target/test-classes:hierarchy/target/classes:core/target/classes"
CP="$CP:$M2/org/hipparchus/hipparchus-core/$HV/hipparchus-core-$HV.jar:$M2/org/apfloat/apfloat/$AV/apfloat-$AV.jar"
echo "== $(nproc) cores; uptime: $(uptime)"
java -Xmx2g -cp "$CP" org.tertius.hierarchy.nls.ProfileBench "$@"

#!/bin/sh
# Wall-clock timings of the special solutions (org.tertius.connection.special): compiles the reactor modules
# core, hierarchy and connection (no tests, no install), then runs tools/bench/SpecialTiming.java as a
# single-file Java program on their classes. Prints the machine's load first: timings on a busy machine are
# slower in proportion.
set -e
cd "$(dirname "$0")/../.."
mvn -q -B -o -DskipTests compile -pl connection -am
cp=core/target/classes:hierarchy/target/classes:connection/target/classes
m2="${HOME}/.m2/repository"
cp="$cp:$(ls "$m2"/org/apfloat/apfloat/1.15.0/apfloat-1.15.0.jar)"
cp="$cp:$(ls "$m2"/org/hipparchus/hipparchus-core/4.0.2/hipparchus-core-4.0.2.jar)"
cp="$cp:$(ls "$m2"/org/hipparchus/hipparchus-ode/4.0.2/hipparchus-ode-4.0.2.jar)"
echo "machine: $(nproc) cores, load: $(cut -d' ' -f1-3 /proc/loadavg)"
java -cp "$cp" tools/bench/SpecialTiming.java

#!/usr/bin/env bash
# CI checks of Tertius as a library, after `mvn -B -q -DskipTests install`: the installed artifacts (the bill of
# materials; jar, sources and javadoc jars of core, hierarchy and connection), the Automatic-Module-Name of each
# jar, the versions (bill of materials, consumer example and project agree), the README's library example (the
# same code as examples/consumer), and the consumer project built and run against the installed artifacts.
# Maven's local repository: -Dmaven.repo.local=... in MAVEN_OPTS, else ~/.m2/repository.
set -euo pipefail
cd "$(dirname "$0")/../.."
say() { echo "library: $*"; }
fail() { echo "library: FAILED: $*"; exit 1; }

version=$(sed -n 's:^  <version>\(.*\)</version>$:\1:p' pom.xml | head -n 1)
bom=$(sed -n 's:^  <version>\(.*\)</version>$:\1:p' bom/pom.xml | head -n 1)
consumer=$(sed -n 's:.*<tertius.version>\(.*\)</tertius.version>.*:\1:p' examples/consumer/pom.xml)
[ -n "$version" ] && [ "$bom" = "$version" ] && [ "$consumer" = "$version" ] \
    || fail "versions differ: project '$version', bom/pom.xml '$bom', examples/consumer '$consumer'"

repo=$HOME/.m2/repository
if [[ "${MAVEN_OPTS:-}" =~ -Dmaven\.repo\.local=([^[:space:]]+) ]]; then
    repo=${BASH_REMATCH[1]}
fi
base=$repo/org/tertius
[ -f "$base/tertius-bom/$version/tertius-bom-$version.pom" ] || fail "tertius-bom $version is not in $repo"
for module in core hierarchy connection; do
    dir=$base/tertius-$module/$version
    for suffix in .jar -sources.jar -javadoc.jar .pom; do
        [ -s "$dir/tertius-$module-$version$suffix" ] || fail "tertius-$module-$version$suffix is not in $dir"
    done
    manifest=$(mktemp -d)
    (cd "$manifest" && jar xf "$dir/tertius-$module-$version.jar" META-INF/MANIFEST.MF)
    name=$(tr -d '\r' < "$manifest/META-INF/MANIFEST.MF" | sed -n 's/^Automatic-Module-Name: //p')
    rm -rf "$manifest"
    [ "$name" = "org.tertius.$module" ] || fail "tertius-$module's jar names module '$name', not org.tertius.$module"
    jar --describe-module --file "$dir/tertius-$module-$version.jar" 2> /dev/null | grep "^org.tertius.$module@" > /dev/null \
        || fail "the JDK does not read tertius-$module's jar as module org.tertius.$module"
    [ "$(jar tf "$dir/tertius-$module-$version-javadoc.jar" | grep -cx 'index.html')" = 1 ] \
        || fail "tertius-$module's javadoc jar has no index.html"
done
say "installed $version: tertius-bom; tertius-core, -hierarchy, -connection with sources, javadoc and module names org.tertius.*"

# the README's example is the consumer's source, line for line
example=examples/consumer/src/main/java/example/Example.java
marker="<!-- the example below is $example, built and run by CI -->"
grep -qF "$marker" README.md || fail "README.md has no line '$marker' before its library example"
mkdir -p target
awk -v m="$marker" 'found == 1 && /^```/ { if (inside) exit; inside = 1; next }
     inside { print } index($0, m) == 1 { found = 1 }' README.md > target/readme-example.java
diff -u "$example" target/readme-example.java > target/readme-example.diff \
    || { cat target/readme-example.diff; fail "the README's library example differs from $example"; }

# the consumer project, built and run against the installed artifacts
out=$(mvn -B -q -Dstyle.color=never -f examples/consumer/pom.xml clean package exec:java 2>&1) || { echo "$out"; fail "the consumer example did not build or run"; }
echo "$out" | sed -e 's/\x1b\[[0-9;]*m//g' -e '/^[[:space:]]*$/d' -e 's/^/  /'
[[ "$out" == *"correct digits"* ]] || fail "the consumer example printed no 40-digit value"
say "examples/consumer built and run against the installed $version"

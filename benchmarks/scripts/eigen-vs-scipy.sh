#!/bin/sh
# Issue 18: the library eigen-solver, LAPACK dstebz + dstein in the same JVM (pure Java), and the
# native LAPACK driver through scipy, back to back on the same matrices. Run from the repository
# root after `mvn -B -ntp -pl benchmarks -am package -DskipTests`.
set -e
JAR=benchmarks/target/benchmarks.jar
DIR=${1:-benchmarks/target/channel-well}
SIZES="500 1000 2000 4000 8000"
java -cp "$JAR" org.wurtzkit.benchmarks.ExportChannelWell "$DIR" $SIZES
OMP_NUM_THREADS=1 OPENBLAS_NUM_THREADS=1 python3 benchmarks/scripts/scipy_stebz.py "$DIR" $SIZES
java -jar "$JAR" 'EigenBenchmark\.(tridiagonal|lapackStebzStein)$' -f 1 -wi 3 -w 1s -i 5 -r 1s \
     -prof org.wurtzkit.benchmarks.CpuProfiler
OMP_NUM_THREADS=1 OPENBLAS_NUM_THREADS=1 python3 benchmarks/scripts/scipy_stebz.py "$DIR" $SIZES

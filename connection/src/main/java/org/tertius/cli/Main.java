package org.tertius.cli;
public final class Main { public static void main(String[] a) { } }

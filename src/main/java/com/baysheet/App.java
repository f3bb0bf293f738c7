package com.baysheet;
public final class App { public static void main(String[] a) {} }

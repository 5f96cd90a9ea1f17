package org.baywright.io;

/** JSON pointers (RFC 6901) for locating problems in a plan file. */
final class Pointers {
    private Pointers() {
    }

    /** The pointer of member {@code key} of the object at {@code parent}. */
    static String child(String parent, String key) {
        return parent + "/" + key.replace("~", "~0").replace("/", "~1");
    }

    /** The pointer of element {@code index} of the array at {@code parent}. */
    static String child(String parent, int index) {
        return parent + "/" + index;
    }
}

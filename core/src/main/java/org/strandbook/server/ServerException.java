package org.strandbook.server;

/** A plant server that cannot be reached, refuses a change or holds something unexpected; the message is for the user. */
public class ServerException extends RuntimeException {

    public ServerException(String message) {
        super(message);
    }

    public ServerException(String message, Throwable cause) {
        super(message, cause);
    }

    /** The first line of a driver's message, which is the part a person can act on. */
    static String firstLine(Throwable e) {
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        int nl = m.indexOf('\n');
        return (nl < 0 ? m : m.substring(0, nl)).strip();
    }
}

package dev.penduline.ui.tests;

/**
 * One capability of the workbench, driven through its real widgets inside the running
 * workbench (on the UI thread). Each is reported as its own test, named after it, by
 * {@link WorkbenchCapabilitiesTest}.
 */
@FunctionalInterface
interface Capability {

    /**
     * Drives the capability and checks what it shows and stores.
     *
     * @param driver the live workbench
     * @throws Exception a failed check or an unexpected fault
     */
    void run(WorkbenchDriver driver) throws Exception;
}

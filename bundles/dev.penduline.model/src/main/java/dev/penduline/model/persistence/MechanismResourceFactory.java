package dev.penduline.model.persistence;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.impl.ResourceFactoryImpl;

/**
 * Creates {@link MechanismResource}s. Registered for the {@code penduline} extension in
 * {@code plugin.xml}; outside OSGi, {@link MechanismFiles#newResourceSet()} registers it in the
 * resource set it returns.
 */
public class MechanismResourceFactory extends ResourceFactoryImpl {

    /** Creates the factory (the extension registry needs a public no-argument constructor). */
    public MechanismResourceFactory() {
        super();
    }

    /**
     * Creates a mechanism resource.
     *
     * @param uri the resource's URI
     * @return a new, empty {@link MechanismResource}
     */
    @Override
    public Resource createResource(URI uri) {
        return new MechanismResource(uri);
    }
}

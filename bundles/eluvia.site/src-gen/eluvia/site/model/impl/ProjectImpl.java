/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.CleanupLevel;
import eluvia.site.model.Contaminant;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.Project;
import eluvia.site.model.Site;
import eluvia.site.model.SitePackage;

import java.util.Collection;

import org.eclipse.emf.common.notify.Notification;
import org.eclipse.emf.common.notify.NotificationChain;

import org.eclipse.emf.common.util.EList;

import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.InternalEObject;

import org.eclipse.emf.ecore.impl.ENotificationImpl;
import org.eclipse.emf.ecore.impl.MinimalEObjectImpl;

import org.eclipse.emf.ecore.util.EObjectContainmentEList;
import org.eclipse.emf.ecore.util.InternalEList;

/**
 * <!-- begin-user-doc -->
 * An implementation of the model object '<em><b>Project</b></em>'.
 * <!-- end-user-doc -->
 * <p>
 * The following features are implemented:
 * </p>
 * <ul>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getName <em>Name</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getDescription <em>Description</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getSchemaVersion <em>Schema Version</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getSite <em>Site</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getContaminants <em>Contaminants</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getCleanupLevels <em>Cleanup Levels</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getFlushingDesigns <em>Flushing Designs</em>}</li>
 * </ul>
 *
 * @generated
 */
public class ProjectImpl extends MinimalEObjectImpl.Container implements Project {
	/**
	 * The default value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected static final String NAME_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getName() <em>Name</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getName()
	 * @generated
	 * @ordered
	 */
	protected String name = NAME_EDEFAULT;

	/**
	 * The default value of the '{@link #getDescription() <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDescription()
	 * @generated
	 * @ordered
	 */
	protected static final String DESCRIPTION_EDEFAULT = null;

	/**
	 * The cached value of the '{@link #getDescription() <em>Description</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getDescription()
	 * @generated
	 * @ordered
	 */
	protected String description = DESCRIPTION_EDEFAULT;

	/**
	 * The default value of the '{@link #getSchemaVersion() <em>Schema Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSchemaVersion()
	 * @generated
	 * @ordered
	 */
	protected static final int SCHEMA_VERSION_EDEFAULT = 0;

	/**
	 * The cached value of the '{@link #getSchemaVersion() <em>Schema Version</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSchemaVersion()
	 * @generated
	 * @ordered
	 */
	protected int schemaVersion = SCHEMA_VERSION_EDEFAULT;

	/**
	 * The cached value of the '{@link #getSite() <em>Site</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getSite()
	 * @generated
	 * @ordered
	 */
	protected Site site;

	/**
	 * The cached value of the '{@link #getContaminants() <em>Contaminants</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getContaminants()
	 * @generated
	 * @ordered
	 */
	protected EList<Contaminant> contaminants;

	/**
	 * The cached value of the '{@link #getCleanupLevels() <em>Cleanup Levels</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getCleanupLevels()
	 * @generated
	 * @ordered
	 */
	protected EList<CleanupLevel> cleanupLevels;

	/**
	 * The cached value of the '{@link #getFlushingDesigns() <em>Flushing Designs</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getFlushingDesigns()
	 * @generated
	 * @ordered
	 */
	protected EList<FlushingDesign> flushingDesigns;

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	protected ProjectImpl() {
		super();
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	protected EClass eStaticClass() {
		return SitePackage.Literals.PROJECT;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getName() {
		return name;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setName(String newName) {
		String oldName = name;
		name = newName;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PROJECT__NAME, oldName, name));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String getDescription() {
		return description;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setDescription(String newDescription) {
		String oldDescription = description;
		description = newDescription;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PROJECT__DESCRIPTION, oldDescription, description));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public int getSchemaVersion() {
		return schemaVersion;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSchemaVersion(int newSchemaVersion) {
		int oldSchemaVersion = schemaVersion;
		schemaVersion = newSchemaVersion;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PROJECT__SCHEMA_VERSION, oldSchemaVersion, schemaVersion));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Site getSite() {
		return site;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetSite(Site newSite, NotificationChain msgs) {
		Site oldSite = site;
		site = newSite;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, SitePackage.PROJECT__SITE, oldSite, newSite);
			if (msgs == null) msgs = notification; else msgs.add(notification);
		}
		return msgs;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setSite(Site newSite) {
		if (newSite != site) {
			NotificationChain msgs = null;
			if (site != null)
				msgs = ((InternalEObject)site).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - SitePackage.PROJECT__SITE, null, msgs);
			if (newSite != null)
				msgs = ((InternalEObject)newSite).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - SitePackage.PROJECT__SITE, null, msgs);
			msgs = basicSetSite(newSite, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PROJECT__SITE, newSite, newSite));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Contaminant> getContaminants() {
		if (contaminants == null) {
			contaminants = new EObjectContainmentEList<Contaminant>(Contaminant.class, this, SitePackage.PROJECT__CONTAMINANTS);
		}
		return contaminants;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<CleanupLevel> getCleanupLevels() {
		if (cleanupLevels == null) {
			cleanupLevels = new EObjectContainmentEList<CleanupLevel>(CleanupLevel.class, this, SitePackage.PROJECT__CLEANUP_LEVELS);
		}
		return cleanupLevels;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<FlushingDesign> getFlushingDesigns() {
		if (flushingDesigns == null) {
			flushingDesigns = new EObjectContainmentEList<FlushingDesign>(FlushingDesign.class, this, SitePackage.PROJECT__FLUSHING_DESIGNS);
		}
		return flushingDesigns;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public NotificationChain eInverseRemove(InternalEObject otherEnd, int featureID, NotificationChain msgs) {
		switch (featureID) {
			case SitePackage.PROJECT__SITE:
				return basicSetSite(null, msgs);
			case SitePackage.PROJECT__CONTAMINANTS:
				return ((InternalEList<?>)getContaminants()).basicRemove(otherEnd, msgs);
			case SitePackage.PROJECT__CLEANUP_LEVELS:
				return ((InternalEList<?>)getCleanupLevels()).basicRemove(otherEnd, msgs);
			case SitePackage.PROJECT__FLUSHING_DESIGNS:
				return ((InternalEList<?>)getFlushingDesigns()).basicRemove(otherEnd, msgs);
		}
		return super.eInverseRemove(otherEnd, featureID, msgs);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public Object eGet(int featureID, boolean resolve, boolean coreType) {
		switch (featureID) {
			case SitePackage.PROJECT__NAME:
				return getName();
			case SitePackage.PROJECT__DESCRIPTION:
				return getDescription();
			case SitePackage.PROJECT__SCHEMA_VERSION:
				return getSchemaVersion();
			case SitePackage.PROJECT__SITE:
				return getSite();
			case SitePackage.PROJECT__CONTAMINANTS:
				return getContaminants();
			case SitePackage.PROJECT__CLEANUP_LEVELS:
				return getCleanupLevels();
			case SitePackage.PROJECT__FLUSHING_DESIGNS:
				return getFlushingDesigns();
		}
		return super.eGet(featureID, resolve, coreType);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@SuppressWarnings("unchecked")
	@Override
	public void eSet(int featureID, Object newValue) {
		switch (featureID) {
			case SitePackage.PROJECT__NAME:
				setName((String)newValue);
				return;
			case SitePackage.PROJECT__DESCRIPTION:
				setDescription((String)newValue);
				return;
			case SitePackage.PROJECT__SCHEMA_VERSION:
				setSchemaVersion((Integer)newValue);
				return;
			case SitePackage.PROJECT__SITE:
				setSite((Site)newValue);
				return;
			case SitePackage.PROJECT__CONTAMINANTS:
				getContaminants().clear();
				getContaminants().addAll((Collection<? extends Contaminant>)newValue);
				return;
			case SitePackage.PROJECT__CLEANUP_LEVELS:
				getCleanupLevels().clear();
				getCleanupLevels().addAll((Collection<? extends CleanupLevel>)newValue);
				return;
			case SitePackage.PROJECT__FLUSHING_DESIGNS:
				getFlushingDesigns().clear();
				getFlushingDesigns().addAll((Collection<? extends FlushingDesign>)newValue);
				return;
		}
		super.eSet(featureID, newValue);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void eUnset(int featureID) {
		switch (featureID) {
			case SitePackage.PROJECT__NAME:
				setName(NAME_EDEFAULT);
				return;
			case SitePackage.PROJECT__DESCRIPTION:
				setDescription(DESCRIPTION_EDEFAULT);
				return;
			case SitePackage.PROJECT__SCHEMA_VERSION:
				setSchemaVersion(SCHEMA_VERSION_EDEFAULT);
				return;
			case SitePackage.PROJECT__SITE:
				setSite((Site)null);
				return;
			case SitePackage.PROJECT__CONTAMINANTS:
				getContaminants().clear();
				return;
			case SitePackage.PROJECT__CLEANUP_LEVELS:
				getCleanupLevels().clear();
				return;
			case SitePackage.PROJECT__FLUSHING_DESIGNS:
				getFlushingDesigns().clear();
				return;
		}
		super.eUnset(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public boolean eIsSet(int featureID) {
		switch (featureID) {
			case SitePackage.PROJECT__NAME:
				return NAME_EDEFAULT == null ? name != null : !NAME_EDEFAULT.equals(name);
			case SitePackage.PROJECT__DESCRIPTION:
				return DESCRIPTION_EDEFAULT == null ? description != null : !DESCRIPTION_EDEFAULT.equals(description);
			case SitePackage.PROJECT__SCHEMA_VERSION:
				return schemaVersion != SCHEMA_VERSION_EDEFAULT;
			case SitePackage.PROJECT__SITE:
				return site != null;
			case SitePackage.PROJECT__CONTAMINANTS:
				return contaminants != null && !contaminants.isEmpty();
			case SitePackage.PROJECT__CLEANUP_LEVELS:
				return cleanupLevels != null && !cleanupLevels.isEmpty();
			case SitePackage.PROJECT__FLUSHING_DESIGNS:
				return flushingDesigns != null && !flushingDesigns.isEmpty();
		}
		return super.eIsSet(featureID);
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public String toString() {
		if (eIsProxy()) return super.toString();

		StringBuilder result = new StringBuilder(super.toString());
		result.append(" (name: ");
		result.append(name);
		result.append(", description: ");
		result.append(description);
		result.append(", schemaVersion: ");
		result.append(schemaVersion);
		result.append(')');
		return result.toString();
	}

} //ProjectImpl

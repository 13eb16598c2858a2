/**
 */
package eluvia.site.model.impl;

import eluvia.site.model.CleanupLevel;
import eluvia.site.model.ColumnTest;
import eluvia.site.model.Contaminant;
import eluvia.site.model.ExcavationDesign;
import eluvia.site.model.FlushingDesign;
import eluvia.site.model.PriceBook;
import eluvia.site.model.Project;
import eluvia.site.model.Revision;
import eluvia.site.model.Site;
import eluvia.site.model.SitePackage;

import eluvia.site.model.UncertaintySettings;
import eluvia.site.model.UnitSystem;
import eluvia.site.model.ZoneAnalysisSettings;
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
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getUnitSystem <em>Unit System</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getRevisions <em>Revisions</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getExcavationDesigns <em>Excavation Designs</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getPriceBooks <em>Price Books</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getColumnTests <em>Column Tests</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getUncertainty <em>Uncertainty</em>}</li>
 *   <li>{@link eluvia.site.model.impl.ProjectImpl#getZoneAnalysis <em>Zone Analysis</em>}</li>
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
	 * The default value of the '{@link #getUnitSystem() <em>Unit System</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnitSystem()
	 * @generated
	 * @ordered
	 */
	protected static final UnitSystem UNIT_SYSTEM_EDEFAULT = UnitSystem.SI;

	/**
	 * The cached value of the '{@link #getUnitSystem() <em>Unit System</em>}' attribute.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUnitSystem()
	 * @generated
	 * @ordered
	 */
	protected UnitSystem unitSystem = UNIT_SYSTEM_EDEFAULT;

	/**
	 * The cached value of the '{@link #getRevisions() <em>Revisions</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getRevisions()
	 * @generated
	 * @ordered
	 */
	protected EList<Revision> revisions;

	/**
	 * The cached value of the '{@link #getExcavationDesigns() <em>Excavation Designs</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getExcavationDesigns()
	 * @generated
	 * @ordered
	 */
	protected EList<ExcavationDesign> excavationDesigns;

	/**
	 * The cached value of the '{@link #getPriceBooks() <em>Price Books</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getPriceBooks()
	 * @generated
	 * @ordered
	 */
	protected EList<PriceBook> priceBooks;

	/**
	 * The cached value of the '{@link #getColumnTests() <em>Column Tests</em>}' containment reference list.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getColumnTests()
	 * @generated
	 * @ordered
	 */
	protected EList<ColumnTest> columnTests;

	/**
	 * The cached value of the '{@link #getUncertainty() <em>Uncertainty</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getUncertainty()
	 * @generated
	 * @ordered
	 */
	protected UncertaintySettings uncertainty;

	/**
	 * The cached value of the '{@link #getZoneAnalysis() <em>Zone Analysis</em>}' containment reference.
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @see #getZoneAnalysis()
	 * @generated
	 * @ordered
	 */
	protected ZoneAnalysisSettings zoneAnalysis;

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
	public UnitSystem getUnitSystem() {
		return unitSystem;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public void setUnitSystem(UnitSystem newUnitSystem) {
		UnitSystem oldUnitSystem = unitSystem;
		unitSystem = newUnitSystem == null ? UNIT_SYSTEM_EDEFAULT : newUnitSystem;
		if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PROJECT__UNIT_SYSTEM, oldUnitSystem, unitSystem));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<Revision> getRevisions() {
		if (revisions == null) {
			revisions = new EObjectContainmentEList<Revision>(Revision.class, this, SitePackage.PROJECT__REVISIONS);
		}
		return revisions;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<ExcavationDesign> getExcavationDesigns() {
		if (excavationDesigns == null) {
			excavationDesigns = new EObjectContainmentEList<ExcavationDesign>(ExcavationDesign.class, this, SitePackage.PROJECT__EXCAVATION_DESIGNS);
		}
		return excavationDesigns;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<PriceBook> getPriceBooks() {
		if (priceBooks == null) {
			priceBooks = new EObjectContainmentEList<PriceBook>(PriceBook.class, this, SitePackage.PROJECT__PRICE_BOOKS);
		}
		return priceBooks;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public EList<ColumnTest> getColumnTests() {
		if (columnTests == null) {
			columnTests = new EObjectContainmentEList<ColumnTest>(ColumnTest.class, this, SitePackage.PROJECT__COLUMN_TESTS);
		}
		return columnTests;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public UncertaintySettings getUncertainty() {
		return uncertainty;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetUncertainty(UncertaintySettings newUncertainty, NotificationChain msgs) {
		UncertaintySettings oldUncertainty = uncertainty;
		uncertainty = newUncertainty;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, SitePackage.PROJECT__UNCERTAINTY, oldUncertainty, newUncertainty);
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
	public void setUncertainty(UncertaintySettings newUncertainty) {
		if (newUncertainty != uncertainty) {
			NotificationChain msgs = null;
			if (uncertainty != null)
				msgs = ((InternalEObject)uncertainty).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - SitePackage.PROJECT__UNCERTAINTY, null, msgs);
			if (newUncertainty != null)
				msgs = ((InternalEObject)newUncertainty).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - SitePackage.PROJECT__UNCERTAINTY, null, msgs);
			msgs = basicSetUncertainty(newUncertainty, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PROJECT__UNCERTAINTY, newUncertainty, newUncertainty));
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	@Override
	public ZoneAnalysisSettings getZoneAnalysis() {
		return zoneAnalysis;
	}

	/**
	 * <!-- begin-user-doc -->
	 * <!-- end-user-doc -->
	 * @generated
	 */
	public NotificationChain basicSetZoneAnalysis(ZoneAnalysisSettings newZoneAnalysis, NotificationChain msgs) {
		ZoneAnalysisSettings oldZoneAnalysis = zoneAnalysis;
		zoneAnalysis = newZoneAnalysis;
		if (eNotificationRequired()) {
			ENotificationImpl notification = new ENotificationImpl(this, Notification.SET, SitePackage.PROJECT__ZONE_ANALYSIS, oldZoneAnalysis, newZoneAnalysis);
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
	public void setZoneAnalysis(ZoneAnalysisSettings newZoneAnalysis) {
		if (newZoneAnalysis != zoneAnalysis) {
			NotificationChain msgs = null;
			if (zoneAnalysis != null)
				msgs = ((InternalEObject)zoneAnalysis).eInverseRemove(this, EOPPOSITE_FEATURE_BASE - SitePackage.PROJECT__ZONE_ANALYSIS, null, msgs);
			if (newZoneAnalysis != null)
				msgs = ((InternalEObject)newZoneAnalysis).eInverseAdd(this, EOPPOSITE_FEATURE_BASE - SitePackage.PROJECT__ZONE_ANALYSIS, null, msgs);
			msgs = basicSetZoneAnalysis(newZoneAnalysis, msgs);
			if (msgs != null) msgs.dispatch();
		}
		else if (eNotificationRequired())
			eNotify(new ENotificationImpl(this, Notification.SET, SitePackage.PROJECT__ZONE_ANALYSIS, newZoneAnalysis, newZoneAnalysis));
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
			case SitePackage.PROJECT__REVISIONS:
				return ((InternalEList<?>)getRevisions()).basicRemove(otherEnd, msgs);
			case SitePackage.PROJECT__EXCAVATION_DESIGNS:
				return ((InternalEList<?>)getExcavationDesigns()).basicRemove(otherEnd, msgs);
			case SitePackage.PROJECT__PRICE_BOOKS:
				return ((InternalEList<?>)getPriceBooks()).basicRemove(otherEnd, msgs);
			case SitePackage.PROJECT__COLUMN_TESTS:
				return ((InternalEList<?>)getColumnTests()).basicRemove(otherEnd, msgs);
			case SitePackage.PROJECT__UNCERTAINTY:
				return basicSetUncertainty(null, msgs);
			case SitePackage.PROJECT__ZONE_ANALYSIS:
				return basicSetZoneAnalysis(null, msgs);
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
			case SitePackage.PROJECT__UNIT_SYSTEM:
				return getUnitSystem();
			case SitePackage.PROJECT__REVISIONS:
				return getRevisions();
			case SitePackage.PROJECT__EXCAVATION_DESIGNS:
				return getExcavationDesigns();
			case SitePackage.PROJECT__PRICE_BOOKS:
				return getPriceBooks();
			case SitePackage.PROJECT__COLUMN_TESTS:
				return getColumnTests();
			case SitePackage.PROJECT__UNCERTAINTY:
				return getUncertainty();
			case SitePackage.PROJECT__ZONE_ANALYSIS:
				return getZoneAnalysis();
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
			case SitePackage.PROJECT__UNIT_SYSTEM:
				setUnitSystem((UnitSystem)newValue);
				return;
			case SitePackage.PROJECT__REVISIONS:
				getRevisions().clear();
				getRevisions().addAll((Collection<? extends Revision>)newValue);
				return;
			case SitePackage.PROJECT__EXCAVATION_DESIGNS:
				getExcavationDesigns().clear();
				getExcavationDesigns().addAll((Collection<? extends ExcavationDesign>)newValue);
				return;
			case SitePackage.PROJECT__PRICE_BOOKS:
				getPriceBooks().clear();
				getPriceBooks().addAll((Collection<? extends PriceBook>)newValue);
				return;
			case SitePackage.PROJECT__COLUMN_TESTS:
				getColumnTests().clear();
				getColumnTests().addAll((Collection<? extends ColumnTest>)newValue);
				return;
			case SitePackage.PROJECT__UNCERTAINTY:
				setUncertainty((UncertaintySettings)newValue);
				return;
			case SitePackage.PROJECT__ZONE_ANALYSIS:
				setZoneAnalysis((ZoneAnalysisSettings)newValue);
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
			case SitePackage.PROJECT__UNIT_SYSTEM:
				setUnitSystem(UNIT_SYSTEM_EDEFAULT);
				return;
			case SitePackage.PROJECT__REVISIONS:
				getRevisions().clear();
				return;
			case SitePackage.PROJECT__EXCAVATION_DESIGNS:
				getExcavationDesigns().clear();
				return;
			case SitePackage.PROJECT__PRICE_BOOKS:
				getPriceBooks().clear();
				return;
			case SitePackage.PROJECT__COLUMN_TESTS:
				getColumnTests().clear();
				return;
			case SitePackage.PROJECT__UNCERTAINTY:
				setUncertainty((UncertaintySettings)null);
				return;
			case SitePackage.PROJECT__ZONE_ANALYSIS:
				setZoneAnalysis((ZoneAnalysisSettings)null);
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
			case SitePackage.PROJECT__UNIT_SYSTEM:
				return unitSystem != UNIT_SYSTEM_EDEFAULT;
			case SitePackage.PROJECT__REVISIONS:
				return revisions != null && !revisions.isEmpty();
			case SitePackage.PROJECT__EXCAVATION_DESIGNS:
				return excavationDesigns != null && !excavationDesigns.isEmpty();
			case SitePackage.PROJECT__PRICE_BOOKS:
				return priceBooks != null && !priceBooks.isEmpty();
			case SitePackage.PROJECT__COLUMN_TESTS:
				return columnTests != null && !columnTests.isEmpty();
			case SitePackage.PROJECT__UNCERTAINTY:
				return uncertainty != null;
			case SitePackage.PROJECT__ZONE_ANALYSIS:
				return zoneAnalysis != null;
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
		result.append(", unitSystem: ");
		result.append(unitSystem);
		result.append(')');
		return result.toString();
	}

} //ProjectImpl

export { customerKeys, customerQuery, useCustomer } from './api/customers';
export { CustomerCard } from './components/customer-card';
export { CustomerFields } from './components/customer-fields';
export { CustomerForm } from './components/customer-form';
export { CUSTOMER_FORM_MODEL, customerFormToInput, EMPTY_CUSTOMER, type CustomerFormValues } from './components/customer-model';
export { CustomerSearch } from './components/customer-search';
export { CustomersTable } from './components/customers-table';

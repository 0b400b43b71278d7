export { customerKeys, customerQuery, useCustomer } from './api/customers';
export { CustomerCard } from './components/customer-card';
export { CustomerFields } from './components/customer-fields';
export { CustomerForm, EMPTY_CUSTOMER, type CustomerFormValues } from './components/customer-form';
export { CustomerSearch } from './components/customer-search';
export { CustomersTable } from './components/customers-table';

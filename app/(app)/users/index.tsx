import { lazyScreen } from '../../../components/screens/lazy-screen';

export default lazyScreen('users');
